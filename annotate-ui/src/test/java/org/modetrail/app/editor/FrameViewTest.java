package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.MouseEvent;
import java.awt.event.MouseWheelEvent;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.JComponent;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/**
 * The canvas driven by mouse and key events sent straight to it (no screen needed, so these run headless too).
 * An 800x600 canvas shows a 640x480 frame at 1.25x with no offset, so image point (x, y) is at view (1.25x, 1.25y);
 * the expected boxes were worked by hand from that.
 */
class FrameViewTest {
    static final int RED = 0xE03020;
    private FrameView view;
    private final List<String> heard = new ArrayList<>();

    /** A listener writing down what it hears, one line per call. */
    static FrameView.Listener recorder(List<String> into) {
        return new FrameView.Listener() {
            @Override
            public void boxDrawn(int frame, Box box) {
                into.add("drawn " + frame + " " + box);
            }

            @Override
            public void trackSelected(Integer trackId) {
                into.add("selected " + trackId);
            }

            @Override
            public void boxChanged(int trackId, int frame, Box box) {
                into.add("changed " + trackId + " " + frame + " " + box);
            }

            @Override
            public void message(String text) {
                into.add("message " + text);
            }
        };
    }

    /**
     * Track 1 with a keyframe at (80, 80) 120x96 on frame 0, track 2 hidden there, track 3 interpolated at (400, 300)
     * 80x60, track 4 a small keyframe (150, 90) 20x20 inside track 1's box.
     */
    static Project project() {
        VideoRef video = new VideoRef("clip.mp4", 640, 480, 10, "");
        Track one = Track.startingWith(1, "animal", FrameAnnotation.keyframe(0, new Box(80, 80, 120, 96)));
        Track two = Track.startingWith(2, "animal", FrameAnnotation.markedBy(0, Presence.HIDDEN));
        Track three = new Track(3, "robot", "", Map.of(0, FrameAnnotation.interpolated(0, new Box(400, 300, 80, 60))));
        Track four = Track.startingWith(4, "robot", FrameAnnotation.keyframe(0, new Box(150, 90, 20, 20)));
        return new Project(video, List.of(new ObjectClass("animal", RED), new ObjectClass("robot", 0x20C0F0)),
                List.of(one, two, three, four));
    }

    static BufferedImage grey(int w, int h) {
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setColor(new Color(0x606060));
        g.fillRect(0, 0, w, h);
        g.dispose();
        return img;
    }

    static void onEdt(Runnable r) {
        try {
            SwingUtilities.invokeAndWait(r);
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }

    @BeforeEach
    void canvas() {
        onEdt(() -> {
            view = new FrameView();
            view.setSize(800, 600);
            view.showFrame(0, grey(640, 480));
            view.setProject(project());
            view.setListener(recorder(heard));
        });
    }

    private void mouse(int id, int x, int y, int button, int clicks) {
        int mask = button == MouseEvent.BUTTON2 ? InputEvent.BUTTON2_DOWN_MASK : InputEvent.BUTTON1_DOWN_MASK;
        onEdt(() -> view.dispatchEvent(new MouseEvent(view, id, System.currentTimeMillis(),
                id == MouseEvent.MOUSE_RELEASED ? 0 : mask, x, y, clicks, false, button)));
    }

    private void drag(int fromX, int fromY, int toX, int toY, int button) {
        mouse(MouseEvent.MOUSE_PRESSED, fromX, fromY, button, 1);
        mouse(MouseEvent.MOUSE_DRAGGED, (fromX + toX) / 2, (fromY + toY) / 2, button, 0);
        mouse(MouseEvent.MOUSE_DRAGGED, toX, toY, button, 0);
        mouse(MouseEvent.MOUSE_RELEASED, toX, toY, button, 1);
    }

    private void click(int x, int y) {
        mouse(MouseEvent.MOUSE_PRESSED, x, y, MouseEvent.BUTTON1, 1);
        mouse(MouseEvent.MOUSE_RELEASED, x, y, MouseEvent.BUTTON1, 1);
    }

    @Test
    void fitsTheFrameAtFirst() {
        assertEquals(new ViewTransform(1.25, 0, 0), view.transform());
    }

    @Test
    void aStandInPictureTakesNoEditsUntilTheExactOneComes() {
        onEdt(() -> view.showFrame(5, grey(640, 480), 0));
        assertTrue(view.showsStandIn());
        drag(300, 100, 400, 200, MouseEvent.BUTTON1);
        click(125, 125); // where track 1's box is on frame 0
        assertEquals(List.of(), heard, "nothing drawn or selected on another frame's picture");
        onEdt(() -> view.showFrame(5, grey(640, 480), 5));
        assertFalse(view.showsStandIn());
        drag(300, 100, 400, 200, MouseEvent.BUTTON1);
        assertEquals(List.of("drawn 5 " + new Box(240, 80, 80, 80)), heard);
    }

    @Test
    void dragOnEmptySpaceDrawsABoxInImageCoordinates() {
        drag(300, 100, 400, 200, MouseEvent.BUTTON1);
        // View (300, 100)-(400, 200) / 1.25 = image (240, 80) 80x80.
        assertEquals(List.of("drawn 0 " + new Box(240, 80, 80, 80)), heard);
    }

    @Test
    void aBoxDrawnAcrossTheEdgeIsCutToTheFrame() {
        drag(700, 500, 820, 640, MouseEvent.BUTTON1);
        // Image (560, 400) to (656, 512), cut at 640x480: (560, 400) 80x80.
        assertEquals(List.of("drawn 0 " + new Box(560, 400, 80, 80), "message " + FrameView.KEPT_INSIDE), heard);
    }

    @Test
    void aTinyBoxIsRefused() {
        drag(300, 100, 302, 103, MouseEvent.BUTTON1); // 1.6 x 2.4 image pixels
        assertEquals(List.of("message " + FrameView.TOO_SMALL), heard);
    }

    @Test
    void clickingABoxSelectsItsTrackAndEmptySpaceClearsIt() {
        click(175, 160); // image (140, 128): inside track 1's box
        assertEquals(1, view.selectedTrack());
        click(700, 100);
        assertNull(view.selectedTrack());
        click(700, 100); // nothing selected: nothing to say
        assertEquals(List.of("selected 1", "selected null"), heard);
    }

    @Test
    void aSmallBoxInsideTheSelectedOneCanBeChosen() {
        onEdt(() -> view.setSelectedTrack(1));
        click(200, 125); // image (160, 100): inside track 4's box, itself inside track 1's
        assertEquals(4, view.selectedTrack());
        // A drag there now moves track 4's box, not track 1's: 10 view px = 8 image px.
        drag(200, 125, 210, 125, MouseEvent.BUTTON1);
        assertEquals(List.of("selected 4", "changed 4 0 " + new Box(158, 90, 20, 20)), heard);
    }

    @Test
    void draggingTheSelectedBoxMovesIt() {
        onEdt(() -> view.setSelectedTrack(1));
        drag(175, 160, 200, 185, MouseEvent.BUTTON1); // 25 view px = 20 image px each way
        assertEquals(List.of("changed 1 0 " + new Box(100, 100, 120, 96)), heard);
    }

    @Test
    void draggingAGripResizes() {
        onEdt(() -> view.setSelectedTrack(1));
        // Track 1's bottom-right corner is at image (200, 176) = view (250, 220).
        drag(250, 220, 300, 245, MouseEvent.BUTTON1); // +40, +20 image px
        assertEquals(List.of("changed 1 0 " + new Box(80, 80, 160, 116)), heard);
    }

    @Test
    void aBoxMovedPastTheEdgeStopsThere() {
        onEdt(() -> view.setSelectedTrack(1));
        drag(175, 160, 1000, 160, MouseEvent.BUTTON1);
        assertEquals(List.of("changed 1 0 " + new Box(520, 80, 120, 96), "message " + FrameView.KEPT_INSIDE), heard);
    }

    @Test
    void aClickOnTheSelectedBoxChangesNothing() {
        onEdt(() -> view.setSelectedTrack(1));
        drag(175, 160, 176, 161, MouseEvent.BUTTON1); // under the drag threshold
        assertEquals(List.of(), heard);
    }

    @Test
    void wheelZoomsAboutThePointer() {
        ViewTransform before = view.transform();
        double ix = before.toImageX(300), iy = before.toImageY(200);
        onEdt(() -> view.dispatchEvent(new MouseWheelEvent(view, MouseEvent.MOUSE_WHEEL, System.currentTimeMillis(),
                0, 300, 200, 0, false, MouseWheelEvent.WHEEL_UNIT_SCROLL, 3, -1)));
        ViewTransform after = view.transform();
        assertEquals(1.25 * FrameView.WHEEL_STEP, after.scale(), 1e-9);
        assertEquals(300, after.toViewX(ix), 1e-9);
        assertEquals(200, after.toViewY(iy), 1e-9);
    }

    @Test
    void middleDragPansAndFKeyFitsAgain() {
        drag(400, 300, 450, 320, MouseEvent.BUTTON2);
        assertEquals(new ViewTransform(1.25, 50, 20), view.transform());
        assertEquals(List.of(), heard);
        // Key events need a focus owner, which a headless run has not: the F binding's action is run directly.
        onEdt(() -> view.getActionMap().get(view.getInputMap(JComponent.WHEN_FOCUSED)
                .get(KeyStroke.getKeyStroke("F"))).actionPerformed(new ActionEvent(view, 0, "F")));
        assertEquals(new ViewTransform(1.25, 0, 0), view.transform());
    }

    @Test
    void aFrameOfTheSameSizeKeepsTheZoom() {
        onEdt(() -> view.zoomBy(2, 0, 0));
        onEdt(() -> view.showFrame(1, grey(640, 480)));
        assertEquals(2.5, view.transform().scale(), 1e-9);
        onEdt(() -> view.showFrame(2, grey(320, 240)));
        assertEquals(new ViewTransform(2.5, 0, 0), view.transform()); // fitted: min(800 / 320, 600 / 240)
    }

    private BufferedImage paint() {
        AtomicReference<BufferedImage> out = new AtomicReference<>();
        onEdt(() -> {
            BufferedImage img = new BufferedImage(800, 600, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            view.paint(g);
            g.dispose();
            out.set(img);
        });
        return out.get();
    }

    @Test
    void boxesAreDrawnInTheirClassColourAndHiddenMarksAreNot() {
        BufferedImage img = paint();
        // Track 1's left edge at view x 100, halfway down (y 160): the class colour, the inside plain footage.
        assertEquals(RED, img.getRGB(100, 160) & 0xFFFFFF);
        assertEquals(0x606060, img.getRGB(150, 160) & 0xFFFFFF);
        // Track 3's interpolated box is dashed: along its top edge (view y 375) both colour and gaps show.
        int on = 0, off = 0;
        for (int x = 505; x < 595; x++) {
            if ((img.getRGB(x, 375) & 0xFFFFFF) == 0x20C0F0) {
                on++;
            } else {
                off++;
            }
        }
        assertTrue(on > 20 && off > 20, on + " on, " + off + " off");
        onEdt(() -> view.setSelectedTrack(1));
        BufferedImage selected = paint();
        // Selected: lightly washed with its colour inside, and a grip at the middle of its right edge (250, 160).
        assertNotEquals(0x606060, selected.getRGB(150, 160) & 0xFFFFFF);
        assertEquals(RED, selected.getRGB(250, 160) & 0xFFFFFF);
        assertEquals(RED, selected.getRGB(252, 162) & 0xFFFFFF); // inside the grip, off the line
        assertNotEquals(RED, img.getRGB(252, 162) & 0xFFFFFF);
    }

    @Test
    void pixelsAreCrispWhenZoomedIn() {
        BufferedImage check = new BufferedImage(16, 16, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < 16; y++) {
            for (int x = 0; x < 16; x++) {
                check.setRGB(x, y, (x + y) % 2 == 0 ? 0xFFFFFF : 0x000000);
            }
        }
        onEdt(() -> {
            view.setProject(null);
            view.showFrame(0, check);
        });
        // Fitted at min(800 / 16, 600 / 16) = 37.5, stopped at 32x: 512x512 at (144, 44). Image pixel (0, 0) is
        // view 144..176 x 44..76, all white; pixel (1, 0) next to it all black.
        assertEquals(new ViewTransform(32, 144, 44), view.transform());
        BufferedImage img = paint();
        assertEquals(0xFFFFFF, img.getRGB(145, 45) & 0xFFFFFF);
        assertEquals(0xFFFFFF, img.getRGB(175, 75) & 0xFFFFFF);
        assertEquals(0x000000, img.getRGB(177, 45) & 0xFFFFFF);
    }
}
