package org.modetrail.trackbench;

import boofcv.abst.tracker.ConfigTrackerTld;
import boofcv.factory.tracker.FactoryTrackerObjectQuad;
import boofcv.struct.image.GrayU8;

/**
 * Peer tracker: BoofCV's TLD, tracking-learning-detection of Kalal, Mikolajczyk and Matas, "Tracking-learning-
 * detection" (IEEE TPAMI 2012), through {@code FactoryTrackerObjectQuad.tld} on grey 8-bit images. Settings: the
 * library's defaults ({@code new ConfigTrackerTld()}). It reports failure when neither its tracker nor its
 * detector finds the object, and may detect it again later: such frames have no box.
 */
public final class BoofTldTracker extends BoofGrayTracker {
    public BoofTldTracker() {
        super(FactoryTrackerObjectQuad.tld(new ConfigTrackerTld(), GrayU8.class));
    }

    @Override
    public String name() {
        return "BoofCV TLD";
    }
}
