package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * Target localisation by kernel mean shift, as in Comaniciu, Ramesh and Meer, "Kernel-based object tracking", PAMI
 * 2003, section 4 (the algorithm of section 4.2; equation numbers of that paper are quoted from memory):
 * <ol>
 * <li>at the start y0, the candidate p_u(y0) and rho = sum sqrt(p_u(y0) q_u) (equation 17);</li>
 * <li>pixel weights w_i = sqrt(q_u / p_u(y0)) for the bin u of pixel i (equation 25);</li>
 * <li>the new location y1 = sum x_i w_i g_i / sum w_i g_i (equation 26), which for the Epanechnikov profile,
 * whose derivative is constant, is the weighted mean of the pixel positions inside the ellipse;</li>
 * <li>while rho(y1) &lt; rho(y0), y1 = (y0 + y1) / 2 (step halving, a bounded number of times);</li>
 * <li>stop when |y1 - y0| &lt; epsilon, else start again from y1, at most {@code maxIterations} times.</li>
 * </ol>
 * With background weighting the weights use the corrected model q' of Ning et al. (see
 * {@link BackgroundWeightedModel}) while rho is measured against the plain model q.
 *
 * <p>No allocation per iteration: the candidate histograms are two buffers swapped between steps, and positions
 * are plain numbers until the result.
 */
final class MeanShiftLocalizer {
    private static final int MAX_HALVINGS = 4;

    private KernelHistogram current;
    private KernelHistogram next;
    private final int maxIterations;
    private final double epsilon;
    /** sqrt(q'_u / p_u(y0)) per bin, filled for the bins of the current candidate only. */
    private final float[] binWeight;

    /** The weighted mean found by the last {@link #weightedMean} call. */
    private double meanX;
    private double meanY;
    /** Outcome of the last {@link #localize} call. */
    double similarity;
    int iterations;

    MeanShiftLocalizer(int binCount, int maxIterations, double epsilon) {
        this.current = new KernelHistogram(binCount);
        this.next = new KernelHistogram(binCount);
        this.maxIterations = maxIterations;
        this.epsilon = epsilon;
        this.binWeight = new float[binCount];
    }

    /** The candidate histogram at the last returned location (valid until the next call). */
    KernelHistogram candidate() {
        return current;
    }

    /**
     * Climbs from {@code start} to the nearest mode of the similarity surface; the box keeps its size.
     *
     * @param weightModel q' for the weights (or q without background weighting)
     * @param model       q, against which rho is measured
     */
    Box localize(BinImage image, Box start, float[] weightModel, float[] model) {
        double w = start.width();
        double h = start.height();
        double cx = start.centreX();
        double cy = start.centreY();
        current.compute(image, cx, cy, w, h);
        double rho0 = current.bhattacharyya(model);
        iterations = 0;
        while (iterations < maxIterations) {
            iterations++;
            if (!weightedMean(image, cx, cy, w, h, weightModel)) {
                break;
            }
            double nx = meanX;
            double ny = meanY;
            next.compute(image, nx, ny, w, h);
            double rho1 = next.bhattacharyya(model);
            for (int k = 0; k < MAX_HALVINGS && rho1 < rho0; k++) {
                nx = (cx + nx) / 2;
                ny = (cy + ny) / 2;
                next.compute(image, nx, ny, w, h);
                rho1 = next.bhattacharyya(model);
            }
            if (rho1 < rho0) {
                break; // no better place along the step: stay at the mode found
            }
            double shift = Math.hypot(nx - cx, ny - cy);
            KernelHistogram t = current;
            current = next;
            next = t;
            cx = nx;
            cy = ny;
            rho0 = rho1;
            if (shift < epsilon) {
                break;
            }
        }
        similarity = rho0;
        return start.centreX() == cx && start.centreY() == cy ? start : Box.centredAt(cx, cy, w, h);
    }

    /** Equation 26 with the Epanechnikov kernel: the mean of pixel positions weighted by sqrt(q'_u / p_u(y0)). */
    private boolean weightedMean(BinImage image, double cx, double cy, double width, double height,
                                 float[] weightModel) {
        double ax = width / 2;
        double ay = height / 2;
        double invAx2 = 1 / (ax * ax);
        double invAy2 = 1 / (ay * ay);
        int xa = image.firstColumn(cx - ax);
        int xb = image.endColumn(cx + ax);
        int ya = image.firstRow(cy - ay);
        int yb = image.endRow(cy + ay);
        int[] bins = image.raw();
        int stride = image.width();
        float[] p = current.values;
        // One square root per bin present rather than per pixel: the same pixels made the candidate, so every
        // bin met below is among them.
        for (int k = 0; k < current.touchedCount; k++) {
            int u = current.touched[k];
            binWeight[u] = (float) Math.sqrt(weightModel[u] / p[u]);
        }
        double sw = 0;
        double sx = 0;
        double sy = 0;
        for (int y = ya; y < yb; y++) {
            double dy = y + 0.5 - cy;
            double ry = dy * dy * invAy2;
            if (ry >= 1) {
                continue;
            }
            int row = (y - image.y0()) * stride - image.x0();
            double rowW = 0;
            double rowX = 0;
            for (int x = xa; x < xb; x++) {
                double dx = x + 0.5 - cx;
                if (dx * dx * invAx2 + ry < 1) {
                    float w = binWeight[bins[row + x]];
                    rowW += w;
                    rowX += w * dx;
                }
            }
            sw += rowW;
            sx += rowX;
            sy += rowW * dy;
        }
        if (sw <= 0) {
            return false;
        }
        meanX = cx + sx / sw;
        meanY = cy + sy / sw;
        return true;
    }
}
