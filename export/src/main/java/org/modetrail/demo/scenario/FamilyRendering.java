package org.modetrail.demo.scenario;

/**
 * Which layers a family scenario renders. Every clip uses {@link #FULL}; tests turn layers off to tell an object's
 * pixels from the rest exactly (a flat floor, no noise, no shadows, no blur).
 *
 * @param texture  the floor's texture and blotches; off, the floor is {@link ScenarioConfig#FLAT_FLOOR}
 * @param noise    per-frame sensor noise
 * @param blur     motion blur; off, every body is painted at its pose of the frame alone
 * @param shadows  the bodies' shadows on the floor
 * @param lighting the lighting drift and the band of shade
 */
record FamilyRendering(boolean texture, boolean noise, boolean blur, boolean shadows, boolean lighting) {

    static final FamilyRendering FULL = new FamilyRendering(true, true, true, true, true);
    /** Flat floor, no noise, no blur, no shadows, no light change: each body's pixels exactly. */
    static final FamilyRendering BARE = new FamilyRendering(false, false, false, false, false);

    FamilyRendering withBlur(boolean on) {
        return new FamilyRendering(texture, noise, on, shadows, lighting);
    }
}
