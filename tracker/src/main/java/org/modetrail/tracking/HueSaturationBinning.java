package org.modetrail.tracking;

/**
 * Hue-saturation binning with a separate band of bins for dark and for unsaturated pixels, whose hue is
 * meaningless: a feature space that shrugs off brightness changes (shadows, lighting drift). Hue and saturation
 * follow the HSV definition (Smith, "Color gamut transform pairs", SIGGRAPH 1978). The bin of a colour is looked up
 * in a table over 15-bit RGB (5 bits per channel), so binning a pixel costs one table read.
 *
 * <p>{@link #defaults()}: 16 hue bins, 4 saturation bins for chromatic pixels, 4 value bins for grey ones.
 */
public final class HueSaturationBinning implements ColourBinning {
    /** Saturation under this, or value under {@link #MIN_VALUE}, counts as grey (common practice, no source). */
    private static final double MIN_SATURATION = 0.15;
    private static final double MIN_VALUE = 0.12;

    private final int hueBins;
    private final int saturationBins;
    private final int greyBins;
    /** The bin of every 15-bit colour, built once per instance and never changed. */
    private final short[] table;

    public HueSaturationBinning(int hueBins, int saturationBins, int greyBins) {
        if (hueBins < 2 || hueBins > 64 || saturationBins < 1 || saturationBins > 16 || greyBins < 1
                || greyBins > 16) {
            throw new IllegalArgumentException("hue bins 2-64, saturation bins 1-16, grey bins 1-16; got " + hueBins
                    + ", " + saturationBins + ", " + greyBins);
        }
        this.hueBins = hueBins;
        this.saturationBins = saturationBins;
        this.greyBins = greyBins;
        this.table = new short[1 << 15];
        for (int i = 0; i < table.length; i++) {
            table[i] = binOfComponents(((i >> 10) & 31) / 31.0, ((i >> 5) & 31) / 31.0, (i & 31) / 31.0);
        }
    }

    public static HueSaturationBinning defaults() {
        return new HueSaturationBinning(16, 4, 4);
    }

    @Override
    public int binCount() {
        return hueBins * saturationBins + greyBins;
    }

    @Override
    public int binOf(int rgb) {
        return table[((rgb >>> 9) & 0x7C00) | ((rgb >>> 6) & 0x3E0) | ((rgb >>> 3) & 0x1F)];
    }

    @Override
    public void binRegion(int[] rgb, int stride, int x0, int y0, int w, int h, int[] bins) {
        short[] t = table;
        int k = 0;
        for (int y = y0; y < y0 + h; y++) {
            int row = y * stride;
            for (int x = x0; x < x0 + w; x++) {
                int p = rgb[row + x];
                bins[k++] = t[((p >>> 9) & 0x7C00) | ((p >>> 6) & 0x3E0) | ((p >>> 3) & 0x1F)];
            }
        }
    }

    private short binOfComponents(double r, double g, double b) {
        double max = Math.max(r, Math.max(g, b));
        double min = Math.min(r, Math.min(g, b));
        double v = max;
        double s = max > 0 ? (max - min) / max : 0;
        if (s < MIN_SATURATION || v < MIN_VALUE) {
            return (short) (hueBins * saturationBins + Math.min(greyBins - 1, (int) (v * greyBins)));
        }
        double hue;
        double d = max - min;
        if (max == r) {
            hue = ((g - b) / d) / 6;
        } else if (max == g) {
            hue = ((b - r) / d + 2) / 6;
        } else {
            hue = ((r - g) / d + 4) / 6;
        }
        if (hue < 0) {
            hue += 1;
        }
        int hb = Math.min(hueBins - 1, (int) (hue * hueBins));
        int sb = Math.min(saturationBins - 1, (int) ((s - MIN_SATURATION) / (1 - MIN_SATURATION) * saturationBins));
        return (short) (hb * saturationBins + sb);
    }

    @Override
    public String toString() {
        return "HueSaturationBinning[" + hueBins + " hues x " + saturationBins + " saturations + " + greyBins
                + " greys]";
    }
}
