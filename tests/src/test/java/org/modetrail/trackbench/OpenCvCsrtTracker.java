package org.modetrail.trackbench;

import org.bytedeco.opencv.opencv_tracking.TrackerCSRT;
import org.bytedeco.opencv.opencv_video.Tracker;

/**
 * Peer tracker: OpenCV's CSRT, the discriminative correlation filter with channel and spatial reliability of
 * Lukezic, Vojir, Cehovin Zajc, Matas and Kristan, "Discriminative correlation filter with channel and spatial
 * reliability" (CVPR 2017), from the contrib tracking module through JavaCPP's opencv preset
 * ({@code TrackerCSRT.create()}). Settings: the library's defaults (from memory: HOG, colour-names and grey features, the
 * spatial reliability mask, a scale search), on 8-bit BGR.
 */
public final class OpenCvCsrtTracker extends OpenCvTrackerAdapter {
    @Override
    public String name() {
        return "OpenCV CSRT";
    }

    @Override
    Tracker create() {
        return TrackerCSRT.create();
    }
}
