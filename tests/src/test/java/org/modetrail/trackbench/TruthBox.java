package org.modetrail.trackbench;

import org.modetrail.model.Box;

/**
 * The truth for one object on one frame.
 *
 * @param box     where it is, in pixels (top-left origin)
 * @param visible fraction of the object that can be seen, 0..1
 */
public record TruthBox(Box box, double visible) {
    public TruthBox {
        if (box == null || !(visible >= 0 && visible <= 1)) {
            throw new IllegalArgumentException("truth needs a box and a visible fraction in 0..1, got " + visible);
        }
    }
}
