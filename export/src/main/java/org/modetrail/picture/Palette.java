package org.modetrail.picture;

/**
 * A colour-blind-safe palette of eight colours (Okabe and Ito, 2008, "Color Universal Design"): orange, sky blue,
 * bluish green, blue, vermilion, reddish purple, black, yellow. Yellow is moved last (the published order has it
 * fourth) because it is the one colour that is hard to see on a white plot background.
 */
public final class Palette {
    private static final int[] COLOURS = {
        0xE69F00, 0x56B4E9, 0x009E73, 0x0072B2, 0xD55E00, 0xCC79A7, 0x000000, 0xF0E442};

    private Palette() {
    }

    /** How many colours the palette has before it repeats. */
    public static int size() {
        return COLOURS.length;
    }

    /** The i-th colour (0xRRGGBB), repeating after {@link #size()}. */
    public static int colour(int i) {
        return COLOURS[Math.floorMod(i, COLOURS.length)];
    }
}
