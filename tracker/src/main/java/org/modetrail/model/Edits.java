package org.modetrail.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The editing operations, as pure functions from a project to an {@link Edit}. Keyframes (the user's boxes and
 * marks) are only ever changed here, never by tracking. An edit that changes keyframes clears the tracked and
 * interpolated frames between the neighbouring keyframes, which are stale, and names that span for tracking again.
 */
public final class Edits {
    private Edits() {
    }

    /** Starts a new track of class {@code objectClass} (added to the project if new) with one keyframe. */
    public static Edit newTrack(Project project, ObjectClass objectClass, int frame, Box box) {
        checkFrame(project, frame);
        Project p = project.withClass(objectClass);
        int id = p.nextTrackId();
        p = p.withTrack(Track.startingWith(id, objectClass.name(), FrameAnnotation.keyframe(frame, box)));
        return retrackAround(p, id, frame, frame);
    }

    /** Adds a keyframe, or moves or resizes the one on that frame (a drag on the canvas). */
    public static Edit setKeyframe(Project project, int trackId, int frame, Box box) {
        checkFrame(project, frame);
        Track t = track(project, trackId).with(FrameAnnotation.keyframe(frame, box));
        return retrackAround(project.withTrack(t), trackId, frame, frame);
    }

    /** Removes the keyframe on {@code frame}; a track left with no keyframe is removed. */
    public static Edit deleteKeyframe(Project project, int trackId, int frame) {
        Track t = track(project, trackId);
        if (t.at(frame).map(a -> !a.isKeyframe()).orElse(true)) {
            throw new IllegalArgumentException("track " + trackId + " has no keyframe on frame " + frame);
        }
        Track without = t.without(frame, frame);
        if (without.keyframes().isEmpty()) {
            return new Edit(project.withoutTrack(trackId), trackId, frame, frame, false);
        }
        return retrackAround(project.withTrack(without), trackId, frame, frame);
    }

    /** Marks frames {@code from..to} as hidden or absent, the user's word that overrides the tracker. */
    public static Edit markSpan(Project project, int trackId, int from, int to, Presence presence) {
        checkSpan(project, from, to);
        List<FrameAnnotation> marks = new ArrayList<>();
        for (int f = from; f <= to; f++) {
            marks.add(FrameAnnotation.markedBy(f, presence));
        }
        Track t = track(project, trackId).withAll(marks);
        return retrackAround(project.withTrack(t), trackId, from, to);
    }

    /** Deletes every annotation of frames {@code from..to}, keyframes included. */
    public static Edit deleteSpan(Project project, int trackId, int from, int to) {
        checkSpan(project, from, to);
        Track t = track(project, trackId).without(from, to);
        if (t.keyframes().isEmpty()) {
            return new Edit(project.withoutTrack(trackId), trackId, from, to, false);
        }
        return new Edit(project.withTrack(t), trackId, from, to, false);
    }

    /** Frames from {@code frame} on become a new track of the same class; the edit names the new track. */
    public static Edit split(Project project, int trackId, int frame) {
        Track t = track(project, trackId);
        if (t.frames().firstKey() >= frame || t.lastFrame() < frame) {
            throw new IllegalArgumentException("track " + trackId + " spans frames " + t.firstFrame() + " to "
                    + t.lastFrame() + ": splitting at " + frame + " would leave one part empty");
        }
        Track before = t.only(0, frame - 1);
        int newId = project.nextTrackId();
        Track after = t.only(frame, t.lastFrame()).withId(newId);
        Project p = project.withTrack(before).withTrack(after);
        return new Edit(p, newId, frame, t.lastFrame(), false);
    }

    /**
     * Merges track {@code otherId} into {@code keepId}: a frame takes the keyframe if either has one (both having
     * one on the same frame is an error), otherwise the kept track's annotation. The gap between the two, if any,
     * is named for tracking.
     */
    public static Edit merge(Project project, int keepId, int otherId) {
        if (keepId == otherId) {
            throw new IllegalArgumentException("a track cannot be merged with itself");
        }
        Track keep = track(project, keepId);
        Track other = track(project, otherId);
        Map<Integer, FrameAnnotation> merged = new TreeMap<>(keep.frames());
        for (FrameAnnotation a : other.frames().values()) {
            FrameAnnotation mine = merged.get(a.frame());
            if (mine != null && mine.isKeyframe() && a.isKeyframe()) {
                throw new IllegalArgumentException("tracks " + keepId + " and " + otherId + " both have a keyframe on"
                        + " frame " + a.frame() + "; delete one first");
            }
            if (mine == null || a.isKeyframe()) {
                merged.put(a.frame(), a);
            }
        }
        Track joined = new Track(keepId, keep.className(), keep.note(), merged);
        Project p = project.withoutTrack(otherId).withTrack(joined);
        int gapFrom = Math.min(keep.lastFrame(), other.lastFrame());
        int gapTo = Math.max(keep.firstFrame(), other.firstFrame());
        if (gapFrom < gapTo) {
            // The ends of the gap belong to the two old tracks and are not changed: the span is from the
            // keyframe at or before one to the keyframe at or after the other.
            return retrackAround(p, keepId, gapFrom + 1, gapTo - 1);
        }
        return new Edit(p, keepId, joined.firstFrame(), joined.lastFrame(), false);
    }

    /** Gives a track another class, which must be one of the project's. */
    public static Edit changeClass(Project project, int trackId, String className) {
        if (project.objectClass(className).isEmpty()) {
            throw new IllegalArgumentException("the project has no class '" + className + "'");
        }
        Track t = track(project, trackId);
        return new Edit(project.withTrack(t.withClass(className)), trackId, t.firstFrame(), t.lastFrame(), false);
    }

    /**
     * The span to track again after a change of frames {@code from..to}: from the keyframe before to the keyframe
     * after (or the start and end of the video where there is none); its stale tracked and interpolated frames are
     * cleared.
     */
    static Edit retrackAround(Project project, int trackId, int from, int to) {
        Track t = track(project, trackId);
        int spanFrom = t.keyframeBefore(from).map(FrameAnnotation::frame).orElse(0);
        int spanTo = t.keyframeAfter(to).map(FrameAnnotation::frame).orElse(project.video().frameCount() - 1);
        TreeMap<Integer, FrameAnnotation> kept = new TreeMap<>(t.frames());
        kept.subMap(spanFrom, true, spanTo, true).values().removeIf(a -> !a.isKeyframe());
        Track cleared = new Track(t.id(), t.className(), t.note(), kept);
        return new Edit(project.withTrack(cleared), trackId, spanFrom, spanTo, true);
    }

    private static Track track(Project project, int id) {
        return project.track(id).orElseThrow(() -> new IllegalArgumentException("no track " + id));
    }

    private static void checkFrame(Project project, int frame) {
        if (frame < 0 || frame >= project.video().frameCount()) {
            throw new IllegalArgumentException("frame " + frame + " is outside the video's frames 0 to "
                    + (project.video().frameCount() - 1));
        }
    }

    private static void checkSpan(Project project, int from, int to) {
        checkFrame(project, from);
        checkFrame(project, to);
        if (from > to) {
            throw new IllegalArgumentException("span " + from + " to " + to + " runs backwards");
        }
    }
}
