package org.modetrail.trackbench;

import boofcv.abst.tracker.ConfigComaniciu2003;
import boofcv.factory.tracker.FactoryTrackerObjectQuad;
import boofcv.struct.image.GrayU8;
import boofcv.struct.image.ImageType;
import boofcv.struct.image.Planar;

/**
 * Reference tracker: BoofCV's implementation of Comaniciu, Ramesh and Meer (PAMI 2003), the paper Modetrail's
 * tracker implements, through {@code FactoryTrackerObjectQuad.meanShiftComaniciu2003} on a 3-band RGB
 * {@code Planar<GrayU8>}. Settings: scale estimation on ({@code new ConfigComaniciu2003(true)}, which sets
 * scaleChange = 0.1, the paper's +-10%) and 16 bins per band (16^3, as the paper and Modetrail use); everything else
 * is BoofCV's default. The box is the axis-aligned bounds of the quadrilateral it reports; a frame on which it
 * reports failure ({@code process} returns false) gets no box ({@link BoofQuadAdapter}).
 */
public final class BoofComaniciuTracker extends BoofQuadAdapter<Planar<GrayU8>> {
    private Planar<GrayU8> image;

    public BoofComaniciuTracker() {
        super(FactoryTrackerObjectQuad.meanShiftComaniciu2003(config(), ImageType.pl(3, GrayU8.class)));
    }

    private static ConfigComaniciu2003 config() {
        ConfigComaniciu2003 config = new ConfigComaniciu2003(true);
        config.numHistogramBins = 16;
        return config;
    }

    @Override
    public String name() {
        return "BoofCV Comaniciu2003";
    }

    @Override
    Planar<GrayU8> image() {
        return image;
    }

    @Override
    public void load(int[] rgb, int width, int height) {
        if (image == null || image.width != width || image.height != height) {
            image = new Planar<>(GrayU8.class, width, height, 3);
        }
        PlanarRgb.fill(image, rgb, width, height);
    }
}
