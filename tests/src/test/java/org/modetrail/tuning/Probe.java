package org.modetrail.tuning;

import org.modetrail.model.Box;
import org.modetrail.tracking.MeanShiftTracker;
import org.modetrail.tracking.TrackStep;
import org.modetrail.tracking.TrackerConfig;
import org.modetrail.trackbench.BenchClip;
import org.modetrail.trackbench.TruthBox;
import org.modetrail.video.Frame;

/** Scratch: one tracker over a bench clip; a box only where the tracker found the object; OTB AUC with misses 0. */
final class Probe {
    record Result(double auc, int reacquired, int falseReacquired, int firstMiss) {
    }

    static Result run(TrackerConfig config, BenchClip clip) {
        int n = clip.frameCount();
        int[] rgb = new int[clip.width() * clip.height()];
        clip.render(0, rgb);
        MeanShiftTracker t = new MeanShiftTracker(config);
        t.start(new Frame(0, 0, clip.width(), clip.height(), rgb), clip.truth(0).box());
        double[] hits = new double[21];
        int scored = 0;
        int re = 0;
        int falseRe = 0;
        int firstMiss = -1;
        for (int f = 1; f < n; f++) {
            clip.render(f, rgb);
            Box b = null;
            if (!t.isLost()) {
                TrackStep s = t.track(new Frame(f, 0, clip.width(), clip.height(), rgb));
                if (s.status().found()) {
                    b = s.box();
                }
                TruthBox truth = clip.truth(f);
                if (s.status() == org.modetrail.tracking.TrackStatus.REACQUIRED) {
                    re++;
                    if (truth.visible() < 0.5 || b.iou(truth.box()) < 0.3) {
                        falseRe++;
                    }
                }
            }
            TruthBox truth = clip.truth(f);
            if (truth.visible() < 0.5) {
                continue;
            }
            double iou = b == null ? 0 : b.iou(truth.box());
            if (iou == 0 && firstMiss < 0) {
                firstMiss = f;
            }
            for (int i = 0; i < 21; i++) {
                if (iou > i / 20.0) {
                    hits[i]++;
                }
            }
            scored++;
        }
        double auc = 0;
        for (double h : hits) {
            auc += h / Math.max(1, scored);
        }
        return new Result(auc / 21, re, falseRe, firstMiss);
    }
}
