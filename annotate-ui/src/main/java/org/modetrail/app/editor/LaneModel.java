package org.modetrail.app.editor;

import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Track;

/**
 * One track's state on every frame of the video, for drawing its lane on the timeline. Free of Swing. The states
 * are kept one byte per frame (100,000 frames take 100 kB), with the most important state of each block of
 * {@value #BLOCK} frames kept beside them, so that a column covering thousands of frames is summed up from a few
 * block entries instead of every frame.
 *
 * <p>A pixel column that covers several frames shows the most important state among them, by
 * {@link State#priority()}: keyframe &gt; weak &gt; hidden &gt; interpolated &gt; tracked &gt; absent &gt; empty. So a
 * single weak frame in an hour of tracked frames still shows as one weak column, and a user's keyframe is never
 * drawn over.
 *
 * <p>For drawing, {@link #columns(int, int, int, byte[], boolean[])} gives two layers instead: the bar, which shows
 * the most important state other than keyframe (a keyframe counts as a box, like a tracked one), and whether the
 * column holds a keyframe at all, drawn as a marker on top. That way a column with a keyframe and a weak frame shows
 * both, and dense keyframes in a zoomed-out view do not hide the weak or hidden frames between them.
 *
 * <p>Immutable once built; safe to read from any thread.
 */
public final class LaneModel {
    /** Frames per block of the block summary. */
    static final int BLOCK = 64;

    /**
     * What a track is on one frame. Declared in ascending order of importance: a column covering several frames
     * shows the state with the highest {@link #priority()}.
     */
    public enum State {
        /** No annotation on the frame. */
        EMPTY,
        /** Marked absent: not in the scene. */
        ABSENT,
        /** A box found by the tracker with a similarity at or above the weak threshold. */
        TRACKED,
        /** A box filled in by interpolation between two known boxes. */
        INTERPOLATED,
        /** Marked hidden: in the scene but covered. */
        HIDDEN,
        /** A box found by the tracker with a similarity under the weak threshold: worth a look. */
        WEAK,
        /** A box the user drew. */
        KEYFRAME;

        private static final State[] ALL = values();

        /** Higher is more important; equal to the ordinal. */
        public int priority() {
            return ordinal();
        }

        /** The state of the given {@link #priority()}. */
        public static State ofPriority(int priority) {
            return ALL[priority];
        }
    }

    /**
     * How frames are classified.
     *
     * @param weakScore a tracked box with a similarity under this is {@link State#WEAK}; in (0, 1], default 0.5
     */
    public record Config(double weakScore) {
        public static final double DEFAULT_WEAK_SCORE = 0.5;

        public Config {
            if (!(weakScore > 0 && weakScore <= 1)) {
                throw new IllegalArgumentException("the weak score threshold must be in (0, 1], got " + weakScore);
            }
        }

        public static Config defaults() {
            return new Config(DEFAULT_WEAK_SCORE);
        }
    }

    private final int trackId;
    private final byte[] states;
    private final byte[] blockMax;
    /** Per block, the most important state with keyframes counted as tracked. */
    private final byte[] blockBar;
    private static final byte KEY = (byte) State.KEYFRAME.ordinal();
    private static final byte BOX = (byte) State.TRACKED.ordinal();

    private LaneModel(int trackId, byte[] states) {
        this.trackId = trackId;
        this.states = states;
        int blocks = (states.length + BLOCK - 1) / BLOCK;
        this.blockMax = new byte[blocks];
        this.blockBar = new byte[blocks];
        for (int f = 0; f < states.length; f++) {
            int b = f / BLOCK;
            byte v = states[f];
            if (v > blockMax[b]) {
                blockMax[b] = v;
            }
            byte bar = v == KEY ? BOX : v;
            if (bar > blockBar[b]) {
                blockBar[b] = bar;
            }
        }
    }

    /** The lane of {@code track} over a video of {@code frameCount} frames; frames beyond the video are ignored. */
    public static LaneModel of(Track track, int frameCount, Config config) {
        if (frameCount <= 0) {
            throw new IllegalArgumentException("a lane needs at least one frame, got " + frameCount);
        }
        byte[] s = new byte[frameCount];
        for (FrameAnnotation a : track.frames().values()) {
            if (a.frame() >= frameCount) {
                break;
            }
            s[a.frame()] = (byte) stateOf(a, config).ordinal();
        }
        return new LaneModel(track.id(), s);
    }

    /** The state of one annotation (presence first: a hidden or absent mark is that, whoever set it). */
    public static State stateOf(FrameAnnotation a, Config config) {
        return switch (a.presence()) {
            case HIDDEN -> State.HIDDEN;
            case ABSENT -> State.ABSENT;
            case VISIBLE -> switch (a.source()) {
                case KEYFRAME -> State.KEYFRAME;
                case INTERPOLATED -> State.INTERPOLATED;
                case TRACKED -> a.score() < config.weakScore() ? State.WEAK : State.TRACKED;
            };
        };
    }

    public int trackId() {
        return trackId;
    }

    public int frameCount() {
        return states.length;
    }

    public State stateAt(int frame) {
        return State.ofPriority(states[frame]);
    }

    /** How many frames are in state {@code s}. */
    public int count(State s) {
        int n = 0;
        byte b = (byte) s.ordinal();
        for (byte v : states) {
            if (v == b) {
                n++;
            }
        }
        return n;
    }

    /**
     * The first frame of pixel column {@code column} when frames {@code first} to {@code first + span - 1} are
     * spread over {@code width} columns: {@code first + floor(column * span / width)}. Column {@code c} covers the
     * frames from its first frame up to (not including) the first frame of column {@code c + 1}, or just its first
     * frame when zoomed in so far that several columns share a frame. The timeline maps mouse positions to frames
     * with the same rule.
     */
    public static int frameAtColumn(int first, int span, int width, int column) {
        return first + (int) ((long) column * span / width);
    }

    /**
     * Fills {@code out[0..width-1]} with the {@link State#priority()} of each column's most important state, for
     * frames {@code first .. first + span - 1} spread over {@code width} columns (see {@link #frameAtColumn}).
     * Frames outside the video count as empty. Allocates nothing.
     */
    public void columns(int first, int span, int width, byte[] out) {
        if (span <= 0 || width <= 0 || out.length < width) {
            throw new IllegalArgumentException("need a positive span and width and room for " + width + " columns");
        }
        for (int c = 0; c < width; c++) {
            int from = frameAtColumn(first, span, width, c);
            int to = Math.max(from + 1, frameAtColumn(first, span, width, c + 1));
            out[c] = maxOver(from, to);
        }
    }

    /**
     * The two layers the timeline draws, for frames {@code first .. first + span - 1} over {@code width} columns:
     * {@code bar[c]}, the {@link State#priority()} of the most important state in column {@code c} with keyframes
     * counted as {@link State#TRACKED} (never {@code KEYFRAME}), and {@code keyframes[c]}, whether the column holds
     * a keyframe. Allocates nothing.
     */
    public void columns(int first, int span, int width, byte[] bar, boolean[] keyframes) {
        if (span <= 0 || width <= 0 || bar.length < width || keyframes.length < width) {
            throw new IllegalArgumentException("need a positive span and width and room for " + width + " columns");
        }
        for (int c = 0; c < width; c++) {
            int from = frameAtColumn(first, span, width, c);
            int to = Math.max(from + 1, frameAtColumn(first, span, width, c + 1));
            bar[c] = barOver(from, to);
            keyframes[c] = maxOver(from, to) == KEY;
        }
    }

    /** The columns as states (a convenience for tests and tooltips; allocates). */
    public State[] columns(int first, int span, int width) {
        byte[] b = new byte[width];
        columns(first, span, width, b);
        State[] s = new State[width];
        for (int i = 0; i < width; i++) {
            s[i] = State.ofPriority(b[i]);
        }
        return s;
    }

    /** As {@link #maxOver} with keyframes counted as tracked. */
    byte barOver(int from, int to) {
        from = Math.max(from, 0);
        to = Math.min(to, states.length);
        byte max = 0;
        int top = State.WEAK.priority();
        int f = from;
        while (f < to && max < top) {
            if (f % BLOCK == 0 && f + BLOCK <= to) {
                byte b = blockBar[f / BLOCK];
                if (b > max) {
                    max = b;
                }
                f += BLOCK;
            } else {
                byte v = states[f] == KEY ? BOX : states[f];
                if (v > max) {
                    max = v;
                }
                f++;
            }
        }
        return max;
    }

    /** The highest priority over frames {@code from} (inclusive) to {@code to} (exclusive), clipped to the video. */
    byte maxOver(int from, int to) {
        from = Math.max(from, 0);
        to = Math.min(to, states.length);
        byte max = 0;
        int top = State.KEYFRAME.priority();
        int f = from;
        while (f < to && max < top) {
            if (f % BLOCK == 0 && f + BLOCK <= to) {
                byte b = blockMax[f / BLOCK];
                if (b > max) {
                    max = b;
                }
                f += BLOCK;
            } else {
                byte v = states[f];
                if (v > max) {
                    max = v;
                }
                f++;
            }
        }
        return max;
    }
}
