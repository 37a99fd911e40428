package org.modetrail.trackbench;

/**
 * A generated clip with truth for every object, as the benchmark report sees it: the generator's tracking scenarios
 * and the scenario family both look like this ({@link ScenarioMultiClip}).
 */
public interface MultiClip {
    /** Unique within a clip set, for file names and progress lines, e.g. {@code translation-s101}. */
    String name();

    int width();

    int height();

    int fps();

    int frameCount();

    int objectCount();

    /** Draws {@code frame} into {@code rgb} (packed 0xFFRRGGBB, row-major, width * height). */
    void render(int frame, int[] rgb);

    /**
     * The truth of {@code object} on {@code frame}; a box of no area when the object is out of the frame, and
     * {@code visible} the fraction of its whole body that is seen (inside the frame and not covered).
     */
    TruthBox truth(int object, int frame);
}
