package org.modetrail.demo;

/**
 * What goes into a rendered frame besides the objects themselves.
 *
 * @param texture     floor or ground texture (grain, blotches, markings); when off the background is the flat
 *                    colour {@link #FLAT_BACKGROUND}, so tests can tell object pixels from background exactly
 * @param sensorNoise amplitude in grey levels (0..32) of the per-frame noise added to every pixel, 0 for none
 * @param shadows     ground shadows under road users; they darken the ground but belong to no object
 */
public record RenderStyle(boolean texture, int sensorNoise, boolean shadows) {

    /** Pure green: no object colour in either scenario is exactly this value. */
    public static final int FLAT_BACKGROUND = 0x00FF00;

    public RenderStyle {
        if (sensorNoise < 0 || sensorNoise > 32) {
            throw new IllegalArgumentException("sensor noise must be 0..32 grey levels, got " + sensorNoise);
        }
    }

    /** Textured background, the given noise amplitude, shadows on: what the demo clips use. */
    public static RenderStyle standard(int sensorNoise) {
        return new RenderStyle(true, sensorNoise, true);
    }

    /** Flat background, no noise, no shadows: only the objects differ from {@link #FLAT_BACKGROUND}. */
    public static RenderStyle flat() {
        return new RenderStyle(false, 0, false);
    }
}
