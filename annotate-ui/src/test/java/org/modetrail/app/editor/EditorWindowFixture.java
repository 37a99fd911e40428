package org.modetrail.app.editor;

import java.awt.GraphicsEnvironment;
import java.time.Duration;
import java.util.UUID;
import java.util.function.BooleanSupplier;
import java.util.prefs.Preferences;

import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Assumptions;

/**
 * An editor window on the screen for the window tests: light theme, 1200 x 820 at the screen's corner, preferences
 * of its own (removed afterwards), a robot, and waiting until the window stays put (Xvfb has no window manager to
 * place it at once). Closing closes the export screen, the session and the window.
 */
final class EditorWindowFixture implements AutoCloseable {
    final Robot robot;
    final EditorWindow window;
    private final Preferences node;

    private EditorWindowFixture(Robot robot, EditorWindow window, Preferences node) {
        this.robot = robot;
        this.window = window;
        this.node = node;
    }

    /** Skips the test without a display (CI runs these under Xvfb). */
    static void assumeDisplay() {
        boolean x11 = !System.getenv().getOrDefault("DISPLAY", "").isBlank();
        Assumptions.assumeTrue(!GraphicsEnvironment.isHeadless() && x11, "no display (CI runs this under Xvfb)");
    }

    static EditorWindowFixture open() throws InterruptedException {
        assumeDisplay();
        Robot robot = BasicRobot.robotWithNewAwtHierarchy();
        Preferences node = Preferences.userRoot().node("org/modetrail/editor-test-" + UUID.randomUUID());
        EditorWindow window = GuiActionRunner.execute(() -> {
            Themes.apply(false);
            EditorWindow w = new EditorWindow(new EditorPreferences(node), () -> { });
            w.setSize(1200, 820);
            w.setLocation(0, 0);
            w.setVisible(true);
            return w;
        });
        robot.waitForIdle();
        ScreenWait.untilStill(window, new java.awt.Point(0, 0));
        return new EditorWindowFixture(robot, window, node);
    }

    /** Waits up to a minute for {@code condition}, failing with {@code what} after that. */
    static void waitFor(BooleanSupplier condition, String what) throws InterruptedException {
        long end = System.nanoTime() + Duration.ofSeconds(60).toNanos();
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > end) {
                throw new AssertionError("timed out waiting for " + what);
            }
            Thread.sleep(10);
        }
    }

    @Override
    public void close() throws Exception {
        GuiActionRunner.execute(() -> {
            if (window.exportDialog() != null) {
                window.exportDialog().dispose();
            }
            if (window.session() != null) {
                window.session().close();
            }
            window.dispose();
        });
        robot.cleanUp();
        node.removeNode();
    }
}
