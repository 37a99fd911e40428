package org.modetrail.app.editor;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import javax.imageio.ImageIO;
import javax.swing.JFrame;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/**
 * A project with every lane state, made by hand on the boxes of the arena clip's truth file, and a way to look at
 * the timeline: {@code main} writes screenshots of the timeline, its legend and the track list in the light and
 * the dark theme (needs a display).
 */
final class TimelineDemo {
    static final int FRAMES = 450;
    static final ObjectClass ANIMAL = new ObjectClass("animal", 0xE69F00);
    static final ObjectClass HANDLER = new ObjectClass("handler", 0x56B4E9);

    private TimelineDemo() {
    }

    /** Frame times of the 25 fps clip. */
    static double[] times() {
        double[] t = new double[FRAMES];
        for (int i = 0; i < FRAMES; i++) {
            t[i] = i / 25.0;
        }
        return t;
    }

    /**
     * Tracks 1 to 3 on the arena's truth boxes (or a fixed box when the file is not found), track 4 by hand:
     * <ul>
     * <li>1: keyframes every 75 frames, tracked between at 0.85, weak 200-215 (0.35), hidden 300-330;</li>
     * <li>2: keyframes 0, 150, 300, 449; tracked 1-149; interpolated 151-299; tracked 301-419 with one weak frame
     * (400); absent 420-448;</li>
     * <li>3: nothing before 100; keyframe 100; tracked 101-250 at 0.6; interpolated 251-299; absent 300-349;
     * keyframe 350; tracked 351-449, with a jump on frame 380;</li>
     * <li>4 (handler): keyframe 20; tracked 21-60; weak 61-70; hidden 71-90; keyframe 91; interpolated 92-120;
     * absent 121-200; nothing after.</li>
     * </ul>
     */
    static Project project(Path truthCsv) {
        Map<Integer, Map<Integer, Box>> truth = readTruth(truthCsv);
        TreeMap<Integer, FrameAnnotation> t1 = new TreeMap<>();
        for (int f = 0; f < FRAMES; f++) {
            Box b = box(truth, 1, f);
            if (f >= 300 && f <= 330) {
                put(t1, FrameAnnotation.markedBy(f, Presence.HIDDEN));
            } else if (f % 75 == 0 || f == 331 || f == FRAMES - 1) {
                put(t1, FrameAnnotation.keyframe(f, b));
            } else {
                put(t1, FrameAnnotation.tracked(f, b, f >= 200 && f <= 215 ? 0.35 : 0.85));
            }
        }
        TreeMap<Integer, FrameAnnotation> t2 = new TreeMap<>();
        for (int f = 0; f < FRAMES; f++) {
            Box b = box(truth, 2, f);
            if (f == 0 || f == 150 || f == 300 || f == 449) {
                put(t2, FrameAnnotation.keyframe(f, b));
            } else if (f < 150) {
                put(t2, FrameAnnotation.tracked(f, b, 0.9));
            } else if (f < 300) {
                put(t2, FrameAnnotation.interpolated(f, b));
            } else if (f < 420) {
                put(t2, FrameAnnotation.tracked(f, b, f == 400 ? 0.3 : 0.8));
            } else {
                put(t2, FrameAnnotation.markedBy(f, Presence.ABSENT));
            }
        }
        TreeMap<Integer, FrameAnnotation> t3 = new TreeMap<>();
        for (int f = 100; f < FRAMES; f++) {
            Box b = box(truth, 3, f);
            if (f == 100 || f == 350) {
                put(t3, FrameAnnotation.keyframe(f, b));
            } else if (f <= 250) {
                put(t3, FrameAnnotation.tracked(f, b, 0.6));
            } else if (f < 300) {
                put(t3, FrameAnnotation.interpolated(f, b));
            } else if (f < 350) {
                put(t3, FrameAnnotation.markedBy(f, Presence.ABSENT));
            } else {
                Box moved = f >= 380 && f < 384 ? new Box(b.x() + 120, b.y(), b.width(), b.height()) : b;
                put(t3, FrameAnnotation.tracked(f, moved, 0.75));
            }
        }
        TreeMap<Integer, FrameAnnotation> t4 = new TreeMap<>();
        Box hb = new Box(520, 40, 30, 60);
        for (int f = 20; f <= 200; f++) {
            if (f == 20 || f == 91) {
                put(t4, FrameAnnotation.keyframe(f, hb));
            } else if (f <= 60) {
                put(t4, FrameAnnotation.tracked(f, hb, 0.8));
            } else if (f <= 70) {
                put(t4, FrameAnnotation.tracked(f, hb, 0.4));
            } else if (f <= 90) {
                put(t4, FrameAnnotation.markedBy(f, Presence.HIDDEN));
            } else if (f <= 120) {
                put(t4, FrameAnnotation.interpolated(f, hb));
            } else {
                put(t4, FrameAnnotation.markedBy(f, Presence.ABSENT));
            }
        }
        return new Project(new VideoRef("arena.mp4", 640, 480, FRAMES, ""), List.of(ANIMAL, HANDLER),
                List.of(new Track(1, "animal", "", t1), new Track(2, "animal", "", t2),
                        new Track(3, "animal", "", t3), new Track(4, "handler", "", t4)));
    }

    private static void put(TreeMap<Integer, FrameAnnotation> m, FrameAnnotation a) {
        m.put(a.frame(), a);
    }

    private static Box box(Map<Integer, Map<Integer, Box>> truth, int track, int frame) {
        Map<Integer, Box> t = truth.get(track);
        Box b = t == null ? null : t.get(frame);
        return b != null ? b : new Box(100 + 60 * track, 100, 24, 40);
    }

    /** The truth file's boxes by track and frame; empty when the file is not there. */
    static Map<Integer, Map<Integer, Box>> readTruth(Path csv) {
        Map<Integer, Map<Integer, Box>> out = new HashMap<>();
        if (csv == null || !Files.isRegularFile(csv)) {
            return out;
        }
        try {
            List<String> lines = Files.readAllLines(csv);
            for (String line : lines.subList(1, lines.size())) {
                String[] c = line.split(",");
                if (c.length < 9 || !c[8].trim().equals("1")) {
                    continue;
                }
                out.computeIfAbsent(Integer.parseInt(c[0]), k -> new HashMap<>()).put(Integer.parseInt(c[2]),
                        new Box(Double.parseDouble(c[4]), Double.parseDouble(c[5]), Double.parseDouble(c[6]),
                                Double.parseDouble(c[7])));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }

    /** The timeline with its legend above the track list, as the editor might lay them out. */
    static JPanel layout(TimelineView timeline, TrackListPanel list) {
        JPanel lanes = new JPanel(new BorderLayout());
        lanes.add(timeline, BorderLayout.CENTER);
        lanes.add(new TimelineLegend(timeline), BorderLayout.SOUTH);
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, lanes, list);
        split.setResizeWeight(0.5);
        JPanel all = new JPanel(new BorderLayout());
        all.add(split, BorderLayout.CENTER);
        return all;
    }

    /** Writes {@code out} with the demo project shown in the current look and feel. */
    static void screenshot(Path truth, File out, int first, int span) throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            Project p = project(truth);
            TimelineView timeline = new TimelineView();
            timeline.setProject(p, FRAMES);
            timeline.setFrameTimes(times());
            timeline.setCurrentFrame(205);
            timeline.setSelectedTrack(2);
            if (span > 0) {
                timeline.setSize(new Dimension(1100, 200));
            }
            TrackListPanel list = new TrackListPanel();
            list.setProject(p, FRAMES);
            list.setSelectedTrack(2);
            JFrame frame = new JFrame("timeline");
            frame.getContentPane().add(layout(timeline, list));
            frame.setSize(1100, 420);
            frame.setVisible(true);
            frame.validate();
            if (span > 0) {
                timeline.setVisibleRange(first, span);
            }
            BufferedImage img = new BufferedImage(frame.getContentPane().getWidth(),
                    frame.getContentPane().getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            frame.getContentPane().paint(g);
            g.dispose();
            try {
                ImageIO.write(img, "png", out);
                // The same in grey, to check that the states differ by shape alone.
                BufferedImage grey = new java.awt.image.ColorConvertOp(
                        java.awt.color.ColorSpace.getInstance(java.awt.color.ColorSpace.CS_GRAY), null)
                        .filter(img, null);
                ImageIO.write(grey, "png", new File(out.getPath().replace(".png", "-grey.png")));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            frame.dispose();
        });
    }

    /** An hour at 25 fps with 50 tracks, each over a stretch of the video with keyframes every 500 frames. */
    static Project hour() {
        int n = 90_000;
        List<Track> tracks = new java.util.ArrayList<>();
        java.util.Random random = new java.util.Random(3);
        Box b = new Box(100, 100, 30, 30);
        for (int t = 1; t <= 50; t++) {
            TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
            int start = random.nextInt(n / 2);
            int end = Math.min(n, start + 10_000 + random.nextInt(n / 2));
            int hiddenAt = start + random.nextInt(end - start);
            for (int f = start; f < end; f++) {
                if (f >= hiddenAt && f < hiddenAt + 400) {
                    put(m, FrameAnnotation.markedBy(f, Presence.HIDDEN));
                } else if ((f - start) % 500 == 0) {
                    put(m, FrameAnnotation.keyframe(f, b));
                } else if ((f - start) % 500 > 450) {
                    put(m, FrameAnnotation.interpolated(f, b));
                } else {
                    put(m, FrameAnnotation.tracked(f, b, random.nextInt(20_000) == 0 ? 0.2 : 0.9));
                }
            }
            tracks.add(new Track(t, t % 3 == 0 ? "handler" : "animal", "", m));
        }
        return new Project(new VideoRef("hour.mp4", 1920, 1080, n, ""), List.of(ANIMAL, HANDLER), tracks);
    }

    static void hourScreenshot(File out) throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            Project p = hour();
            TimelineView timeline = new TimelineView();
            timeline.setProject(p, 90_000);
            double[] t = new double[90_000];
            for (int i = 0; i < t.length; i++) {
                t[i] = i / 25.0;
            }
            timeline.setFrameTimes(t);
            timeline.setCurrentFrame(40_000);
            JFrame frame = new JFrame("hour");
            frame.getContentPane().add(new javax.swing.JScrollPane(timeline));
            frame.getContentPane().add(new TimelineLegend(timeline), BorderLayout.SOUTH);
            frame.setSize(1100, 1000);
            frame.setVisible(true);
            frame.validate();
            BufferedImage img = new BufferedImage(frame.getContentPane().getWidth(),
                    frame.getContentPane().getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            frame.getContentPane().paint(g);
            g.dispose();
            try {
                ImageIO.write(img, "png", out);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            frame.dispose();
        });
    }

    public static void main(String[] args) throws Exception {
        if (args.length > 0 && args[0].equals("hour")) {
            FlatLightLaf.setup();
            hourScreenshot(new File("/tmp/timeline-hour.png"));
            System.exit(0);
        }
        Path truth = Path.of(args.length > 0 ? args[0] : "clips/arena-truth.csv");
        int first = args.length > 2 ? Integer.parseInt(args[1]) : 0;
        int span = args.length > 2 ? Integer.parseInt(args[2]) : 0;
        String suffix = span > 0 ? "-zoom" : "";
        FlatLightLaf.setup();
        screenshot(truth, new File("/tmp/timeline-light" + suffix + ".png"), first, span);
        FlatDarkLaf.setup();
        SwingUtilities.invokeAndWait(() -> UIManager.getLookAndFeelDefaults());
        screenshot(truth, new File("/tmp/timeline-dark" + suffix + ".png"), first, span);
        System.exit(0);
    }
}
