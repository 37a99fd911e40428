package org.modetrail.summary;

import java.util.List;
import java.util.Map;

/**
 * What a track did, for the summary table: its time span, its path, its speeds (when the ground is calibrated),
 * the time it spent in each zone and the counting lines it crossed.
 *
 * @param boxedFrames       frames with a box (keyframe, tracked or interpolated)
 * @param durationS         from the first boxed frame's time to the end of the last one (one frame's duration added)
 * @param pathLengthPx      along the ground contact point in the image, between consecutive boxed frames
 * @param pathLengthM       along the smoothed ground path between consecutive frames, NaN without a calibration
 * @param meanSpeedMs       mean of the smoothed speeds, NaN without a calibration
 * @param peakSpeedMs       the largest smoothed speed, NaN without a calibration
 * @param peakSpeedSigmaMs  the standard uncertainty of that peak speed
 * @param peakLeftOut       frames with a speed that the peak leaves out ({@link TrackSummaries#PEAK_MAX_RELATIVE_SIGMA}:
 *                          interpolated boxes, and speeds whose uncertainty is too large for a peak); 0 without a
 *                          calibration
 * @param secondsInZone     per zone name (in the project's order), seconds the contact point was inside
 */
public record TrackSummary(int trackId, String className, int firstFrame, int lastFrame, int boxedFrames,
                           double durationS, double pathLengthPx, double pathLengthM, double meanSpeedMs,
                           double peakSpeedMs, double peakSpeedSigmaMs, int peakLeftOut,
                           Map<String, Double> secondsInZone,
                           List<LineCrossing> crossings) {
    public TrackSummary {
        secondsInZone = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(secondsInZone));
        crossings = List.copyOf(crossings);
    }

    /** How many times the track crossed counting line {@code line} in direction {@code d}. */
    public long crossingCount(String line, CrossingDirection d) {
        return crossings.stream().filter(c -> c.line().equals(line) && c.direction() == d).count();
    }
}
