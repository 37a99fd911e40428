package org.modetrail.demo.scenario;

/**
 * The colour of a body at a point given relative to it: {@code nu} along its heading and {@code nv} across it, both
 * in -1..1, and {@code q} the superellipse value of {@link Pose} (0 at the centre, 1 at the rim). Painting and the
 * patterns live in body coordinates, so a pattern turns and scales with its body.
 */
interface BodyLook {

    /** Packed {@code 0x00RRGGBB}; a function of the body point only, the same in every frame. */
    int colour(double nu, double nv, double q);
}
