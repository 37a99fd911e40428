package org.modetrail.demo;

import java.util.List;

/**
 * One animal of the arena: an elliptical body with a darker head end.
 *
 * @param trackId       1-based identity in the ground truth
 * @param bodyColour    packed RGB of the body
 * @param headColour    packed RGB of the head end
 * @param semiLength    half the body length in pixels (along the heading)
 * @param semiWidth     half the body width in pixels
 * @param cruiseSpeed   typical speed in pixels per second
 */
record Animal(int trackId, int bodyColour, int headColour, double semiLength, double semiWidth, double cruiseSpeed) {

    static final String CLASS = "animal";

    Animal {
        if (!(semiWidth > 0 && semiLength >= semiWidth)) {
            throw new IllegalArgumentException("body must be at least as long as it is wide");
        }
        if (!(cruiseSpeed > 0)) {
            throw new IllegalArgumentException("cruise speed must be positive");
        }
    }

    /**
     * The three animals: reddish, bluish and yellowish so that colour histograms separate them, of different sizes
     * (about 44, 38 and 34 px long at 480 lines) and temperaments.
     */
    static List<Animal> cast(double scale) {
        return List.of(
                new Animal(1, Rgb.pack(196, 72, 58), Rgb.pack(120, 40, 36), 22 * scale, 11 * scale, 70 * scale),
                new Animal(2, Rgb.pack(62, 98, 196), Rgb.pack(34, 52, 120), 19 * scale, 10 * scale, 90 * scale),
                new Animal(3, Rgb.pack(222, 188, 54), Rgb.pack(150, 118, 30), 17 * scale, 8.5 * scale, 55 * scale));
    }
}
