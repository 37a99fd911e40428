package org.modetrail.app.editor;

import java.awt.GraphicsEnvironment;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;

import javax.swing.SwingUtilities;

/** Starts the editor's window on the event thread, with the remembered FlatLaf theme installed first. */
public final class EditorLauncher {
    private static final CountDownLatch CLOSED = new CountDownLatch(1);

    private EditorLauncher() {
    }

    /** Opens the editor, on a video or project when one is given. */
    public static void open(Path file) {
        if (GraphicsEnvironment.isHeadless()) {
            throw new IllegalStateException("no display: the editor needs a desktop session (or Xvfb); "
                    + "the other commands run without one");
        }
        System.setProperty("flatlaf.uiScale.allowScaleDown", "true");
        SwingUtilities.invokeLater(() -> {
            EditorPreferences prefs = EditorPreferences.user();
            Themes.apply(prefs.darkTheme());
            EditorWindow window = new EditorWindow(prefs, CLOSED::countDown);
            window.setVisible(true);
            if (file != null) {
                window.open(file);
            }
        });
    }

    /** Blocks until the editor's window is closed. */
    public static void awaitClose() throws InterruptedException {
        CLOSED.await();
    }
}
