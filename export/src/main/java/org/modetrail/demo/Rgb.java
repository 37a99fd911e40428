package org.modetrail.demo;

/** Packing of 8-bit colour channels into the {@code 0x00RRGGBB} ints the frame buffers hold. */
public final class Rgb {

    private Rgb() {
    }

    public static int pack(int r, int g, int b) {
        return (clamp(r) << 16) | (clamp(g) << 8) | clamp(b);
    }

    /** Rounds and clamps; the renderers compute shading in floating point. */
    public static int pack(double r, double g, double b) {
        return pack((int) Math.round(r), (int) Math.round(g), (int) Math.round(b));
    }

    public static int red(int rgb) {
        return (rgb >>> 16) & 0xFF;
    }

    public static int green(int rgb) {
        return (rgb >>> 8) & 0xFF;
    }

    public static int blue(int rgb) {
        return rgb & 0xFF;
    }

    /** Every channel multiplied by {@code factor}: shading of a face or a shadow on the ground. */
    public static int scale(int rgb, double factor) {
        return pack(red(rgb) * factor, green(rgb) * factor, blue(rgb) * factor);
    }

    /** Every channel moved by {@code delta}: grain that changes brightness but not hue. */
    public static int offset(int rgb, int delta) {
        return pack(red(rgb) + delta, green(rgb) + delta, blue(rgb) + delta);
    }

    /** Linear blend, {@code t = 0} gives {@code a}. */
    public static int mix(int a, int b, double t) {
        return pack(red(a) + (red(b) - red(a)) * t,
                green(a) + (green(b) - green(a)) * t,
                blue(a) + (blue(b) - blue(a)) * t);
    }

    public static int clamp(int v) {
        return v < 0 ? 0 : Math.min(v, 255);
    }
}
