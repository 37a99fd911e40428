package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.event.InputEvent;
import java.awt.event.MouseEvent;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Pictures of the canvas on a frame of the arena clip, for a person to look at: boxes of every source and three
 * classes (light, mid and dark colours), a selected box with its grips, in FlatLaf's light and dark themes, and a
 * zoomed-in view with a box being drawn, and the note shown when the selected track is hidden on the frame. Written into the folder named by the system property
 * {@code modetrail.lookDir} and skipped without it:
 * {@code mvn -pl tracker,export,annotate-ui test -Dtest=FrameViewLookTest -Dmodetrail.lookDir=/tmp}.
 */
class FrameViewLookTest {
    private static final int FRAME = 120;

    @AfterAll
    static void plainLook() throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            try {
                UIManager.setLookAndFeel(UIManager.getCrossPlatformLookAndFeelClassName());
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
    }

    /** The truth boxes of the arena's three animals on frame 120, as a keyframe, a tracked and an interpolated box,
     * and made-up boxes of two more classes around them. */
    static Project project() {
        VideoRef video = new VideoRef("arena.mp4", 640, 480, 450, "");
        List<ObjectClass> classes = List.of(new ObjectClass("animal", 0xE8702A), new ObjectClass("feeder", 0x2F45B5),
                new ObjectClass("marker", 0xF2DE4B));
        List<Track> tracks = List.of(
                one(1, "animal", FrameAnnotation.keyframe(FRAME, new Box(392, 212, 32, 37))),
                one(2, "animal", FrameAnnotation.tracked(FRAME, new Box(263, 265, 28, 32), 0.91)),
                one(3, "animal", FrameAnnotation.interpolated(FRAME, new Box(416, 108, 32, 19))),
                one(4, "animal", FrameAnnotation.markedBy(FRAME, Presence.HIDDEN)),
                one(5, "feeder", FrameAnnotation.keyframe(FRAME, new Box(40, 30, 90, 60))),
                one(6, "feeder", FrameAnnotation.tracked(FRAME, new Box(520, 380, 80, 70), 0.7)),
                one(7, "marker", FrameAnnotation.interpolated(FRAME, new Box(150, 330, 60, 50))),
                one(8, "marker", FrameAnnotation.keyframe(FRAME, new Box(300, 2, 50, 30))),
                one(9, "marker", FrameAnnotation.tracked(FRAME, new Box(255, 255, 50, 50), 0.8)));
        return new Project(video, classes, tracks);
    }

    private static Track one(int id, String cls, FrameAnnotation a) {
        return new Track(id, cls, "", Map.of(a.frame(), a));
    }

    @Test
    void canvasPicturesInLightAndDarkThemes() throws Exception {
        String dir = System.getProperty("modetrail.lookDir");
        Assumptions.assumeTrue(dir != null && !dir.isBlank(), "no -Dmodetrail.lookDir");
        Path look = Files.createDirectories(Path.of(dir));
        BufferedImage frame;
        VideoOptions options = VideoOptions.defaults().withIndexCacheDir(look.resolve("index-cache"));
        try (VideoSource src = VideoSource.open(Path.of("..", "clips", "arena.mp4"), options)) {
            Frame f = src.frame(FRAME);
            frame = new BufferedImage(f.width(), f.height(), BufferedImage.TYPE_INT_RGB);
            frame.setRGB(0, 0, f.width(), f.height(), f.rgb(), 0, f.width());
        }
        BufferedImage light = picture(frame, false, false);
        BufferedImage dark = picture(frame, true, false);
        BufferedImage zoom = picture(frame, true, true);
        BufferedImage note = picture(frame, false, false, 4);
        ImageIO.write(light, "png", look.resolve("canvas-light.png").toFile());
        ImageIO.write(dark, "png", look.resolve("canvas-dark.png").toFile());
        ImageIO.write(zoom, "png", look.resolve("canvas-zoom.png").toFile());
        ImageIO.write(note, "png", look.resolve("canvas-hidden-selected.png").toFile());
        // The empty space beside the frame follows the theme: light on the light one, dark on the dark one.
        assertTrue(lightness(light.getRGB(5, 5)) > 150, "light theme background " + lightness(light.getRGB(5, 5)));
        assertTrue(lightness(dark.getRGB(5, 5)) < 90, "dark theme background " + lightness(dark.getRGB(5, 5)));
        // The selected keyframe's left edge (image x 392 at 640 / 480 * ... fitted) carries the class colour.
        ViewTransform t = ViewTransform.fit(640, 480, 960, 640, ViewTransform.Limits.DEFAULT);
        int x = (int) Math.round(t.toViewX(392)), y = (int) Math.round(t.toViewY(212 + 37 / 2.0));
        assertEquals(0xE8702A, light.getRGB(x, y) & 0xFFFFFF);
    }

    private static int lightness(int rgb) {
        return (((rgb >> 16) & 0xFF) * 299 + ((rgb >> 8) & 0xFF) * 587 + (rgb & 0xFF) * 114) / 1000;
    }

    private static BufferedImage picture(BufferedImage frame, boolean darkTheme, boolean zoomed) throws Exception {
        return picture(frame, darkTheme, zoomed, 1);
    }

    private static BufferedImage picture(BufferedImage frame, boolean darkTheme, boolean zoomed, int selected)
            throws Exception {
        AtomicReference<BufferedImage> out = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            if (darkTheme) {
                FlatDarkLaf.setup();
            } else {
                FlatLightLaf.setup();
            }
            FrameView view = new FrameView();
            view.setSize(960, 640);
            view.showFrame(FRAME, frame);
            view.setProject(project());
            view.setSelectedTrack(selected);
            if (zoomed) {
                // 4x about the selected animal, then a box being drawn beside it (pressed and dragged, not released).
                ViewTransform fit = view.transform();
                view.zoomBy(3, fit.toViewX(408), fit.toViewY(230));
                ViewTransform t = view.transform();
                press(view, MouseEvent.MOUSE_PRESSED, (int) t.toViewX(345), (int) t.toViewY(200));
                press(view, MouseEvent.MOUSE_DRAGGED, (int) t.toViewX(375), (int) t.toViewY(240));
            }
            BufferedImage img = new BufferedImage(960, 640, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            view.paint(g);
            g.dispose();
            out.set(img);
        });
        return out.get();
    }

    private static void press(FrameView view, int id, int x, int y) {
        view.dispatchEvent(new MouseEvent(view, id, System.currentTimeMillis(), InputEvent.BUTTON1_DOWN_MASK, x, y,
                id == MouseEvent.MOUSE_PRESSED ? 1 : 0, false, MouseEvent.BUTTON1));
    }
}
