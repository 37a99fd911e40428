package org.modetrail.run;

import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.tracking.TrackerConfig;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * Turns keyframes into whole tracks. For each span to fill, the segments between consecutive keyframes are tracked
 * forward from the earlier keyframe and backward from the later one; before the first keyframe the track runs
 * backward to the start of the video or until lost, after the last forward to the end or until lost. Then
 * {@link SpanFill} merges the two passes of each segment and interpolates where both lost the object.
 *
 * <p>All forward passes of all tracks share one sequential read of the video; all backward passes share one
 * backward sweep, read in chunks that fit a memory budget (decoded forward, fed in reverse). Keyframes are never
 * changed. Progress and cancellation are passed in, so the command line and the editor run the same code.
 */
public final class TrackRunner {
    /** The merge the simulated annotator's effort chose (DEVELOPERS.md, "Choosing how passes merge"). */
    public static final PassMerge DEFAULT_MERGE = PassMerge.MORE_SIMILAR;
    private static final long DEFAULT_BACKWARD_BUDGET = 256L << 20;

    private final TrackerConfig config;
    private final PassMerge merge;
    private final long backwardBudgetBytes;

    /**
     * @param config              the tracker's settings
     * @param merge               how frames that both passes of a segment found take their box
     * @param backwardBudgetBytes memory for the frames of one backward chunk; at least 8 frames are always held
     */
    public TrackRunner(TrackerConfig config, PassMerge merge, long backwardBudgetBytes) {
        if (backwardBudgetBytes <= 0) {
            throw new IllegalArgumentException("the backward budget must be positive");
        }
        this.config = config;
        this.merge = java.util.Objects.requireNonNull(merge, "merge");
        this.backwardBudgetBytes = backwardBudgetBytes;
    }

    public TrackRunner(TrackerConfig config, long backwardBudgetBytes) {
        this(config, DEFAULT_MERGE, backwardBudgetBytes);
    }

    public TrackRunner(PassMerge merge) {
        this(TrackerConfig.defaults(), merge, DEFAULT_BACKWARD_BUDGET);
    }

    public TrackRunner() {
        this(DEFAULT_MERGE);
    }

    /** Tracks every track over the whole video. */
    public Project trackAll(VideoSource video, Project project, RunProgress progress, BooleanSupplier cancelled)
            throws VideoException {
        List<Span> spans = new ArrayList<>();
        for (Track t : project.tracks()) {
            spans.add(new Span(t.id(), 0, video.frameCount() - 1));
        }
        return track(video, project, spans, progress, cancelled);
    }

    /** Tracks the given spans (an edit's, or whole tracks); tracked frames inside them are replaced. */
    public Project track(VideoSource video, Project project, List<Span> spans, RunProgress progress,
                         BooleanSupplier cancelled) throws VideoException {
        return track(video, project, spans, progress, cancelled, null, Duration.ZERO);
    }

    /**
     * The same, also handing {@code partial} the project with the frames tracked so far at most every
     * {@code partialEvery} while it runs (on the tracking thread), so a window can show a track grow.
     */
    public Project track(VideoSource video, Project project, List<Span> spans, RunProgress progress,
                         BooleanSupplier cancelled, Consumer<Project> partial, Duration partialEvery)
            throws VideoException {
        List<Segment> segments = new ArrayList<>();
        for (Span span : spans) {
            Track t = project.track(span.trackId()).orElseThrow(
                    () -> new IllegalArgumentException("no track " + span.trackId()));
            segments.addAll(Segment.of(t, span, video.frameCount(), config));
        }
        List<Pass> forward = new ArrayList<>();
        List<Pass> backward = new ArrayList<>();
        long total = 0;
        for (Segment s : segments) {
            if (s.forward != null) {
                forward.add(s.forward);
                total += s.forward.length();
            }
            if (s.backward != null) {
                backward.add(s.backward);
                total += s.backward.length();
            }
        }
        long[] done = {0};
        long all = total;
        RunProgress seen = partial == null ? progress : new PartialProgress(progress, partialEvery,
                () -> partial.accept(assemble(project, segments, true)));
        KeyframeClaims keys = new KeyframeClaims(project);
        sweepForward(video, forward, keys, seen, cancelled, done, all);
        sweepBackward(video, backward, keys, seen, cancelled, done, all);
        Project result = assemble(project, segments, false);
        progress.frames(all, all);
        return result;
    }

    /**
     * The project with each segment's frames as its passes have them: all of them when the passes are done, or
     * only the frames tracked so far ({@code soFar}), without the interpolation that would stand in for frames
     * the passes have not reached yet.
     */
    private Project assemble(Project project, List<Segment> segments, boolean soFar) {
        Project result = project;
        for (Segment s : segments) {
            Track t = result.track(s.trackId).orElseThrow();
            TrackFrames.Builder b = TrackFrames.clearNonKeyframes(t, s.from, s.to);
            for (FrameAnnotation a : s.fill(merge)) {
                if (t.at(a.frame()).map(FrameAnnotation::isKeyframe).orElse(false)
                        || soFar && a.source() != BoxSource.TRACKED) {
                    continue;
                }
                b.put(a);
            }
            result = result.withTrack(b.build());
        }
        return result;
    }

    /** Passes progress on, and every {@code every} hands the results so far to a listener. */
    private static final class PartialProgress implements RunProgress {
        private final RunProgress inner;
        private final long everyNanos;
        private final Runnable publish;
        private long last = System.nanoTime();

        PartialProgress(RunProgress inner, Duration every, Runnable publish) {
            this.inner = inner;
            this.everyNanos = every.toNanos();
            this.publish = publish;
        }

        @Override
        public void frames(long done, long total) {
            inner.frames(done, total);
            long now = System.nanoTime();
            if (now - last >= everyNanos && done < total) {
                last = now;
                publish.run();
            }
        }
    }

    private static void sweepForward(VideoSource video, List<Pass> passes, KeyframeClaims keys, RunProgress progress,
                                     BooleanSupplier cancelled, long[] done, long total) throws VideoException {
        if (passes.isEmpty()) {
            return;
        }
        int from = Integer.MAX_VALUE;
        int to = Integer.MIN_VALUE;
        for (Pass p : passes) {
            from = Math.min(from, p.start);
            to = Math.max(to, p.stop);
        }
        video.read(from, to + 1, frame -> {
            if (cancelled.getAsBoolean()) {
                throw new CancellationException("tracking cancelled at frame " + frame.index());
            }
            boolean any = feedFrame(frame, passes, keys, done);
            progress.frames(done[0], total);
            return any || frame.index() < maxStart(passes);
        });
    }

    private void sweepBackward(VideoSource video, List<Pass> passes, KeyframeClaims keys, RunProgress progress,
                               BooleanSupplier cancelled, long[] done, long total) throws VideoException {
        if (passes.isEmpty()) {
            return;
        }
        int from = Integer.MAX_VALUE;
        int to = Integer.MIN_VALUE;
        for (Pass p : passes) {
            from = Math.min(from, p.stop);
            to = Math.max(to, p.start);
        }
        long frameBytes = (long) video.info().width() * video.info().height() * Integer.BYTES;
        int chunk = (int) Math.max(8, Math.min(1024, backwardBudgetBytes / frameBytes));
        List<Frame> held = new ArrayList<>(chunk);
        for (int end = to + 1; end > from; end -= chunk) {
            int begin = Math.max(from, end - chunk);
            if (!anyWantsBetween(passes, begin, end - 1)) {
                continue;
            }
            held.clear();
            video.read(begin, end, f -> {
                held.add(f.copy());
                return true;
            });
            for (int i = held.size() - 1; i >= 0; i--) {
                Frame frame = held.get(i);
                if (cancelled.getAsBoolean()) {
                    throw new CancellationException("tracking cancelled at frame " + frame.index());
                }
                feedFrame(frame, passes, keys, done);
                progress.frames(done[0], total);
            }
        }
        held.clear();
    }

    /** Whether an unfinished pass visits any frame of {@code a..b}. */
    /**
     * Feeds {@code frame} to every pass that wants it, the most confident first, each kept off the boxes that other
     * tracks hold: other tracks' keyframes in the frame, the boxes of passes fed before it in the frame, and the
     * last frame's boxes of passes not fed yet. So a track whose object has gone cannot settle on another track's
     * object, whichever is fed first (a greedy order alone let a track whose object vanished take its look-alike
     * neighbour in the same frame). Returns whether any pass wanted the frame.
     */
    private static boolean feedFrame(Frame frame, List<Pass> passes, KeyframeClaims keys, long[] done) {
        int n = frame.index();
        List<Pass> now = new ArrayList<>();
        for (Pass p : passes) {
            if (p.wants(n)) {
                now.add(p);
            }
        }
        now.sort((a, b) -> Double.compare(b.confidence(), a.confidence()));
        List<Box> claimed = new ArrayList<>();
        for (Pass p : now) {
            claimed.clear();
            keys.addOthers(n, p.trackId, claimed);
            // Passes fed before this one hold their box in this frame, the others still their last frame's.
            for (Pass q : now) {
                if (q.trackId != p.trackId && q.held() != null) {
                    claimed.add(q.held());
                }
            }
            if (n != p.start) {
                done[0]++;
            }
            p.feed(frame, claimed);
        }
        return !now.isEmpty();
    }

    /** The boxes of every track's keyframes, by frame: places other tracks may not take. */
    private static final class KeyframeClaims {
        private record Claim(int trackId, Box box) {
        }

        private final Map<Integer, List<Claim>> byFrame = new HashMap<>();

        KeyframeClaims(Project project) {
            for (Track t : project.tracks()) {
                for (FrameAnnotation a : t.keyframes()) {
                    if (a.box() != null) {
                        byFrame.computeIfAbsent(a.frame(), k -> new ArrayList<>()).add(new Claim(t.id(), a.box()));
                    }
                }
            }
        }

        void addOthers(int frame, int trackId, List<Box> out) {
            for (Claim c : byFrame.getOrDefault(frame, List.of())) {
                if (c.trackId() != trackId) {
                    out.add(c.box());
                }
            }
        }
    }

    private static boolean anyWantsBetween(List<Pass> passes, int a, int b) {
        for (Pass p : passes) {
            if (!p.finished() && Math.min(p.start, p.stop) <= b && Math.max(p.start, p.stop) >= a) {
                return true;
            }
        }
        return false;
    }

    private static int maxStart(List<Pass> passes) {
        int m = -1;
        for (Pass p : passes) {
            if (!p.finished()) {
                m = Math.max(m, p.start);
            }
        }
        return m;
    }
}
