package org.modetrail.evaluation;

/**
 * How well one track follows the truth object of the same id ({@link SingleObjectEvaluation}).
 *
 * @param id                   the truth object's id (the track with the same id is scored)
 * @param framesScored         truth frames scored (those at least half visible)
 * @param successAuc           area under the success plot: the mean of {@link #successCurve()}
 * @param precisionAt20        fraction of scored frames with the centres at most 20 px apart
 * @param successAt50          fraction of scored frames whose IoU is above 0.5 (the success plot at 0.5)
 * @param framesUntilFailure   scored frames before the first with no overlap (all of them when none)
 * @param successCurve         fraction of scored frames with IoU above t, for t = 0, 0.05, ..., 1 (21 values)
 * @param precisionCurve       fraction of scored frames with centre error at most d px, for d = 0, 1, ..., 50
 */
public record SingleObjectScore(int id, int framesScored, double successAuc, double precisionAt20,
                                double successAt50, int framesUntilFailure, double[] successCurve,
                                double[] precisionCurve) {
    public SingleObjectScore {
        successCurve = successCurve.clone();
        precisionCurve = precisionCurve.clone();
    }

    @Override
    public double[] successCurve() {
        return successCurve.clone();
    }

    @Override
    public double[] precisionCurve() {
        return precisionCurve.clone();
    }
}
