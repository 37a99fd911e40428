package org.modetrail.trackbench;

import boofcv.abst.tracker.TrackerObjectQuad;
import boofcv.struct.image.GrayU8;

/**
 * A BoofCV tracker on grey 8-bit images (Circulant and TLD take grey only). The grey level is the ITU-R BT.601
 * luma, 0.299 R + 0.587 G + 0.114 B, in integers (as OpenCV's {@code cvtColor(..., COLOR_BGR2GRAY)} computes it).
 */
abstract class BoofGrayTracker extends BoofQuadAdapter<GrayU8> {
    private GrayU8 image;

    BoofGrayTracker(TrackerObjectQuad<GrayU8> tracker) {
        super(tracker);
    }

    @Override
    GrayU8 image() {
        return image;
    }

    @Override
    public void load(int[] rgb, int width, int height) {
        if (image == null || image.width != width || image.height != height) {
            image = new GrayU8(width, height);
        }
        byte[] data = image.data;
        for (int y = 0; y < height; y++) {
            int src = y * width;
            int dst = image.startIndex + y * image.stride;
            for (int x = 0; x < width; x++) {
                int p = rgb[src + x];
                int luma = (299 * ((p >>> 16) & 0xFF) + 587 * ((p >>> 8) & 0xFF) + 114 * (p & 0xFF) + 500) / 1000;
                data[dst + x] = (byte) luma;
            }
        }
    }
}
