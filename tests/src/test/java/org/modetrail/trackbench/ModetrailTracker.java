package org.modetrail.trackbench;

import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStatus;
import org.modetrail.tracking.TrackStep;
import org.modetrail.tracking.TrackerConfig;
import org.modetrail.video.Frame;

/**
 * Modetrail's kernel mean-shift tracker with its default {@link TrackerConfig}. Its own pixel layout, so loading only
 * wraps the array in a {@link Frame}. After it reports {@link TrackStatus#LOST} it is not restarted (one keyframe,
 * as for the references): its last box stands for the rest of the clip.
 */
public final class ModetrailTracker implements BoxTracker {
    private final TrackerConfig config;
    private final String label;
    private MeanShiftTracker tracker;
    private Frame frame;
    private int index;
    private Box last;
    private boolean lost;

    public ModetrailTracker() {
        this(TrackerConfig.defaults());
    }

    public ModetrailTracker(TrackerConfig config) {
        this(config, "Modetrail");
    }

    /** A variant of the settings, named for the benchmark's table of settings. */
    public ModetrailTracker(TrackerConfig config, String label) {
        this.config = config;
        this.label = label;
    }

    TrackerConfig config() {
        return config;
    }

    @Override
    public String name() {
        return label;
    }

    @Override
    public void load(int[] rgb, int width, int height) {
        frame = new Frame(index++, 0, width, height, rgb);
    }

    @Override
    public void start(Box box) {
        tracker = new MeanShiftTracker(config);
        tracker.start(frame, box);
        last = box;
        lost = false;
    }

    @Override
    public boolean working() {
        return !lost;
    }

    @Override
    public Box track() {
        if (!lost) {
            TrackStep step = tracker.track(frame);
            last = step.box();
            lost = step.status() == TrackStatus.LOST;
        }
        return last;
    }
}
