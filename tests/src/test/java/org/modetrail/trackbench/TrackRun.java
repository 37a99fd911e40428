package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.modetrail.model.Box;

/**
 * One tracker over one clip from the truth box of object 0 on frame 0 (a single keyframe, no re-initialisation):
 * the boxes it gave, its score and the time of each {@link BoxTracker#track} call.
 *
 * @param tracker name of the tracker
 * @param clip    name of the clip
 * @param boxes   per frame (frame 0 is the start box)
 * @param score   OTB figures against the truth
 * @param nanos   time of each track() call while the tracker was {@linkplain BoxTracker#working() working}, in frame
 *                order; conversion into the tracker's image type not included
 */
public record TrackRun(String tracker, String clip, List<Box> boxes, TrackScore score, long[] nanos) {

    public static TrackRun of(BoxTracker tracker, BenchClip clip) {
        int n = clip.frameCount();
        int[] rgb = new int[clip.width() * clip.height()];
        List<TruthBox> truth = new ArrayList<>(n);
        List<Box> boxes = new ArrayList<>(n);
        long[] nanos = new long[n - 1];
        int timed = 0;
        clip.render(0, rgb);
        tracker.load(rgb, clip.width(), clip.height());
        TruthBox first = clip.truth(0);
        tracker.start(first.box());
        truth.add(first);
        boxes.add(first.box());
        for (int f = 1; f < n; f++) {
            clip.render(f, rgb);
            tracker.load(rgb, clip.width(), clip.height());
            boolean working = tracker.working();
            long t0 = System.nanoTime();
            Box b = tracker.track();
            long t1 = System.nanoTime();
            if (working) {
                nanos[timed++] = t1 - t0;
            }
            boxes.add(b);
            truth.add(clip.truth(f));
        }
        return new TrackRun(tracker.name(), clip.name(), List.copyOf(boxes), TrackMetrics.score(boxes, truth, 0),
                Arrays.copyOf(nanos, timed));
    }

    /** Median time of one track() call in milliseconds. */
    public double medianMillis() {
        if (nanos.length == 0) {
            return Double.NaN;
        }
        long[] sorted = nanos.clone();
        Arrays.sort(sorted);
        int m = sorted.length / 2;
        double median = sorted.length % 2 == 1 ? sorted[m] : (sorted[m - 1] + sorted[m]) / 2.0;
        return median / 1e6;
    }
}
