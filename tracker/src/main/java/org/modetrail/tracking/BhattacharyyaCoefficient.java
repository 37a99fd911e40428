package org.modetrail.tracking;

/**
 * The Bhattacharyya coefficient between two discrete distributions, rho = sum over bins of sqrt(p_u q_u)
 * (Comaniciu, Ramesh and Meer, "Kernel-based object tracking", PAMI 2003, equation 17). It is 1 for identical
 * normalised histograms and 0 for disjoint ones; the corresponding distance is sqrt(1 - rho) (equation 18).
 */
public final class BhattacharyyaCoefficient {
    private BhattacharyyaCoefficient() {
    }

    /** Over all bins; both histograms normalised to sum 1. */
    public static double of(float[] p, float[] q) {
        double rho = 0;
        for (int u = 0; u < p.length; u++) {
            rho += Math.sqrt((double) p[u] * q[u]);
        }
        return rho;
    }

    /**
     * Over only the bins listed in {@code bins[0..count)}: a target of a few thousand pixels fills a few hundred of
     * 4096 bins, and the terms of the others are zero.
     */
    public static double overBins(float[] p, float[] q, int[] bins, int count) {
        double rho = 0;
        for (int k = 0; k < count; k++) {
            int u = bins[k];
            rho += Math.sqrt((double) p[u] * q[u]);
        }
        return rho;
    }

    /** The distance d = sqrt(1 - rho) of equation 18. */
    public static double distance(double rho) {
        return Math.sqrt(Math.max(0, 1 - rho));
    }
}
