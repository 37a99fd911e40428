package org.modetrail.trackbench;

import boofcv.abst.tracker.ConfigCirculantTracker;
import boofcv.factory.tracker.FactoryTrackerObjectQuad;
import boofcv.struct.image.GrayU8;

/**
 * Peer tracker: BoofCV's Circulant tracker, the correlation filter with kernels on circulant matrices of Henriques,
 * Caseiro, Martins and Batista, "Exploiting the circulant structure of tracking-by-detection with kernels" (ECCV
 * 2012), through {@code FactoryTrackerObjectQuad.circulant} on grey 8-bit images. Settings: the library's defaults
 * ({@code new ConfigCirculantTracker()}); it keeps the start box's size.
 */
public final class BoofCirculantTracker extends BoofGrayTracker {
    public BoofCirculantTracker() {
        super(FactoryTrackerObjectQuad.circulant(new ConfigCirculantTracker(), GrayU8.class));
    }

    @Override
    public String name() {
        return "BoofCV Circulant";
    }
}
