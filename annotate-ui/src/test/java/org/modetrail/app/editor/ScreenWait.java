package org.modetrail.app.editor;

import java.awt.Component;
import java.awt.Point;
import java.awt.Rectangle;
import java.awt.Window;

import javax.swing.SwingUtilities;

import org.assertj.swing.edt.GuiActionRunner;

/**
 * Waits until a shown component stays where it is on the screen, at the same size. Under Xvfb without a window
 * manager a new window can still be moved into place just after it appears (seen on CI: the window reported at the
 * screen's corner for a moment, then moved to where it was placed), and a screen that grows to fit its content once
 * shown moves what is at its bottom; a robot that maps a point of the component to the screen before then clicks
 * beside it.
 */
final class ScreenWait {
    private static final long TIMEOUT_NS = 10_000_000_000L;

    private ScreenWait() {
    }

    static void untilStill(Component c) throws InterruptedException {
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
     * Waits until the window holding {@code c}, placed by the test at {@code placed}, is reported there, then until
     * {@code c} stays still.
     */
    static void untilStill(Component c, Point placed) throws InterruptedException {
        long end = System.nanoTime() + TIMEOUT_NS;
        while (System.nanoTime() < end) {
            Point at = GuiActionRunner.execute(() -> {
                Window w = c instanceof Window cw ? cw : SwingUtilities.getWindowAncestor(c);
                return w != null && w.isShowing() ? w.getLocationOnScreen() : null;
            });
            if (placed.equals(at)) {
                break;
            }
            Thread.sleep(50);
        }
        untilStill(c);
    }
}
