package org.modetrail.summary;

/**
 * A track's path on the ground, as the calibration code computes it: per frame with a box, the smoothed position in
 * metres and the speed with its standard uncertainty (NaN where no speed could be computed, as at the ends of a
 * short run). All arrays have the same length and follow {@code frames}, which is increasing.
 */
public record GroundPath(int trackId, int[] frames, double[] xM, double[] yM, double[] speedMs,
                         double[] speedSigmaMs) {
    public GroundPath {
        int n = frames.length;
        if (xM.length != n || yM.length != n || speedMs.length != n || speedSigmaMs.length != n) {
            throw new IllegalArgumentException("a ground path's arrays must all have " + n + " entries");
        }
        for (int i = 1; i < n; i++) {
            if (frames[i] <= frames[i - 1]) {
                throw new IllegalArgumentException("a ground path's frames must increase, found " + frames[i - 1]
                        + " then " + frames[i]);
            }
        }
    }
}
