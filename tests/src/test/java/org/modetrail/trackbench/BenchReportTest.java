package org.modetrail.trackbench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The benchmark report's quick mode, as CI runs it so the report cannot rot: a row per scenario and tracker with
 * figures in range, and a success plot per scenario. Asserts the report's shape, not the trackers' standing (that
 * is EffortTest's and ScenarioAccuracyTest's).
 */
class BenchReportTest {
    @TempDir
    Path dir;

    @Test
    void theQuickReportHasEveryScenarioAndTrackerWithFiguresInRange() throws Exception {
        BenchReport.main(new String[] {"--out", dir.toString(), "--quick"});
        List<String> md = Files.readAllLines(dir.resolve(BenchReport.REPORT));
        assertTrue(md.get(0).startsWith("# Tracking benchmark"));
        int scenarios = ScenarioClips.all().size();
        List<String> rows = md.stream().filter(l -> l.startsWith("| ") && !l.startsWith("| scenario")).toList();
        assertEquals(scenarios * BenchReport.TRACKERS.size(), rows.size(), String.join("\n", md));
        for (String row : rows) {
            String[] f = row.split("\\|");
            double auc = Double.parseDouble(f[3].strip());
            double precision = Double.parseDouble(f[4].strip());
            double keys = Double.parseDouble(f[5].strip());
            double ms = Double.parseDouble(f[6].strip());
            assertTrue(auc >= 0 && auc <= 20.0 / 21 + 1e-9, row);
            assertTrue(precision >= 0 && precision <= 1, row);
            assertTrue(keys >= 0 && keys <= 1000, row);
            assertTrue(ms > 0, row);
        }
        try (var pngs = Files.list(dir)) {
            List<Path> plots = pngs.filter(p -> p.toString().endsWith(".png")).toList();
            assertEquals(scenarios, plots.size());
            BufferedImage img = ImageIO.read(plots.get(0).toFile());
            assertEquals(800, img.getWidth());
        }
    }
}
