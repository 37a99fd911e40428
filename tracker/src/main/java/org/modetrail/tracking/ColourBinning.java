package org.modetrail.tracking;

/**
 * How a colour maps to a histogram bin: the feature space of the target model. A strategy, so the tracker does
 * not change when the feature space does.
 */
public interface ColourBinning {
    /** Number of bins, m in Comaniciu et al. */
    int binCount();

    /** The bin of a packed 0xAARRGGBB pixel (alpha ignored), b(x) in Comaniciu et al. */
    int binOf(int rgb);

    /**
     * Fills {@code bins[i]} with the bin of {@code rgb[offset + ...]} for a rectangle, row by row: the one pass over
     * the pixels that the tracker makes per frame. Implementations may override with something faster.
     */
    default void binRegion(int[] rgb, int stride, int x0, int y0, int w, int h, int[] bins) {
        int k = 0;
        for (int y = y0; y < y0 + h; y++) {
            int row = y * stride;
            for (int x = x0; x < x0 + w; x++) {
                bins[k++] = binOf(rgb[row + x]);
            }
        }
    }
}
