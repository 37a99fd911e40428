package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BorderLayout;
import java.awt.Cursor;
import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.awt.Point;
import java.awt.event.KeyEvent;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.swing.JFrame;

import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.MouseButton;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;

/**
 * The canvas in a real window, driven by a robot moving the system's mouse (under Xvfb on CI). A 640x480 grey frame
 * with track 1's keyframe at image (80, 80) 120x96 (see {@link FrameViewTest#project()}). Where a view point is
 * needed it is worked out from the canvas's transform, so the window's exact size does not matter; boxes are
 * checked within 1.5 image pixels, as the robot lands on whole screen pixels.
 */
class FrameViewRobotTest {
    private static final double PX = 1.5;
    private Robot robot;
    private FrameView view;
    private final List<String> heard = new CopyOnWriteArrayList<>();

    @BeforeAll
    static void needsADisplay() {
        // The parent pom sets java.awt.headless=true for every test run; these need it false and a display.
        boolean x11 = !System.getProperty("os.name", "").startsWith("Linux")
                || !System.getenv().getOrDefault("DISPLAY", "").isBlank();
        Assumptions.assumeTrue(!GraphicsEnvironment.isHeadless() && x11, "no display (run with DISPLAY set and "
                + "-Djava.awt.headless=false)");
        FailOnThreadViolationRepaintManager.install();
    }

    @AfterAll
    static void done() {
        FailOnThreadViolationRepaintManager.uninstall();
    }

    @BeforeEach
    void window() throws InterruptedException {
        robot = BasicRobot.robotWithNewAwtHierarchy();
        view = GuiActionRunner.execute(() -> {
            FrameView v = new FrameView();
            v.setPreferredSize(new Dimension(800, 600));
            v.showFrame(0, FrameViewTest.grey(640, 480));
            v.setProject(FrameViewTest.project());
            v.setListener(FrameViewTest.recorder(heard));
            JFrame f = new JFrame("FrameView test");
            f.getContentPane().add(v, BorderLayout.CENTER);
            f.pack();
            f.setLocation(40, 40);
            f.setVisible(true);
            return v;
        });
        robot.waitForIdle();
        ScreenWait.untilStill(view, new Point(40, 40));
    }

    @AfterEach
    void close() {
        robot.cleanUp();
    }

    private ViewTransform transform() {
        return GuiActionRunner.execute(view::transform);
    }

    private Point at(double imageX, double imageY) {
        ViewTransform t = transform();
        return new Point((int) Math.round(t.toViewX(imageX)), (int) Math.round(t.toViewY(imageY)));
    }

    private void drag(Point from, Point to) {
        robot.pressMouse(view, from, MouseButton.LEFT_BUTTON);
        robot.moveMouse(view, (from.x + to.x) / 2, (from.y + to.y) / 2);
        robot.moveMouse(view, to);
        robot.releaseMouse(MouseButton.LEFT_BUTTON);
        robot.waitForIdle();
    }

    /** The one box heard, from a line "drawn 0 Box[...]" or "changed 1 0 Box[...]". */
    private static Box box(String line) {
        Matcher m = Pattern.compile("Box\\[x=(.+), y=(.+), width=(.+), height=(.+)]").matcher(line);
        assertTrue(m.find(), line);
        return new Box(Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2)),
                Double.parseDouble(m.group(3)), Double.parseDouble(m.group(4)));
    }

    private static void assertBox(Box expected, Box actual) {
        String both = "expected " + expected + ", got " + actual;
        assertEquals(expected.x(), actual.x(), PX, both);
        assertEquals(expected.y(), actual.y(), PX, both);
        assertEquals(expected.width(), actual.width(), PX, both);
        assertEquals(expected.height(), actual.height(), PX, both);
    }

    @Test
    void drawingABoxGivesItInImageCoordinates() {
        drag(at(300, 100), at(400, 180));
        assertEquals(1, heard.size(), heard.toString());
        assertTrue(heard.get(0).startsWith("drawn 0 "), heard.toString());
        assertBox(new Box(300, 100, 100, 80), box(heard.get(0)));
    }

    @Test
    void clickingSelectsAndDraggingAGripResizes() {
        robot.click(view, at(140, 128));
        robot.waitForIdle();
        assertEquals(List.of("selected 1"), heard);
        assertEquals(1, GuiActionRunner.execute(view::selectedTrack));
        // Over the bottom-right corner the pointer shows the resize cursor for it.
        robot.moveMouse(view, at(200, 176));
        robot.waitForIdle();
        assertEquals(Cursor.SE_RESIZE_CURSOR, GuiActionRunner.execute(() -> view.getCursor().getType()));
        heard.clear();
        drag(at(200, 176), at(240, 196));
        assertEquals(1, heard.size(), heard.toString());
        assertTrue(heard.get(0).startsWith("changed 1 0 "), heard.toString());
        assertBox(new Box(80, 80, 160, 116), box(heard.get(0)));
    }

    @Test
    void spaceAndLeftDragPans() {
        robot.click(view, new Point(700, 500)); // focus, on empty space
        ViewTransform before = transform();
        robot.pressKey(KeyEvent.VK_SPACE);
        drag(new Point(400, 300), new Point(460, 340));
        robot.releaseKey(KeyEvent.VK_SPACE);
        robot.waitForIdle();
        assertEquals(before.panBy(60, 40), transform());
        assertEquals(List.of(), heard); // no box drawn
    }

    @Test
    void wheelZoomKeepsThePointUnderThePointerAndFFitsAgain() {
        ViewTransform before = transform();
        Point p = new Point(300, 200);
        double ix = before.toImageX(p.x), iy = before.toImageY(p.y);
        robot.moveMouse(view, p);
        robot.rotateMouseWheel(-2); // two notches towards the user's screen: in
        robot.waitForIdle();
        if (transform().equals(before)) {
            // Under Xvfb the first wheel notches can be lost before the pointer's move is heard: turn again.
            robot.moveMouse(view, p);
            robot.waitForIdle();
            robot.rotateMouseWheel(-2);
            robot.waitForIdle();
        }
        ViewTransform after = transform();
        assertTrue(after.scale() > before.scale() * 1.1, before + " then " + after);
        assertEquals(p.x, after.toViewX(ix), 1e-6);
        assertEquals(p.y, after.toViewY(iy), 1e-6);
        robot.click(view, new Point(5, 5)); // focus, on empty space
        robot.pressAndReleaseKeys(KeyEvent.VK_F);
        robot.waitForIdle();
        assertEquals(before, transform());
    }
}
