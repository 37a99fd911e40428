package org.modetrail.groundtruth;

import java.util.ArrayList;
import java.util.List;
import java.util.NavigableMap;
import java.util.TreeMap;

import org.modetrail.model.Box;

/**
 * A chain of foreground regions linked frame to frame ({@link BlobLinker}). A tracklet is one person, or a group
 * (a region that two or more tracklets entered together, which are then its members). Mutable while linking only.
 */
final class Tracklet {
    final int id;
    /** The boxes of the regions linked to it, by frame. */
    final NavigableMap<Integer, Box> seen = new TreeMap<>();
    /** The regions themselves, by frame (for splitting a group's region by columns). */
    final NavigableMap<Integer, Blob> blobs = new TreeMap<>();
    /** For a group: who was in it on each frame it was seen. */
    final NavigableMap<Integer, List<Tracklet>> membersAt = new TreeMap<>();
    /** Tracklets that entered this one when it is a group (empty for one person). */
    final List<Tracklet> members = new ArrayList<>();
    /** The group this tracklet is in now, or null. */
    Tracklet inGroup;
    boolean ended;

    Tracklet(int id) {
        this.id = id;
    }

    void see(Blob b) {
        seen.put(b.frame(), b.box());
        blobs.put(b.frame(), b);
    }

    boolean isGroup() {
        return !members.isEmpty();
    }

    int first() {
        return seen.firstKey();
    }

    int last() {
        return seen.lastKey();
    }

    Box lastBox() {
        return seen.lastEntry().getValue();
    }

    /** The centre velocity in px a frame over the last {@code span} frames seen (0 when seen once). */
    double[] velocity(int span) {
        int last = last();
        var from = seen.ceilingEntry(last - span);
        int df = last - from.getKey();
        if (df == 0) {
            return new double[] {0, 0};
        }
        Box a = from.getValue();
        Box b = lastBox();
        return new double[] {(b.centreX() - a.centreX()) / df, (b.centreY() - a.centreY()) / df};
    }

    /** Where the last box would be on {@code frame} at the recent velocity, same size. */
    Box predict(int frame, int span) {
        double[] v = velocity(span);
        Box b = lastBox();
        int df = frame - last();
        return b.movedTo(b.centreX() + v[0] * df, b.centreY() + v[1] * df);
    }

    @Override
    public String toString() {
        return (isGroup() ? "G" : "T") + id + "[" + first() + "-" + last() + "]";
    }
}
