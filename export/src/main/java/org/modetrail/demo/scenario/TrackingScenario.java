package org.modetrail.demo.scenario;

/**
 * A short synthetic clip that exercises one tracking difficulty, with exact ground truth for every frame. Any frame
 * can be rendered on its own, in any order, and always comes out the same.
 */
public interface TrackingScenario {

    /**
     * The difficulty exercised; a scenario of the family ({@link ScenarioFamily}) gives the single-difficulty kind
     * nearest its situation ({@link FamilyKind#nearest()}), and its {@link #name()} says which it is.
     */
    ScenarioKind kind();

    /** Name for file names and table rows: the kind's slug, and for a family scenario {@code KIND-SEED}. */
    default String name() {
        return kind().slug();
    }

    int width();

    int height();

    int fps();

    int frameCount();

    /** Objects with ground truth: 1, or 2 for {@link ScenarioKind#CROSSING}; 2 to 8 in the family. */
    int objectCount();

    /**
     * Renders {@code frame} into {@code rgb}: row-major ({@code rgb[y * width + x]}), packed {@code 0xFFRRGGBB} with
     * opaque alpha, as Modetrail's video layer delivers frames. The buffer is reused; nothing is allocated per pixel.
     *
     * @throws IllegalArgumentException when the frame is out of range or the buffer has the wrong size
     */
    void render(int frame, int[] rgb);

    /**
     * Ground truth of {@code object} in {@code frame}; object 0 is the target a single-object tracker starts on.
     *
     * @throws IllegalArgumentException when the object or frame is out of range
     */
    ScenarioBox truth(int object, int frame);
}
