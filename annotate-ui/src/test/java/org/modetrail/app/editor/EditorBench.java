package org.modetrail.app.editor;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import org.modetrail.format.project.AutosaveConfig;
import org.modetrail.model.Box;
import org.modetrail.model.Edits;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.VideoRef;
import org.modetrail.video.VideoSource;

/**
 * The editor's speed figures, printed with references measured in the same run: stepping a frame forward and back
 * through the window's frame supply, jumping to random frames against a bare decoder's seek, and a new track's
 * growth against decoding alone. Run after {@code mvn -B -q install -DskipTests}:
 * {@code mvn -B -q -pl annotate-ui test-compile exec:java -Dexec.mainClass=org.modetrail.app.editor.EditorBench
 * -Dexec.classpathScope=test [-Dexec.args="CLIP.mp4"]}; without a clip it makes a 1080p one with GOP 250 with the
 * ffmpeg tool.
 */
public final class EditorBench {
    private EditorBench() {
    }

    public static void main(String[] args) throws Exception {
        Path clip = args.length > 0 ? Path.of(args[0]) : makeClip();
        try (VideoSource v = VideoSource.open(clip); FrameFetcher fetcher = new FrameFetcher(VideoSource.open(clip))) {
            System.out.printf(Locale.ROOT, "clip %s: %dx%d, %d frames%n", clip.getFileName(), v.info().width(),
                    v.info().height(), v.frameCount());
            double decodeFps = sequentialFps(v, Math.min(v.frameCount(), 250));
            System.out.printf(Locale.ROOT, "reference: sequential decoding %.1f frames/s (%.2f ms a frame)%n",
                    decodeFps, 1000 / decodeFps);
            int start = Math.min(100, v.frameCount() / 3);
            int span = Math.min(80, v.frameCount() - start - 1);
            double[] forward = steps(fetcher, start, start + span, 1);
            double[] back = steps(fetcher, start + span - 1, start, -1);
            double[] bareForward = new double[41];
            try (VideoSource bare = VideoSource.open(clip)) {
                bare.frame(start + 100);
                for (int i = 0; i < bareForward.length; i++) {
                    long t0 = System.nanoTime();
                    bare.frame(start + 100 + i);
                    bareForward[i] = (System.nanoTime() - t0) / 1e6;
                }
            }
            print("bare decoder: frame(n + 1) after frame(n)", bareForward, 1000 / decodeFps);
            print("step forward", forward, 1000 / decodeFps);
            print("step back", back, 1000 / decodeFps);
            System.out.printf(Locale.ROOT, "  steps over 20 ms: %d of %d forward, %d of %d back (a step every %d ms, "
                    + "as a held arrow key repeats; %d pictures kept)%n", over(forward, 20), forward.length,
                    over(back, 20), back.length, STEP_EVERY_MS, fetcher.keptCapacity());
            Random r = new Random(7);
            int[] jumps = new int[20];
            for (int i = 0; i < jumps.length; i++) {
                jumps[i] = r.nextInt(v.frameCount());
            }
            double[] editor = new double[jumps.length];
            double[] firstPicture = new double[jumps.length];
            double[] bare = new double[jumps.length];
            double[] fromKey = new double[jumps.length];
            try (VideoSource seek = VideoSource.open(clip)) {
                for (int i = 0; i < jumps.length; i++) {
                    double[] t = twice(fetcher, jumps[i]);
                    firstPicture[i] = t[0];
                    editor[i] = t[1];
                    long t0 = System.nanoTime();
                    seek.frame(jumps[i]);
                    bare[i] = (System.nanoTime() - t0) / 1e6;
                    fromKey[i] = (jumps[i] - seek.index().keyframeAtOrBefore(jumps[i]) + 1) / decodeFps * 1000;
                }
            }
            double bareMedian = median(bare);
            print("jump: first picture on screen", firstPicture, bareMedian);
            print("jump: exact frame", editor, bareMedian);
            double[] ratio = new double[jumps.length];
            for (int i = 0; i < jumps.length; i++) {
                ratio[i] = editor[i] / fromKey[i];
            }
            int worst = 0;
            for (int i = 1; i < jumps.length; i++) {
                worst = ratio[i] > ratio[worst] ? i : worst;
            }
            System.out.printf(Locale.ROOT, "  slowest against its keyframe distance: frame %d, %d frames after its "
                    + "keyframe, %.1f ms (a bare decoder's seek to it %.1f ms)%n", jumps[worst],
                    jumps[worst] - v.index().keyframeAtOrBefore(jumps[worst]), editor[worst], bare[worst]);
            Arrays.sort(ratio);
            System.out.printf(Locale.ROOT, "  (reference: a bare decoder's exact seek, median %.1f ms; exact frame "
                    + "against decoding from the preceding keyframe at the sequential rate: median %.2f, max %.2f)%n",
                    bareMedian, ratio[ratio.length / 2], ratio[ratio.length - 1]);
        }
        trackingGrowth();
    }

    /** A new track from one box on the arena demo, frames per minute, against decoding the clip alone. */
    private static void trackingGrowth() throws Exception {
        Path arena = Files.exists(Path.of("clips", "arena.mp4")) ? Path.of("clips", "arena.mp4")
                : Path.of("..", "clips", "arena.mp4");
        Path dir = Files.createTempDirectory("modetrail-editor-bench");
        double decodeFps;
        try (VideoSource v = VideoSource.open(arena)) {
            decodeFps = sequentialFps(v, v.frameCount());
        }
        try (EditorSession s = EditorSession.forVideo(arena, new VideoRef(arena.toAbsolutePath().toString(), 640,
                480, 450, ""), dir.resolve("a.json"), AutosaveConfig.DEFAULT)) {
            long t0 = System.nanoTime();
            s.apply(Edits.newTrack(s.project(), new ObjectClass("animal", 0xE69F00), 0, new Box(383, 291, 24, 43)));
            s.awaitIdle(Duration.ofMinutes(5));
            double seconds = (System.nanoTime() - t0) / 1e9;
            int frames = s.project().tracks().get(0).frames().size();
            double perMinute = frames / seconds * 60;
            System.out.printf(Locale.ROOT, "new track from one box (arena, 640x480): %d frames in %.2f s = %.0f "
                    + "frames/min; decoding alone %.0f frames/min; ratio %.2f%n", frames, seconds, perMinute,
                    decodeFps * 60, perMinute / (decodeFps * 60));
        }
    }

    private static double sequentialFps(VideoSource v, int frames) throws Exception {
        long t0 = System.nanoTime();
        int[] n = {0};
        v.read(0, frames, f -> {
            n[0]++;
            return true;
        });
        return n[0] / ((System.nanoTime() - t0) / 1e9);
    }

    /**
     * Milliseconds between steps: X servers repeat a held key 25 times a second by default (xset's "rate 660 25";
     * from memory of the X server's defaults, not measured here).
     */
    private static final int STEP_EVERY_MS = 40;

    private static double[] steps(FrameFetcher f, int from, int to, int dir) throws Exception {
        int n = Math.abs(to - from) + 1;
        double[] ms = new double[n];
        for (int i = 0; i < n; i++) {
            long t0 = System.nanoTime();
            ms[i] = once(f, from + dir * i);
            long rest = STEP_EVERY_MS - (System.nanoTime() - t0) / 1_000_000;
            if (rest > 0) {
                Thread.sleep(rest);
            }
        }
        return ms;
    }

    private static int over(double[] ms, double limit) {
        int n = 0;
        for (double m : ms) {
            if (m > limit) {
                n++;
            }
        }
        return n;
    }

    /** Milliseconds from asking for frame {@code n} to having its exact picture. */
    private static double once(FrameFetcher f, int n) throws Exception {
        return twice(f, n)[1];
    }

    /** Milliseconds from asking for frame {@code n} to the first picture on screen, and to the exact one. */
    private static double[] twice(FrameFetcher f, int n) throws Exception {
        CountDownLatch got = new CountDownLatch(1);
        long[] first = {0};
        long t0 = System.nanoTime();
        f.request(n, d -> {
            if (first[0] == 0) {
                first[0] = System.nanoTime();
            }
            if (d.exact()) {
                got.countDown();
            }
        }, msg -> got.countDown());
        if (!got.await(30, TimeUnit.SECONDS)) {
            throw new IllegalStateException("frame " + n + " never came");
        }
        return new double[] {(first[0] - t0) / 1e6, (System.nanoTime() - t0) / 1e6};
    }

    private static void print(String what, double[] ms, double reference) {
        double[] s = ms.clone();
        Arrays.sort(s);
        double median = s[s.length / 2];
        double p90 = s[Math.min(s.length - 1, (int) Math.ceil(0.9 * s.length) - 1)];
        System.out.printf(Locale.ROOT, "%-44s median %6.2f ms, p90 %6.2f ms (%d samples); median / reference %.2f%n",
                what, median, p90, s.length, median / reference);
    }

    private static double median(double[] a) {
        double[] s = a.clone();
        Arrays.sort(s);
        return s[s.length / 2];
    }

    private static Path makeClip() throws Exception {
        Path dir = Files.createTempDirectory("modetrail-editor-bench");
        Path clip = dir.resolve("bench-1080p.mp4");
        Process p = new ProcessBuilder("ffmpeg", "-v", "error", "-f", "lavfi", "-i",
                "testsrc2=size=1920x1080:rate=25", "-t", "12", "-g", "250", "-pix_fmt", "yuv420p", "-c:v", "libx264",
                "-preset", "veryfast", clip.toString()).inheritIO().start();
        if (p.waitFor() != 0) {
            throw new IllegalStateException("the ffmpeg tool could not make the clip; give a clip as the argument");
        }
        return clip;
    }
}
