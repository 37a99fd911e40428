package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.BorderLayout;
import java.awt.GraphicsEnvironment;
import java.awt.Point;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.JFrame;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * The timeline and the track list driven with real mouse events on a display (Xvfb in CI). The surefire setup
 * runs headless by default; run with {@code -Djava.awt.headless=false} and a {@code DISPLAY} to include these.
 */
class TimelineViewSwingTest {
    /** The labels, 800 px of lanes, the margin. */
    private static final int WIDTH = TimelineView.LABEL_WIDTH + 800 + TimelineView.RIGHT_MARGIN;

    private JFrame frame;
    private TimelineView timeline;
    private TrackListPanel list;
    private Robot robot;
    private final List<String> heard = new CopyOnWriteArrayList<>();

    @BeforeEach
    void show() throws Exception {
        assumeFalse(GraphicsEnvironment.isHeadless(), "needs a display");
        robot = new Robot();
        robot.setAutoDelay(20);
        SwingUtilities.invokeAndWait(() -> {
            timeline = new TimelineView();
            timeline.setProject(TimelineDemo.project(null), TimelineDemo.FRAMES);
            timeline.addListener(new TimelineView.Listener() {
                @Override
                public void frameChosen(int f) {
                    heard.add("frame " + f);
                }

                @Override
                public void trackChosen(int id) {
                    heard.add("track " + id);
                }
            });
            list = new TrackListPanel();
            list.setProject(TimelineDemo.project(null), TimelineDemo.FRAMES);
            list.addListener(id -> heard.add("list " + id));
            frame = new JFrame("timeline test");
            frame.setUndecorated(true);
            frame.getContentPane().add(timeline, BorderLayout.NORTH);
            frame.getContentPane().add(list, BorderLayout.CENTER);
            timeline.setPreferredSize(new java.awt.Dimension(WIDTH, 120));
            frame.setSize(WIDTH, 400);
            frame.setLocation(600, 500);
            frame.setAlwaysOnTop(true);
            frame.setVisible(true);
            frame.toFront();
        });
        robot.waitForIdle();
        robot.delay(200);
        robot.waitForIdle();
        ScreenWait.untilStill(frame, new java.awt.Point(600, 500));
    }

    @AfterEach
    void close() throws Exception {
        if (frame != null) {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }

    private Point onScreen(int x, int y) throws Exception {
        AtomicReference<Point> p = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            Point o = timeline.getLocationOnScreen();
            p.set(new Point(o.x + x, o.y + y));
        });
        return p.get();
    }

    /**
     * Moves the pointer to {@code p} on the screen and waits until the window sees it there: the display may be
     * shared, and a window of another program on top would take the events.
     */
    private void moveTo(Point p) throws Exception {
        robot.mouseMove(p.x, p.y);
        robot.waitForIdle();
        for (int i = 0; i < 40; i++) {
            Point seen = onEdt(() -> frame.getMousePosition(true));
            if (seen != null) {
                return;
            }
            robot.delay(50);
            robot.mouseMove(p.x, p.y);
        }
        throw new AssertionError("the test window does not get the pointer at " + p + ": is another window on top?");
    }

    private void click(Point p) throws Exception {
        moveTo(p);
        robot.mousePress(InputEvent.BUTTON1_DOWN_MASK);
        robot.mouseRelease(InputEvent.BUTTON1_DOWN_MASK);
        robot.waitForIdle();
    }

    private <T> T onEdt(java.util.concurrent.Callable<T> c) throws Exception {
        AtomicReference<T> r = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                r.set(c.call());
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        return r.get();
    }

    @Test
    void aClickChoosesTheFrameAndTheTrack() throws Exception {
        assertEquals(WIDTH, (int) onEdt(timeline::getWidth));
        // 450 frames over 800 columns: column 400 shows frame floor(400 * 450 / 800) = 225.
        // The third lane (track 3) spans y 30 + 36 to 30 + 54.
        click(onScreen(TimelineView.LABEL_WIDTH + 400, TimelineView.RULER_HEIGHT + 2 * 18 + 9));
        assertEquals(List.of("track 3", "frame 225"), heard);
        assertEquals(225, (int) onEdt(timeline::currentFrame));
        assertEquals(3, (int) onEdt(timeline::selectedTrack));
    }

    @Test
    void aClickOnTheRulerChoosesOnlyTheFrame() throws Exception {
        // Column 80 shows frame floor(80 * 450 / 800) = 45.
        click(onScreen(TimelineView.LABEL_WIDTH + 80, 10));
        assertEquals(List.of("frame 45"), heard);
    }

    @Test
    void draggingScrubs() throws Exception {
        Point from = onScreen(TimelineView.LABEL_WIDTH + 100, 10);
        moveTo(from);
        robot.mousePress(InputEvent.BUTTON1_DOWN_MASK);
        for (int dx = 20; dx <= 200; dx += 20) {
            robot.mouseMove(from.x + dx, from.y);
        }
        robot.mouseRelease(InputEvent.BUTTON1_DOWN_MASK);
        robot.waitForIdle();
        // Ends on column 300: frame floor(300 * 450 / 800) = 168.
        assertEquals("frame 168", heard.get(heard.size() - 1));
        assertTrue(heard.size() >= 5, "scrubbing reports the frames passed: " + heard);
        assertEquals(168, (int) onEdt(timeline::currentFrame));
    }

    @Test
    void theWheelZoomsAboutThePointerAndShiftScrolls() throws Exception {
        int x = TimelineView.LABEL_WIDTH + 600;
        int under = onEdt(() -> timeline.frameAtX(x)); // floor(600 * 450 / 800) = 337
        assertEquals(337, under);
        Point p = onScreen(x, TimelineView.RULER_HEIGHT + 5);
        moveTo(p);
        robot.mouseWheel(-3); // three notches in: 450 / 1.25^3 = 230 frames
        robot.waitForIdle();
        assertEquals(230, (int) onEdt(timeline::visibleSpan));
        assertEquals(337, (int) onEdt(() -> timeline.frameAtX(x)), "the frame under the pointer stays");
        int firstBefore = onEdt(timeline::visibleFirst);
        robot.keyPress(KeyEvent.VK_SHIFT);
        robot.mouseWheel(-1);
        robot.keyRelease(KeyEvent.VK_SHIFT);
        robot.waitForIdle();
        assertEquals(230, (int) onEdt(timeline::visibleSpan), "scrolling keeps the zoom");
        assertEquals(firstBefore - 23, (int) onEdt(timeline::visibleFirst), "a tenth of the view to the start");
        robot.mouseWheel(10); // far out: the whole video again
        robot.waitForIdle();
        assertEquals(450, (int) onEdt(timeline::visibleSpan));
        assertEquals(0, (int) onEdt(timeline::visibleFirst));
    }

    @Test
    void choosingARowInTheListTellsTheListener() throws Exception {
        Rectangle cell = onEdt(() -> {
            Rectangle r = list.table().getCellRect(3, 0, true);
            Point o = list.table().getLocationOnScreen();
            return new Rectangle(o.x + r.x, o.y + r.y, r.width, r.height);
        });
        moveTo(new Point(cell.x + cell.width / 2, cell.y + cell.height / 2));
        robot.mousePress(InputEvent.BUTTON1_DOWN_MASK);
        robot.mouseRelease(InputEvent.BUTTON1_DOWN_MASK);
        robot.waitForIdle();
        assertEquals(List.of("list 4"), heard);
        assertEquals(4, (int) onEdt(list::selectedTrack));
        // Selecting from outside does not echo back.
        SwingUtilities.invokeAndWait(() -> list.setSelectedTrack(2));
        assertEquals(List.of("list 4"), heard);
        assertEquals(2, (int) onEdt(list::selectedTrack));
    }
}
