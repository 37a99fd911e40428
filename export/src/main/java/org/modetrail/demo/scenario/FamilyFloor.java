package org.modetrail.demo.scenario;

import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * The floor of a family scenario, painted once: colours packed {@code 0x00RRGGBB}, before lighting and noise.
 *
 * @param style   the kind of floor
 * @param base    its main colour
 * @param accent  its second colour: grout and chips, the far end of a gradient, the verge beside a road
 * @param cell    tile or paving stone size in px, or the road's half-width at the bottom row
 * @param vanishX road only: the vanishing point's x
 * @param vanishY road only: the vanishing point's y (the horizon)
 */
record FamilyFloor(Style style, int base, int accent, double cell, double vanishX, double vanishY) {

    /** The floors real clips show under tracked objects. */
    enum Style {
        /** Square tiles with grout lines, a tint per tile, wear and grain. */
        TILES,
        /** Terrazzo-like: a mottled ground with small dark and light chips. */
        SPECKLE,
        /** A smooth fall of light from one side to the other, as under a lamp, with a fine grain. */
        GRADIENT,
        /** Staggered rectangular paving stones, each its own tint, with dark joints. */
        PAVING,
        /** A pale floor with strong fine grain and fibres, as paper or a bench top under a camera. */
        PALE_NOISY,
        /** Asphalt with dashed lane lines converging to a vanishing point, verges beside it, a far wall above. */
        ROAD
    }

    FamilyFloor {
        if (style == null || !(cell > 4)) {
            throw new IllegalArgumentException("floor needs a style and a cell over 4 px, got " + cell);
        }
    }

    /** Paints the floor into {@code out}, row-major {@code width x height}. */
    void paint(int[] out, int width, int height, long seed) {
        for (int j = 0; j < height; j++) {
            for (int i = 0; i < width; i++) {
                out[j * width + i] = switch (style) {
                    case TILES -> tiles(i, j, seed);
                    case SPECKLE -> speckle(i, j, seed);
                    case GRADIENT -> gradient(i, j, width, height, seed);
                    case PAVING -> paving(i, j, seed);
                    case PALE_NOISY -> paleNoisy(i, j, seed);
                    case ROAD -> road(i, j, height, seed);
                };
            }
        }
    }

    private int tiles(int i, int j, long seed) {
        int t = (int) cell;
        int grout = Math.max(1, (int) Math.round(cell / 40));
        double shade = 6 * NoiseHash.signed(seed ^ 0x711EL, i / t, j / t)
                + 9 * NoiseHash.valueNoise(seed ^ 0x3EA8L, i / 44.0, j / 44.0)
                + 4 * NoiseHash.valueNoise(seed ^ 0x3EA9L, i / 9.0, j / 9.0)
                + 4 * NoiseHash.signed(seed ^ 0x96A1L, i, j);
        if (i % t < grout || j % t < grout) {
            return Rgb.offset(accent, (int) Math.round(shade / 2));
        }
        return Rgb.offset(base, (int) Math.round(shade));
    }

    private int speckle(int i, int j, long seed) {
        double shade = 7 * NoiseHash.valueNoise(seed ^ 0x3EA8L, i / 50.0, j / 50.0)
                + 4 * NoiseHash.signed(seed ^ 0x96A1L, i, j);
        long h = NoiseHash.hash(seed ^ 0x5EC1L, i / 2, j / 2);
        double u = NoiseHash.unit(h);
        if (u < 0.07) {
            return Rgb.offset(accent, (int) Math.round(shade));
        }
        if (u < 0.12) {
            return Rgb.offset(base, (int) Math.round(shade + 38));
        }
        return Rgb.offset(base, (int) Math.round(shade));
    }

    private int gradient(int i, int j, int width, int height, long seed) {
        double angle = 2 * Math.PI * NoiseHash.unit(NoiseHash.mix(seed ^ 0x6AD1L));
        double along = ((i - width / 2.0) * StrictMath.cos(angle) + (j - height / 2.0) * StrictMath.sin(angle))
                / Math.hypot(width, height) + 0.5;
        double t = Math.max(0, Math.min(1, along));
        int c = Rgb.mix(base, accent, t * t * (3 - 2 * t));
        double shade = 3 * NoiseHash.valueNoise(seed ^ 0x3EA9L, i / 12.0, j / 12.0)
                + 3 * NoiseHash.signed(seed ^ 0x96A1L, i, j);
        return Rgb.offset(c, (int) Math.round(shade));
    }

    private int paving(int i, int j, long seed) {
        int h = (int) Math.round(cell / 2);
        int row = Math.floorDiv(j, h);
        int shifted = i + (row % 2 == 0 ? 0 : (int) cell / 2);
        int col = Math.floorDiv(shifted, (int) cell);
        double tint = NoiseHash.unit(NoiseHash.hash(seed ^ 0x9A71L, col, row));
        int c = Rgb.mix(base, accent, 0.45 * tint);
        double shade = 5 * NoiseHash.valueNoise(seed ^ 0x3EA8L, i / 7.0, j / 7.0)
                + 5 * NoiseHash.signed(seed ^ 0x96A1L, i, j)
                + 6 * NoiseHash.valueNoise(seed ^ 0x3EAAL, i / 60.0, j / 60.0);
        int inRow = j - row * h;
        int inCol = shifted - col * (int) cell;
        if (inRow < 2 || inCol < 2) {
            shade -= 34;
        } else if (inRow < 3 || inCol < 3) {
            shade -= 10;
        }
        return Rgb.offset(c, (int) Math.round(shade));
    }

    private int paleNoisy(int i, int j, long seed) {
        double shade = 8 * NoiseHash.valueNoise(seed ^ 0x3EA8L, i / 30.0, j / 30.0)
                + 6 * NoiseHash.valueNoise(seed ^ 0xF1BEL, i / 2.5, j / 9.0)
                + 11 * NoiseHash.signed(seed ^ 0x96A1L, i, j);
        return Rgb.offset(base, (int) Math.round(shade));
    }

    private int road(int i, int j, int height, long seed) {
        double grain = 5 * NoiseHash.signed(seed ^ 0x96A1L, i, j);
        if (j + 0.5 <= vanishY + 1) {
            // The far side: a wall of the verge's colour, darker and mottled, no detail that would look like a body.
            double shade = -25 + 8 * NoiseHash.valueNoise(seed ^ 0x3EA8L, i / 40.0, j / 15.0);
            return Rgb.offset(accent, (int) Math.round(shade + grain));
        }
        // Ground coordinates: depth 1 / (j - horizon), across = (i - vanishing x) times that depth.
        double below = j + 0.5 - vanishY;
        double scale = (height - vanishY) / below;
        double across = (i + 0.5 - vanishX) * scale;
        double shade = 6 * NoiseHash.valueNoise(seed ^ 0x3EA8L, across / 30.0, scale * 4) + grain;
        if (Math.abs(across) > cell) {
            return Rgb.offset(accent, (int) Math.round(shade));
        }
        double line = 5;
        double lanes = cell / 2;
        boolean edge = Math.abs(Math.abs(across) - (cell - 2 * line)) < line;
        double toLane = Math.abs(across - Math.round(across / lanes) * lanes);
        boolean dash = toLane < line / 2 && Math.abs(across) < cell - 3 * line
                && ((scale * 6) % 2) < 1;
        if (edge || dash) {
            return Rgb.offset(Rgb.pack(214, 212, 200), (int) Math.round(grain));
        }
        return Rgb.offset(base, (int) Math.round(shade));
    }
}
