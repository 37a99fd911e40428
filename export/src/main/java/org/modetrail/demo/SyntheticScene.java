package org.modetrail.demo;

import java.util.List;

/** A generated scenario that renders any of its frames on demand, with that frame's ground truth. */
public interface SyntheticScene {

    int width();

    int height();

    int fps();

    int frameCount();

    /** True when the truth rows carry world coordinates and speeds. */
    boolean hasWorldCoordinates();

    /**
     * Renders {@code frame} into {@code rgb} (row-major, {@code rgb[y * width + x]}, packed {@code 0x00RRGGBB}) and
     * returns the ground truth of the objects seen in it. The same frame always renders to the same pixels.
     */
    List<TruthRow> render(int frame, int[] rgb);
}
