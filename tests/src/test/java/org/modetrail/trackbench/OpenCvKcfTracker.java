package org.modetrail.trackbench;

import org.bytedeco.opencv.opencv_tracking.TrackerKCF;
import org.bytedeco.opencv.opencv_video.Tracker;

/**
 * Peer tracker: OpenCV's KCF, the kernelized correlation filter of Henriques, Caseiro, Martins and Batista,
 * "High-speed tracking with kernelized correlation filters" (IEEE TPAMI 2015), from the contrib tracking module
 * through JavaCPP's opencv preset ({@code TrackerKCF.create()}). Settings: the library's defaults (from memory: grey and
 * colour-names features, a fixed box size), on 8-bit BGR.
 */
public final class OpenCvKcfTracker extends OpenCvTrackerAdapter {
    @Override
    public String name() {
        return "OpenCV KCF";
    }

    @Override
    Tracker create() {
        return TrackerKCF.create();
    }
}
