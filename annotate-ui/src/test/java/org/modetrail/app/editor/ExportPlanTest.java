package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;
import org.modetrail.picture.ColourBy;
import org.modetrail.picture.PlotFormat;

/** The export screen's model: file names, the options a project allows, the overwrite rule. */
class ExportPlanTest {
    private static final Project BARE = Project.of(new VideoRef("/v/arena.mp4", 640, 480, 450, ""));
    private static final Project CALIBRATED = ExportTestProjects.calibrated(BARE);

    @TempDir
    Path dir;

    private ExportPlan plan(Set<ExportItem> items, List<PlotFormat> formats, boolean ground) {
        return new ExportPlan(dir, "arena", items, true, formats, ColourBy.CLASS, ground, 0, 449, 25);
    }

    @Test
    void theNameComesFromTheProjectFileWithoutItsEndings() {
        assertEquals("arena", ExportPlan.baseName(Path.of("/p/arena.modetrail.json")));
        assertEquals("road-2", ExportPlan.baseName(Path.of("/p/road-2.json")));
        assertEquals("Site A", ExportPlan.baseName(Path.of("/p/Site A.JSON")));
        assertEquals("notes.txt", ExportPlan.baseName(Path.of("/p/notes.txt")));
    }

    @Test
    void everyItemNamesItsFilesInTheFolderBeforeWriting() {
        ExportPlan p = plan(EnumSet.allOf(ExportItem.class), List.of(PlotFormat.PNG, PlotFormat.SVG), true);
        assertEquals(List.of(dir.resolve("arena-tracks.csv"), dir.resolve("arena-tracks.csv.about.json")),
                p.files(ExportItem.CSV));
        assertEquals(dir.resolve("arena-coco.json"), p.files(ExportItem.COCO).get(0));
        assertEquals(dir.resolve("arena-mot.txt.about.json"), p.files(ExportItem.MOT).get(1));
        assertEquals(List.of(dir.resolve("arena-summary.csv")), p.files(ExportItem.SUMMARY));
        assertEquals(List.of(dir.resolve("arena-overlay.mp4")), p.files(ExportItem.OVERLAY));
        assertEquals(dir.resolve("arena-frames"), p.framesFolder().orElseThrow());
        // The plot command's three plots, each in both formats, prefixed with the project's name.
        assertEquals(List.of("arena-trajectory-image.png", "arena-trajectory-ground.png", "arena-speed.png",
                "arena-trajectory-image.svg", "arena-trajectory-ground.svg", "arena-speed.svg"),
                p.files(ExportItem.PLOTS).stream().map(f -> f.getFileName().toString()).toList());
        assertEquals(List.of("arena-trajectory-image.svg"), plan(Set.of(ExportItem.PLOTS), List.of(PlotFormat.SVG),
                false).files(ExportItem.PLOTS).stream().map(f -> f.getFileName().toString()).toList());
    }

    @Test
    void groundPlotsAreOfferedOnlyWithACalibrationAndSayWhyNot() {
        assertFalse(ExportPlan.groundPlotsAvailable(BARE));
        assertTrue(ExportPlan.whyNoGroundPlots(BARE).orElseThrow().contains("ground calibration"));
        assertTrue(ExportPlan.groundPlotsAvailable(CALIBRATED));
        assertTrue(ExportPlan.whyNoGroundPlots(CALIBRATED).isEmpty());
        assertFalse(ExportPlan.defaults(Path.of("/p/a.json"), BARE, dir).groundPlots());
        assertTrue(ExportPlan.defaults(Path.of("/p/a.json"), CALIBRATED, dir).groundPlots());
        ExportPlan ground = plan(Set.of(ExportItem.PLOTS), List.of(PlotFormat.PNG), true);
        assertEquals(1, ground.problems(BARE).size(), "ground plots asked of an uncalibrated project");
        assertEquals(List.of(), ground.problems(CALIBRATED));
    }

    @Test
    void theCautionGoesWithSpeedsOnlyWhereTheExportCarriesThem() {
        assertTrue(plan(Set.of(ExportItem.CSV), List.of(PlotFormat.PNG), false).carriesSpeeds(CALIBRATED));
        assertTrue(plan(Set.of(ExportItem.SUMMARY), List.of(PlotFormat.PNG), false).carriesSpeeds(CALIBRATED));
        assertTrue(plan(Set.of(ExportItem.PLOTS), List.of(PlotFormat.PNG), true).carriesSpeeds(CALIBRATED));
        assertFalse(plan(Set.of(ExportItem.PLOTS), List.of(PlotFormat.PNG), false).carriesSpeeds(CALIBRATED));
        assertFalse(plan(Set.of(ExportItem.MOT, ExportItem.OVERLAY), List.of(PlotFormat.PNG), false)
                .carriesSpeeds(CALIBRATED));
        assertFalse(plan(Set.of(ExportItem.CSV, ExportItem.SUMMARY), List.of(PlotFormat.PNG), false)
                .carriesSpeeds(BARE), "no calibration, no metres");
    }

    @Test
    void existingFilesOfChosenItemsAreReplacedOnlyWhenTheUserAgrees() throws Exception {
        ExportPlan p = plan(Set.of(ExportItem.CSV, ExportItem.COCO), List.of(PlotFormat.PNG), false);
        assertEquals(List.of(), p.existing());
        assertTrue(p.mayWrite(false), "nothing to replace");
        Files.writeString(dir.resolve("arena-tracks.csv"), "mine");
        Files.writeString(dir.resolve("arena-summary.csv"), "not chosen, not asked about");
        Files.createDirectories(dir.resolve("arena-frames"));
        assertEquals(List.of(dir.resolve("arena-tracks.csv")), p.existing(), "an empty frames folder is no loss");
        Files.writeString(dir.resolve("arena-frames").resolve("frame_000000.png"), "x");
        assertEquals(List.of(dir.resolve("arena-tracks.csv"), dir.resolve("arena-frames")), p.existing());
        assertFalse(p.mayWrite(false));
        assertTrue(p.mayWrite(true));
    }

    @Test
    void badSettingsAreRefusedWithASentence() {
        assertThrows(IllegalArgumentException.class, () -> new ExportPlan(dir, "arena", Set.of(), false,
                List.of(PlotFormat.PNG), ColourBy.CLASS, false, 10, 5, 25));
        assertThrows(IllegalArgumentException.class, () -> new ExportPlan(dir, "arena", Set.of(), false,
                List.of(PlotFormat.PNG), ColourBy.CLASS, false, 0, 5, -1));
        assertThrows(IllegalArgumentException.class, () -> new ExportPlan(dir, "a/b", Set.of(), false,
                List.of(PlotFormat.PNG), ColourBy.CLASS, false, 0, 5, 25));
        assertThrows(IllegalArgumentException.class, () -> new ExportPlan(dir, "arena", Set.of(), false,
                List.of(), ColourBy.CLASS, false, 0, 5, 25));
        assertEquals("Choose at least one thing to export.",
                plan(Set.of(), List.of(PlotFormat.PNG), false).problems(BARE).get(0));
        ExportPlan pastTheEnd = new ExportPlan(dir, "arena", Set.of(ExportItem.OVERLAY), false,
                List.of(PlotFormat.PNG), ColourBy.CLASS, false, 0, 450, 25);
        assertTrue(pastTheEnd.problems(BARE).get(0).contains("frames 0 to 449"));
    }

    @Test
    void progressGivesTheTimeLeftAtTheRateSinceTheFirstFrame() {
        assertEquals(6.0, ExportJobState.secondsLeft(100, 2.0, 300), 1e-9, "300 frames at 50 a second");
        assertTrue(ExportJobState.secondsLeft(4, 2.0, 300) < 0, "no estimate from 4 frames");
        assertTrue(ExportJobState.secondsLeft(100, 0.2, 300) < 0, "no estimate within half a second");
        assertEquals("100 / 400 frames · 6 s left", ExportJobState.running(100, 400, 6.0).shortText());
        assertEquals("1 / 400 frames", ExportJobState.running(1, 400, -1).shortText());
        assertEquals("2 min 05 s", ExportJobState.timeLeft(124.2));
    }

    @Test
    void theExportFolderIsRememberedPerProject() throws Exception {
        java.util.prefs.Preferences node = java.util.prefs.Preferences.userRoot()
                .node("org/modetrail/editor-test-" + java.util.UUID.randomUUID());
        try {
            EditorPreferences prefs = new EditorPreferences(node);
            Path a = dir.resolve("a.json");
            Path b = dir.resolve("b.json");
            Path out = Files.createDirectories(dir.resolve("out"));
            assertEquals(null, prefs.exportFolder(a));
            prefs.setExportFolder(a, out);
            assertEquals(out, prefs.exportFolder(a));
            assertEquals(null, prefs.exportFolder(b), "another project starts from its own folder");
            Files.delete(out);
            assertEquals(null, prefs.exportFolder(a), "a folder since removed is forgotten");
        } finally {
            node.removeNode();
        }
    }
}
