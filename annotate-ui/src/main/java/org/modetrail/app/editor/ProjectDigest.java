package org.modetrail.app.editor;

import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.quality.Concern;
import org.modetrail.quality.TrackQuality;
import org.modetrail.quality.TrackQualitySummary;

/**
 * What the timeline, the track list and the review need of a project, worked out once per project version and off
 * the event thread: each track's lane and quality summary and all places to check, worst first. On an hour-long
 * video these take tens of milliseconds per track (every frame is looked at), too long for the event thread while
 * a track grows. Tracks are immutable, so a track that did not change between two versions is the same object and
 * its lane and quality are taken from the previous digest instead of being worked out again. Free of Swing;
 * immutable once built.
 */
final class ProjectDigest {
    private final Project project;
    private final int frameCount;
    private final LaneModel.Config laneConfig;
    private final TrackQualitySummary summary;
    private final Map<Track, LaneModel> lanes;
    private final Map<Track, TrackQuality> qualities;
    private final List<ReviewQueue.Spot> spots;

    private ProjectDigest(Project project, int frameCount, LaneModel.Config laneConfig, TrackQualitySummary summary,
                          Map<Track, LaneModel> lanes, Map<Track, TrackQuality> qualities,
                          List<ReviewQueue.Spot> spots) {
        this.project = project;
        this.frameCount = frameCount;
        this.laneConfig = laneConfig;
        this.summary = summary;
        this.lanes = Collections.unmodifiableMap(lanes);
        this.qualities = Collections.unmodifiableMap(qualities);
        this.spots = spots;
    }

    /**
     * The digest of {@code project} over a video of {@code frameCount} frames, reusing what {@code previous} (may
     * be null) worked out for the same tracks with the same settings.
     */
    static ProjectDigest of(Project project, int frameCount, LaneModel.Config laneConfig,
                            TrackQualitySummary summary, ProjectDigest previous) {
        if (frameCount <= 0) {
            throw new IllegalArgumentException("a digest needs at least one frame, got " + frameCount);
        }
        boolean reuse = previous != null && previous.frameCount == frameCount
                && previous.laneConfig.equals(laneConfig) && previous.summary.equals(summary);
        Map<Track, LaneModel> lanes = new IdentityHashMap<>();
        Map<Track, TrackQuality> qualities = new IdentityHashMap<>();
        List<ReviewQueue.Spot> spots = new ArrayList<>();
        for (Track t : project.tracks()) {
            LaneModel lane = reuse ? previous.lanes.get(t) : null;
            TrackQuality q = reuse ? previous.qualities.get(t) : null;
            lanes.put(t, lane != null ? lane : LaneModel.of(t, frameCount, laneConfig));
            q = q != null ? q : summary.of(t, frameCount);
            qualities.put(t, q);
            if (!t.isEmpty()) {
                for (Concern c : q.concerns()) {
                    spots.add(new ReviewQueue.Spot(t.id(), c.from(), c.to(), c.kind(), c.value(),
                            ReviewQueue.reason(c)));
                }
            }
        }
        spots.sort(ReviewQueue.WORST_FIRST);
        return new ProjectDigest(project, frameCount, laneConfig, summary, lanes, qualities, List.copyOf(spots));
    }

    Project project() {
        return project;
    }

    int frameCount() {
        return frameCount;
    }

    /** The lane of one of this project's tracks. */
    LaneModel lane(Track t) {
        return lanes.get(t);
    }

    /** The quality summary of one of this project's tracks. */
    TrackQuality quality(Track t) {
        return qualities.get(t);
    }

    /** All places to check, worst first ({@link ReviewQueue#WORST_FIRST}). */
    List<ReviewQueue.Spot> spots() {
        return spots;
    }
}
