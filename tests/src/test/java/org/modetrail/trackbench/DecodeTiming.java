package org.modetrail.trackbench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;

import org.modetrail.demo.ClipOptions;
import org.modetrail.demo.ClipWriter;
import org.modetrail.demo.scenario.TrackingScenarios;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Time to decode one frame of a clip through {@link VideoSource#read}, the sequential path the tracker is fed by:
 * the clip is written as H.264 by the generator's {@code TrackingScenarios.writeClip} (or, for the stand-in, export's
 * {@link ClipWriter} with default options; both run the ffmpeg command), then
 * read twice (the first read warms up) and the median gap between frames is taken.
 */
public final class DecodeTiming {
    private DecodeTiming() {
    }

    /** Median milliseconds per decoded frame of {@code clip} encoded as H.264 under {@code dir}. */
    public static double medianMillis(BenchClip clip, Path dir) throws IOException {
        Path file = dir.resolve(clip.name().replaceAll("[^a-z0-9-]", "_") + ".mp4");
        if (clip instanceof ScenarioClip sc) {
            // The generator's own writer with its options for the scenario (H.264 through the ffmpeg command).
            TrackingScenarios.writeClip(sc.scenario(), file, TrackingScenarios.clipOptions(sc.scenario()));
        } else {
            encode(clip, file);
        }
        return decodeMillis(file, dir);
    }

    private static void encode(BenchClip clip, Path file) throws IOException {
        int[] rgb = new int[clip.width() * clip.height()];
        try (ClipWriter writer = ClipWriter.open(file, ClipOptions.defaults(clip.width(), clip.height(),
                clip.frameCount()))) {
            for (int f = 0; f < clip.frameCount(); f++) {
                clip.render(f, rgb);
                writer.write(rgb);
            }
            writer.finish();
        }
    }

    private static double decodeMillis(Path file, Path dir) throws IOException {
        double median = 0;
        try (VideoSource src = VideoSource.open(file, VideoOptions.defaults().withIndexCacheDir(dir))) {
            for (int pass = 0; pass < 2; pass++) {
                long[] gaps = new long[src.frameCount()];
                int[] n = {0};
                long[] previous = {System.nanoTime()};
                src.read(0, src.frameCount(), frame -> {
                    long now = System.nanoTime();
                    gaps[n[0]++] = now - previous[0];
                    previous[0] = now;
                    return true;
                });
                long[] got = Arrays.copyOf(gaps, n[0]);
                Arrays.sort(got);
                median = got[got.length / 2] / 1e6;
            }
        } catch (org.modetrail.video.VideoException e) {
            throw new IOException(e.getMessage(), e);
        }
        return median;
    }
}
