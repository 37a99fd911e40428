package org.modetrail.demo.scenario;

import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * What a tracked object looks like: a rounded-rectangle body (a superellipse of exponent 4) with a domed shading,
 * patches of a darker accent colour, one pale band and a fine grain. The pattern is fixed to the body in
 * coordinates relative to its size, so it turns with the body and scales with it, and the colour histogram stays
 * that of the same object when it approaches or recedes. Colours are packed {@code 0x00RRGGBB}.
 *
 * @param base        main body colour
 * @param accent      colour of the darker patches, about 30 % of the body
 * @param band        colour of the pale band
 * @param semiLength  half the body length in pixels at size 1 (along its heading)
 * @param semiWidth   half the body width in pixels at size 1
 * @param bandAcross  true for a band across the body, false for one along it: two looks of one colour family
 *                    can then differ in pattern as well as shade
 * @param seed        places the patches and the grain
 */
record ObjectLook(int base, int accent, int band, double semiLength, double semiWidth, boolean bandAcross,
                  long seed) implements BodyLook {

    /** Share of patch cells in the accent colour. */
    private static final double ACCENT_SHARE = 0.3;
    private static final double GRAIN = 7;

    ObjectLook {
        if (!(semiWidth > 0) || !(semiLength >= semiWidth)) {
            throw new IllegalArgumentException("body must be at least as long as it is wide, got " + semiLength
                    + " x " + semiWidth);
        }
    }

    /**
     * Colour at a body point given relative to the body ({@code nu, nv} in -1..1 along and across it) with
     * superellipse value {@code q} (0 at the centre, 1 at the rim).
     */
    @Override
    public int colour(double nu, double nv, double q) {
        // Lit from above: the middle of the dome is brighter than the rim.
        double light = 0.7 + 0.3 * Math.sqrt(1 - q);
        long cell = NoiseHash.hash(seed, (long) Math.floor((nu + 1) * 4), (long) Math.floor((nv + 1) * 3));
        int c = NoiseHash.unit(cell) < ACCENT_SHARE ? accent : base;
        double bandPos = bandAcross ? nu - 0.3 : nv + 0.1;
        if (Math.abs(bandPos) < 0.12) {
            c = band;
        }
        // Grain cells of about 2 x 2 px at size 1 on a 60 x 40 body, scaling with it.
        double grain = GRAIN * NoiseHash.signed(seed ^ 0x6EA1L, (long) Math.floor((nu + 1) * semiLength / 2),
                (long) Math.floor((nv + 1) * semiWidth / 2));
        return Rgb.pack(Rgb.red(c) * light + grain, Rgb.green(c) * light + grain, Rgb.blue(c) * light + grain);
    }
}
