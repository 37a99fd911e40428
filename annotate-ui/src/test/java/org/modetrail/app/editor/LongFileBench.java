package org.modetrail.app.editor;

import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.Random;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.prefs.Preferences;

import javax.swing.SwingUtilities;

import org.modetrail.model.Box;
import org.modetrail.model.Edit;
import org.modetrail.model.Edits;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Whether the editor stays responsive on an hour-long 1080p file: how long the event thread is held up (the
 * delay of an empty task posted to it every 10 ms) while the file opens, while the user jumps about it, while a
 * project with several hour-long tracks is shown and edited, and while a new track grows. Figures are printed
 * against the 1000 / 60 ms of one screen refresh. Needs a display (Xvfb). Run after
 * {@code mvn -B -q install -DskipTests}: {@code mvn -B -q -pl annotate-ui test-compile exec:java
 * -Dexec.mainClass=org.modetrail.app.editor.LongFileBench -Dexec.classpathScope=test [-Dexec.args=CLIP]};
 * without a clip it makes an hour of 1080p at 25 frames/s, GOP 250, with the ffmpeg tool (about 5 minutes; the
 * picture is simple, so the file is small, but it has the 90,000 frames and 360 keyframes of a real hour).
 */
public final class LongFileBench {
    private static final double REFRESH_MS = 1000.0 / 60;

    private LongFileBench() {
    }

    public static void main(String[] args) throws Exception {
        if (GraphicsEnvironment.isHeadless()) {
            throw new IllegalStateException("needs a display: run under Xvfb with DISPLAY set");
        }
        Path clip = args.length > 0 ? Path.of(args[0]) : makeHour();
        Path work = Files.createTempDirectory("modetrail-long-bench");
        Path copy = work.resolve("hour" + clip.getFileName().toString().replaceAll("^.*(\\.[^.]+)$", "$1"));
        Files.createSymbolicLink(copy, clip.toAbsolutePath());

        long t0 = System.nanoTime();
        try (VideoSource v = VideoSource.open(copy, VideoOptions.defaults().withIndexCacheDir(null))) {
            System.out.printf(Locale.ROOT, "clip: %dx%d, %d frames (%.0f min), %d keyframes; index scan %.2f s%n",
                    v.info().width(), v.info().height(), v.frameCount(), v.info().durationSeconds() / 60,
                    v.info().keyframeCount(), (System.nanoTime() - t0) / 1e9);
        }

        Preferences node = Preferences.userRoot().node("org/modetrail/long-bench");
        EditorWindow[] w = new EditorWindow[1];
        SwingUtilities.invokeAndWait(() -> {
            Themes.apply(false);
            w[0] = new EditorWindow(new EditorPreferences(node), () -> { });
            w[0].setSize(1400, 900);
            w[0].setVisible(true);
        });
        EditorWindow window = w[0];
        try {
            EventThreadProbe probe = EventThreadProbe.start();
            t0 = System.nanoTime();
            SwingUtilities.invokeAndWait(() -> window.open(copy));
            while (window.session() == null) {
                Thread.sleep(20);
            }
            print("open (index scan, first frame)", probe.stop(), (System.nanoTime() - t0) / 1e9);

            int frames = window.frameCount();
            Random r = new Random(11);
            probe = EventThreadProbe.start();
            t0 = System.nanoTime();
            for (int i = 0; i < 30; i++) {
                int n = r.nextInt(frames);
                SwingUtilities.invokeAndWait(() -> window.showFrame(n));
                Thread.sleep(150);
            }
            for (int i = 0; i < 50; i++) {
                SwingUtilities.invokeAndWait(() -> window.showFrame(window.currentFrame() + 1));
                Thread.sleep(40);
            }
            print("30 jumps across the hour, 50 steps", probe.stop(), (System.nanoTime() - t0) / 1e9);

            EditorSession s = window.session();
            Project big = hourLongTracks(s.project(), frames, 6);
            probe = EventThreadProbe.start();
            t0 = System.nanoTime();
            s.apply(new Edit(big, 0, 0, 0, false));
            Thread.sleep(1500);
            print("show 6 tracks of " + frames + " frames", probe.stop(), (System.nanoTime() - t0) / 1e9);

            probe = EventThreadProbe.start();
            t0 = System.nanoTime();
            int at = frames / 2;
            Project p = s.project();
            for (int i = 0; i < 5; i++) {
                Track t = p.tracks().get(i);
                Box b = t.frames().get(at + i).box();
                s.apply(Edits.setKeyframe(s.project(), t.id(), at + i, new Box(b.x() + 3, b.y(), b.width(),
                        b.height())));
                Thread.sleep(300);
            }
            s.cancelTracking();
            s.awaitIdle(Duration.ofMinutes(2));
            print("5 corrections in those tracks (re-tracking)", probe.stop(), (System.nanoTime() - t0) / 1e9);

            probe = EventThreadProbe.start();
            t0 = System.nanoTime();
            double time = at / 25.0;
            double x = (time * 120) % 1700;
            double y = 400 + 200 * Math.sin(time);
            s.apply(Edits.newTrack(s.project(), new ObjectClass("block", 0x0072B2), at,
                    new Box(Math.round(x) - 4, Math.round(y) - 4, 128, 98)));
            Thread.sleep(20_000);
            int grown = s.project().tracks().get(s.project().tracks().size() - 1).frames().size();
            s.cancelTracking();
            s.awaitIdle(Duration.ofMinutes(2));
            double seconds = (System.nanoTime() - t0) / 1e9;
            print(String.format(Locale.ROOT, "new track growing (%d frames in 20 s)", grown), probe.stop(), seconds);
        } finally {
            SwingUtilities.invokeAndWait(() -> {
                if (window.session() != null) {
                    try {
                        window.session().close();
                    } catch (java.io.IOException e) {
                        System.err.println("closing: " + e.getMessage());
                    }
                }
                window.dispose();
            });
            node.removeNode();
        }
        System.exit(0);
    }

    /** The project with {@code count} tracks over every frame: a keyframe every 500 frames, tracked between. */
    private static Project hourLongTracks(Project p, int frames, int count) {
        List<Track> tracks = new ArrayList<>(p.tracks());
        Random r = new Random(3);
        for (int k = 0; k < count; k++) {
            TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
            for (int f = 0; f < frames; f++) {
                Box b = new Box(100 + 200 * k + (f % 200), 300 + (f % 97), 120, 90);
                m.put(f, f % 500 == 0 ? FrameAnnotation.keyframe(f, b)
                        : FrameAnnotation.tracked(f, b, 0.4 + 0.6 * r.nextDouble()));
            }
            tracks.add(new Track(p.nextTrackId() + k, "block", "", m));
        }
        List<ObjectClass> classes = p.objectClass("block").isPresent() ? p.classes()
                : concat(p.classes(), new ObjectClass("block", 0x0072B2));
        return new Project(p.video(), classes, tracks, p.site());
    }

    private static List<ObjectClass> concat(List<ObjectClass> a, ObjectClass b) {
        List<ObjectClass> out = new ArrayList<>(a);
        out.add(b);
        return out;
    }

    private static void print(String what, double[] delays, double seconds) {
        double[] s = delays.clone();
        Arrays.sort(s);
        int over = 0;
        for (double d : s) {
            if (d > 100) {
                over++;
            }
        }
        System.out.printf(Locale.ROOT, "%-46s %6.1f s; event thread delay median %5.1f ms, p99 %6.1f ms, max %6.1f "
                + "ms (max / refresh %.1f); %d of %d over 100 ms%n", what, seconds, s[s.length / 2],
                s[Math.min(s.length - 1, (int) (0.99 * s.length))], s[s.length - 1], s[s.length - 1] / REFRESH_MS,
                over, s.length);
    }

    /** Posts an empty task to the event thread every 10 ms and records how long each waited. */
    private static final class EventThreadProbe {
        private final List<Double> delays = new ArrayList<>();
        private final AtomicBoolean running = new AtomicBoolean(true);
        private final Thread thread;

        /** Where the event thread was when a posted task had waited longest (sampled after 100 ms). */
        private volatile String stalledAt = "";
        private volatile double stalledFor;

        private EventThreadProbe() {
            thread = new Thread(() -> {
                while (running.get()) {
                    long t = System.nanoTime();
                    try {
                        java.util.concurrent.CountDownLatch ran = new java.util.concurrent.CountDownLatch(1);
                        SwingUtilities.invokeLater(ran::countDown);
                        if (!ran.await(100, java.util.concurrent.TimeUnit.MILLISECONDS)) {
                            String where = eventThreadStack();
                            ran.await();
                            double waited = (System.nanoTime() - t) / 1e6;
                            if (waited > stalledFor) {
                                stalledFor = waited;
                                stalledAt = where;
                            }
                        }
                        Thread.sleep(10);
                    } catch (InterruptedException e) {
                        return;
                    }
                    synchronized (delays) {
                        delays.add((System.nanoTime() - t) / 1e6 - 10);
                    }
                }
            }, "event-thread-probe");
            thread.setDaemon(true);
        }

        private static String eventThreadStack() {
            for (Map.Entry<Thread, StackTraceElement[]> e : Thread.getAllStackTraces().entrySet()) {
                if (e.getKey().getName().startsWith("AWT-EventQueue")) {
                    StringBuilder b = new StringBuilder();
                    int shown = 0;
                    for (StackTraceElement f : e.getValue()) {
                        if (f.getClassName().startsWith("org.modetrail") && shown++ < 4) {
                            b.append("\n      at ").append(f);
                        }
                    }
                    return b.length() > 0 ? b.toString() : "\n      at " + e.getValue()[0];
                }
            }
            return "";
        }

        static EventThreadProbe start() {
            EventThreadProbe p = new EventThreadProbe();
            p.thread.start();
            return p;
        }

        double[] stop() throws InterruptedException {
            running.set(false);
            thread.join();
            if (stalledFor > 0) {
                System.out.printf(Locale.ROOT, "  longest stall %.0f ms, the event thread sampled after 100 ms:%s%n",
                        stalledFor, stalledAt);
            }
            synchronized (delays) {
                return delays.stream().mapToDouble(d -> Math.max(0, d)).toArray();
            }
        }
    }

    private static Path makeHour() throws Exception {
        Path clip = Path.of(System.getProperty("java.io.tmpdir"), "modetrail-hour-1080p.mp4");
        if (Files.exists(clip)) {
            return clip;
        }
        Path part = clip.resolveSibling("modetrail-hour-1080p.part.mp4");
        Process p = new ProcessBuilder("ffmpeg", "-v", "error", "-y", "-f", "lavfi", "-i",
                "color=c=0x406040:s=1920x1080:r=25,drawbox=x='mod(t*120,1700)':y='400+200*sin(t)':w=120:h=90"
                        + ":color=0xE0A020:t=fill", "-t", "3600", "-c:v", "libx264", "-preset", "ultrafast",
                "-g", "250", "-pix_fmt", "yuv420p", part.toString()).inheritIO().start();
        if (p.waitFor() != 0) {
            throw new IllegalStateException("the ffmpeg tool could not make the clip; give a clip as the argument");
        }
        Files.move(part, clip);
        return clip;
    }
}
