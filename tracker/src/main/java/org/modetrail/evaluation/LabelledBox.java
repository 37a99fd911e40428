package org.modetrail.evaluation;

import org.modetrail.model.Box;

/**
 * One box of a track or of the ground truth on one frame, as the evaluation reads them.
 *
 * @param id      the track (or truth object) id
 * @param frame   0-based frame
 * @param box     the box in pixels
 * @param visible how much of the object is visible, 0 to 1 (1 where the file says nothing)
 */
public record LabelledBox(int id, int frame, Box box, double visible) {
    public LabelledBox {
        if (frame < 0) {
            throw new IllegalArgumentException("frame must be 0 or more, got " + frame);
        }
        if (box == null) {
            throw new IllegalArgumentException("a labelled box needs its box");
        }
        if (!(visible >= 0 && visible <= 1)) {
            throw new IllegalArgumentException("visible must be between 0 and 1, got " + visible);
        }
    }

    public LabelledBox(int id, int frame, Box box) {
        this(id, frame, box, 1);
    }
}
