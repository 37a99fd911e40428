package org.modetrail.demo.scenario;

/**
 * Global illumination as a gain per colour channel, eased from its start to its end value over the clip with a
 * smoothstep, so the change has no sudden onset a tracker could mistake for a cut.
 *
 * @param startRed   red gain at the first frame
 * @param startGreen green gain at the first frame
 * @param startBlue  blue gain at the first frame
 * @param endRed     red gain at the last frame
 * @param endGreen   green gain at the last frame
 * @param endBlue    blue gain at the last frame
 */
record Lighting(double startRed, double startGreen, double startBlue, double endRed, double endGreen,
                double endBlue) {

    static final Lighting CONSTANT = new Lighting(1, 1, 1, 1, 1, 1);

    Lighting {
        for (double g : new double[] {startRed, startGreen, startBlue, endRed, endGreen, endBlue}) {
            if (!(g > 0 && g <= 2)) {
                throw new IllegalArgumentException("channel gain must be in (0, 2], got " + g);
            }
        }
    }

    /**
     * Dims to {@code brightness} and moves from warm to cool: red and blue gains start {@code tint} apart one way
     * and end the same distance apart the other way, green keeping the brightness.
     */
    static Lighting dimmingAndCooling(double brightness, double tint) {
        return new Lighting(1 + tint, 1, 1 - tint, brightness * (1 - tint), brightness, brightness * (1 + tint));
    }

    boolean isConstant() {
        return equals(CONSTANT);
    }

    /** Gain of channel 0 (red), 1 (green) or 2 (blue) at clip position {@code t} in 0..1. */
    double gain(int channel, double t) {
        double e = t <= 0 ? 0 : t >= 1 ? 1 : t * t * (3 - 2 * t);
        return switch (channel) {
            case 0 -> startRed + (endRed - startRed) * e;
            case 1 -> startGreen + (endGreen - startGreen) * e;
            case 2 -> startBlue + (endBlue - startBlue) * e;
            default -> throw new IllegalArgumentException("channel must be 0..2, got " + channel);
        };
    }
}
