package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * The target model with the corrected background-weighted histogram (CBWH) of Ning, Zhang, Zhang and Wu, "Robust
 * mean-shift tracking with corrected background-weighted histogram", IET Computer Vision 6(1), 2012.
 *
 * <p>The background histogram o_u is taken from a ring around the target box (the box doubled in width and height,
 * minus the box: three times its area). Colours common in the background are played down by
 * v_u = min(o* / o_u, 1), o* the smallest non-zero o_u; the target model becomes q'_u = C' v_u q_u. The correction
 * of the paper is to transform only the target model, not the candidate, so the mean-shift weights become
 * w_i = sqrt(q'_u / p_u(y0)) and really favour what sets the target apart. The background is taken anew when its
 * Bhattacharyya coefficient with the stored one falls under a threshold (the paper's background update).
 *
 * <p>Departure from the paper: the background ring is weighted uniformly (the paper does the same; the kernel
 * profile applies only inside the target's ellipse), and v_u for colours absent from the background is 1.
 */
final class BackgroundWeightedModel {
    /** Plain target model q_u: what similarity is reported against. */
    final KernelHistogram target;
    /** The background-weighted target model q'_u used for the mean-shift weights. */
    final float[] weighted;
    /** Background histogram o_u (normalised, uniform weights over the ring). */
    final KernelHistogram background;
    private final KernelHistogram freshBackground;
    /** The bins of {@link #weighted} that are set, to clear them without a pass over every bin. */
    private final int[] weightedBins;
    private int weightedCount;
    private final boolean enabled;

    BackgroundWeightedModel(int binCount, boolean enabled) {
        target = new KernelHistogram(binCount);
        weighted = new float[binCount];
        background = new KernelHistogram(binCount);
        freshBackground = new KernelHistogram(binCount);
        weightedBins = new int[binCount];
        this.enabled = enabled;
    }

    /** Builds q, o and q' from the box on the current bin image. */
    void build(BinImage image, Box box) {
        target.compute(image, box);
        ring(image, box, background);
        reweight();
    }

    /** Takes the background ring around {@code box} on the current frame, without adopting it yet. */
    float[] sampleBackground(BinImage image, Box box) {
        ring(image, box, freshBackground);
        return freshBackground.values;
    }

    /**
     * Adopts the last sampled background (and re-derives q') when it differs from the stored one, Bhattacharyya
     * coefficient under {@code threshold}: the background update of Ning et al. Returns whether it did.
     */
    boolean adoptSampledBackground(double threshold) {
        if (!enabled) {
            return false;
        }
        double rho = freshBackground.bhattacharyya(background.values);
        if (rho >= threshold) {
            return false;
        }
        background.copyFrom(freshBackground);
        reweight();
        return true;
    }

    /** Blends the plain target model towards a candidate: q = (1 - a) q + a p, then re-derives q'. */
    void blend(KernelHistogram candidate, double rate) {
        float keep = (float) (1 - rate);
        float take = (float) rate;
        float[] q = target.values;
        for (int k = 0; k < target.touchedCount; k++) {
            q[target.touched[k]] *= keep;
        }
        for (int k = 0; k < candidate.touchedCount; k++) {
            int u = candidate.touched[k];
            if (q[u] == 0) {
                target.touched[target.touchedCount++] = u;
            }
            q[u] += take * candidate.values[u];
        }
        reweight();
    }

    private void reweight() {
        float[] q = target.values;
        for (int k = 0; k < weightedCount; k++) {
            weighted[weightedBins[k]] = 0;
        }
        weightedCount = 0;
        float[] o = background.values;
        float oStar = Float.MAX_VALUE;
        for (int k = 0; k < background.touchedCount; k++) {
            float v = o[background.touched[k]];
            if (v > 0 && v < oStar) {
                oStar = v;
            }
        }
        double sum = 0;
        for (int k = 0; k < target.touchedCount; k++) {
            int u = target.touched[k];
            float v = !enabled || o[u] <= 0 ? 1f : Math.min(oStar / o[u], 1f);
            weighted[u] = v * q[u];
            weightedBins[weightedCount++] = u;
            sum += weighted[u];
        }
        if (sum > 0) {
            float inv = (float) (1 / sum);
            for (int k = 0; k < weightedCount; k++) {
                weighted[weightedBins[k]] *= inv;
            }
        }
    }

    /** Uniform histogram of the ring between {@code box} and the box twice its size, normalised. */
    static void ring(BinImage image, Box box, KernelHistogram out) {
        out.clear();
        float[] values = out.values;
        int ix0 = (int) Math.floor(box.x());
        int iy0 = (int) Math.floor(box.y());
        int ix1 = (int) Math.ceil(box.right());
        int iy1 = (int) Math.ceil(box.bottom());
        int ox0 = image.firstColumn(box.centreX() - box.width());
        int oy0 = image.firstRow(box.centreY() - box.height());
        int ox1 = image.endColumn(box.centreX() + box.width());
        int oy1 = image.endRow(box.centreY() + box.height());
        int[] bins = image.raw();
        int stride = image.width();
        int count = 0;
        for (int y = oy0; y < oy1; y++) {
            int row = (y - image.y0()) * stride - image.x0();
            boolean insideRows = y >= iy0 && y < iy1;
            for (int x = ox0; x < ox1; x++) {
                if (insideRows && x >= ix0 && x < ix1) {
                    x = ix1 - 1; // skip the box itself
                    continue;
                }
                int u = bins[row + x];
                if (values[u] == 0) {
                    out.touched[out.touchedCount++] = u;
                }
                values[u] += 1;
                count++;
            }
        }
        out.mass = count;
        if (count > 0) {
            float inv = 1f / count;
            for (int k = 0; k < out.touchedCount; k++) {
                values[out.touched[k]] *= inv;
            }
        }
    }
}
