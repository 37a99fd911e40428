package org.modetrail.format.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Project;

class ProjectAutosaveTest {
    private static final AutosaveConfig FAST = new AutosaveConfig(Duration.ofMillis(200));

    @TempDir
    Path dir;

    private final List<Exception> failures = new CopyOnWriteArrayList<>();

    private static void waitFor(java.util.function.BooleanSupplier condition, long millis) throws Exception {
        long end = System.nanoTime() + millis * 1_000_000;
        while (!condition.getAsBoolean() && System.nanoTime() < end) {
            Thread.sleep(10);
        }
    }

    @Test
    void editReachesTheRecoveryFileWithinTheInterval() throws Exception {
        Path project = dir.resolve("p.json");
        Path recovery = ProjectAutosave.recoveryFile(project);
        assertEquals(dir.resolve("p.json.recovery"), recovery);
        try (ProjectAutosave autosave = new ProjectAutosave(project, FAST, failures::add)) {
            long start = System.nanoTime();
            autosave.markDirty(SampleProjects.small());
            waitFor(() -> Files.exists(recovery), 2_000);
            long millis = (System.nanoTime() - start) / 1_000_000;
            assertTrue(Files.exists(recovery));
            assertTrue(millis >= 150 && millis < 1_500, "written after " + millis + " ms");
            assertEquals(SampleProjects.small(), ProjectFile.read(recovery));
            assertFalse(Files.exists(project), "the project file is never written by the autosave");
        }
        assertEquals(List.of(), failures);
    }

    @Test
    void rapidEditsAreWrittenAtMostOncePerInterval() throws Exception {
        Path project = dir.resolve("p.json");
        Project last = null;
        ProjectAutosave autosave = new ProjectAutosave(project, FAST, failures::add);
        long start = System.nanoTime();
        for (int i = 0; i < 30; i++) {
            last = SampleProjects.small().withTrack(SampleProjects.small().tracks().get(2).withNote("edit " + i));
            autosave.markDirty(last);
            Thread.sleep(20);
        }
        long elapsed = (System.nanoTime() - start) / 1_000_000;
        int writes = autosave.writes();
        assertTrue(writes >= 1 && writes <= elapsed / 200 + 1, writes + " writes in " + elapsed + " ms");
        autosave.close(); // flushes the last edit
        assertEquals(last, ProjectFile.read(ProjectAutosave.recoveryFile(project)));
        assertThrows(IllegalStateException.class, () -> autosave.markDirty(SampleProjects.small()));
        assertEquals(List.of(), failures);
    }

    @Test
    void recoveryNewerThanTheProjectIsFoundAndDiscardedAfterSaving() throws Exception {
        Path project = dir.resolve("p.json");
        Project saved = SampleProjects.small();
        ProjectFile.write(saved, project);
        Files.setLastModifiedTime(project, FileTime.from(Instant.now().minusSeconds(60)));
        assertEquals(Optional.empty(), ProjectAutosave.findRecovery(project));
        Project edited = saved.withoutTrack(4);
        try (ProjectAutosave autosave = new ProjectAutosave(project, FAST, failures::add)) {
            autosave.markDirty(edited);
            waitFor(() -> autosave.writes() > 0, 2_000);
            Optional<Path> found = ProjectAutosave.findRecovery(project);
            assertEquals(Optional.of(ProjectAutosave.recoveryFile(project)), found);
            assertEquals(edited, ProjectFile.read(found.get()));

            ProjectFile.write(edited, project);
            autosave.saved(edited);
            assertFalse(Files.exists(ProjectAutosave.recoveryFile(project)));
            assertEquals(Optional.empty(), ProjectAutosave.findRecovery(project));
        }
        assertFalse(Files.exists(ProjectAutosave.recoveryFile(project)), "nothing was waiting after the save");
    }

    @Test
    void recoveryOlderThanTheProjectIsNotOfferedButKept() throws Exception {
        Path project = dir.resolve("p.json");
        Path recovery = ProjectAutosave.recoveryFile(project);
        ProjectFile.write(SampleProjects.small(), recovery);
        ProjectFile.write(SampleProjects.small(), project);
        Files.setLastModifiedTime(recovery, FileTime.from(Instant.now().minusSeconds(60)));
        assertEquals(Optional.empty(), ProjectAutosave.findRecovery(project));
        assertTrue(Files.exists(recovery));
        ProjectAutosave.discardRecovery(project);
        assertFalse(Files.exists(recovery));
    }

    @Test
    void unsavedProjectOffersItsRecovery() throws Exception {
        Path project = dir.resolve("never-saved.json");
        ProjectFile.write(SampleProjects.small(), ProjectAutosave.recoveryFile(project));
        assertTrue(ProjectAutosave.findRecovery(project).isPresent());
    }

    @Test
    void intervalIsValidated() {
        assertEquals(Duration.ofSeconds(5), AutosaveConfig.DEFAULT.interval());
        assertThrows(IllegalArgumentException.class, () -> new AutosaveConfig(Duration.ofMillis(10)));
    }
}
