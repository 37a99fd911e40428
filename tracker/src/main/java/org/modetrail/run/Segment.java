package org.modetrail.run;

import java.util.ArrayList;
import java.util.List;

import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Track;
import org.modetrail.tracking.TrackerConfig;

/**
 * The frames between two neighbouring keyframes of a track (or between a keyframe and an end of the video), with
 * the passes that fill them: forward from the earlier keyframe if it has a box, backward from the later one if it
 * has a box.
 */
final class Segment {
    final int trackId;
    final FrameAnnotation startKey;
    final FrameAnnotation endKey;
    final int from;
    final int to;
    final Pass forward;
    final Pass backward;

    private Segment(int trackId, FrameAnnotation startKey, FrameAnnotation endKey, int from, int to,
                    TrackerConfig config) {
        this.trackId = trackId;
        this.startKey = startKey;
        this.endKey = endKey;
        this.from = from;
        this.to = to;
        forward = startKey != null && startKey.isVisible()
                ? new Pass(trackId, startKey.frame(), startKey.box(), to, true, config) : null;
        backward = endKey != null && endKey.isVisible()
                ? new Pass(trackId, endKey.frame(), endKey.box(), from, false, config) : null;
    }

    /** The segments of {@code track} that meet {@code span}. */
    static List<Segment> of(Track track, Span span, int frameCount, TrackerConfig config) {
        List<FrameAnnotation> keys = track.keyframes();
        List<Segment> out = new ArrayList<>();
        if (keys.isEmpty()) {
            return out;
        }
        FrameAnnotation previous = null;
        for (int i = 0; i <= keys.size(); i++) {
            FrameAnnotation next = i < keys.size() ? keys.get(i) : null;
            int from = previous == null ? 0 : previous.frame() + 1;
            int to = next == null ? frameCount - 1 : next.frame() - 1;
            if (from <= to && to >= span.from() && from <= span.to()) {
                out.add(new Segment(track.id(), previous, next, from, to, config));
            }
            previous = next;
        }
        return out;
    }

    List<FrameAnnotation> fill(PassMerge merge) {
        PassResult f = forward != null ? forward.result : new PassResult(from, from - 1);
        PassResult b = backward != null ? backward.result : new PassResult(from, from - 1);
        return SpanFill.fill(startKey, endKey, f, b, from, to, merge);
    }
}
