package org.modetrail.app.editor;

import java.awt.GraphicsEnvironment;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;

import javax.swing.SwingUtilities;

import com.formdev.flatlaf.FlatLightLaf;

/** Starts the editor's window on the event thread, the FlatLaf look installed first. */
public final class EditorLauncher {
    private static final CountDownLatch CLOSED = new CountDownLatch(1);

    private EditorLauncher() {
    }

    /** Opens the editor, on a video when one is given. */
    public static void open(Path video) {
        if (GraphicsEnvironment.isHeadless()) {
            throw new IllegalStateException("no display: the editor needs a desktop session (or Xvfb); "
                    + "the other commands run without one");
        }
        System.setProperty("flatlaf.uiScale.allowScaleDown", "true");
        SwingUtilities.invokeLater(() -> {
            FlatLightLaf.setup();
            ViewerWindow window = new ViewerWindow(CLOSED::countDown);
            window.setVisible(true);
            if (video != null) {
                window.openVideo(video);
            }
        });
    }

    /** Blocks until the editor's window is closed. */
    public static void awaitClose() throws InterruptedException {
        CLOSED.await();
    }
}
