package org.modetrail.tracking;

/**
 * How much more often each colour bin occurs on the target than around it: c_u = max(0, (q_u - o_u) / (q_u + o_u)),
 * 1 for colours only on the target, 0 for colours at least as common in the background. Back-projected, it is a
 * map of object-like pixels, used for the wide search (where a mean-shift window cannot reach) and for the
 * moment-based size estimate. The contrast form of the colour likelihood ratio is common practice with no single
 * source; the back-projection idea is that of Swain and Ballard, "Color indexing", IJCV 1991.
 */
final class ColourLikelihood {
    final float[] perBin;
    private final int[] set;
    private int setCount;

    ColourLikelihood(int binCount) {
        perBin = new float[binCount];
        set = new int[binCount];
    }

    /** Recomputes the table from the plain target model and the background histogram. */
    void update(KernelHistogram target, float[] background) {
        for (int k = 0; k < setCount; k++) {
            perBin[set[k]] = 0;
        }
        setCount = 0;
        float[] q = target.values;
        for (int k = 0; k < target.touchedCount; k++) {
            int u = target.touched[k];
            float o = background[u];
            float c = (q[u] - o) / (q[u] + o);
            if (c > 0) {
                perBin[u] = c;
                set[setCount++] = u;
            }
        }
    }
}
