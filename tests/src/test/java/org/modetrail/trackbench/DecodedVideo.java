package org.modetrail.trackbench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;

import org.modetrail.demo.ClipOptions;
import org.modetrail.demo.ClipWriter;
import org.modetrail.video.Frame;
import org.modetrail.video.FrameIndex;
import org.modetrail.video.FrameSink;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * A clip's decoded frames held in memory and served as a {@link VideoSource}, so every tracker and every pass of
 * the simulated annotator sees the same decoded pixels without decoding again. Made either by encoding a generated
 * clip as H.264 with export's {@link ClipWriter} (the ffmpeg command) and decoding it with Modetrail's
 * {@link VideoSource} ({@link #encodeAndDecode}), or by decoding a real file ({@link #decode}). The median time
 * between consecutive frames of that one sequential read is kept as the decode time per frame.
 */
public final class DecodedVideo implements VideoSource {
    private final Path path;
    private final Frame[] frames;
    private final double fps;
    private final FrameIndex index;
    private final double decodeMillis;

    private DecodedVideo(Path path, Frame[] frames, double fps, double decodeMillis) {
        this.path = path;
        this.frames = frames;
        this.fps = fps;
        this.decodeMillis = decodeMillis;
        long[] pts = new long[frames.length];
        boolean[] key = new boolean[frames.length];
        for (int n = 0; n < frames.length; n++) {
            pts[n] = n;
            key[n] = true;
        }
        index = new FrameIndex(pts, key, 1, (int) Math.round(fps));
    }

    /**
     * Renders the first {@code frames} frames of {@code clip}, encodes them as H.264 at {@code crf} (otherwise the
     * committed demo clips' settings: GOP 250, 3 B-frames, preset medium, yuv420p) into {@code dir}, and decodes
     * the file into memory; the file is deleted afterwards.
     */
    public static DecodedVideo encodeAndDecode(MultiClip clip, int frames, int crf, Path dir) throws IOException,
            VideoException {
        int n = Math.min(frames, clip.frameCount());
        Path file = dir.resolve(clip.name().replaceAll("[^A-Za-z0-9-]", "_") + ".mp4");
        ClipOptions options = ClipOptions.defaults(clip.width(), clip.height(), n).withTiming(clip.fps(), n)
                .withQuality(crf, ClipOptions.DEFAULT_QSCALE, ClipOptions.DEFAULT_PRESET);
        int[] rgb = new int[clip.width() * clip.height()];
        try (ClipWriter writer = ClipWriter.open(file, options)) {
            for (int f = 0; f < n; f++) {
                clip.render(f, rgb);
                writer.write(rgb);
            }
            writer.finish();
        }
        try {
            DecodedVideo v = decode(file, n, dir);
            if (v.frameCount() != n) {
                throw new VideoException(file, "decoded " + v.frameCount() + " frames of the " + n + " encoded; "
                        + "the encoder or decoder dropped frames");
            }
            return v;
        } finally {
            java.nio.file.Files.deleteIfExists(file);
        }
    }

    /** The first {@code frames} frames of a video file, decoded in one sequential read into memory. */
    public static DecodedVideo decode(Path file, int frames, Path indexCacheDir) throws VideoException {
        try (VideoSource src = VideoSource.open(file, VideoOptions.defaults().withIndexCacheDir(indexCacheDir))) {
            int n = Math.min(frames, src.frameCount());
            Frame[] got = new Frame[n];
            long[] gaps = new long[n];
            int[] count = {0};
            long[] previous = {System.nanoTime()};
            src.read(0, n, frame -> {
                long now = System.nanoTime();
                int i = count[0]++;
                gaps[i] = now - previous[0];
                got[frame.index()] = new Frame(frame.index(), frame.timeSeconds(), frame.width(), frame.height(),
                        frame.rgb().clone());
                previous[0] = System.nanoTime(); // the copy is ours, not the decoder's
                return true;
            });
            for (int i = 0; i < n; i++) {
                if (got[i] == null) {
                    throw new VideoException(file, "frame " + i + " could not be decoded; the benchmark needs "
                            + "every frame");
                }
            }
            // The first gap includes opening the decoder: the median of the rest.
            long[] sorted = Arrays.copyOfRange(gaps, Math.min(1, count[0]), count[0]);
            Arrays.sort(sorted);
            double median = sorted.length == 0 ? Double.NaN : sorted[sorted.length / 2] / 1e6;
            return new DecodedVideo(file, got, src.info().meanFrameRate(), median);
        }
    }

    /** Median milliseconds between consecutive frames of the sequential read that made this. */
    public double decodeMillis() {
        return decodeMillis;
    }

    @Override
    public Path path() {
        return path;
    }

    @Override
    public VideoInfo info() {
        Frame first = frames[0];
        return new VideoInfo(first.width(), first.height(), frames.length, frames.length / fps, fps, false,
                frames.length, "decoded", "memory");
    }

    @Override
    public FrameIndex index() {
        return index;
    }

    @Override
    public Frame frame(int n) {
        return frames[n];
    }

    @Override
    public void read(int from, int to, FrameSink sink) throws VideoException {
        for (int n = from; n < to; n++) {
            if (!sink.accept(frames[n])) {
                return;
            }
        }
    }

    @Override
    public int[] unreadableFrames() {
        return new int[0];
    }

    @Override
    public void close() {
    }
}
