package org.modetrail.format.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.WorldPoint;

class CalibrationPointsCsvTest {
    @TempDir
    Path dir;

    private Path file(String text) throws Exception {
        return Files.writeString(dir.resolve("points.csv"), text);
    }

    private CsvFormatException refused(String text) throws Exception {
        Path f = file(text);
        return assertThrows(CsvFormatException.class, () -> CalibrationPointsCsv.read(f, 960, 540));
    }

    static final String ROWS = "656.38,480.28,3.575,12\n552.52,362.62,3.425,18\n\n907.28,432.79,10.575,12\n"
            + "753.81,335.16,10.425,18\n";

    @Test
    void readsRowsInFileOrderInAnyColumnOrder() throws Exception {
        List<GroundPoint> p = CalibrationPointsCsv.read(file("image_x,image_y,world_x_m,world_y_m\n" + ROWS));
        assertEquals(4, p.size());
        assertEquals(new GroundPoint(new PixelPoint(656.38, 480.28), new WorldPoint(3.575, 12)), p.get(0));
        assertEquals(new WorldPoint(10.575, 12), p.get(2).world());
        List<GroundPoint> q = CalibrationPointsCsv.read(file("\uFEFFworld_y_m,WORLD_X_M,image_y,image_x\n"
                + "12,3.575,480.28,656.38\n18,3.425,362.62,552.52\n12,10.575,432.79,907.28\n18,10.425,335.16,"
                + "\"753.81\"\n"));
        assertEquals(p, q);
    }

    @Test
    void everyBadRowIsNamedByItsLine() throws Exception {
        String h = "image_x,image_y,world_x_m,world_y_m\n";
        CsvFormatException e = refused(h + "656.38,480.28,3.575,12\n552,362,3;4,18\n");
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("points.csv, line 3") && e.getMessage().contains("a number with a dot"),
                e.getMessage());
        assertEquals(2, refused(h + "656,480,3,12,7\n").line(), "extra field");
        assertTrue(refused(h + "1,1,0,0\n2,2,1,1\n1,1,2,2\n").getMessage().contains("already on line 2"));
        assertEquals(4, refused(h + "1,1,0,0\n2,2,1,1\n3,3,1,1\n").line(), "same ground point");
        assertTrue(refused(h + "970,10,0,0\n").getMessage().contains("outside the 960x540 frame"));
        assertTrue(refused(h + "1,1,0,0\n2,2,1,1\n3,3,2,5\n").getMessage().contains("only 3 point(s)"));
        assertTrue(refused(h + "1,1,NaN,0\n").getMessage().contains("world_x_m must be a number"));
        CsvFormatException extra = refused("image_x,image_y,world_x_m,world_y_m,name\n");
        assertEquals(1, extra.line());
        assertTrue(extra.getMessage().contains("unknown column 'name'"));
        assertTrue(refused("image_x,image_y,world_x_m\n").getMessage().contains("lacks column 'world_y_m'"));
        assertTrue(refused("image_x,image_y,world_x_m,image_x\n").getMessage().contains("appears twice"));
        assertTrue(refused("").getMessage().contains("empty"));
        Path none = dir.resolve("missing.csv");
        assertTrue(assertThrows(CsvFormatException.class, () -> CalibrationPointsCsv.read(none)).getMessage()
                .contains("--points"));
    }
}
