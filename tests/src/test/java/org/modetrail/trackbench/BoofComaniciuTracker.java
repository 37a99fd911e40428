package org.modetrail.trackbench;

import boofcv.abst.tracker.ConfigComaniciu2003;
import boofcv.abst.tracker.TrackerObjectQuad;
import boofcv.factory.tracker.FactoryTrackerObjectQuad;
import boofcv.struct.image.GrayU8;
import boofcv.struct.image.ImageType;
import boofcv.struct.image.Planar;
import georegression.struct.shapes.Quadrilateral_F64;
import org.modetrail.model.Box;

/**
 * Reference tracker: BoofCV's implementation of Comaniciu, Ramesh and Meer (PAMI 2003), the paper Modetrail's
 * tracker implements, through {@code FactoryTrackerObjectQuad.meanShiftComaniciu2003} on a 3-band RGB
 * {@code Planar<GrayU8>}. Settings: scale estimation on ({@code new ConfigComaniciu2003(true)}, which sets
 * scaleChange = 0.1, the paper's +-10%) and 16 bins per band (16^3, as the paper and Modetrail use); everything else
 * is BoofCV's default. The box is the axis-aligned bounds of the quadrilateral it reports; when it reports failure
 * the last box stands.
 */
public final class BoofComaniciuTracker implements BoxTracker {
    private final TrackerObjectQuad<Planar<GrayU8>> tracker;
    private final Quadrilateral_F64 quad = new Quadrilateral_F64();
    private Planar<GrayU8> image;
    private Box last;

    public BoofComaniciuTracker() {
        ConfigComaniciu2003 config = new ConfigComaniciu2003(true);
        config.numHistogramBins = 16;
        tracker = FactoryTrackerObjectQuad.meanShiftComaniciu2003(config, ImageType.pl(3, GrayU8.class));
    }

    @Override
    public String name() {
        return "BoofCV Comaniciu2003";
    }

    @Override
    public void load(int[] rgb, int width, int height) {
        if (image == null || image.width != width || image.height != height) {
            image = new Planar<>(GrayU8.class, width, height, 3);
        }
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

    @Override
    public void start(Box box) {
        quad.a.setTo(box.x(), box.y());
        quad.b.setTo(box.right(), box.y());
        quad.c.setTo(box.right(), box.bottom());
        quad.d.setTo(box.x(), box.bottom());
        tracker.initialize(image, quad);
        last = box;
    }

    @Override
    public Box track() {
        if (tracker.process(image, quad)) {
            double x0 = Math.min(Math.min(quad.a.x, quad.b.x), Math.min(quad.c.x, quad.d.x));
            double x1 = Math.max(Math.max(quad.a.x, quad.b.x), Math.max(quad.c.x, quad.d.x));
            double y0 = Math.min(Math.min(quad.a.y, quad.b.y), Math.min(quad.c.y, quad.d.y));
            double y1 = Math.max(Math.max(quad.a.y, quad.b.y), Math.max(quad.c.y, quad.d.y));
            last = new Box(x0, y0, x1 - x0, y1 - y0);
        }
        return last;
    }
}
