package org.modetrail.trackbench;

/**
 * How well one run followed one object.
 *
 * @param successAuc         OTB success-plot area, 0..20/21 (see {@link TrackMetrics#successAuc})
 * @param precision20        fraction of scored frames with centre error at most 20 px
 * @param framesUntilFailure frames tracked after the start frame before the first failure (IoU 0 on a frame where
 *                           the object is visible); all tracked frames when it never failed
 * @param trackedFrames      frames after the start frame
 * @param scoredFrames       of those, frames whose truth is at least half visible
 */
public record TrackScore(double successAuc, double precision20, int framesUntilFailure, int trackedFrames,
        int scoredFrames) {
}
