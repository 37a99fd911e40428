package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Point;
import java.awt.event.KeyEvent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.JDialog;

import org.assertj.swing.core.MouseButton;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * The editor as a user drives it, in a real window under Xvfb: open a video, draw a box, see the track appear,
 * step, correct a box, undo, save, reopen, export; and bad input (a broken project) says what is wrong without
 * freezing. The arena clip is copied to a scratch folder so the project and its autosave land there.
 */
class EditorWindowTest {
    private static final Path CLIP = Path.of("..", "clips", "arena.mp4");
    /** Animal 1 on frame 0 (clips/arena-keys.csv). */
    private static final Box ANIMAL = new Box(383, 291, 24, 43);

    @TempDir
    Path dir;
    private EditorWindowFixture fixture;
    private Robot robot;
    private EditorWindow window;

    @BeforeEach
    void start() throws InterruptedException {
        fixture = EditorWindowFixture.open();
        robot = fixture.robot;
        window = fixture.window;
    }

    @AfterEach
    void stop() throws Exception {
        if (fixture != null) {
            fixture.close();
        }
    }

    private Project project() {
        return GuiActionRunner.execute(() -> window.session().project());
    }

    /** The screen point of an image point on the canvas. */
    private Point onScreen(double x, double y) {
        return GuiActionRunner.execute(() -> {
            FrameView v = findFrameView();
            Point origin = v.getLocationOnScreen();
            ViewTransform t = v.transform();
            return new Point(origin.x + (int) Math.round(t.toViewX(x)), origin.y + (int) Math.round(t.toViewY(y)));
        });
    }

    private FrameView findFrameView() {
        return (FrameView) robot.finder().findByName(window, "frameView");
    }

    private void drag(Point from, Point to) {
        robot.moveMouse(from);
        robot.pressMouse(MouseButton.LEFT_BUTTON);
        robot.moveMouse(new Point((from.x + to.x) / 2, (from.y + to.y) / 2));
        robot.moveMouse(to);
        robot.releaseMouse(MouseButton.LEFT_BUTTON);
        robot.waitForIdle();
    }

    private Path openCopyOfTheClip() throws Exception {
        Path clip = Files.copy(CLIP, dir.resolve("arena.mp4"));
        GuiActionRunner.execute(() -> window.open(clip));
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(() -> window.session() != null && findFrameView().frame() == 0),
                "the clip to open and show frame 0");
        robot.waitForIdle();
        return clip;
    }

    @Test
    void drawTrackStepCorrectUndoSaveReopenExport() throws Exception {
        Path clip = openCopyOfTheClip();
        // Draw a box around animal 1 on frame 0 and accept the class offered.
        drag(onScreen(ANIMAL.x(), ANIMAL.y()), onScreen(ANIMAL.right(), ANIMAL.bottom()));
        JDialog classDialog = waitForDialog();
        robot.pressAndReleaseKey(KeyEvent.VK_ENTER);
        EditorWindowFixture.waitFor(() -> !classDialog.isShowing(), "the class dialog to close");
        EditorWindowFixture.waitFor(() -> project().tracks().size() == 1 && !window.session().isTracking(), "tracking");
        Track t = project().tracks().get(0);
        assertEquals(450, t.frames().size(), "one box drawn, the whole clip tracked");
        Box drawn = t.at(0).orElseThrow().box();
        assertEquals(ANIMAL.x(), drawn.x(), 2);
        assertEquals(ANIMAL.width(), drawn.width(), 3);
        int rows = GuiActionRunner.execute(() -> ((TrackListPanel) robot.finder().findByName(window, "trackList"))
                .rows().size());
        assertEquals(1, rows, "the track list shows it");

        // Step to frame 10 and drag the box 6 px to the right: a keyframe there. (Under Xvfb there is no window
        // manager to give the window the focus back after the dialog, so the test clicks it, as a user would.)
        robot.click((java.awt.Component) robot.finder().findByName(window, "status"));
        robot.waitForIdle();
        for (int i = 0; i < 10; i++) {
            robot.pressAndReleaseKey(KeyEvent.VK_RIGHT);
        }
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(() -> window.currentFrame() == 10 && findFrameView().frame() == 10),
                "frame 10, at " + GuiActionRunner.execute(() -> window.currentFrame() + " active " + window.isActive()
                        + " focus " + java.awt.KeyboardFocusManager.getCurrentKeyboardFocusManager().getFocusOwner()));
        Box at10 = t.at(10).orElseThrow().box();
        drag(onScreen(at10.centreX(), at10.centreY()), onScreen(at10.centreX() + 6, at10.centreY()));
        EditorWindowFixture.waitFor(() -> project().tracks().get(0).at(10).orElseThrow().source() == BoxSource.KEYFRAME,
                "the corrected box to become a keyframe");
        assertEquals(at10.x() + 6, project().tracks().get(0).at(10).orElseThrow().box().x(), 2);
        EditorWindowFixture.waitFor(() -> !window.session().isTracking(), "retracking");

        // Undo takes the correction back.
        control(KeyEvent.VK_Z);
        EditorWindowFixture.waitFor(() -> project().tracks().get(0).at(10).orElseThrow().source() != BoxSource.KEYFRAME, "undo");

        // Save, reopen in a new session, export.
        control(KeyEvent.VK_S);
        Path projectFile = EditorWindow.projectFileFor(clip);
        EditorWindowFixture.waitFor(() -> Files.exists(projectFile) && !window.session().isDirty(), "the save");
        assertEquals(1, ProjectFile.read(projectFile).tracks().size());
        GuiActionRunner.execute(() -> window.open(projectFile));
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(() -> window.session() != null
                && window.session().projectFile().equals(projectFile) && window.frameCount() == 450), "reopen");
        assertEquals(450, project().tracks().get(0).frames().size());
        // Ctrl+E opens the export screen on the project's folder with the tracks CSV chosen; Export writes it.
        robot.click((java.awt.Component) robot.finder().findByName(window, "status"));
        control(KeyEvent.VK_E);
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(() -> window.exportDialog() != null
                && window.exportDialog().isShowing()), "the export screen");
        ExportDialog export = GuiActionRunner.execute(() -> window.exportDialog());
        ScreenWait.untilStill(export);
        robot.click((java.awt.Component) robot.finder().findByName(export, "exportStart"));
        // A click that lands before the screen takes it starts nothing: click again, as the export screen's own
        // test does.
        for (int i = 0; i < 50 && GuiActionRunner.execute(() -> export.state(ExportItem.CSV)) == null; i++) {
            robot.waitForIdle();
            Thread.sleep(100);
        }
        if (GuiActionRunner.execute(() -> export.state(ExportItem.CSV)) == null) {
            GuiActionRunner.execute(() -> ((javax.swing.JButton) robot.finder().findByName(export, "exportStart"))
                    .doClick());
        }
        Path csv = dir.resolve("arena-tracks.csv");
        EditorWindowFixture.waitFor(() -> Files.exists(dir.resolve("arena-tracks.csv.about.json")), "the export, screen at "
                + GuiActionRunner.execute(() -> export.getBounds() + " state " + export.state(ExportItem.CSV)
                + " problem '" + ((javax.swing.JLabel) robot.finder().findByName(export, "exportProblem")).getText()
                + "' folder " + ((javax.swing.JTextField) robot.finder().findByName(export, "exportFolder")).getText()
                + " focus " + java.awt.KeyboardFocusManager.getCurrentKeyboardFocusManager().getFocusOwner()));
        assertEquals(1 + 450, Files.readAllLines(csv).size());
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(() -> export.state(ExportItem.CSV) != null
                && export.state(ExportItem.CSV).finished()), "the export screen to say it is done");
        assertEquals(ExportJobState.Stage.DONE, GuiActionRunner.execute(() -> export.state(ExportItem.CSV).stage()));
    }

    @Test
    void aTooSmallBoxAndABrokenProjectAreExplainedInTheWindow() throws Exception {
        openCopyOfTheClip();
        drag(onScreen(100, 100), onScreen(100.4, 100.4));
        String status = GuiActionRunner.execute(() -> ((javax.swing.JLabel) robot.finder().findByName(window,
                "status")).getText());
        assertTrue(project().tracks().isEmpty(), "no track from a dot");
        assertFalse(status.isBlank());
        Path broken = Files.writeString(dir.resolve("broken.json"), "{\"format\": \"modetrail-project\",\n"
                + " \"schema\": 2, \"video\": {\"path\": \"arena.mp4\", \"width\": 640,");
        GuiActionRunner.execute(() -> window.open(broken));
        JDialog error = waitForDialog();
        String text = GuiActionRunner.execute(() -> messageOf(error));
        assertTrue(text.contains("broken.json") && text.contains("line"), text);
        robot.pressAndReleaseKey(KeyEvent.VK_ENTER);
        EditorWindowFixture.waitFor(() -> !error.isShowing(), "the message to close");
        assertEquals(450, GuiActionRunner.execute(() -> window.frameCount()), "the open clip is still there");

        // A video cut short after its first 20 kB (a copy that did not finish): named, explained, nothing lost.
        byte[] clip = Files.readAllBytes(CLIP);
        Path cut = Files.write(dir.resolve("cut.mp4"), java.util.Arrays.copyOf(clip, 20_000));
        GuiActionRunner.execute(() -> window.open(cut));
        JDialog cutError = waitForDialog();
        String cutText = GuiActionRunner.execute(() -> messageOf(cutError));
        assertTrue(cutText.contains("cut.mp4"), cutText);
        robot.pressAndReleaseKey(KeyEvent.VK_ENTER);
        EditorWindowFixture.waitFor(() -> !cutError.isShowing(), "the message to close");
        assertEquals(450, GuiActionRunner.execute(() -> window.frameCount()), "the open clip is still there");
        assertTrue(GuiActionRunner.execute(() -> window.session().videoFile().getFileName().toString())
                .equals("arena.mp4"));
    }

    private void control(int key) {
        robot.pressKey(KeyEvent.VK_CONTROL);
        robot.pressAndReleaseKey(key);
        robot.releaseKey(KeyEvent.VK_CONTROL);
        robot.waitForIdle();
    }

    private JDialog waitForDialog() throws InterruptedException {
        AtomicReference<JDialog> found = new AtomicReference<>();
        EditorWindowFixture.waitFor(() -> {
            for (java.awt.Window w : java.awt.Window.getWindows()) {
                if (w instanceof JDialog d && d.isShowing()) {
                    found.set(d);
                    return true;
                }
            }
            return false;
        }, "a dialog");
        robot.waitForIdle();
        return found.get();
    }

    private static String messageOf(JDialog d) {
        StringBuilder text = new StringBuilder();
        collect(d.getContentPane(), text);
        return text.toString();
    }

    private static void collect(java.awt.Container c, StringBuilder out) {
        for (java.awt.Component k : c.getComponents()) {
            if (k instanceof javax.swing.JLabel l && l.getText() != null) {
                out.append(l.getText()).append('\n');
            } else if (k instanceof javax.swing.text.JTextComponent tc) {
                out.append(tc.getText()).append('\n');
            }
            if (k instanceof java.awt.Container inner) {
                collect(inner, out);
            }
        }
    }
}
