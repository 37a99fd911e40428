package org.modetrail.trackbench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The benchmark report's quick mode, as CI runs it so the report cannot rot: every kind of the clip set in use with
 * Modetrail, every fast peer and interpolation, figures in range, a success plot per kind, Modetrail above a floor,
 * and a second run that reuses the first's runs.
 */
class BenchReportTest {
    /**
     * Modetrail's mean success AUC over the quick set must be above this. Measured when written on the eight
     * tracking scenarios' report seeds 101-102, first 100 frames: 0.89 (0.85 to 0.92 per kind); a tracker that stays
     * where it started scores 0.02 to 0.09 (the interpolation rows). Common practice, no source: a floor well under
     * today's figure, so only a broken tracker or harness fails it.
     */
    static final double MODETRAIL_FLOOR = 0.70;
    static final double PERFECT_AUC = 20.0 / 21;

    @TempDir
    Path dir;

    @Test
    void theQuickReportHasEveryKindAndTrackerWithFiguresInRangeAndModetrailAboveItsFloor() throws Exception {
        BenchReport.main(new String[] {"--out", dir.toString(), "--quick"});
        List<String> md = Files.readAllLines(dir.resolve(BenchReport.REPORT));
        assertTrue(md.get(0).startsWith("# Tracking benchmark"));
        List<String> kinds = ClipSets.standard().kinds();
        List<String> trackers = new ArrayList<>(PeerTrackers.quickKeys());
        trackers.add(ClipBench.INTERPOLATION);
        assertTrue(PeerTrackers.quickKeys().stream().anyMatch(k -> k.startsWith("opencv-"))
                && PeerTrackers.quickKeys().stream().anyMatch(k -> k.startsWith("boofcv-")), "both libraries");

        List<String> csv = Files.readAllLines(dir.resolve(BenchReport.FIGURES));
        Map<String, String[]> rows = new HashMap<>();
        for (String line : csv.subList(1, csv.size())) {
            String[] f = line.split(",");
            rows.put(f[0] + "/" + f[1], f);
        }
        double modetrailSum = 0;
        double stillSum = 0;
        for (String kind : kinds) {
            for (String t : trackers) {
                String[] f = rows.get(kind + "/" + t);
                assertTrue(f != null, "no row for " + kind + " / " + t + " in\n" + String.join("\n", csv));
                String row = String.join(",", f);
                double auc = Double.parseDouble(f[4]);
                double worst = Double.parseDouble(f[5]);
                assertTrue(Integer.parseInt(f[2]) >= 1, row);
                assertTrue(auc >= 0 && auc <= PERFECT_AUC + 1e-9 && worst <= auc + 1e-9, row);
                assertTrue(inUnit(f[7]) && inUnit(f[9]), row);
                assertTrue(Double.parseDouble(f[8]) >= 0 && Double.parseDouble(f[10]) >= 0
                        && Double.parseDouble(f[11]) >= 0 && Double.parseDouble(f[12]) >= 0, row);
                assertTrue(t.equals(ClipBench.INTERPOLATION) || Double.parseDouble(f[13]) > 0, row);
                assertTrue(Double.parseDouble(f[14]) > 0, row);
            }
            String[] mt = rows.get(kind + "/" + PeerTrackers.MODETRAIL);
            String[] still = rows.get(kind + "/" + ClipBench.INTERPOLATION);
            modetrailSum += Double.parseDouble(mt[4]);
            stillSum += Double.parseDouble(still[4]);
            // The annotator's effort: a tracker that follows needs fewer keyframes than none at all.
            assertTrue(Double.parseDouble(mt[12]) < Double.parseDouble(still[12]), kind + ": Modetrail "
                    + mt[12] + " keyframes / 1000, interpolation " + still[12]);
        }
        double modetrail = modetrailSum / kinds.size();
        assertTrue(modetrail > MODETRAIL_FLOOR, "Modetrail's mean AUC " + modetrail);
        assertTrue(stillSum / kinds.size() < 0.3, "a box held still should score low, got " + stillSum / kinds.size());

        try (var pngs = Files.list(dir)) {
            List<Path> plots = pngs.filter(p -> p.toString().endsWith(".png")).toList();
            assertTrue(plots.size() >= kinds.size(), plots.toString());
            BufferedImage img = ImageIO.read(plots.get(0).toFile());
            assertEquals(800, img.getWidth());
        }
        for (String kind : kinds) {
            assertTrue(md.contains("## " + kind), "no section for " + kind);
        }

        // Resumed: the runs kept under runs/ are read back, not run again, and give the same figures.
        String objects = Files.readString(dir.resolve(BenchReport.OBJECTS));
        BenchReport.main(new String[] {"--out", dir.toString(), "--quick"});
        assertEquals(objects, Files.readString(dir.resolve(BenchReport.OBJECTS)));
    }

    private static boolean inUnit(String v) {
        double d = Double.parseDouble(v);
        return d >= 0 && d <= 1;
    }
}
