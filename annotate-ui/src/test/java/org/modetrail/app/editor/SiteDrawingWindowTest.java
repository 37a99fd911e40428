package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Point;
import java.awt.event.KeyEvent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;

import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.KeyStroke;

import org.assertj.swing.core.MouseButton;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Box;
import org.modetrail.model.CountingLine;
import org.modetrail.model.Edit;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.Zone;
import org.modetrail.summary.CrossingDirection;
import org.modetrail.summary.TrackSummaries;
import org.modetrail.summary.TrackSummary;
import org.modetrail.video.VideoSource;

/**
 * Zones and counting lines as a user makes them in the editor's window, under Xvfb: draw a zone and a line on the
 * arena clip, name them, undo and redo, save, reopen, and see the summary count a crossing. Track 1 is animal 1's
 * true path over frames 280-350 (clips/arena-truth.csv) as keyframes: its ground contact point (the box's bottom
 * centre) goes from (451.5, 240) to (234.5, 82), crossing image x = 300 between frames 325 and 326 at y about 154.
 */
class SiteDrawingWindowTest {
    private static final Path CLIP = Path.of("..", "clips", "arena.mp4");
    private static final double PX = 1.5;
    /** The zone drawn: where track 1 runs during frames 280-310. */
    private static final List<PixelPoint> NEST = List.of(new PixelPoint(330, 150), new PixelPoint(480, 150),
            new PixelPoint(480, 260), new PixelPoint(330, 260));
    /** The line drawn, downwards along x = 300: its left (the summary's "left") is +x, so track 1 goes left to right. */
    private static final PixelPoint GATE_FROM = new PixelPoint(300, 100), GATE_TO = new PixelPoint(300, 380);

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

    // ------------------------------------------------------------------------------------------------ helpers

    private Project project() {
        return GuiActionRunner.execute(() -> window.session().project());
    }

    private String status() {
        return GuiActionRunner.execute(() -> ((JLabel) robot.finder().findByName(window, "status")).getText());
    }

    private FrameView frameView() {
        return (FrameView) robot.finder().findByName(window, "frameView");
    }

    private Point onScreen(PixelPoint p) {
        return GuiActionRunner.execute(() -> {
            FrameView v = frameView();
            Point origin = v.getLocationOnScreen();
            ViewTransform t = v.transform();
            return new Point(origin.x + (int) Math.round(t.toViewX(p.x())),
                    origin.y + (int) Math.round(t.toViewY(p.y())));
        });
    }

    private void clickAt(PixelPoint p) {
        robot.moveMouse(onScreen(p));
        robot.pressMouse(MouseButton.LEFT_BUTTON);
        robot.releaseMouse(MouseButton.LEFT_BUTTON);
        robot.waitForIdle();
    }

    private void drag(PixelPoint from, PixelPoint to) {
        Point a = onScreen(from), b = onScreen(to);
        robot.moveMouse(a);
        robot.pressMouse(MouseButton.LEFT_BUTTON);
        robot.moveMouse(new Point((a.x + b.x) / 2, (a.y + b.y) / 2));
        robot.moveMouse(b);
        robot.releaseMouse(MouseButton.LEFT_BUTTON);
        robot.waitForIdle();
    }

    /** Gives the window the focus back (Xvfb has no window manager to do it after a dialog), as a user would. */
    private void focusWindow() {
        robot.click((java.awt.Component) robot.finder().findByName(window, "status"));
        robot.waitForIdle();
    }

    private void key(int code) {
        robot.pressAndReleaseKey(code);
        robot.waitForIdle();
    }

    private void control(int code) {
        robot.pressKey(KeyEvent.VK_CONTROL);
        robot.pressAndReleaseKey(code);
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
        ScreenWait.untilStill(found.get());
        return found.get();
    }

    /** Types {@code name} over the suggested one in the name dialog and accepts it. */
    private void answerName(String name) throws InterruptedException {
        JDialog d = waitForDialog();
        javax.swing.JTextField field = robot.finder().findByType(d, javax.swing.JTextField.class);
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(field::isFocusOwner), "the name field to have the focus");
        if (name != null) {
            GuiActionRunner.execute(field::selectAll);
            robot.enterText(name);
        }
        key(KeyEvent.VK_ENTER);
        EditorWindowFixture.waitFor(() -> !d.isShowing(), "the name dialog to close");
        focusWindow();
    }

    /** Opens a copy of the clip with track 1 of animal 1's true path over frames 280-350 (keyframes, no tracking). */
    private Path openClipWithTrack() throws Exception {
        Path clip = Files.copy(CLIP, dir.resolve("arena.mp4"));
        GuiActionRunner.execute(() -> window.open(clip));
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(() -> window.session() != null && frameView().frame() == 0),
                "the clip to open and show frame 0");
        List<FrameAnnotation> keys = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of("..", "clips", "arena-truth.csv"))) {
            String[] f = line.split(",");
            if (f[0].equals("1") && Integer.parseInt(f[2]) >= 280 && Integer.parseInt(f[2]) <= 350) {
                keys.add(FrameAnnotation.keyframe(Integer.parseInt(f[2]), new Box(Double.parseDouble(f[4]),
                        Double.parseDouble(f[5]), Double.parseDouble(f[6]), Double.parseDouble(f[7]))));
            }
        }
        assertEquals(71, keys.size());
        GuiActionRunner.execute(() -> {
            Project p = window.session().project().withClass(new ObjectClass("animal", 0xE69F00));
            Track t = Track.startingWith(1, "animal", keys.get(0)).withAll(keys);
            window.session().apply(new Edit(p.withTrack(t), 1, 0, 0, false));
        });
        robot.waitForIdle();
        focusWindow();
        return clip;
    }

    private static void assertNear(PixelPoint expected, PixelPoint actual) {
        assertEquals(expected.x(), actual.x(), PX, "expected " + expected + ", got " + actual);
        assertEquals(expected.y(), actual.y(), PX, "expected " + expected + ", got " + actual);
    }

    // -------------------------------------------------------------------------------------------------- tests

    @Test
    void drawNameUndoRedoSaveReopenAndCountACrossing() throws Exception {
        everyCommandHasItsOwnKeyAndNoneIsACanvasKey();
        Path clip = openClipWithTrack();

        // A zone: Z, four corners, then a click on the first corner closes it; named "nest".
        key(KeyEvent.VK_Z);
        assertTrue(GuiActionRunner.execute(() -> frameView().drawsSite()), "Z starts the zone tool");
        for (PixelPoint p : NEST) {
            clickAt(p);
        }
        clickAt(new PixelPoint(NEST.get(0).x() + 1, NEST.get(0).y() + 1));
        answerName("nest");
        EditorWindowFixture.waitFor(() -> project().site().zones().size() == 1, "the zone in the project");
        Zone zone = project().site().zones().get(0);
        assertEquals("nest", zone.name());
        assertEquals(4, zone.polygon().size());
        for (int i = 0; i < 4; i++) {
            assertNear(NEST.get(i), zone.polygon().get(i));
        }

        // A counting line: L, a drag from end to end, the name offered ("line 1") accepted.
        key(KeyEvent.VK_L);
        drag(GATE_FROM, GATE_TO);
        answerName(null);
        EditorWindowFixture.waitFor(() -> project().site().lines().size() == 1, "the line in the project");
        CountingLine line = project().site().lines().get(0);
        assertEquals("line 1", line.name());
        assertNear(GATE_FROM, line.from());
        assertNear(GATE_TO, line.to());
        assertEquals(SiteItem.line("line 1"), GuiActionRunner.execute(window::selectedSiteForTest),
                "the new line is selected");

        // Undo takes the line back, redo brings it again; the zone stays throughout.
        control(KeyEvent.VK_Z);
        EditorWindowFixture.waitFor(() -> project().site().lines().isEmpty(), "undo of the line");
        assertEquals(1, project().site().zones().size());
        control(KeyEvent.VK_Y);
        EditorWindowFixture.waitFor(() -> project().site().lines().size() == 1, "redo of the line");

        // Save, reopen in a new session: both are in the file and in the reopened project.
        control(KeyEvent.VK_S);
        Path projectFile = EditorWindow.projectFileFor(clip);
        EditorWindowFixture.waitFor(() -> Files.exists(projectFile) && !window.session().isDirty(), "the save");
        assertEquals(List.of("nest"), ProjectFile.read(projectFile).site().zones().stream().map(Zone::name).toList());
        GuiActionRunner.execute(() -> window.open(projectFile));
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(() -> window.session() != null
                && window.session().projectFile().equals(projectFile) && window.frameCount() == 450), "reopen");
        Project reopened = project();
        assertEquals(zone, reopened.site().zones().get(0));
        assertEquals(line, reopened.site().lines().get(0));
        assertEquals(2, GuiActionRunner.execute(() -> frameView().siteVisible() ? reopened.site().zones().size()
                + reopened.site().lines().size() : -1), "both shown on the reopened project");

        // The summary: one crossing of line 1, left to right; the frames 280-310 in the nest count as time in it.
        double[] times;
        try (VideoSource v = VideoSource.open(clip)) {
            times = new double[v.frameCount()];
            for (int i = 0; i < times.length; i++) {
                times[i] = v.index().timeSeconds(i);
            }
        }
        TrackSummary s = TrackSummaries.of(reopened, times, Map.of()).get(0);
        assertEquals(1, s.crossingCount("line 1", CrossingDirection.LEFT_TO_RIGHT), s.toString());
        assertEquals(0, s.crossingCount("line 1", CrossingDirection.RIGHT_TO_LEFT), s.toString());
        assertTrue(s.secondsInZone().get("nest") > 0.5, s.toString());
    }

    @Test
    void badShapesAndATakenNameAreExplainedAndNothingIsLost() throws Exception {
        openClipWithTrack();
        GuiActionRunner.execute(() -> window.session().apply(org.modetrail.model.SiteEdits.addZone(
                window.session().project(), new Zone("nest", NEST))));

        // Two corners and Enter: the status line says a zone needs 3, the two corners stay.
        key(KeyEvent.VK_Z);
        clickAt(new PixelPoint(100, 300));
        clickAt(new PixelPoint(200, 300));
        key(KeyEvent.VK_ENTER);
        assertTrue(status().contains("at least 3 corners"), status());
        assertEquals(2, GuiActionRunner.execute(() -> frameView().zoneDraft().size()));
        // A third corner, Enter, and the name already taken: asked again, the status line says why.
        clickAt(new PixelPoint(150, 400));
        key(KeyEvent.VK_ENTER);
        JDialog d = waitForDialog();
        javax.swing.JTextField field = robot.finder().findByType(d, javax.swing.JTextField.class);
        assertEquals("zone 1", GuiActionRunner.execute(() -> field.getText()), "a default name is offered");
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(field::isFocusOwner), "the name field to have the focus");
        GuiActionRunner.execute(field::selectAll);
        robot.enterText("nest");
        key(KeyEvent.VK_ENTER);
        EditorWindowFixture.waitFor(() -> status().contains("already"), "the taken name to be explained");
        assertTrue(status().contains("'nest'"), status());
        answerName("burrow");
        EditorWindowFixture.waitFor(() -> project().site().zones().size() == 2, "the zone under its new name");
        assertEquals("burrow", project().site().zones().get(1).name());

        // A line whose two clicks fall on one point: refused, said so, nothing added.
        key(KeyEvent.VK_L);
        clickAt(new PixelPoint(500, 100));
        clickAt(new PixelPoint(500, 100));
        assertTrue(status().contains("two different ends"), status());
        assertTrue(project().site().lines().isEmpty());

        // R renames the selected zone; a taken name is asked again. Shift+Delete deletes, undo brings it back.
        key(KeyEvent.VK_ESCAPE);
        clickAt(new PixelPoint(160, 350)); // inside burrow
        assertEquals(SiteItem.zone("burrow"), GuiActionRunner.execute(window::selectedSiteForTest));
        key(KeyEvent.VK_R);
        JDialog rename = waitForDialog();
        javax.swing.JTextField renameField = robot.finder().findByType(rename, javax.swing.JTextField.class);
        EditorWindowFixture.waitFor(() -> GuiActionRunner.execute(renameField::isFocusOwner), "the name field to have the focus");
        GuiActionRunner.execute(renameField::selectAll);
        robot.enterText("nest");
        key(KeyEvent.VK_ENTER);
        EditorWindowFixture.waitFor(() -> status().contains("already"), "the taken name to be explained");
        answerName("den");
        EditorWindowFixture.waitFor(() -> project().site().zones().get(1).name().equals("den"), "the rename");
        assertEquals("nest", project().site().zones().get(0).name(), "the other zone keeps its name");
        robot.pressKey(KeyEvent.VK_SHIFT);
        key(KeyEvent.VK_DELETE);
        robot.releaseKey(KeyEvent.VK_SHIFT);
        EditorWindowFixture.waitFor(() -> project().site().zones().size() == 1, "the deletion");
        control(KeyEvent.VK_Z);
        EditorWindowFixture.waitFor(() -> project().site().zones().size() == 2, "undo of the deletion");
        // A zones file adds its zones and lines (the same name replaces); a broken one is refused with its line.
        Path zones = Files.writeString(dir.resolve("zones.json"), "{\"zones\": [{\"name\": \"nest\", \"polygon\": "
                + "[[10, 10], [90, 10], [50, 80]]}],\n \"lines\": [{\"name\": \"gate\", \"from\": [0, 200], "
                + "\"to\": [640, 200]}]}");
        GuiActionRunner.execute(() -> window.importZones(zones));
        EditorWindowFixture.waitFor(() -> project().site().lines().size() == 1, "the import");
        assertEquals(List.of("nest", "den"), project().site().zones().stream().map(Zone::name).toList());
        assertEquals(3, project().site().zones().get(0).polygon().size(), "nest replaced by the file's");
        Path broken = Files.writeString(dir.resolve("broken.json"), "{\"zones\": [{\"name\": \"x\",\n \"polygon\": 3");
        GuiActionRunner.execute(() -> window.importZones(broken));
        assertTrue(status().startsWith("Not imported") && status().contains("broken.json"), status());
        assertEquals(1, project().site().lines().size(), "nothing changed");

        // V hides them: a click inside the zone then selects nothing.
        key(KeyEvent.VK_V);
        assertFalse(GuiActionRunner.execute(() -> frameView().siteVisible()));
        clickAt(new PixelPoint(160, 350));
        assertEquals(null, GuiActionRunner.execute(window::selectedSiteForTest));
    }

    /** Checked here, on the window the other tests open anyway: a second window costs seconds under Xvfb. */
    private void everyCommandHasItsOwnKeyAndNoneIsACanvasKey() {
        List<EditorWindow.Command> commands = GuiActionRunner.execute(() -> window.commands());
        Set<KeyStroke> keys = new HashSet<>();
        Set<KeyStroke> canvas = Set.of(KeyStroke.getKeyStroke("F"), KeyStroke.getKeyStroke("pressed SPACE"),
                KeyStroke.getKeyStroke("ESCAPE"), KeyStroke.getKeyStroke("ENTER"), KeyStroke.getKeyStroke("BACK_SPACE"));
        for (EditorWindow.Command c : commands) {
            assertTrue(keys.add(c.key()), c.name() + ": " + c.key() + " is taken by another command");
            assertFalse(canvas.contains(c.key()), c.name() + ": " + c.key() + " is a key of the canvas");
        }
        assertTrue(commands.stream().anyMatch(c -> c.key().equals(KeyStroke.getKeyStroke("Z"))
                && c.menu().equals("Zones")), "Z draws a zone");
    }
}
