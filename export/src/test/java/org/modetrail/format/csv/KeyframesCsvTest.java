package org.modetrail.format.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Box;

class KeyframesCsvTest {
    @TempDir
    Path dir;

    private Path file(String text) throws Exception {
        return Files.writeString(dir.resolve("keys.csv"), text);
    }

    private CsvFormatException refused(String text) throws Exception {
        Path f = file(text);
        return assertThrows(CsvFormatException.class, () -> KeyframesCsv.read(f, 640, 480, 100));
    }

    @Test
    void readsRowsInAnyColumnOrderWithAnOptionalClass() throws Exception {
        List<KeyframeRow> rows = KeyframesCsv.read(file(
                "frame,track_id,x,y,width,height,class\n0,1,10.5,20,30,40,\"rat, brown\"\n\n12,2,0,0,5,5,mouse\n"),
                640, 480, 100);
        assertEquals(2, rows.size());
        assertEquals(new Box(10.5, 20, 30, 40), rows.get(0).box());
        assertEquals("rat, brown", rows.get(0).className());
        assertEquals(2, rows.get(1).trackId());
        assertEquals(12, rows.get(1).frame());
        assertEquals(4, rows.get(1).line());
        assertNull(KeyframesCsv.read(file("track_id,frame,x,y,width,height\n1,0,1,1,2,2\n"), 640, 480, 100)
                .get(0).className());
    }

    @Test
    void everyBadRowIsNamedByItsLine() throws Exception {
        String h = "track_id,frame,x,y,width,height\n";
        assertEquals(3, refused(h + "1,0,1,1,2,2\n1,0,5,5,2,2\n").line(), "duplicate track and frame");
        assertTrue(refused(h + "1,0,630,1,20,2\n").getMessage().contains("outside the 640x480 frame"));
        assertTrue(refused(h + "1,100,1,1,2,2\n").getMessage().contains("frames are 0 to 99"));
        assertTrue(refused(h + "1,0,1,1,2\n").getMessage().contains("has 5 fields"));
        assertTrue(refused(h + "1,0,1;5,1,2,2\n").getMessage().contains("a number with a dot"));
        assertTrue(refused(h + "0,0,1,1,2,2\n").getMessage().contains("track_id must be 1 or more"));
        assertTrue(refused(h + "1,0,1,1,0,2\n").getMessage().contains("positive width"));
        assertTrue(refused(h + "1,0,1,1,3,1\n").getMessage().contains("too small to track"));
        assertTrue(refused("track_id,frame,x,y,w,height\n").getMessage().contains("unknown column 'w'"));
        assertTrue(refused("track_id,frame,x,y,width\n").getMessage().contains("lacks column 'height'"));
        assertTrue(refused(h).getMessage().contains("no keyframes"));
        assertTrue(refused("").getMessage().contains("empty"));
        assertTrue(refused(h + "1,0,\"1,1,2,2\n").getMessage().contains("not closed"));
    }
}
