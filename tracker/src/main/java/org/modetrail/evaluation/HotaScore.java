package org.modetrail.evaluation;

/**
 * The HOTA figures ({@link Hota}), each the mean over the localisation thresholds alpha = 0.05, 0.10, ..., 0.95,
 * with the per-threshold values beside them.
 *
 * @param hota  higher order tracking accuracy, sqrt(DetA x AssA)
 * @param detA  detection accuracy, TP / (TP + FN + FP)
 * @param assA  association accuracy
 * @param locA  localisation accuracy, mean IoU of the true positives
 * @param hotaByAlpha HOTA at each alpha (19 values)
 * @param detAByAlpha DetA at each alpha
 * @param assAByAlpha AssA at each alpha
 */
public record HotaScore(double hota, double detA, double assA, double locA, double[] hotaByAlpha,
                        double[] detAByAlpha, double[] assAByAlpha) {
    public HotaScore {
        hotaByAlpha = hotaByAlpha.clone();
        detAByAlpha = detAByAlpha.clone();
        assAByAlpha = assAByAlpha.clone();
    }

    @Override
    public double[] hotaByAlpha() {
        return hotaByAlpha.clone();
    }

    @Override
    public double[] detAByAlpha() {
        return detAByAlpha.clone();
    }

    @Override
    public double[] assAByAlpha() {
        return assAByAlpha.clone();
    }
}
