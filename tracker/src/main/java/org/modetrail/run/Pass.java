package org.modetrail.run;

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

    void feed(Frame frame) {
        int n = frame.index();
        if (n == start) {
            tracker = new MeanShiftTracker(config);
            tracker.start(frame, startBox);
            finished = start == stop;
            return;
        }
        if (tracker == null) {
            return; // the start frame was unreadable: nothing to track from
        }
        TrackStep step = tracker.track(frame);
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

    boolean finished() {
        return finished;
    }

    /** Frames this pass would visit, for progress. */
    int length() {
        return Math.abs(stop - start);
    }
}
