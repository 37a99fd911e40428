package org.modetrail.evaluation;

/**
 * The CLEAR MOT figures ({@link ClearMot}).
 *
 * @param mota             multiple object tracking accuracy, 1 - (misses + false positives + switches) / truth
 *                         boxes; NaN without truth boxes
 * @param motp             multiple object tracking precision: mean IoU of the matched pairs; NaN without matches
 * @param truthBoxes       truth boxes over all frames
 * @param trackBoxes       track boxes over all frames
 * @param matches          matched pairs over all frames
 * @param misses           truth boxes with no match (false negatives)
 * @param falsePositives   track boxes with no match
 * @param idSwitches       times a truth object was matched to another track than the one it was last matched to
 * @param truthObjects     truth ids
 * @param mostlyTracked    truth objects matched on at least 80% of their frames
 * @param partiallyTracked truth objects matched on 20% to 80% of their frames
 * @param mostlyLost       truth objects matched on less than 20% of their frames
 */
public record ClearMotScore(double mota, double motp, int truthBoxes, int trackBoxes, int matches, int misses,
                            int falsePositives, int idSwitches, int truthObjects, int mostlyTracked,
                            int partiallyTracked, int mostlyLost) {
}
