package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.project.AutosaveConfig;
import org.modetrail.format.project.ProjectAutosave;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.Edits;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/**
 * The editor's session on the bundled arena clip (450 frames, three animals; the generator's truth in
 * clips/arena-truth.csv): a drawn box becomes a whole track in the background, undo and redo take the edit and
 * its tracking together, a correction retracks only its span, saving and recovery.
 */
class EditorSessionTest {
    private static final Path CLIP = Path.of("..", "clips", "arena.mp4");
    /** Animal 1 on frame 0 (clips/arena-keys.csv). */
    private static final Box FIRST = new Box(383, 291, 24, 43);
    private static final ObjectClass ANIMAL = new ObjectClass("animal", 0xE69F00);

    @TempDir
    Path dir;

    private EditorSession newSession(Path projectFile) throws Exception {
        return EditorSession.forVideo(CLIP, new VideoRef(CLIP.toAbsolutePath().toString(), 640, 480, 450, ""),
                projectFile, new AutosaveConfig(Duration.ofMillis(100)));
    }

    @Test
    void aDrawnBoxBecomesAWholeTrackAndUndoTakesItBackWithItsTracking() throws Exception {
        try (EditorSession s = newSession(dir.resolve("arena.json"))) {
            s.apply(Edits.newTrack(s.project(), ANIMAL, 0, FIRST));
            assertTrue(s.awaitIdle(Duration.ofSeconds(60)));
            Track t = s.project().tracks().get(0);
            assertEquals(450, t.frames().size(), "tracked through the whole clip from one box");
            assertEquals(1, t.keyframes().size());
            s.undo();
            assertTrue(s.project().tracks().isEmpty());
            s.redo();
            assertEquals(450, s.project().tracks().get(0).frames().size(), "redo brings the tracking back too");
        }
    }

    @Test
    void aCorrectionIsAKeyframeAndRetracksOnlyAroundIt() throws Exception {
        try (EditorSession s = newSession(dir.resolve("arena.json"))) {
            s.apply(Edits.newTrack(s.project(), ANIMAL, 0, FIRST));
            assertTrue(s.awaitIdle(Duration.ofSeconds(60)));
            Track before = s.project().tracks().get(0);
            Box at200 = before.at(200).orElseThrow().box();
            Box corrected = new Box(at200.x() + 3, at200.y(), at200.width(), at200.height());
            s.apply(Edits.setKeyframe(s.project(), before.id(), 200, corrected));
            assertTrue(s.awaitIdle(Duration.ofSeconds(60)));
            Track after = s.project().tracks().get(0);
            assertEquals(BoxSource.KEYFRAME, after.at(200).orElseThrow().source());
            assertEquals(corrected, after.at(200).orElseThrow().box(), "the user's box is kept as drawn");
            assertEquals(450, after.frames().size());
            assertEquals(before.at(0), after.at(0), "the first keyframe is untouched");
        }
    }

    @Test
    void savingClearsDirtyAndAnAutosaveIsOfferedAfterACrash() throws Exception {
        Path file = dir.resolve("arena.json");
        try (EditorSession s = newSession(file)) {
            s.apply(Edits.newTrack(s.project(), ANIMAL, 0, FIRST));
            assertTrue(s.awaitIdle(Duration.ofSeconds(60)));
            s.save();
            assertFalse(s.isDirty());
            assertEquals(s.project().tracks(), ProjectFile.read(file).tracks());
            s.apply(Edits.changeClass(s.project().withClass(new ObjectClass("mouse", 0x56B4E9)),
                    s.project().tracks().get(0).id(), "mouse"));
            assertTrue(s.isDirty());
            Thread.sleep(600); // past the 100 ms autosave interval
        }
        // As after a crash: the recovery file holds the unsaved class change and is newer than the project.
        assertTrue(ProjectAutosave.findRecovery(file).isPresent());
        try (EditorSession recovered = EditorSession.forProject(file, true, AutosaveConfig.DEFAULT)) {
            assertEquals("mouse", recovered.project().tracks().get(0).className());
            assertTrue(recovered.isDirty(), "recovered edits are not saved yet");
        }
        try (EditorSession saved = EditorSession.forProject(file, false, AutosaveConfig.DEFAULT)) {
            assertEquals("animal", saved.project().tracks().get(0).className());
        }
    }

    @Test
    void saveAsMovesTheProjectAndItsRecoveryFile() throws Exception {
        try (EditorSession s = newSession(dir.resolve("a.json"))) {
            s.apply(Edits.newTrack(s.project(), ANIMAL, 0, FIRST));
            s.cancelTracking();
            assertTrue(s.awaitIdle(Duration.ofSeconds(60)));
            Path other = dir.resolve("sub").resolve("b.json");
            s.saveAs(other);
            assertEquals(other, s.projectFile());
            assertTrue(Files.exists(other));
            Project back = ProjectFile.read(other);
            assertEquals(List.of(1), back.tracks().stream().map(Track::id).toList());
        }
    }
}
