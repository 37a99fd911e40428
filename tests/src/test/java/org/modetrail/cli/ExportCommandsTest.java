package org.modetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.modetrail.format.csv.TracksCsv;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.video.VideoSource;

/**
 * The export, import, plot and overlay commands on a calibrated road project made from the generator's truth (car
 * 1 and the van 2), as a user would chain them.
 */
class ExportCommandsTest {
    @TempDir
    Path dir;
    Path projectFile;

    @BeforeEach
    void calibratedRoadProject() throws Exception {
        projectFile = RoadFixture.truthProject(dir, 1, 2);
        RoadFixture.Run c = RoadFixture.run("calibrate", projectFile.toString(), "--points",
                RoadFixture.points(dir).toString());
        assertEquals(0, c.code(), c.err());
    }

    @Test
    void aCalibratedCsvExportHasGroundColumnsAndNotesBesideIt() throws Exception {
        Path out = dir.resolve("road.csv");
        RoadFixture.Run r = RoadFixture.run("export", projectFile.toString(), "--format", "csv", "--out",
                out.toString());
        assertEquals(0, r.code(), r.err());
        List<String> lines = Files.readAllLines(out);
        assertEquals(TracksCsv.HEADER + "," + TracksCsv.UNCERTAINTY_COLUMN + "," + TracksCsv.GROUND_COLUMNS,
                lines.get(0));
        String[] mid = lines.get(100).split(",");
        assertEquals(17, mid.length, lines.get(100));
        // The project's boxes are keyframes: the user's placement uncertainty, 1 px.
        assertEquals(1.0, Double.parseDouble(mid[10]), 1e-9, lines.get(100));
        // Car 1 drives away from the camera along x = 1.75 m (clips/README.md): its contact point stays in its lane.
        assertEquals(1.75, Double.parseDouble(mid[11]), 1.2, "world x of " + lines.get(100));
        JsonNode notes = new ObjectMapper().readTree(dir.resolve("road.csv.about.json").toFile());
        assertEquals("csv", notes.get("format").asText());
        assertTrue(notes.get("software").asText().startsWith("Modetrail"));
        assertTrue(notes.get("calibration").get("reprojection_rms_px").asDouble() < 0.01);
        assertTrue(notes.get("caution").asText().contains("licensed engineering practice"));
        assertTrue(notes.get("frame_to_time").asText().contains("presentation timestamp"));
        assertEquals("metres per second", notes.get("units").get("speed_m_s").asText());
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"csv", "coco", "mot"})
    void exportThenImportGivesTheSameTracks(String format) throws Exception {
        Path out = dir.resolve("road." + format);
        assertEquals(0, RoadFixture.run("export", projectFile.toString(), "--format", format, "--out",
                out.toString()).code());
        Path back = dir.resolve("back.json");
        RoadFixture.Run r = RoadFixture.run("import", out.toString(), "--format", format, "--project",
                back.toString(), "--video", RoadFixture.CLIP.toString(), "--class", "car");
        assertEquals(0, r.code(), r.err());
        Project original = ProjectFile.read(projectFile);
        Project imported = ProjectFile.read(back);
        assertEquals(original.tracks().size(), imported.tracks().size());
        for (Track t : original.tracks()) {
            Track u = imported.track(t.id()).orElseThrow();
            assertEquals(t.frames().keySet(), u.frames().keySet(), format + " track " + t.id());
            if (!format.equals("mot")) {
                assertEquals(t.className(), u.className());
            }
            for (FrameAnnotation a : t.frames().values()) {
                FrameAnnotation b = u.frames().get(a.frame());
                assertEquals(a.source(), b.source());
                // Printed to 3 decimals; COCO clips to the frame, which these fully visible boxes never leave.
                assertEquals(a.box().x(), b.box().x(), 5e-4);
                assertEquals(a.box().height(), b.box().height(), 5e-4);
            }
        }
    }

    @Test
    void importingIntoAProjectWithTheSameIdsRenumbersAndKeepsABackup() throws Exception {
        Path out = dir.resolve("road.csv");
        assertEquals(0, RoadFixture.run("export", projectFile.toString(), "--format", "csv", "--out",
                out.toString()).code());
        RoadFixture.Run r = RoadFixture.run("import", out.toString(), "--format", "csv", "--project",
                projectFile.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("1->3, 2->4"), r.out());
        Project p = ProjectFile.read(projectFile);
        assertEquals(List.of(1, 2, 3, 4), p.tracks().stream().map(Track::id).toList());
        assertTrue(p.site().calibration() != null, "the calibration stays");
        assertTrue(Files.exists(ProjectFile.backupFile(projectFile)));
    }

    @Test
    void cocoWithFramesWritesOneImagePerAnnotatedFrame() throws Exception {
        // Only frames 60..70 of car 1, to keep the test short.
        Project p = ProjectFile.read(projectFile);
        Track car = p.track(1).orElseThrow();
        java.util.Map<Integer, FrameAnnotation> few = new java.util.TreeMap<>(car.frames().subMap(60, 71));
        Path small = dir.resolve("small.json");
        ProjectFile.write(new Project(p.video(), p.classes(), List.of(new Track(1, car.className(), "", few)),
                p.site()), small);
        Path json = dir.resolve("small-coco.json");
        Path frames = dir.resolve("frames");
        RoadFixture.Run r = RoadFixture.run("export", small.toString(), "--format", "coco", "--out",
                json.toString(), "--frames", frames.toString());
        assertEquals(0, r.code(), r.err());
        JsonNode coco = new ObjectMapper().readTree(json.toFile());
        assertEquals(11, coco.get("images").size());
        assertEquals(11, coco.get("annotations").size());
        try (var files = Files.list(frames)) {
            assertEquals(11, files.count());
        }
        BufferedImage img = ImageIO.read(frames.resolve("frame_000060.png").toFile());
        assertEquals(960, img.getWidth());
        assertEquals(540, img.getHeight());
    }

    @Test
    void badExportAndImportRequestsAreBadInput() throws Exception {
        assertEquals(2, RoadFixture.run("export", projectFile.toString(), "--format", "xml", "--out",
                dir.resolve("x").toString()).code());
        assertEquals(2, RoadFixture.run("export", projectFile.toString(), "--format", "csv", "--out",
                dir.resolve("x").toString(), "--frames", dir.resolve("f").toString()).code());
        Path bad = Files.writeString(dir.resolve("bad.txt"), "1,1,10,10,20,20,1,-1,-1,-1\n2,1,10,10,20\n");
        RoadFixture.Run r = RoadFixture.run("import", bad.toString(), "--format", "mot", "--project",
                dir.resolve("new.json").toString(), "--video", RoadFixture.CLIP.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("bad.txt, line 2"), r.err());
        assertFalse(Files.exists(dir.resolve("new.json")), "nothing is written");
        RoadFixture.Run noVideo = RoadFixture.run("import", bad.toString(), "--format", "mot", "--project",
                dir.resolve("new.json").toString());
        assertEquals(2, noVideo.code());
        assertTrue(noVideo.err().contains("--video"), noVideo.err());
    }

    @Test
    void plotsAreWrittenForTheImageAndTheGround() throws Exception {
        Path plots = dir.resolve("plots");
        RoadFixture.Run r = RoadFixture.run("plot", projectFile.toString(), "--out", plots.toString());
        assertEquals(0, r.code(), r.err());
        for (String name : List.of("trajectory-image", "trajectory-ground", "speed")) {
            BufferedImage png = ImageIO.read(plots.resolve(name + ".png").toFile());
            assertEquals(1000, png.getWidth(), name);
            assertTrue(Files.readString(plots.resolve(name + ".svg")).contains("<svg"), name);
        }
    }

    @Test
    void anOverlayOfAFewFramesReadsBackAtTheSourceSize() throws Exception {
        Path mp4 = dir.resolve("overlay.mp4");
        RoadFixture.Run r = RoadFixture.run("overlay", projectFile.toString(), "--out", mp4.toString(), "--from",
                "40", "--to", "59");
        assertEquals(0, r.code(), r.err());
        // Read back through FFmpeg's decoder.
        try (VideoSource v = VideoSource.open(mp4)) {
            assertEquals(20, v.frameCount());
            assertEquals(960, v.info().width());
            assertEquals(540, v.info().height());
        }
        assertEquals(2, RoadFixture.run("overlay", projectFile.toString(), "--out", mp4.toString(), "--from", "400",
                "--to", "500").code());
    }
}
