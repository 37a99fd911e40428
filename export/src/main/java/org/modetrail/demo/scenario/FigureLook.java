package org.modetrail.demo.scenario;

import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * A body in colour zones across its length: for an upright figure a head, a top and a bottom (a person's face and
 * hair, coat, trousers), for a two-colour object its two halves. Zones sit at fixed fractions of the length, so they
 * turn and scale with the body; over them a domed shading, soft folds and a fine grain. Colours are packed
 * {@code 0x00RRGGBB}. The front end ({@code nu} near +1) is the head; an upright figure faces up the image.
 *
 * @param head      colour of the head zone (the face)
 * @param hair      colour of the crown, the upper 40 % of the head zone
 * @param headShare share of the length the head takes, 0..0.3; 0 for no head
 * @param top       colour from the head to {@code split}
 * @param bottom    colour behind {@code split}
 * @param split     where top meets bottom, -0.8..0.8 along the body
 * @param seed      places the folds and the grain
 */
record FigureLook(int head, int hair, double headShare, int top, int bottom, double split, long seed)
        implements BodyLook {

    private static final double GRAIN = 5;
    private static final double FOLDS = 9;

    FigureLook {
        if (!(headShare >= 0 && headShare <= 0.3) || !(split >= -0.8 && split <= 0.8)) {
            throw new IllegalArgumentException("head share must be 0..0.3 and split -0.8..0.8, got " + headShare
                    + " and " + split);
        }
    }

    /** Two halves of two colours, no head: the two-colour object. */
    static FigureLook halves(int front, int back, long seed) {
        return new FigureLook(front, front, 0, front, back, 0, seed);
    }

    @Override
    public int colour(double nu, double nv, double q) {
        double light = 0.72 + 0.28 * Math.sqrt(Math.max(0, 1 - q));
        int c;
        if (headShare > 0 && nu > 1 - 0.8 * headShare) {
            c = hair;
        } else if (headShare > 0 && nu > 1 - 2 * headShare) {
            c = head;
        } else {
            c = nu > split ? top : bottom;
        }
        // Folds run along the body (cloth hangs), grain cells are about 1/20 of the length by 1/8 of the width.
        double shade = FOLDS * NoiseHash.valueNoise(seed, nu * 2.5, nv * 4)
                + GRAIN * NoiseHash.signed(seed ^ 0x6EA1L, (long) Math.floor((nu + 1) * 10),
                (long) Math.floor((nv + 1) * 4));
        return Rgb.pack(Rgb.red(c) * light + shade, Rgb.green(c) * light + shade, Rgb.blue(c) * light + shade);
    }
}
