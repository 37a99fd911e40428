package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.modetrail.evaluation.SingleObjectEvaluation;

/**
 * The figures of one tracker on one kind (or on the real footage), over the objects of the seeds run.
 *
 * @param group             the kind's slug, or {@code vtest}
 * @param tracker           the tracker's key
 * @param objects           objects scored (at least one half-visible frame after the start)
 * @param seeds             clips
 * @param meanAuc           mean success AUC over the objects
 * @param worstSeedAuc      the lowest of the clips' mean AUC over their objects
 * @param worstSeed         that clip's seed
 * @param precision20       mean precision at 20 px over the objects
 * @param framesToFailure   mean frames from the start to the first failure (see {@link ObjectFigures})
 * @param failedShare       share of objects whose track ended or ballooned before the object left for good
 * @param wrongPer1000      wrong re-acquisitions per 1000 tracked frames
 * @param absentPer1000     boxes on an object out of view per 1000 tracked frames
 * @param keyframesPer1000  keyframes the simulated annotator added per 1000 judged frames (start to clip end)
 * @param msPerFrame        median over the clips of the per-clip time ({@link ObjectFigures#msPerFrame})
 * @param decodeMs          median over the clips of the decode time per frame
 * @param curve             mean success plot over the objects
 */
record BenchSummary(String group, String tracker, int objects, int seeds, double meanAuc, double worstSeedAuc,
                    long worstSeed, double precision20, double framesToFailure, double failedShare,
                    double wrongPer1000, double absentPer1000, double keyframesPer1000, double msPerFrame,
                    double decodeMs, double[] curve) {

    /** Summaries by group (in the order first met) and tracker (in the order given). */
    static List<BenchSummary> of(List<ObjectFigures> rows, List<String> groups, List<String> trackers) {
        List<BenchSummary> out = new ArrayList<>();
        for (String g : groups) {
            for (String t : trackers) {
                List<ObjectFigures> mine = rows.stream().filter(r -> r.kind().equals(g) && r.tracker().equals(t))
                        .toList();
                if (!mine.isEmpty()) {
                    out.add(of(g, t, mine));
                }
            }
        }
        return out;
    }

    static BenchSummary of(String group, String tracker, List<ObjectFigures> rows) {
        List<ObjectFigures> scored = rows.stream().filter(r -> r.scored() > 0).toList();
        Map<Long, List<ObjectFigures>> bySeed = new TreeMap<>();
        scored.forEach(r -> bySeed.computeIfAbsent(r.seed(), s -> new ArrayList<>()).add(r));
        double worst = Double.NaN;
        long worstSeed = -1;
        for (Map.Entry<Long, List<ObjectFigures>> e : bySeed.entrySet()) {
            double m = e.getValue().stream().mapToDouble(ObjectFigures::auc).average().orElse(Double.NaN);
            if (Double.isNaN(worst) || m < worst) {
                worst = m;
                worstSeed = e.getKey();
            }
        }
        double[] curve = new double[SingleObjectEvaluation.SUCCESS_POINTS];
        for (ObjectFigures r : scored) {
            for (int i = 0; i < curve.length; i++) {
                curve[i] += r.curve()[i] / scored.size();
            }
        }
        long tracked = rows.stream().mapToLong(ObjectFigures::tracked).sum();
        long judged = rows.stream().mapToLong(ObjectFigures::effortFrames).sum();
        Map<Long, Double> ms = new LinkedHashMap<>();
        Map<Long, Double> decode = new LinkedHashMap<>();
        rows.forEach(r -> {
            ms.put(r.seed(), r.msPerFrame());
            decode.put(r.seed(), r.decodeMs());
        });
        return new BenchSummary(group, tracker, scored.size(), bySeed.size(),
                scored.stream().mapToDouble(ObjectFigures::auc).average().orElse(Double.NaN), worst, worstSeed,
                scored.stream().mapToDouble(ObjectFigures::precision20).average().orElse(Double.NaN),
                scored.stream().mapToDouble(ObjectFigures::framesToFailure).average().orElse(Double.NaN),
                scored.stream().filter(ObjectFigures::failed).count() / (double) Math.max(1, scored.size()),
                per1000(rows.stream().mapToLong(ObjectFigures::wrongReacquired).sum(), tracked),
                per1000(rows.stream().mapToLong(ObjectFigures::boxesWhileAbsent).sum(), tracked),
                per1000(rows.stream().mapToLong(ObjectFigures::keyframes).sum(), judged),
                median(ms.values()), median(decode.values()), curve);
    }

    private static double per1000(long count, long frames) {
        return frames == 0 ? Double.NaN : count * 1000.0 / frames;
    }

    private static double median(java.util.Collection<Double> values) {
        double[] v = values.stream().mapToDouble(Double::doubleValue).filter(d -> !Double.isNaN(d)).toArray();
        if (v.length == 0) {
            return Double.NaN;
        }
        Arrays.sort(v);
        int m = v.length / 2;
        return v.length % 2 == 1 ? v[m] : (v[m - 1] + v[m]) / 2;
    }
}
