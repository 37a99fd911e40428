package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TruthCsvTest {

    @TempDir
    Path dir;

    @Test
    void roadTruthHasTheDocumentedColumnsAndParsesBack() throws IOException {
        RoadScene scene = new RoadScene(RoadConfig.defaults().withSize(320, 180).withTiming(25, 50)
                .withStyle(RenderStyle.flat()));
        List<TruthRow> rows = new ArrayList<>();
        int[] rgb = new int[320 * 180];
        for (int f = 0; f < 50; f++) {
            rows.addAll(scene.render(f, rgb));
        }
        Path file = dir.resolve("road-truth.csv");
        TruthCsv.write(file, rows, true);
        List<String> lines = Files.readAllLines(file);
        assertEquals("track_id,class,frame,time_s,x,y,width,height,visible,world_x_m,world_y_m,speed_m_s",
                lines.get(0));
        assertEquals(rows.size() + 1, lines.size());
        for (int k = 0; k < rows.size(); k++) {
            String[] cells = lines.get(k + 1).split(",", -1);
            TruthRow r = rows.get(k);
            assertEquals(12, cells.length);
            assertEquals(r.trackId(), Integer.parseInt(cells[0]));
            assertEquals(r.objectClass(), cells[1]);
            assertEquals(r.frame(), Integer.parseInt(cells[2]));
            // time_s = frame / fps, the brief's definition, computed here rather than taken from the row.
            assertEquals(r.frame() / 25.0, Double.parseDouble(cells[3]), 1e-9);
            assertEquals(r.x(), Double.parseDouble(cells[4]), 1e-3);
            assertEquals(r.visible(), Double.parseDouble(cells[8]), 1e-4);
            assertEquals(r.worldYM(), Double.parseDouble(cells[10]), 1e-4);
            assertEquals(r.speedMS(), Double.parseDouble(cells[11]), 1e-4);
        }
    }

    @Test
    void arenaTruthHasNoWorldColumns() throws IOException {
        ArenaScene scene = new ArenaScene(ArenaConfig.defaults().withSize(160, 120).withTiming(25, 2));
        List<TruthRow> rows = new ArrayList<>(scene.render(0, new int[160 * 120]));
        Path file = dir.resolve("arena-truth.csv");
        TruthCsv.write(file, rows, false);
        List<String> lines = Files.readAllLines(file);
        assertEquals("track_id,class,frame,time_s,x,y,width,height,visible", lines.get(0));
        assertTrue(lines.stream().skip(1).allMatch(l -> l.split(",").length == 9 && l.contains(",animal,0,0,")));
    }

    @Test
    void numbersUseADotAndNoTrailingZerosWhateverTheLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals("0.04", TruthCsv.number(0.04, 4));
            assertEquals("12", TruthCsv.number(12.0, 3));
            assertEquals("-3.5", TruthCsv.number(-3.5, 3));
            assertEquals("0", TruthCsv.number(-0.00001, 3));
        } finally {
            Locale.setDefault(before);
        }
        assertThrows(IllegalArgumentException.class, () -> TruthCsv.number(Double.NaN, 3));
    }

    @Test
    void calibrationFileListsCameraHomographyAndPoints() throws IOException {
        RoadScene scene = new RoadScene(RoadConfig.defaults().withTiming(25, 1).withStyle(RenderStyle.flat()));
        Path file = dir.resolve("road-calibration.csv");
        CalibrationCsv.write(file, scene.config().camera(), scene.calibrationPoints());
        List<String> lines = Files.readAllLines(file);
        assertEquals(CalibrationCsv.HEADER, lines.get(0));
        assertTrue(lines.contains("camera,height_m,10,,,,"), lines.toString());
        assertTrue(lines.contains("homography,h33,1,,,,"), lines.toString());
        long points = lines.stream().filter(l -> l.startsWith("point,")).count();
        assertTrue(points >= 6, "points: " + points);
        assertTrue(lines.stream().allMatch(l -> l.split(",", -1).length == 7), "seven cells on every row");
        // Existing files are replaced whole.
        CalibrationCsv.write(file, scene.config().camera(), List.of());
        assertEquals(1 + 10 + 9, Files.readAllLines(file).size());
    }
}
