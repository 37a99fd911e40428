package org.modetrail.app.bench;

import java.util.Arrays;

/**
 * Median and 90th percentile of repeated measurements. Medians, not means: on a shared two-core machine one
 * pass that lands on someone else's build should not move the figure.
 */
public record Summary(int count, double median, double p90, double min, double max) {

    public static Summary of(double... values) {
        if (values.length == 0) {
            throw new IllegalArgumentException("no measurements to summarise");
        }
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        return new Summary(sorted.length, percentile(sorted, 50), percentile(sorted, 90), sorted[0],
                sorted[sorted.length - 1]);
    }

    /** Linear interpolation between closest ranks, so the median of an even count is the mean of the middle two. */
    static double percentile(double[] sorted, double p) {
        if (sorted.length == 1) {
            return sorted[0];
        }
        double rank = p / 100 * (sorted.length - 1);
        int lo = (int) Math.floor(rank);
        int hi = Math.min(lo + 1, sorted.length - 1);
        return sorted[lo] + (rank - lo) * (sorted[hi] - sorted[lo]);
    }

    /**
     * The median of paired ratios {@code a[i] / b[i]}: each pair was measured back to back, so a slow spell of the
     * machine hits both sides of a pair and cancels out, which a ratio of two medians would not do.
     */
    public static double medianRatio(double[] a, double[] b) {
        if (a.length != b.length || a.length == 0) {
            throw new IllegalArgumentException("ratios need the same, non-zero number of measurements on each side");
        }
        double[] r = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = a[i] / b[i];
        }
        return of(r).median();
    }
}
