package org.modetrail.format.mot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.ImportException;
import org.modetrail.format.ImportLimits;
import org.modetrail.format.TrackSamples;
import org.modetrail.model.BoxSource;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * The MOTChallenge text format as Milan et al. 2016, "MOT16: A benchmark for multi-object tracking" (arXiv:1603.00831,
 * the section on the data format) defines it: one object per line, ten comma-separated values
 * {@code frame, id, bb_left, bb_top, bb_width, bb_height, conf, x, y, z}, frames and ids counting from 1, and
 * x, y, z = -1 for a 2D box.
 */
class MotFormatTest {
    @TempDir
    Path dir;

    @Test
    void linesHaveTenFieldsOneBasedFramesAndAreSortedByFrameThenId() throws Exception {
        Path out = dir.resolve("res.txt");
        Locale saved = Locale.getDefault();
        Locale.setDefault(Locale.GERMANY); // decimal comma: must not leak into the file
        try {
            MotWriter.write(TrackSamples.small(), out);
        } finally {
            Locale.setDefault(saved);
        }
        List<String> lines = Files.readAllLines(out);
        // Modetrail frame 0 is MOT frame 1 (Milan et al. 2016: frames count from 1); track ids are kept (from 1).
        assertEquals(List.of(
                "1,1,10.000,20.000,30.000,40.000,1.0000,-1,-1,-1",
                "2,1,11.250,20.500,30.125,40.063,0.9137,-1,-1,-1",
                "2,4,600.000,400.000,40.000,80.000,1.0000,-1,-1,-1",
                "3,1,12.333,21.100,30.200,40.100,0.0000,-1,-1,-1",
                "3,4,599.500,399.250,40.500,80.750,0.0000,-1,-1,-1",
                "300,1,0.000,0.000,1.000,1.000,1.0000,-1,-1,-1"), lines, "hidden frame 3 of track 1 has no line");
        for (String line : lines) {
            String[] f = line.split(",");
            assertEquals(10, f.length, line);
            assertTrue(Integer.parseInt(f[0]) >= 1 && Integer.parseInt(f[1]) >= 1, "1-based frame and id: " + line);
            assertEquals(List.of("-1", "-1", "-1"), List.of(f[7], f[8], f[9]), "x, y, z of a 2D box: " + line);
        }
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file left beside the output");
        }
    }

    @Test
    void roundTripKeepsIdsFramesBoxesAndScoresAsKeyframes() throws Exception {
        Project p = TrackSamples.small();
        Path out = dir.resolve("res.txt");
        MotWriter.write(p, out);
        Project back = MotReader.read(out, p.video(), new ObjectClass("mouse", 0x123456));
        // MOT names no class and no source: every track gets the class given, every box comes in as a keyframe.
        Project expected = relabel(TrackSamples.asKeyframes(p), "mouse");
        TrackSamples.assertSameTracks(expected, back);
        assertEquals(BoxSource.KEYFRAME, back.track(4).orElseThrow().at(2).orElseThrow().source());
        assertEquals(List.of(new ObjectClass("mouse", 0x123456)), back.classes());
    }

    private static Project relabel(Project p, String cls) {
        List<Track> tracks = p.tracks().stream().map(t -> t.withClass(cls)).toList();
        return new Project(p.video(), List.of(new ObjectClass(cls, 0)), tracks);
    }

    @Test
    void confOutsideZeroToOneBecomesScoreOne() throws Exception {
        Path f = dir.resolve("gt.txt");
        Files.writeString(f, "5, 2, 10, 10, 20, 20, -1, -1, -1, -1\n");
        Project back = MotReader.read(f, TrackSamples.VIDEO, new ObjectClass("person", 0));
        assertEquals(1.0, back.track(2).orElseThrow().at(4).orElseThrow().score(), "frame 5 is Modetrail frame 4");
    }

    private ImportException refused(String text) throws Exception {
        return refused(text, ImportLimits.DEFAULT);
    }

    private ImportException refused(String text, ImportLimits limits) throws Exception {
        Path f = dir.resolve("bad.txt");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        ImportException e = assertThrows(ImportException.class,
                () -> MotReader.read(f, TrackSamples.VIDEO, new ObjectClass("person", 0), limits));
        assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
        return e;
    }

    private static final String OK = "1,1,10,10,20,20,1,-1,-1,-1\n";

    @Test
    void malformedLinesNameTheirLineAndField() throws Exception {
        ImportException e = refused(OK + "2,1,10,10,20,20,1,-1,-1\n");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("has 9 fields; a MOTChallenge line has 10"), e.getMessage());

        e = refused(OK + OK.replace("1,1,", "2,1,") + "3,1,10,1O,20,20,1,-1,-1,-1\n");
        assertEquals(3, e.line());
        assertEquals(8, e.column(), "bb_top starts at column 8");
        assertTrue(e.getMessage().contains("bb_top (field 4) must be a number"), e.getMessage());

        e = refused("1.5,1,10,10,20,20,1,-1,-1,-1\n");
        assertEquals(1, e.line());
        assertTrue(e.getMessage().contains("frame must be a whole number"), e.getMessage());

        e = refused("0,1,10,10,20,20,1,-1,-1,-1\n");
        assertTrue(e.getMessage().contains("frames count from 1"), e.getMessage());

        e = refused("1,0,10,10,20,20,1,-1,-1,-1\n");
        assertTrue(e.getMessage().contains("ids count from 1"), e.getMessage());
    }

    @Test
    void frameBeyondTheVideoBoxOutsideAndDuplicatesAreRefused() throws Exception {
        // The video has 300 frames, MOT frames 1 to 300.
        ImportException e = refused(OK + "301,1,10,10,20,20,1,-1,-1,-1\n");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("frame 301 is beyond the video"), e.getMessage());

        e = refused(OK + "\n" + "2,1,-30,10,20,20,1,-1,-1,-1\n");
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("lies wholly outside the 640x480 frame"), e.getMessage());

        e = refused(OK + OK);
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("track 1 already has a box on frame 0"), e.getMessage());

        e = refused("1,1,10,10,0,20,1,-1,-1,-1\n");
        assertTrue(e.getMessage().contains("positive width and height"), e.getMessage());
    }

    @Test
    void tooLargeFilesAndLinesAreRefusedBeforeReading() throws Exception {
        ImportException e = refused(OK.repeat(200), ImportLimits.DEFAULT.withMaxFileBytes(1024));
        assertEquals(0, e.line());
        assertTrue(e.getMessage().contains("more than the limit of 1024"), e.getMessage());

        e = refused(OK + "1".repeat(100_000));
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("longer than 65536 characters"), e.getMessage());

        e = refused(OK + OK.replace("1,1,", "2,1,") + OK.replace("1,1,", "3,1,"),
                ImportLimits.DEFAULT.withMaxBoxes(2));
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("more than 2 boxes"), e.getMessage());
    }
}
