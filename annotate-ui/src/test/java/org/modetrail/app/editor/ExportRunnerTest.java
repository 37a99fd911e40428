package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Project;
import org.modetrail.picture.ColourBy;
import org.modetrail.picture.PlotFormat;

/** The export jobs without a screen: what they write, and what a failure tells the user. */
class ExportRunnerTest {
    @TempDir
    Path dir;

    private Map<ExportItem, ExportJobState> run(Path video, Project project, ExportPlan plan) throws Exception {
        Map<ExportItem, ExportJobState> last = new ConcurrentHashMap<>();
        try (ExportRunner runner = new ExportRunner(video, "Modetrail test")) {
            ExportRunner.Batch b = runner.start(project, plan, last::put);
            long end = System.nanoTime() + Duration.ofSeconds(30).toNanos();
            while (!b.isFinished()) {
                assertTrue(System.nanoTime() < end, "the jobs did not finish");
                Thread.sleep(10);
            }
        }
        return last;
    }

    private ExportPlan plan(Path folder, Set<ExportItem> items) {
        return new ExportPlan(folder, "arena", items, false, List.of(PlotFormat.PNG), ColourBy.CLASS, false, 0, 449,
                25);
    }

    @Test
    void aTracksExportIsDoneWithItsFileAndNotes() throws Exception {
        Path file = ExportTestProjects.arena(dir);
        Project p = ProjectFile.read(file);
        Map<ExportItem, ExportJobState> s = run(dir.resolve("arena.mp4"), p, plan(dir, Set.of(ExportItem.MOT)));
        assertEquals(ExportJobState.Stage.DONE, s.get(ExportItem.MOT).stage(), s.get(ExportItem.MOT).message());
        assertEquals(List.of(dir.resolve("arena-mot.txt"), dir.resolve("arena-mot.txt.about.json")),
                s.get(ExportItem.MOT).files());
        assertTrue(Files.size(dir.resolve("arena-mot.txt.about.json")) > 0);
    }

    @Test
    void aFolderThatCannotBeMadeIsNamedWithWhatToDo() throws Exception {
        Path file = ExportTestProjects.arena(dir);
        Path notAFolder = Files.writeString(dir.resolve("taken"), "a file where the folder would go");
        Map<ExportItem, ExportJobState> s = run(dir.resolve("arena.mp4"), ProjectFile.read(file),
                plan(notAFolder.resolve("out"), Set.of(ExportItem.CSV)));
        ExportJobState csv = s.get(ExportItem.CSV);
        assertEquals(ExportJobState.Stage.FAILED, csv.stage());
        assertTrue(csv.message().contains(notAFolder.resolve("out").toString()), csv.message());
        assertTrue(csv.message().contains("choose another folder"), csv.message());
    }

    @Test
    void aMissingVideoIsNamedAndEveryJobSaysSo() throws Exception {
        Path file = ExportTestProjects.arena(dir);
        Project p = ProjectFile.read(file);
        Path gone = dir.resolve("moved.mp4");
        Map<ExportItem, ExportJobState> s = run(gone, p, plan(dir, Set.of(ExportItem.CSV, ExportItem.SUMMARY)));
        for (ExportItem i : List.of(ExportItem.CSV, ExportItem.SUMMARY)) {
            assertEquals(ExportJobState.Stage.FAILED, s.get(i).stage());
            assertTrue(s.get(i).message().contains("moved.mp4"), s.get(i).message());
            assertTrue(s.get(i).message().contains("put it back"), s.get(i).message());
        }
        assertFalse(Files.exists(dir.resolve("arena-tracks.csv")));
    }
}
