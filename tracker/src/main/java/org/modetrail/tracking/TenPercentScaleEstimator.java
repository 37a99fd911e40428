package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * The scale adaptation of Comaniciu, Ramesh and Meer, "Kernel-based object tracking", PAMI 2003, section 5 (from
 * memory): the localisation is run with the kernel bandwidth h_prev and with h_prev +- 10%; the bandwidth h_opt that
 * gives the largest Bhattacharyya coefficient is smoothed as h_new = gamma h_opt + (1 - gamma) h_prev with
 * gamma = 0.1. Width and height scale together. The paper notes that the coefficient tends to favour the smaller
 * window in uniform regions, so the window shrinks by itself; the benchmark shows it.
 */
final class TenPercentScaleEstimator {
    private static final double[] FACTORS = {0.9, 1.1};
    private static final double GAMMA = 0.1;

    private TenPercentScaleEstimator() {
    }

    /** Returns the localised box with its smoothed size; {@code localized} is the result at the current size. */
    static Box adapt(MeanShiftLocalizer localizer, BinImage image, Box start, Box localized, double rho,
                     float[] weightModel, float[] model) {
        Box best = localized;
        double bestRho = rho;
        double bestFactor = 1;
        for (double f : FACTORS) {
            Box trial = localizer.localize(image, start.resized(start.width() * f, start.height() * f),
                    weightModel, model);
            if (localizer.similarity > bestRho) {
                bestRho = localizer.similarity;
                best = trial;
                bestFactor = f;
            }
        }
        double factor = GAMMA * bestFactor + (1 - GAMMA);
        localizer.similarity = bestRho;
        return Box.centredAt(best.centreX(), best.centreY(), start.width() * factor, start.height() * factor);
    }
}
