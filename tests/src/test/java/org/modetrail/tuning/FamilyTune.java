package org.modetrail.tuning;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.modetrail.demo.scenario.FamilyKind;
import org.modetrail.demo.scenario.ScenarioBox;
import org.modetrail.demo.scenario.ScenarioFamily;
import org.modetrail.demo.scenario.TrackingScenario;
import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStatus;
import org.modetrail.tracking.TrackStep;
import org.modetrail.video.Frame;

/**
 * Scratch tuning loop on the family's TUNING seeds (raw renders, no H.264): every object from its first frame at
 * least half visible, OTB AUC with a missing box scoring 0; re-acquisitions and false ones counted.
 */
public final class FamilyTune {
    public static void main(String[] args) throws Exception {
        int seedsPerKind = Integer.parseInt(System.getProperty("tune.seeds", "4"));
        ExecutorService pool = Executors.newFixedThreadPool(2);
        List<Future<String>> rows = new ArrayList<>();
        List<double[]> totals = new ArrayList<>();
        String only = System.getProperty("tune.kinds", "");
        for (FamilyKind kind : FamilyKind.values()) {
            if (!only.isEmpty() && !java.util.Arrays.asList(only.split(",")).contains(kind.slug())) {
                continue;
            }
            long[] seeds = Boolean.getBoolean("tune.report") ? ScenarioFamily.reportSeeds(kind) : ScenarioFamily.tuningSeeds(kind);
            for (int i = 0; i < Math.min(seedsPerKind, seeds.length); i++) {
                long seed = seeds[i];
                rows.add(pool.submit(() -> run(kind, seed)));
            }
        }
        double sum = 0;
        int n = 0;
        try {
            for (Future<String> r : rows) {
                String s = r.get();
                System.out.println(s);
                String[] parts = s.split("auc=");
                for (int i = 1; i < parts.length; i++) {
                    sum += Double.parseDouble(parts[i].substring(0, 5));
                    n++;
                }
            }
        } finally {
            pool.shutdownNow();
        }
        System.out.printf(Locale.ROOT, "OVERALL mean over %d objects %.4f%n", n, sum / n);
        pool.shutdown();
    }

    static String run(FamilyKind kind, long seed) {
        TrackingScenario s = ScenarioFamily.create(kind, seed);
        int objects = s.objectCount();
        int w = s.width();
        int h = s.height();
        int[] rgb = new int[w * h];
        MeanShiftTracker[] t = new MeanShiftTracker[objects];
        boolean[] started = new boolean[objects];
        double[][] hits = new double[objects][21];
        int[] scored = new int[objects];
        int[] re = new int[objects];
        int[] falseRe = new int[objects];
        int[] absentBoxes = new int[objects];
        for (int f = 0; f < s.frameCount(); f++) {
            s.render(f, rgb);
            Frame frame = new Frame(f, 0, w, h, rgb);
            for (int k = 0; k < objects; k++) {
                ScenarioBox tb = s.truth(k, f);
                Box truth = tb.width() > 0 ? new Box(tb.x(), tb.y(), tb.width(), tb.height()) : null;
                if (!started[k]) {
                    if (truth != null && tb.visible() >= 0.5) {
                        t[k] = new MeanShiftTracker(Tune.config());
                        t[k].start(frame, truth);
                        started[k] = true;
                    }
                    continue;
                }
                Box b = null;
                if (!t[k].isLost()) {
                    TrackStep step = t[k].track(frame);
                    if (step.status().found()) {
                        b = step.box();
                    }
                    if (step.status() == TrackStatus.REACQUIRED) {
                        re[k]++;
                        if (truth == null || tb.visible() < 0.5 || b.iou(truth) < 0.3) {
                            falseRe[k]++;
                        }
                    }
                }
                if (truth == null && b != null) {
                    absentBoxes[k]++;
                }
                if (truth == null || tb.visible() < 0.5) {
                    continue;
                }
                double iou = b == null ? 0 : b.iou(truth);
                for (int i = 0; i < 21; i++) {
                    if (iou > i / 20.0) {
                        hits[k][i]++;
                    }
                }
                scored[k]++;
            }
        }
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "%-20s seed %4d", kind.slug(), seed));
        for (int k = 0; k < objects; k++) {
            if (!started[k] || scored[k] == 0) {
                continue;
            }
            double auc = 0;
            for (double x : hits[k]) {
                auc += x / scored[k];
            }
            sb.append(String.format(Locale.ROOT, " | o%d auc=%.3f re %d/%d absent %d", k, auc / 21, falseRe[k], re[k],
                    absentBoxes[k]));
        }
        return sb.toString();
    }
}
