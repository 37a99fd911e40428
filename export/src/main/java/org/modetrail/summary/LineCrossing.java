package org.modetrail.summary;

/**
 * A track's ground contact point passing a counting line between two consecutive boxed frames.
 *
 * @param line      the counting line's name
 * @param frame     the first frame on the far side
 * @param timeS     that frame's presentation time
 * @param direction which way it went
 */
public record LineCrossing(String line, int frame, double timeS, CrossingDirection direction) {
}
