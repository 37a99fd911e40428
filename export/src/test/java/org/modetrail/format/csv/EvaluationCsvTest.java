package org.modetrail.format.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.evaluation.Annotations;
import org.modetrail.model.Box;

/** The eval command's reader: the tracks layout with only six columns needed, and every bad row by its line. */
class EvaluationCsvTest {
    @TempDir
    Path dir;

    private Path file(String text) throws Exception {
        return Files.writeString(dir.resolve("truth.csv"), text);
    }

    @Test
    void theSixColumnsInAnyOrderWithVisibleAndTheTracksLayoutsOtherColumns() throws Exception {
        Annotations a = EvaluationCsv.read(file("frame,track_id,height,width,y,x,visible\n0,4,20,10,5,1.5,0.25\n"
                + "\n1,4,20,10,6,2,1\n"), "the truth");
        assertEquals(2, a.count());
        assertEquals(new Box(1.5, 5, 10, 20), a.ofId(4).get(0).box());
        assertEquals(0.25, a.ofId(4).get(0).visible(), 1e-12);
        Annotations tracks = EvaluationCsv.read(file(TracksCsv.HEADER + "\n1,animal,0,0.000,10,20,30,40,keyframe,1\n"),
                "the tracks");
        assertEquals(new Box(10, 20, 30, 40), tracks.ofId(1).get(0).box());
        assertEquals(1, tracks.ofId(1).get(0).visible(), 1e-12, "visible where the file says nothing");
    }

    @Test
    void badRowsAreNamedByLine() throws Exception {
        String head = "track_id,frame,x,y,width,height,visible\n";
        String[][] cases = {
            {head + "1,0,1,1,10,10,1\n1,x,1,1,10,10,1\n", "line 3", "frame must be a whole number"},
            {head + "1,0,1,1,0,10,1\n", "line 2", "positive width and height"},
            {head + "1,0,1,1,10,10,1.5\n", "line 2", "visible must be between 0 and 1"},
            {head + "1,0,1,1,10,10,1\n1,0,2,2,10,10,1\n", "line 3", "(line 2)"},
            {head + "1,0,1,1,10,10\n", "line 2", "has 6 fields"},
            {head + "1,-1,1,1,10,10,1\n", "line 2", "frame must be 0 or more"},
            {"track_id,frame,x,y,width\n", "line 1", "lacks column 'height'"},
            {"track_id,frame,x,y,width,height,colour\n", "line 1", "unknown column 'colour'"},
            {"", "line 1", "empty"},
        };
        for (String[] c : cases) {
            Path f = file(c[0]);
            CsvFormatException e = assertThrows(CsvFormatException.class, () -> EvaluationCsv.read(f, "the truth"),
                    c[0]);
            assertTrue(e.getMessage().contains("truth.csv") && e.getMessage().contains(c[1])
                    && e.getMessage().contains(c[2]), c[0] + " -> " + e.getMessage());
        }
        CsvFormatException missing = assertThrows(CsvFormatException.class,
                () -> EvaluationCsv.read(dir.resolve("none.csv"), "--truth"));
        assertTrue(missing.getMessage().contains("--truth") && !missing.getMessage().contains("line"),
                missing.getMessage());
    }
}
