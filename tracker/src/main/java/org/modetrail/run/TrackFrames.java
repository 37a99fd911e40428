package org.modetrail.run;

import java.util.TreeMap;

import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Track;

/** Building a track's new frames: the stale derived frames of a segment cleared, the new ones put in. */
final class TrackFrames {
    private TrackFrames() {
    }

    static Builder clearNonKeyframes(Track t, int from, int to) {
        TreeMap<Integer, FrameAnnotation> frames = new TreeMap<>(t.frames());
        frames.subMap(from, true, to, true).values().removeIf(a -> !a.isKeyframe());
        return new Builder(t, frames);
    }

    static final class Builder {
        private final Track track;
        private final TreeMap<Integer, FrameAnnotation> frames;

        private Builder(Track track, TreeMap<Integer, FrameAnnotation> frames) {
            this.track = track;
            this.frames = frames;
        }

        void put(FrameAnnotation a) {
            frames.put(a.frame(), a);
        }

        Track build() {
            return new Track(track.id(), track.className(), track.note(), frames);
        }
    }
}
