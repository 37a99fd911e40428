package org.modetrail.evaluation;

import java.util.List;

/**
 * Every figure of one comparison of tracks with a ground truth. Two annotators' files of the same video are
 * compared the same way: one of them is taken as the truth.
 *
 * @param config       how the comparison was made
 * @param truthObjects ids in the truth
 * @param trackObjects ids in the tracks
 * @param singleObject per truth object, the track of the same id against it
 * @param clearMot     CLEAR MOT
 * @param identity     IDF1 and its parts
 * @param hota         HOTA and its parts
 */
public record EvaluationResult(EvaluationConfig config, int truthObjects, int trackObjects,
                               List<SingleObjectScore> singleObject, ClearMotScore clearMot, IdentityScore identity,
                               HotaScore hota) {
    public EvaluationResult {
        singleObject = List.copyOf(singleObject);
    }

    /** All measures of {@code tracks} against {@code truth}. */
    public static EvaluationResult of(Annotations truth, Annotations tracks, EvaluationConfig config) {
        return new EvaluationResult(config, truth.ids().size(), tracks.ids().size(),
                SingleObjectEvaluation.scores(truth, tracks), ClearMot.score(truth, tracks, config.iouThreshold()),
                IdentityMeasures.score(truth, tracks, config.iouThreshold()), Hota.score(truth, tracks));
    }

    /**
     * The success plot over all scored frames of all objects together (frames weigh the same, whichever object),
     * t = 0, 0.05, ..., 1; zeros when no frame was scored.
     */
    public double[] pooledSuccessCurve() {
        return pooled(true);
    }

    /** The precision plot over all scored frames of all objects together, d = 0 to 50 px. */
    public double[] pooledPrecisionCurve() {
        return pooled(false);
    }

    /** Frames scored by the single-object figures, over all objects. */
    public int framesScored() {
        int n = 0;
        for (SingleObjectScore s : singleObject) {
            n += s.framesScored();
        }
        return n;
    }

    private double[] pooled(boolean success) {
        double[] out = new double[success ? SingleObjectEvaluation.SUCCESS_POINTS
                : SingleObjectEvaluation.PRECISION_POINTS];
        int frames = framesScored();
        if (frames == 0) {
            return out;
        }
        for (SingleObjectScore s : singleObject) {
            double[] c = success ? s.successCurve() : s.precisionCurve();
            for (int i = 0; i < out.length; i++) {
                out[i] += c[i] * s.framesScored() / frames;
            }
        }
        return out;
    }
}
