package org.modetrail.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.Optional;
import java.util.TreeMap;

/**
 * One object's trajectory: an id, its class, an optional note, and per frame at most one annotation. Immutable:
 * every change gives a new track.
 */
public final class Track {
    private final int id;
    private final String className;
    private final String note;
    private final NavigableMap<Integer, FrameAnnotation> frames;

    public Track(int id, String className, String note, Map<Integer, FrameAnnotation> frames) {
        if (id <= 0) {
            throw new IllegalArgumentException("track ids start at 1, got " + id);
        }
        if (className == null || className.isBlank()) {
            throw new IllegalArgumentException("track " + id + " needs a class");
        }
        TreeMap<Integer, FrameAnnotation> copy = new TreeMap<>();
        for (Map.Entry<Integer, FrameAnnotation> e : frames.entrySet()) {
            if (e.getKey() != e.getValue().frame()) {
                throw new IllegalArgumentException("track " + id + ": annotation for frame " + e.getValue().frame()
                        + " filed under frame " + e.getKey());
            }
            copy.put(e.getKey(), e.getValue());
        }
        this.id = id;
        this.className = className.strip();
        this.note = note == null ? "" : note;
        this.frames = Collections.unmodifiableNavigableMap(copy);
    }

    /** A new track with one keyframe. */
    public static Track startingWith(int id, String className, FrameAnnotation first) {
        return new Track(id, className, "", Map.of(first.frame(), first));
    }

    public int id() {
        return id;
    }

    public String className() {
        return className;
    }

    public String note() {
        return note;
    }

    /** Every annotated frame, in frame order (read-only). */
    public NavigableMap<Integer, FrameAnnotation> frames() {
        return frames;
    }

    public Optional<FrameAnnotation> at(int frame) {
        return Optional.ofNullable(frames.get(frame));
    }

    /** The user's annotations (boxes and hidden or absent marks), in frame order. */
    public List<FrameAnnotation> keyframes() {
        List<FrameAnnotation> keys = new ArrayList<>();
        for (FrameAnnotation a : frames.values()) {
            if (a.isKeyframe()) {
                keys.add(a);
            }
        }
        return keys;
    }

    /** The keyframe before {@code frame} (exclusive), if any. */
    public Optional<FrameAnnotation> keyframeBefore(int frame) {
        for (FrameAnnotation a : frames.headMap(frame, false).descendingMap().values()) {
            if (a.isKeyframe()) {
                return Optional.of(a);
            }
        }
        return Optional.empty();
    }

    /** The keyframe after {@code frame} (exclusive), if any. */
    public Optional<FrameAnnotation> keyframeAfter(int frame) {
        for (FrameAnnotation a : frames.tailMap(frame, false).values()) {
            if (a.isKeyframe()) {
                return Optional.of(a);
            }
        }
        return Optional.empty();
    }

    public boolean isEmpty() {
        return frames.isEmpty();
    }

    public int firstFrame() {
        return frames.firstKey();
    }

    public int lastFrame() {
        return frames.lastKey();
    }

    public Track withClass(String newClass) {
        return new Track(id, newClass, note, frames);
    }

    public Track withNote(String newNote) {
        return new Track(id, className, newNote, frames);
    }

    public Track withId(int newId) {
        return new Track(newId, className, note, frames);
    }

    /** This track with {@code a} on its frame, replacing what was there. */
    public Track with(FrameAnnotation a) {
        TreeMap<Integer, FrameAnnotation> copy = new TreeMap<>(frames);
        copy.put(a.frame(), a);
        return new Track(id, className, note, copy);
    }

    /** This track with the given frames set, replacing what was there. */
    public Track withAll(Iterable<FrameAnnotation> annotations) {
        TreeMap<Integer, FrameAnnotation> copy = new TreeMap<>(frames);
        for (FrameAnnotation a : annotations) {
            copy.put(a.frame(), a);
        }
        return new Track(id, className, note, copy);
    }

    /** This track without frames {@code from..to} (inclusive). */
    public Track without(int from, int to) {
        TreeMap<Integer, FrameAnnotation> copy = new TreeMap<>(frames);
        copy.subMap(from, true, to, true).clear();
        return new Track(id, className, note, copy);
    }

    /** This track keeping only frames {@code from..to} (inclusive). */
    public Track only(int from, int to) {
        return new Track(id, className, note, frames.subMap(from, true, to, true));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Track t && t.id == id && t.className.equals(className) && t.note.equals(note)
                && t.frames.equals(frames);
    }

    @Override
    public int hashCode() {
        return Integer.hashCode(id) * 31 + frames.hashCode();
    }

    @Override
    public String toString() {
        return "Track[" + id + " " + className + ", " + frames.size() + " frames]";
    }
}
