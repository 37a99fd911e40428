package org.modetrail.demo.scenario;

/**
 * One object of a family scenario: how it looks, where it is in every frame, and the shadow it casts.
 *
 * @param look   colour at each body point
 * @param track  pose per frame
 * @param shadow the soft shadow it casts on the floor
 */
record FamilyBody(BodyLook look, BodyTrack track, Shadow shadow) {

    /** The shadow a body casts on the floor, before the bodies are painted (so it falls under them). */
    enum Shadow {
        /** No shadow: a body lying flat on the floor. */
        NONE,
        /** A flat body a little above the floor: its own outline as a soft ellipse, offset away from the light. */
        BENEATH,
        /** An upright body: a low, wide soft ellipse at its feet, thrown a little sideways. */
        FEET
    }

    FamilyBody {
        if (look == null || track == null || shadow == null) {
            throw new IllegalArgumentException("a body needs a look, a track and a shadow style");
        }
    }
}
