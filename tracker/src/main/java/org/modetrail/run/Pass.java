package org.modetrail.run;

import java.util.List;

import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStatus;
import org.modetrail.tracking.TrackStep;
import org.modetrail.tracking.TrackerConfig;
import org.modetrail.video.Frame;

/**
 * One tracker run from a keyframe towards another (or towards an end of the video): forward passes are fed frames
 * {@code start + 1 .. stop} in order, backward passes {@code start - 1 .. stop}. It records the frames it was sure of
 * and ends when the tracker loses the object or the stop frame is done.
 */
final class Pass {
    final int trackId;
    final int start;
    final int stop;
    final boolean forward;
    final PassResult result;
    private final Box startBox;
    private final TrackerConfig config;
    private MeanShiftTracker tracker;
    private boolean finished;
    private Box held;
    private double similarity = 1;

    Pass(int trackId, int start, Box startBox, int stop, boolean forward, TrackerConfig config) {
        this.trackId = trackId;
        this.start = start;
        this.startBox = startBox;
        this.stop = stop;
        this.forward = forward;
        this.config = config;
        this.result = forward ? new PassResult(start + 1, stop) : new PassResult(stop, start - 1);
    }

    /** Whether this pass wants {@code frame} (its start frame, to set up, or one it tracks). */
    boolean wants(int frame) {
        if (finished) {
            return false;
        }
        return forward ? frame >= start && frame <= stop : frame <= start && frame >= stop;
    }

    /**
     * Tracks {@code frame}, never settling on one of {@code claimed} (boxes other tracks hold in it). Afterwards
     * {@link #held()} is this pass's box in the frame, or null.
     */
    void feed(Frame frame, List<Box> claimed) {
        int n = frame.index();
        held = null;
        if (n == start) {
            tracker = new MeanShiftTracker(config);
            tracker.start(frame, startBox);
            finished = start == stop;
            held = startBox;
            similarity = 1;
            return;
        }
        if (tracker == null) {
            return; // the start frame was unreadable: nothing to track from
        }
        TrackStep step = tracker.track(frame, claimed);
        similarity = step.status().found() ? step.similarity() : -1;
        if (step.status().found()) {
            held = step.box();
        }
        if (step.status() == TrackStatus.TRACKED) {
            result.put(n, step.box(), step.similarity());
        } else if (step.status() == TrackStatus.REACQUIRED) {
            // Found again after a search: the box may be another object that looks like this one. Its uncertainty
            // is its own diagonal, so it is flagged for review and left out of peak speeds.
            result.put(n, step.box(), step.similarity(), Math.hypot(step.box().width(), step.box().height()));
        } else if (step.status() == TrackStatus.SEARCHING) {
            result.markSearching(n);
        }
        if (step.status() == TrackStatus.LOST || n == stop) {
            finished = true;
        }
    }

    /** This pass's box in the frame last fed, or null when it had none. */
    Box held() {
        return held;
    }

    /** The similarity of the frame last fed, -1 without a box: passes are fed the most confident first. */
    double confidence() {
        return similarity;
    }

    boolean finished() {
        return finished;
    }

    /** Frames this pass would visit, for progress. */
    int length() {
        return Math.abs(stop - start);
    }
}
