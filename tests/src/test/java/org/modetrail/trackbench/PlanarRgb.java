package org.modetrail.trackbench;

import boofcv.struct.image.GrayU8;
import boofcv.struct.image.Planar;

/** Packed {@code 0xFFRRGGBB} pixels into a 3-band RGB {@code Planar<GrayU8>} (band 0 red), into its own buffers. */
final class PlanarRgb {
    private PlanarRgb() {
    }

    static void fill(Planar<GrayU8> image, int[] rgb, int width, int height) {
        byte[] r = image.getBand(0).data;
        byte[] g = image.getBand(1).data;
        byte[] b = image.getBand(2).data;
        for (int y = 0; y < height; y++) {
            int src = y * width;
            int dst = image.getBand(0).startIndex + y * image.getBand(0).stride;
            for (int x = 0; x < width; x++) {
                int p = rgb[src + x];
                r[dst + x] = (byte) (p >>> 16);
                g[dst + x] = (byte) (p >>> 8);
                b[dst + x] = (byte) p;
            }
        }
    }
}
