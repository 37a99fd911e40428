package org.modetrail.demo.scenario;

/**
 * How bodies cast shadows on the floor: one light for the whole scene.
 *
 * @param dx       offset of a shadow away from the light along x, as a share of the body's half-height
 * @param dy       along y
 * @param darkness light taken at the shadow's core, 0..0.7; 0 for no shadows
 */
record SoftShadows(double dx, double dy, double darkness) {

    static final SoftShadows NONE = new SoftShadows(0, 0, 0);

    SoftShadows {
        if (!(darkness >= 0 && darkness <= 0.7) || !Double.isFinite(dx) || !Double.isFinite(dy)) {
            throw new IllegalArgumentException("shadow darkness must be 0..0.7, got " + darkness);
        }
    }
}
