package org.modetrail.tuning;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.modetrail.demo.scenario.ScenarioConfig;
import org.modetrail.demo.scenario.ScenarioKind;
import org.modetrail.demo.scenario.TrackingScenarios;
import org.modetrail.trackbench.ModetrailTracker;
import org.modetrail.trackbench.ScenarioClip;
import org.modetrail.trackbench.TrackRun;

/** Scratch tuning loop on tuning seeds of the generator's kinds, at two sizes and two noise levels. */
public final class Tune {
    static org.modetrail.tracking.TrackerConfig config() {
        org.modetrail.tracking.TrackerConfig c = org.modetrail.tracking.TrackerConfig.defaults();
        String bits = System.getProperty("tune.bits");
        if (bits != null) {
            c = c.withBinning(new org.modetrail.tracking.RgbBinning(Integer.parseInt(bits)));
        }
        if (Boolean.getBoolean("tune.hs")) {
            c = c.withBinning(org.modetrail.tracking.HueSaturationBinning.defaults());
        }
        String scale = System.getProperty("tune.scale");
        if (scale != null) {
            c = c.withScale(org.modetrail.tracking.ScaleMethod.valueOf(scale));
        }
        if (System.getProperty("tune.contrast") != null) {
            c = c.toBuilder().requireContrast(Boolean.getBoolean("tune.contrast")).build();
        }
        if (Boolean.getBoolean("tune.noredetect")) {
            c = c.toBuilder().reDetect(false).build();
        }
        return c;
    }

    public static void main(String[] args) throws Exception {
        long[] seeds = {2, 3, 4};
        int[][] sizes = {{640, 480}, {320, 240}};
        int[] noises = {3, 12};
        ExecutorService pool = Executors.newFixedThreadPool(2);
        List<Future<String>> rows = new ArrayList<>();
        for (ScenarioKind kind : ScenarioKind.values()) {
            for (int[] size : sizes) {
                for (int noise : noises) {
                    rows.add(pool.submit(() -> {
                        double sum = 0;
                        double worst = 1;
                        StringBuilder per = new StringBuilder();
                        for (long seed : seeds) {
                            ScenarioConfig c = ScenarioConfig.defaults().withSeed(seed).withSize(size[0], size[1])
                                    .withSensorNoise(noise);
                            Probe.Result r = Probe.run(config(),
                                    new ScenarioClip(TrackingScenarios.create(kind, c)));
                            double auc = r.auc();
                            if (r.reacquired() > 0) {
                                per.append(String.format(Locale.ROOT, " [re %d false %d]", r.reacquired(),
                                        r.falseReacquired()));
                            }
                            sum += auc;
                            worst = Math.min(worst, auc);
                            per.append(String.format(Locale.ROOT, " %.2f", auc));
                        }
                        return String.format(Locale.ROOT, "%-15s %4dx%-4d n%-3d mean %.3f worst %.3f |%s",
                                kind.slug(), size[0], size[1], noise, sum / seeds.length, worst, per);
                    }));
                }
            }
        }
        double total = 0;
        for (Future<String> r : rows) {
            String s = r.get();
            System.out.println(s);
            total += Double.parseDouble(s.substring(s.indexOf("mean ") + 5, s.indexOf(" worst")));
        }
        System.out.printf(Locale.ROOT, "OVERALL mean %.4f%n", total / rows.size());
        pool.shutdown();
    }
}
