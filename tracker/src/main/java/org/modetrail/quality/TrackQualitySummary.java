package org.modetrail.quality;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Track;

/**
 * The quality summary of a track: frames by source, the weakest spans, the frames where the box jumps or
 * changes size abruptly, and the spans where its size has drifted far from the user's boxes. The thresholds are common practice with no single source, and settings here.
 *
 * @param weakSimilarity tracked frames under this similarity make a weak span; default 0.7
 * @param jumpDiagonals  a centre moving more than this many box diagonals between consecutive frames is a jump;
 *                       default 0.5
 * @param sizeRatio      an area changing by more than this factor between consecutive frames is abrupt; default 1.3
 * @param driftRatio     tracked frames whose area is more than this factor from the nearest keyframe's, either way,
 *                       make a size drift; default 4 (the benchmark's test of a ballooned box: more than 4 times
 *                       the true area)
 * @param maxConcerns    at most this many concerns are listed; default 20
 */
public record TrackQualitySummary(double weakSimilarity, double jumpDiagonals, double sizeRatio, double driftRatio,
                                  int maxConcerns) {

    public TrackQualitySummary {
        if (!(weakSimilarity > 0 && weakSimilarity <= 1) || !(jumpDiagonals > 0) || !(sizeRatio > 1)
                || !(driftRatio > 1) || maxConcerns < 1) {
            throw new IllegalArgumentException("weak similarity in (0, 1], jump and size thresholds positive "
                    + "(size and drift above 1), at least one concern");
        }
    }

    public static TrackQualitySummary defaults() {
        return new TrackQualitySummary(0.7, 0.5, 1.3, 4, 20);
    }

    public TrackQuality of(Track track, int frameCount) {
        int keys = 0;
        int tracked = 0;
        int interpolated = 0;
        int marked = 0;
        double scoreSum = 0;
        List<Concern> concerns = new ArrayList<>();
        FrameAnnotation previous = null;
        int weakFrom = -1;
        double weakSum = 0;
        int weakCount = 0;
        for (FrameAnnotation a : track.frames().values()) {
            if (!a.isVisible()) {
                marked++;
            } else {
                switch (a.source()) {
                    case KEYFRAME -> keys++;
                    case TRACKED -> {
                        tracked++;
                        scoreSum += a.score();
                    }
                    case INTERPOLATED -> interpolated++;
                    default -> throw new IllegalStateException("unknown source " + a.source());
                }
            }
            boolean weak = a.isVisible() && a.source() == BoxSource.TRACKED && a.score() < weakSimilarity;
            boolean continues = weakFrom >= 0 && previous.frame() == a.frame() - 1;
            if (weakFrom >= 0 && !(weak && continues)) {
                concerns.add(new Concern(Concern.Kind.WEAK_SPAN, weakFrom, previous.frame(), weakSum / weakCount));
                weakFrom = -1;
                weakSum = 0;
                weakCount = 0;
            }
            if (weak) {
                if (weakFrom < 0) {
                    weakFrom = a.frame();
                }
                weakSum += a.score();
                weakCount++;
            }
            if (previous != null && previous.isVisible() && a.isVisible() && previous.frame() == a.frame() - 1) {
                Box p = previous.box();
                Box b = a.box();
                double diagonal = Math.hypot(p.width(), p.height());
                double moved = p.centreDistance(b) / diagonal;
                if (moved > jumpDiagonals) {
                    concerns.add(new Concern(Concern.Kind.JUMP, previous.frame(), a.frame(), moved));
                }
                double ratio = Math.max(b.area(), p.area()) / Math.max(1e-9, Math.min(b.area(), p.area()));
                if (ratio > sizeRatio) {
                    concerns.add(new Concern(Concern.Kind.SIZE_CHANGE, previous.frame(), a.frame(), ratio));
                }
            }
            previous = a;
        }
        if (weakFrom >= 0) {
            concerns.add(new Concern(Concern.Kind.WEAK_SPAN, weakFrom, previous.frame(), weakSum / weakCount));
        }
        addDrifts(track, concerns);
        concerns.sort(Comparator.comparing(Concern::kind).thenComparing(TrackQualitySummary::badness));
        List<Concern> top = concerns.subList(0, Math.min(maxConcerns, concerns.size()));
        int empty = frameCount - track.frames().size();
        return new TrackQuality(keys, tracked, interpolated, marked, empty, tracked > 0 ? scoreSum / tracked : 0,
                top);
    }

    /** Runs of consecutive tracked frames whose area is more than {@link #driftRatio} from the nearest keyframe's. */
    private void addDrifts(Track track, List<Concern> concerns) {
        List<FrameAnnotation> keys = track.keyframes().stream().filter(FrameAnnotation::isVisible).toList();
        if (keys.isEmpty()) {
            return;
        }
        int from = -1;
        int last = -1;
        double worst = 0;
        for (FrameAnnotation a : track.frames().values()) {
            double ratio = 0;
            if (a.isVisible() && a.source() == BoxSource.TRACKED) {
                FrameAnnotation key = keys.get(0);
                for (FrameAnnotation k : keys) {
                    if (Math.abs(k.frame() - a.frame()) < Math.abs(key.frame() - a.frame())) {
                        key = k;
                    }
                }
                double r = a.box().area() / Math.max(1e-9, key.box().area());
                ratio = Math.max(r, 1 / Math.max(1e-9, r));
            }
            boolean drifted = ratio > driftRatio;
            if (from >= 0 && !(drifted && a.frame() == last + 1)) {
                concerns.add(new Concern(Concern.Kind.SIZE_DRIFT, from, last, worst));
                from = -1;
                worst = 0;
            }
            if (drifted) {
                if (from < 0) {
                    from = a.frame();
                }
                worst = Math.max(worst, ratio);
                last = a.frame();
            }
        }
        if (from >= 0) {
            concerns.add(new Concern(Concern.Kind.SIZE_DRIFT, from, last, worst));
        }
    }

    /** Worse first: a larger jump or size ratio, a lower weak-span similarity. */
    private static double badness(Concern c) {
        return c.kind() == Concern.Kind.WEAK_SPAN ? c.value() : -c.value();
    }
}
