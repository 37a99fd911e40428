package org.modetrail.tracking;

import java.util.ArrayList;
import java.util.List;

import org.modetrail.model.Box;
import org.modetrail.video.Frame;

/**
 * Several objects over the same frames, one {@link MeanShiftTracker} state each, with a guard against two tracks
 * collapsing onto one object when similar objects cross: the tracks are solved one after another, the most
 * confident of the previous frame first, and none may settle on a box another holds: in this frame for those
 * solved before it, in the last frame for the others ({@link MeanShiftTracker#track(Frame, List)}). Greedy
 * ordering by confidence is common practice with no single source; a lost track stays lost and holds no box.
 */
public final class MultiObjectTracker {
    private final TrackerConfig config;
    private final List<MeanShiftTracker> trackers = new ArrayList<>();
    private final List<TrackStep> last = new ArrayList<>();

    public MultiObjectTracker(TrackerConfig config) {
        this.config = config;
    }

    /** Starts one track per box on the same frame; track i follows {@code boxes.get(i)}. */
    public void start(Frame frame, List<Box> boxes) {
        trackers.clear();
        last.clear();
        for (Box b : boxes) {
            MeanShiftTracker t = new MeanShiftTracker(config);
            t.start(frame, b);
            trackers.add(t);
            last.add(new TrackStep(frame.index(), b, 1, TrackStatus.TRACKED));
        }
    }

    /** One step for every track; element i is track i's result (LOST tracks repeat their last step). */
    public List<TrackStep> track(Frame frame) {
        int n = trackers.size();
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (a, b) -> Double.compare(confidence(b), confidence(a)));
        TrackStep[] out = new TrackStep[n];
        List<Box> claimed = new ArrayList<>(n);
        for (int i : order) {
            MeanShiftTracker t = trackers.get(i);
            if (t.isLost()) {
                out[i] = last.get(i);
                continue;
            }
            // Tracks solved before this one hold their box in this frame, the others still their last frame's.
            claimed.clear();
            for (int j = 0; j < n; j++) {
                TrackStep held = out[j] != null ? out[j] : last.get(j);
                if (j != i && !trackers.get(j).isLost() && held.status().found()) {
                    claimed.add(held.box());
                }
            }
            TrackStep s = t.track(frame, claimed);
            out[i] = s;
        }
        last.clear();
        for (TrackStep s : out) {
            last.add(s);
        }
        return List.of(out);
    }

    private double confidence(int i) {
        TrackStep s = last.get(i);
        return s.status().found() ? s.similarity() : -1;
    }

    public int size() {
        return trackers.size();
    }
}
