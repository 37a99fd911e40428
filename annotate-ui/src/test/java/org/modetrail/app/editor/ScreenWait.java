package org.modetrail.app.editor;

import java.awt.AWTEvent;
import java.awt.AWTException;
import java.awt.Component;
import java.awt.Point;
import java.awt.Rectangle;
import java.awt.Toolkit;
import java.awt.Window;
import java.awt.event.AWTEventListener;
import java.awt.event.MouseEvent;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.SwingUtilities;

import org.assertj.swing.edt.GuiActionRunner;

/**
 * Waits until a shown component stays where it is on the screen, at the same size, and the pointer lands where Java
 * says the component is. Under Xvfb without a window manager a new window can still be moved into place just after
 * it appears, and Java can go on reporting it where it was first made (seen on CI: a window placed at (40, 40)
 * reported 40 px up and left of where it was drawn for over 10 s, so a robot's drag landed 40 px off). A screen that
 * grows to fit its content once shown moves what is at its bottom, too.
 */
final class ScreenWait {
    private static final long TIMEOUT_NS = 10_000_000_000L;

    private ScreenWait() {
    }

    static void untilStill(Component c) throws InterruptedException {
        stayStill(c);
    }

    /**
     * As {@link #untilStill(Component)}, then checks with the pointer that {@code c} is where Java says;
     * {@code placed}, where the test put the window holding {@code c}, is where the window is put back when the
     * pointer shows it elsewhere.
     */
    static void untilStill(Component c, Point placed) throws InterruptedException {
        long end = System.nanoTime() + TIMEOUT_NS;
        for (int attempt = 0; ; attempt++) {
            stayStill(c);
            Point miss = pointerMiss(c);
            if (miss == null || (attempt >= 3 && System.nanoTime() > end)) {
                if (miss != null) {
                    throw new AssertionError("the pointer lands " + miss + " px off where Java says " + c.getName()
                            + " is, after " + attempt + " tries to put its window back");
                }
                return;
            }
            System.err.println("ScreenWait: the pointer lands " + miss + " px off in " + c.getClass().getSimpleName()
                    + "; putting its window back");
            // Make Java and the X server agree again: move the window away and back, so both hear where it is.
            GuiActionRunner.execute(() -> {
                Window w = c instanceof Window cw ? cw : SwingUtilities.getWindowAncestor(c);
                Point at = placed;
                w.setLocation(at.x + 1, at.y + 1);
                w.setLocation(at);
            });
            Thread.sleep(200);
        }
    }

    private static void stayStill(Component c) throws InterruptedException {
        Rectangle last = null;
        int still = 0;
        long end = System.nanoTime() + TIMEOUT_NS;
        while (still < 6 && System.nanoTime() < end) {
            Rectangle now = GuiActionRunner.execute(() -> c.isShowing()
                    ? new Rectangle(c.getLocationOnScreen(), c.getSize()) : null);
            still = now != null && now.equals(last) ? still + 1 : 0;
            last = now;
            Thread.sleep(50);
        }
    }

    /**
     * Moves the system's pointer to where Java says a point inside {@code c} is and reads where the event lands in
     * {@code c}; null when it lands there, else how far off.
     */
    private static Point pointerMiss(Component c) throws InterruptedException {
        java.awt.Robot robot;
        try {
            robot = new java.awt.Robot();
        } catch (AWTException e) {
            throw new IllegalStateException("no robot for the display", e);
        }
        Rectangle onScreen = GuiActionRunner.execute(() -> new Rectangle(c.getLocationOnScreen(), c.getSize()));
        Point wanted = new Point(onScreen.width / 2, onScreen.height / 2);
        AtomicReference<Point> landed = new AtomicReference<>();
        AWTEventListener listen = e -> {
            MouseEvent m = (MouseEvent) e;
            Component from = m.getComponent();
            if (from != null && (from == c || SwingUtilities.isDescendingFrom(from, c))) {
                landed.set(SwingUtilities.convertPoint(from, m.getPoint(), c));
            }
        };
        Toolkit.getDefaultToolkit().addAWTEventListener(listen, AWTEvent.MOUSE_MOTION_EVENT_MASK);
        try {
            for (int i = 0; i < 40; i++) {
                // Two positions, so the last move is a real motion even when the pointer was already there.
                robot.mouseMove(onScreen.x + wanted.x - 1, onScreen.y + wanted.y);
                robot.mouseMove(onScreen.x + wanted.x, onScreen.y + wanted.y);
                robot.waitForIdle();
                Thread.sleep(25);
                Point got = landed.get();
                if (got != null && got.x == wanted.x && got.y == wanted.y) {
                    return null;
                }
            }
            Point got = landed.get();
            return got == null ? new Point(Integer.MAX_VALUE, Integer.MAX_VALUE)
                    : new Point(got.x - wanted.x, got.y - wanted.y);
        } finally {
            Toolkit.getDefaultToolkit().removeAWTEventListener(listen);
        }
    }
}
