package org.modetrail.app.editor;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.quality.Concern;
import org.modetrail.quality.TrackQuality;
import org.modetrail.quality.TrackQualitySummary;

/**
 * The places of all tracks a user should check, in one list, worst first, with a cursor to step through them. Free
 * of Swing; the concerns come from {@link TrackQualitySummary} (at most its {@code maxConcerns} a track).
 *
 * <p><b>Order</b> ({@link #WORST_FIRST}): by kind as {@link Concern.Kind} lists them (jumps, then abrupt size
 * changes, then weak spans); within a kind the worst first (the larger jump in box diagonals, the larger area
 * ratio, the lower mean similarity); then by track id and first frame, so the order is total and repeatable.
 *
 * <p><b>Cursor</b>: before the first spot when built; {@link #next()} and {@link #previous()} move it one spot and
 * wrap around at the ends. {@link #rebuild(Project, int)} keeps the cursor near the same place: on the same spot if
 * it is still there (same track and kind, overlapping frames: a retracked span moves a little), otherwise between
 * the spots that now come before and after where it was, so that {@code next()} gives the one after it. Not
 * thread-safe: use it from one thread (the event thread).
 */
public final class ReviewQueue {

    /**
     * One place to check.
     *
     * @param trackId the track
     * @param from    first frame, inclusive
     * @param to      last frame, inclusive
     * @param kind    what is odd there
     * @param value   the figure behind it (box diagonals, area ratio or mean similarity)
     * @param reason  a short sentence for the user, such as "jump of 1.2 box diagonals"
     */
    public record Spot(int trackId, int from, int to, Concern.Kind kind, double value, String reason) {
        /** "frame 12" or "frames 12-40". */
        public String frames() {
            return from == to ? "frame " + from : "frames " + from + "-" + to;
        }

        /** "track 3, frames 12-40: similarity 0.42". */
        public String describe() {
            return "track " + trackId + ", " + frames() + ": " + reason;
        }
    }

    /** The documented order, worst first. */
    public static final Comparator<Spot> WORST_FIRST = Comparator.comparing(Spot::kind)
            .thenComparingDouble(ReviewQueue::badness)
            .thenComparingInt(Spot::trackId)
            .thenComparingInt(Spot::from)
            .thenComparingInt(Spot::to);

    private final TrackQualitySummary summary;
    private List<Spot> spots = List.of();
    /** The spot the cursor is on, or, when {@link #between}, the index of the spot after the cursor. */
    private int index;
    private boolean between = true;

    public ReviewQueue(TrackQualitySummary summary) {
        if (summary == null) {
            throw new IllegalArgumentException("a review queue needs its quality summary settings");
        }
        this.summary = summary;
    }

    /** A queue of the given spots (in the documented order) with the cursor before the first. */
    public static ReviewQueue of(List<Spot> spots, TrackQualitySummary summary) {
        ReviewQueue q = new ReviewQueue(summary);
        q.spots = List.copyOf(spots);
        return q;
    }

    /** A queue of {@code project}'s spots with the cursor before the first. */
    public static ReviewQueue of(Project project, int frameCount, TrackQualitySummary summary) {
        ReviewQueue q = new ReviewQueue(summary);
        q.spots = collect(project, frameCount, summary);
        return q;
    }

    /** The spots of every track of {@code project}, in the documented order. */
    public static List<Spot> collect(Project project, int frameCount, TrackQualitySummary summary) {
        List<Spot> all = new ArrayList<>();
        for (Track t : project.tracks()) {
            if (t.isEmpty()) {
                continue;
            }
            TrackQuality q = summary.of(t, frameCount);
            for (Concern c : q.concerns()) {
                all.add(new Spot(t.id(), c.from(), c.to(), c.kind(), c.value(), reason(c)));
            }
        }
        all.sort(WORST_FIRST);
        return List.copyOf(all);
    }

    /** Takes the spots of the changed project, keeping the cursor near where it was (see the class comment). */
    public void rebuild(Project project, int frameCount) {
        rebuild(collect(project, frameCount, summary));
    }

    /** Takes spots collected elsewhere (in the documented order), keeping the cursor near where it was. */
    public void rebuild(List<Spot> newSpots) {
        Optional<Spot> was = current();
        List<Spot> old = spots;
        int oldIndex = index;
        boolean wasBetween = between;
        spots = List.copyOf(newSpots);
        if (was.isPresent()) {
            Spot w = was.get();
            int same = sameSpot(w);
            if (same >= 0) {
                index = same;
                between = false;
            } else {
                index = insertionPoint(w);
                between = true;
            }
        } else if (wasBetween && oldIndex < old.size()) {
            // Between spots: stay just before the spot that was next (or where it would be, if it went away).
            Spot after = old.get(oldIndex);
            int same = sameSpot(after);
            index = same >= 0 ? same : insertionPoint(after);
            between = true;
        } else {
            // Before the first of none, or after the last: stay at that end.
            index = wasBetween && oldIndex > 0 ? spots.size() : 0;
            between = true;
        }
    }

    /** All spots, worst first. */
    public List<Spot> spots() {
        return spots;
    }

    public int size() {
        return spots.size();
    }

    public boolean isEmpty() {
        return spots.isEmpty();
    }

    /** The spot the cursor is on; empty before the first step or when the cursor's spot went away. */
    public Optional<Spot> current() {
        return between || index >= spots.size() ? Optional.empty() : Optional.of(spots.get(index));
    }

    /** The cursor's index among {@link #spots()}, or -1 when it is between spots. */
    public int position() {
        return between ? -1 : index;
    }

    /** Moves to the next worse-to-better spot, wrapping to the first after the last; empty when there is none. */
    public Optional<Spot> next() {
        if (spots.isEmpty()) {
            return Optional.empty();
        }
        index = between ? index % spots.size() : (index + 1) % spots.size();
        between = false;
        return Optional.of(spots.get(index));
    }

    /** Moves to the spot before, wrapping to the last before the first; empty when there is none. */
    public Optional<Spot> previous() {
        if (spots.isEmpty()) {
            return Optional.empty();
        }
        int n = spots.size();
        index = ((index - 1) % n + n) % n;
        between = false;
        return Optional.of(spots.get(index));
    }

    /** The index of the new spot that is the old {@code w} (same track and kind, overlapping frames), or -1. */
    private int sameSpot(Spot w) {
        int best = -1;
        int bestOverlap = 0;
        for (int i = 0; i < spots.size(); i++) {
            Spot s = spots.get(i);
            if (s.trackId() == w.trackId() && s.kind() == w.kind()) {
                int overlap = Math.min(s.to(), w.to()) - Math.max(s.from(), w.from()) + 1;
                if (overlap > bestOverlap) {
                    best = i;
                    bestOverlap = overlap;
                }
            }
        }
        return best;
    }

    /** The index of the first spot that comes after {@code w} in the order. */
    private int insertionPoint(Spot w) {
        int i = 0;
        while (i < spots.size() && WORST_FIRST.compare(spots.get(i), w) <= 0) {
            i++;
        }
        return i;
    }

    /** Smaller is worse: a larger jump or area ratio, a lower similarity. */
    private static double badness(Spot s) {
        return s.kind() == Concern.Kind.WEAK_SPAN ? s.value() : -s.value();
    }

    /** The reason in the words the {@code track} command prints after a run. */
    static String reason(Concern c) {
        return switch (c.kind()) {
            case JUMP -> String.format(Locale.ROOT, "jump of %.1f box diagonals", c.value());
            case SIZE_CHANGE -> String.format(Locale.ROOT, "size x%.2f", c.value());
            case SIZE_DRIFT -> String.format(Locale.ROOT, "size %.1fx off the keyframe's", c.value());
            case WEAK_SPAN -> String.format(Locale.ROOT, "similarity %.2f", c.value());
        };
    }
}
