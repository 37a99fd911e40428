package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * The tracker's output for one frame.
 *
 * @param frame      the frame index
 * @param box        where the object is (for {@link TrackStatus#COASTING}, where it is predicted to be)
 * @param similarity Bhattacharyya coefficient between the target model and the candidate at {@code box}, 0..1
 * @param status     tracked, coasting or lost
 */
public record TrackStep(int frame, Box box, double similarity, TrackStatus status) {
}
