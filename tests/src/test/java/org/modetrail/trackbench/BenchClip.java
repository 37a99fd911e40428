package org.modetrail.trackbench;

/**
 * A rendered test clip with truth, as the harness sees it: the generator's tracking scenarios
 * ({@link ScenarioClips}) and the harness's own stand-in ({@link StandInClip}) both look like this.
 */
public interface BenchClip {
    String name();

    int width();

    int height();

    int frameCount();

    /** Draws frame {@code frame} into {@code rgb} (packed 0xFFRRGGBB, row-major, width * height). */
    void render(int frame, int[] rgb);

    /** The truth of object 0 (the one tracked) on {@code frame}. */
    TruthBox truth(int frame);
}
