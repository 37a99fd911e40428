package org.modetrail.tracking;

/**
 * Uniform RGB binning with the same number of levels per channel. {@link #COMANICIU} is the 16x16x16 = 4096 bins of
 * Comaniciu, Ramesh and Meer's experiments (PAMI 2003, section 6); {@link #DEFAULT} is 32x32x32, which the tracking
 * benchmark prefers (finer bins tell apart similar objects and clutter of the target's hue).
 */
public record RgbBinning(int bitsPerChannel) implements ColourBinning {

    public static final RgbBinning COMANICIU = new RgbBinning(4);
    public static final RgbBinning DEFAULT = new RgbBinning(5);

    public RgbBinning {
        if (bitsPerChannel < 1 || bitsPerChannel > 6) {
            throw new IllegalArgumentException("bits per channel must be 1 to 6, got " + bitsPerChannel);
        }
    }

    @Override
    public int binCount() {
        return 1 << (3 * bitsPerChannel);
    }

    @Override
    public int binOf(int rgb) {
        int drop = 8 - bitsPerChannel;
        int r = (rgb >>> 16 & 0xFF) >>> drop;
        int g = (rgb >>> 8 & 0xFF) >>> drop;
        int b = (rgb & 0xFF) >>> drop;
        return (r << (2 * bitsPerChannel)) | (g << bitsPerChannel) | b;
    }
}
