package org.modetrail.trackbench;

import java.util.List;
import java.util.Locale;

import org.modetrail.run.PassMerge;

/**
 * The effort table: keyframes a simulated annotator adds per 1000 frames on each scenario, for Modetrail, plain
 * interpolation, and the two reference trackers restarted at each keyframe ({@link EffortSimulation}). Run with
 * {@code mvn -B -q -pl tests test-compile exec:java -Dexec.mainClass=org.modetrail.trackbench.EffortBench
 * -Dexec.classpathScope=test}.
 */
public final class EffortBench {
    private EffortBench() {
    }

    public static void main(String[] args) throws Exception {
        List<EffortSimulation.Filler> fillers = List.of(EffortSimulation.modetrail(), EffortSimulation.interpolation(),
                EffortSimulation.restarted("BoofCV", BoofComaniciuTracker::new),
                EffortSimulation.restarted("CamShift", OpenCvCamShiftTracker::new));
        System.out.printf(Locale.ROOT, "%-16s %10s %14s %10s %10s  %s%n", "scenario", "Modetrail", "interpolation",
                "BoofCV", "CamShift", "targets (MT <= interp/10, MT <= best ref/3)");
        for (BenchClip clip : ScenarioClips.all()) {
            RenderedVideo video = new RenderedVideo(clip);
            double[] k = new double[fillers.size()];
            for (int i = 0; i < fillers.size(); i++) {
                k[i] = EffortSimulation.keyframesPer1000(clip, video, fillers.get(i));
            }
            double bestRef = Math.min(k[2], k[3]);
            boolean met = k[0] <= k[1] / 10 && k[0] <= bestRef / 3;
            System.out.printf(Locale.ROOT, "%-16s %10.1f %14.1f %10.1f %10.1f  %s%n", clip.name(), k[0], k[1], k[2],
                    k[3], met ? "yes" : "NO");
        }
        mergeTable();
    }

    /**
     * How the forward and backward passes merge, judged by the same annotator made stricter: at IoU 0.5 both merges
     * need no keyframe after the first on any scenario, so they are compared where keyframes are needed.
     */
    static void mergeTable() throws Exception {
        double[] strict = {0.7, 0.8};
        System.out.printf(Locale.ROOT, "%nkeyframes per 1000 frames for a stricter annotator, by pass merge%n");
        System.out.printf(Locale.ROOT, "%-16s", "scenario");
        for (double s : strict) {
            for (PassMerge m : PassMerge.values()) {
                System.out.printf(Locale.ROOT, " %18s", m.name().toLowerCase(Locale.ROOT) + "@" + s);
            }
        }
        System.out.println();
        double[] sum = new double[strict.length * PassMerge.values().length];
        for (BenchClip clip : ScenarioClips.all()) {
            RenderedVideo video = new RenderedVideo(clip);
            System.out.printf(Locale.ROOT, "%-16s", clip.name());
            int c = 0;
            for (double s : strict) {
                for (PassMerge m : PassMerge.values()) {
                    double k = EffortSimulation.keyframesPer1000(clip, video, EffortSimulation.modetrail(m), s);
                    sum[c++] += k;
                    System.out.printf(Locale.ROOT, " %18.1f", k);
                }
            }
            System.out.println();
        }
        System.out.printf(Locale.ROOT, "%-16s", "total");
        for (double v : sum) {
            System.out.printf(Locale.ROOT, " %18.1f", v);
        }
        System.out.println();
    }
}
