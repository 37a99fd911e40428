package org.modetrail.evaluation;

/**
 * How tracks are compared with the truth.
 *
 * @param iouThreshold a track box and a truth box may be matched when their IoU is at least this (CLEAR MOT,
 *                     identity measures and the mostly tracked / lost counts); in (0, 1], default 0.5, the
 *                     PASCAL VOC overlap criterion (Everingham et al. 2010) that MOTChallenge uses too
 */
public record EvaluationConfig(double iouThreshold) {
    public static final double DEFAULT_IOU = 0.5;

    public EvaluationConfig {
        if (!(iouThreshold > 0 && iouThreshold <= 1)) {
            throw new IllegalArgumentException("the IoU threshold must be above 0 and at most 1, got " + iouThreshold);
        }
    }

    public static EvaluationConfig defaults() {
        return new EvaluationConfig(DEFAULT_IOU);
    }
}
