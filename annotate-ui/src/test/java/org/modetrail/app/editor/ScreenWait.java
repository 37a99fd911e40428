package org.modetrail.app.editor;

import java.awt.Component;
import java.awt.Point;

import org.assertj.swing.edt.GuiActionRunner;

/**
 * Waits until a shown component stays where it is on the screen. Under Xvfb without a window manager a new window
 * can still be moved into place just after it appears; a robot that maps a point of the component to the screen
 * before then clicks beside it.
 */
final class ScreenWait {
    private ScreenWait() {
    }

    static void untilStill(Component c) throws InterruptedException {
        Point last = null;
        int still = 0;
        long end = System.nanoTime() + 5_000_000_000L;
        while (still < 4 && System.nanoTime() < end) {
            Point now = GuiActionRunner.execute(() -> c.isShowing() ? c.getLocationOnScreen() : null);
            still = now != null && now.equals(last) ? still + 1 : 0;
            last = now;
            Thread.sleep(50);
        }
    }
}
