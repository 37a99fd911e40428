package org.modetrail.run;

import java.util.List;

import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * Bringing a tracking result into a project that may have changed while the tracking ran (the editor tracks in the
 * background while the user keeps working).
 */
public final class TrackResults {
    private TrackResults() {
    }

    /**
     * {@code current} with the tracked and interpolated frames of {@code spans} taken from {@code tracked}, for each
     * track whose keyframes are still exactly those of {@code snapshot}, the project the tracking started from. A
     * track whose keyframes changed meanwhile is left alone: the edit that changed them has queued its own
     * tracking. Keyframes are never touched.
     */
    public static Project foldIn(Project current, Project snapshot, Project tracked, List<Span> spans) {
        Project out = current;
        for (Span s : spans) {
            Track now = out.track(s.trackId()).orElse(null);
            Track then = snapshot.track(s.trackId()).orElse(null);
            Track result = tracked.track(s.trackId()).orElse(null);
            if (now == null || then == null || result == null || !now.keyframes().equals(then.keyframes())) {
                continue;
            }
            TrackFrames.Builder b = TrackFrames.clearNonKeyframes(now, s.from(), s.to());
            for (FrameAnnotation a : result.frames().subMap(s.from(), true, s.to(), true).values()) {
                if (!a.isKeyframe()) {
                    b.put(a);
                }
            }
            out = out.withTrack(b.build());
        }
        return out;
    }
}
