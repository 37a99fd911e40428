package org.modetrail.format.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.ImportException;
import org.modetrail.format.ImportLimits;
import org.modetrail.format.TrackSamples;
import org.modetrail.model.BoxSource;
import org.modetrail.model.Project;

/** TRACKS.csv as {@link TracksCsv} writes it, read back by {@link TracksCsvReader}. */
class TracksCsvReaderTest {
    @TempDir
    Path dir;

    @Test
    void roundTripKeepsIdsClassesSourcesAndBoxesToThePrintedPrecision() throws Exception {
        Project p = TrackSamples.small();
        Path file = dir.resolve("TRACKS.csv");
        TracksCsv.write(p, f -> f * 0.04, file);
        Project back = TracksCsvReader.read(file, p.video());
        TrackSamples.assertSameTracks(p, back);
        assertEquals(BoxSource.INTERPOLATED, back.track(1).orElseThrow().at(2).orElseThrow().source());
        // Rows are sorted by track id, so track 1's class comes first.
        assertEquals(List.of("mouse", "käfer, groß"), back.classes().stream().map(c -> c.name()).toList());
        assertEquals(p.video(), back.video());
    }

    private ImportException refused(String text) throws Exception {
        return refused(text, ImportLimits.DEFAULT);
    }

    private ImportException refused(String text, ImportLimits limits) throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        ImportException e = assertThrows(ImportException.class,
                () -> TracksCsvReader.read(f, TrackSamples.VIDEO, limits));
        assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
        return e;
    }

    private static final String H = TracksCsv.HEADER + "\n";
    private static final String OK = "1,car,0,0.0,10,10,20,20,keyframe,1\n";

    @Test
    void badRowsNameTheirLine() throws Exception {
        ImportException e = refused(H + OK + "1,car,1,0.04,10,10,20\n");
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("has 7 fields but the header 10"), e.getMessage());

        e = refused(H + OK + OK.replace(",0,0.0,", ",2,0.08,") + "1,car,\"3,0.1,1,1,1,1,keyframe,1\n");
        assertEquals(4, e.line());
        assertTrue(e.getMessage().contains("not closed"), e.getMessage());

        e = refused(H + "1,car,0,0.0,10,1O,20,20,keyframe,1\n");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("y must be a number"), e.getMessage());

        e = refused(H + "1,car,0,0.0,10,10,20,20,guessed,1\n");
        assertTrue(e.getMessage().contains("source must be keyframe, tracked or interpolated"), e.getMessage());
    }

    @Test
    void frameBeyondTheVideoBoxOutsideAndDuplicatesAreRefused() throws Exception {
        ImportException e = refused(H + OK + "1,car,300,12.0,10,10,20,20,tracked,0.5\n");
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("frame 300 is beyond the video"), e.getMessage());

        e = refused(H + "2,car,5,0.2,650,10,20,20,tracked,0.5\n");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("lies wholly outside the 640x480 frame"), e.getMessage());

        e = refused(H + OK + "\n" + OK);
        assertEquals(4, e.line());
        assertTrue(e.getMessage().contains("track 1 already has a box on frame 0"), e.getMessage());

        e = refused(H + OK + "1,bus,1,0.04,10,10,20,20,tracked,0.5\n");
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("has class 'bus' here but 'car' at line 2"), e.getMessage());
    }

    @Test
    void boxesReachingPastTheEdgeAndGroundColumnsComeBackAsWritten() throws Exception {
        // An object leaving the picture: the tracker's box reaches past the right edge; a calibrated export adds
        // the ground columns, which an import ignores (they follow from the calibration).
        Path f = dir.resolve("edge.csv");
        Files.writeString(f, TracksCsv.HEADER + "," + TracksCsv.GROUND_COLUMNS + "\n"
                + "1,car,5,0.2,630.5,10,20,20,tracked,0.5,1.5,2.5,3.1,0.2,0.05,90\n");
        Project p = TracksCsvReader.read(f, TrackSamples.VIDEO);
        assertEquals(new org.modetrail.model.Box(630.5, 10, 20, 20), p.tracks().get(0).at(5).orElseThrow().box());
    }

    @Test
    void theUncertaintyComesBackAndFilesWithoutItReadAsNotKnown() throws Exception {
        Project p = TracksCsvReader.read(Files.writeString(dir.resolve("u.csv"), TracksCsv.HEADER + ","
                + TracksCsv.UNCERTAINTY_COLUMN + "\n1,car,0,0.0,10,10,20,20,keyframe,1,1.000\n"
                + "1,car,1,0.04,11,10,20,20,tracked,0.8,3.250\n1,car,2,0.08,12,10,20,20,interpolated,0,\n"),
                TrackSamples.VIDEO);
        var t = p.tracks().get(0);
        assertEquals(1.0, t.at(0).orElseThrow().uncertaintyPx());
        assertEquals(3.25, t.at(1).orElseThrow().uncertaintyPx());
        assertTrue(Double.isNaN(t.at(2).orElseThrow().uncertaintyPx()), "an empty cell is not known");
        Project old = TracksCsvReader.read(Files.writeString(dir.resolve("old.csv"), H + OK), TrackSamples.VIDEO);
        assertTrue(Double.isNaN(old.tracks().get(0).at(0).orElseThrow().uncertaintyPx()),
                "a file without the column: not known");
        // Written and read back: the printed precision (3 decimals) is kept.
        Path file = dir.resolve("again.csv");
        TracksCsv.write(p, f -> f * 0.04, file);
        Project back = TracksCsvReader.read(file, TrackSamples.VIDEO);
        assertEquals(3.25, back.tracks().get(0).at(1).orElseThrow().uncertaintyPx());
        assertTrue(Double.isNaN(back.tracks().get(0).at(2).orElseThrow().uncertaintyPx()));

        ImportException e = refused(TracksCsv.HEADER + ",uncertainty_px\n1,car,0,0.0,10,10,20,20,keyframe,1,-2\n");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("uncertainty_px must be 0 or more"), e.getMessage());
    }

    @Test
    void headerAndSizeLimitsAreChecked() throws Exception {
        ImportException e = refused("track_id,class,frame,x,y,width,height,source,score\n" + OK);
        assertEquals(1, e.line());
        assertTrue(e.getMessage().contains("lacks column 'time_s'"), e.getMessage());

        e = refused(H + OK.repeat(100), ImportLimits.DEFAULT.withMaxFileBytes(1024));
        assertTrue(e.getMessage().contains("more than the limit of 1024"), e.getMessage());

        e = refused(H + "1,car," + "9".repeat(70_000) + "\n");
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("longer than 65536 characters"), e.getMessage());
    }
}
