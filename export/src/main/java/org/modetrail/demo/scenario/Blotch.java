package org.modetrail.demo.scenario;

import org.modetrail.demo.NoiseHash;

/**
 * A stain on the floor, of an object's size and colour family: the distractor of {@link ScenarioKind#CLUTTER}. Its
 * outline is an ellipse with a wavy edge (up to {@value #WOBBLE} of the radius in or out), and it is mottled.
 *
 * @param cx     centre x
 * @param cy     centre y
 * @param rx     semi-axis along {@code angle}
 * @param ry     semi-axis across it
 * @param angle  orientation in radians
 * @param colour packed {@code 0x00RRGGBB} mean colour before mottling
 * @param seed   shapes the edge and the mottling
 */
record Blotch(double cx, double cy, double rx, double ry, double angle, int colour, long seed) {

    static final double WOBBLE = 0.2;
    /** Relative radius within which a point is inside the blotch whatever its edge does. */
    static final double CORE = 1 - WOBBLE - 0.05;

    Blotch {
        if (!(rx > 0 && ry > 0)) {
            throw new IllegalArgumentException("blotch must have positive radii");
        }
    }

    /** Distance of the centre of pixel (i, j) from the blotch centre, relative to the ellipse (1 on it). */
    double radial(int i, int j) {
        double dx = i + 0.5 - cx;
        double dy = j + 0.5 - cy;
        double c = StrictMath.cos(angle);
        double s = StrictMath.sin(angle);
        double u = (dx * c + dy * s) / rx;
        double v = (-dx * s + dy * c) / ry;
        return Math.sqrt(u * u + v * v);
    }

    /** Relative radius of the wavy edge in the direction of pixel (i, j). */
    double edge(int i, int j) {
        double dx = i + 0.5 - cx;
        double dy = j + 0.5 - cy;
        double a = StrictMath.atan2(dy / ry, dx / rx);
        return 1 + WOBBLE * NoiseHash.valueNoise(seed, 3 + 1.7 * StrictMath.cos(a), 3 + 1.7 * StrictMath.sin(a));
    }

    /** True for pixels surely inside the blotch, away from its edge: where tests measure its colour. */
    boolean core(int i, int j) {
        return radial(i, j) < CORE;
    }

    /** Half-size of a box around the centre surely holding the blotch. */
    double reach() {
        return Math.max(rx, ry) * (1 + WOBBLE) + 2;
    }
}
