package org.modetrail.app.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

import org.bytedeco.javacv.FrameGrabber;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Sequential decoding of the whole clip, four ways, interleaved pass by pass so that a load spike on the machine
 * falls on all of them alike. Opening is not timed in any of them: only the frames.
 */
final class SequentialBench {
    private SequentialBench() {
    }

    /** Frames per second of each pass; the ffmpeg arrays are null when there is no ffmpeg. */
    record Result(int frames, double[] sourceFps, double[] grabberFps, double[] ffmpegNullFps,
                  double[] ffmpegBgr0Fps) {
    }

    static Result run(Path clip, VideoOptions options, int threads, int repeats, Optional<FfmpegCli> ffmpeg)
            throws VideoException, FrameGrabber.Exception, IOException {
        int frames;
        try (VideoSource source = VideoSource.open(clip, options)) {
            frames = source.frameCount();
            // Warm-up: loads the natives and lets the JIT compile the loop before anything is timed.
            readSource(source, Math.min(frames, 100));
        }
        try (BareGrabber g = BareGrabber.start(clip, threads)) {
            g.readAll();
        }
        double[] source = new double[repeats];
        double[] grabber = new double[repeats];
        double[] ffNull = ffmpeg.isPresent() ? new double[repeats] : null;
        double[] ffBgr0 = ffmpeg.isPresent() ? new double[repeats] : null;
        for (int r = 0; r < repeats; r++) {
            // Alternating which goes first keeps any order effect out of the paired ratio.
            if (r % 2 == 1) {
                grabber[r] = grabberFps(clip, threads);
            }
            try (VideoSource s = VideoSource.open(clip, options)) {
                long t0 = System.nanoTime();
                int n = readSource(s, frames);
                source[r] = n / seconds(t0);
            }
            if (r % 2 == 0) {
                grabber[r] = grabberFps(clip, threads);
            }
            if (ffmpeg.isPresent()) {
                ffNull[r] = ffmpeg.get().decode(clip, threads, null).fps();
                ffBgr0[r] = ffmpeg.get().decode(clip, threads, "bgr0").fps();
            }
        }
        return new Result(frames, source, grabber, ffNull, ffBgr0);
    }

    private static double grabberFps(Path clip, int threads) throws FrameGrabber.Exception {
        try (BareGrabber g = BareGrabber.start(clip, threads)) {
            long t0 = System.nanoTime();
            int n = g.readAll();
            return n / seconds(t0);
        }
    }

    /** VideoSource.read over frames [0, count): the sink only reads one pixel, as a consumer at least would. */
    private static int readSource(VideoSource source, int count) throws VideoException {
        int[] seen = new int[1];
        long[] touched = new long[1];
        source.read(0, count, f -> {
            touched[0] += f.rgb()[0];
            seen[0]++;
            return true;
        });
        return touched[0] == Long.MIN_VALUE ? -1 : seen[0];
    }

    static double seconds(long startNanos) {
        return (System.nanoTime() - startNanos) / 1e9;
    }
}
