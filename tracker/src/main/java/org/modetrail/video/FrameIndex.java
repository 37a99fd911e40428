package org.modetrail.video;

import java.util.Arrays;

/**
 * Where every video frame sits in time: the presentation timestamp of each frame in presentation order and which
 * frames are keyframes (places the decoder can start from). Built from one scan of the file's packets, without
 * decoding; the container's own frame count and frame rate are never trusted.
 *
 * <p>Timestamps are integers in units of {@code timeBaseNum / timeBaseDen} seconds, as the container stores them;
 * times in seconds are measured from the first frame.
 */
public final class FrameIndex {
    private final long[] pts;
    private final boolean[] keyframe;
    private final int timeBaseNum;
    private final int timeBaseDen;
    private final int keyframeCount;

    /**
     * @param pts         presentation timestamps in presentation order, strictly increasing
     * @param keyframe    for each frame, whether decoding can start there
     * @param timeBaseNum numerator of the time unit in seconds
     * @param timeBaseDen denominator of the time unit in seconds
     */
    public FrameIndex(long[] pts, boolean[] keyframe, int timeBaseNum, int timeBaseDen) {
        if (pts.length != keyframe.length) {
            throw new IllegalArgumentException("pts and keyframe arrays differ in length");
        }
        if (timeBaseNum <= 0 || timeBaseDen <= 0) {
            throw new IllegalArgumentException("time base must be positive, got " + timeBaseNum + "/" + timeBaseDen);
        }
        for (int i = 1; i < pts.length; i++) {
            if (pts[i] <= pts[i - 1]) {
                throw new IllegalArgumentException("timestamps must increase: frame " + i + " has " + pts[i]
                        + " after " + pts[i - 1]);
            }
        }
        this.pts = pts.clone();
        this.keyframe = keyframe.clone();
        this.timeBaseNum = timeBaseNum;
        this.timeBaseDen = timeBaseDen;
        int keys = 0;
        for (boolean k : keyframe) {
            if (k) {
                keys++;
            }
        }
        this.keyframeCount = keys;
    }

    public int frameCount() {
        return pts.length;
    }

    public int keyframeCount() {
        return keyframeCount;
    }

    public int timeBaseNum() {
        return timeBaseNum;
    }

    public int timeBaseDen() {
        return timeBaseDen;
    }

    /** Presentation timestamp of frame n in time-base units, as stored in the file. */
    public long pts(int n) {
        return pts[n];
    }

    /** Presentation timestamp of frame n in seconds as the container states it (not shifted to start at zero). */
    public double ptsSeconds(int n) {
        return pts[n] * (double) timeBaseNum / timeBaseDen;
    }

    /** Time of frame n in seconds from the first frame. */
    public double timeSeconds(int n) {
        return (pts[n] - pts[0]) * (double) timeBaseNum / timeBaseDen;
    }

    /** Every frame's {@link #timeSeconds}, a new array. */
    public double[] timesSeconds() {
        double[] t = new double[pts.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = timeSeconds(i);
        }
        return t;
    }

    public boolean isKeyframe(int n) {
        return keyframe[n];
    }

    /** The last keyframe at or before frame n in presentation order, or 0 if none is marked. */
    public int keyframeAtOrBefore(int n) {
        for (int i = n; i >= 0; i--) {
            if (keyframe[i]) {
                return i;
            }
        }
        return 0;
    }

    /** The frame whose timestamp is exactly {@code timestamp}, or -1. */
    public int frameWithPts(long timestamp) {
        int i = Arrays.binarySearch(pts, timestamp);
        return i >= 0 ? i : -1;
    }

    /** The frame shown at time t seconds from the first frame: the last frame that starts at or before t. */
    public int frameAtTime(double t) {
        if (pts.length == 0) {
            return -1;
        }
        long target = pts[0] + (long) Math.floor(t * timeBaseDen / timeBaseNum + 1e-6);
        int i = Arrays.binarySearch(pts, target);
        if (i >= 0) {
            return i;
        }
        int insertion = -i - 1;
        return Math.max(0, insertion - 1);
    }

    /**
     * Duration in seconds from the start of the first frame to the end of the last; the last frame is taken to last
     * as long as the interval before it.
     */
    public double durationSeconds() {
        int n = pts.length;
        if (n == 0) {
            return 0;
        }
        if (n == 1) {
            return 0;
        }
        long last = pts[n - 1] - pts[n - 2];
        return (pts[n - 1] - pts[0] + last) * (double) timeBaseNum / timeBaseDen;
    }

    /** Frames per second over the whole file: (frames - 1) / (time of last frame - time of first frame). */
    public double meanFrameRate() {
        int n = pts.length;
        if (n < 2) {
            return 0;
        }
        return (n - 1) / timeSeconds(n - 1);
    }

    /**
     * Whether frames are unevenly spaced: some interval differs from the median interval by more than one
     * time-base tick plus 0.1%. One tick of slack lets rates that do not divide the time base (30000/1001 in
     * milliseconds) count as constant, as they are meant.
     */
    public boolean isVariableFrameRate() {
        int n = pts.length;
        if (n < 3) {
            return false;
        }
        long[] intervals = new long[n - 1];
        for (int i = 1; i < n; i++) {
            intervals[i - 1] = pts[i] - pts[i - 1];
        }
        long[] sorted = intervals.clone();
        Arrays.sort(sorted);
        long median = sorted[sorted.length / 2];
        double slack = 1 + 0.001 * median;
        for (long d : intervals) {
            if (Math.abs(d - median) > slack) {
                return true;
            }
        }
        return false;
    }

    /** The same frames with every timestamp moved by {@code delta} time-base units. */
    FrameIndex shifted(long delta) {
        long[] moved = pts.clone();
        for (int i = 0; i < moved.length; i++) {
            moved[i] += delta;
        }
        return new FrameIndex(moved, keyframe, timeBaseNum, timeBaseDen);
    }

    long[] ptsArray() {
        return pts.clone();
    }

    boolean[] keyframeArray() {
        return keyframe.clone();
    }
}
