package org.modetrail.app.editor;

import java.awt.Component;
import java.awt.Rectangle;

import org.assertj.swing.edt.GuiActionRunner;

/**
 * Waits until a shown component stays where it is on the screen, at the same size. Under Xvfb without a window
 * manager a new window can still be moved into place just after it appears, and a screen that grows to fit its
 * content once shown moves what is at its bottom; a robot that maps a point of the component to the screen before
 * then clicks beside it.
 */
final class ScreenWait {
    private ScreenWait() {
    }

    static void untilStill(Component c) throws InterruptedException {
        Rectangle last = null;
        int still = 0;
        long end = System.nanoTime() + 5_000_000_000L;
        while (still < 4 && System.nanoTime() < end) {
            Rectangle now = GuiActionRunner.execute(() -> c.isShowing()
                    ? new Rectangle(c.getLocationOnScreen(), c.getSize()) : null);
            still = now != null && now.equals(last) ? still + 1 : 0;
            last = now;
            Thread.sleep(50);
        }
    }
}
