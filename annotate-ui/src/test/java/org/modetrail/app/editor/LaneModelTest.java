package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.modetrail.app.editor.LaneModel.State;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Presence;
import org.modetrail.model.Track;

class LaneModelTest {
    private static final Box BOX = new Box(10, 10, 20, 20);
    private static final LaneModel.Config DEFAULTS = LaneModel.Config.defaults();

    /**
     * Worked by hand: frame 0 keyframe, 1 tracked 0.9, 2 tracked 0.3 (weak), 3 interpolated, 4 hidden mark,
     * 5 absent mark, 6 nothing, 7 tracked 0.5 (exactly the threshold: not weak), 8 tracked 0.49 (weak), 9 keyframe.
     */
    static Track tenFrames() {
        TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
        m.put(0, FrameAnnotation.keyframe(0, BOX));
        m.put(1, FrameAnnotation.tracked(1, BOX, 0.9));
        m.put(2, FrameAnnotation.tracked(2, BOX, 0.3));
        m.put(3, FrameAnnotation.interpolated(3, BOX));
        m.put(4, FrameAnnotation.markedBy(4, Presence.HIDDEN));
        m.put(5, FrameAnnotation.markedBy(5, Presence.ABSENT));
        m.put(7, FrameAnnotation.tracked(7, BOX, 0.5));
        m.put(8, FrameAnnotation.tracked(8, BOX, 0.49));
        m.put(9, FrameAnnotation.keyframe(9, BOX));
        return new Track(4, "animal", "", m);
    }

    @Test
    void eachFrameHasItsState() {
        LaneModel lane = LaneModel.of(tenFrames(), 12, DEFAULTS);
        State[] expected = {State.KEYFRAME, State.TRACKED, State.WEAK, State.INTERPOLATED, State.HIDDEN,
            State.ABSENT, State.EMPTY, State.TRACKED, State.WEAK, State.KEYFRAME, State.EMPTY, State.EMPTY};
        for (int f = 0; f < expected.length; f++) {
            assertEquals(expected[f], lane.stateAt(f), "frame " + f);
        }
        assertEquals(4, lane.trackId());
        assertEquals(12, lane.frameCount());
        assertEquals(2, lane.count(State.WEAK));
        assertEquals(3, lane.count(State.EMPTY));
    }

    @Test
    void aHigherThresholdMakesMoreFramesWeak() {
        LaneModel lane = LaneModel.of(tenFrames(), 10, new LaneModel.Config(0.95));
        assertEquals(State.WEAK, lane.stateAt(1));
        assertEquals(State.WEAK, lane.stateAt(7));
        assertEquals(4, lane.count(State.WEAK));
    }

    @Test
    void twoFramesPerColumnShowTheMoreImportant() {
        // 10 frames over 5 columns: [0,2) [2,4) [4,6) [6,8) [8,10).
        State[] cols = LaneModel.of(tenFrames(), 10, DEFAULTS).columns(0, 10, 5);
        assertArrayEquals(new State[] {State.KEYFRAME, State.WEAK, State.HIDDEN, State.TRACKED, State.KEYFRAME},
                cols);
    }

    @Test
    void theTimelineLayersShowKeyframesApartFromTheBar() {
        // Same columns as above; the bar counts a keyframe as a box and the keyframes are flagged apart, so the
        // last column shows its weak frame 8 and its keyframe 9 both.
        byte[] bar = new byte[5];
        boolean[] keys = new boolean[5];
        LaneModel.of(tenFrames(), 10, DEFAULTS).columns(0, 10, 5, bar, keys);
        assertArrayEquals(new byte[] {(byte) State.TRACKED.priority(), (byte) State.WEAK.priority(),
            (byte) State.HIDDEN.priority(), (byte) State.TRACKED.priority(), (byte) State.WEAK.priority()}, bar);
        assertArrayEquals(new boolean[] {true, false, false, false, true}, keys);
    }

    @Test
    void unevenColumnsFollowTheFloorRule() {
        // 10 frames over 3 columns start at 0, floor(10/3) = 3, floor(20/3) = 6: [0,3) [3,6) [6,10).
        assertEquals(3, LaneModel.frameAtColumn(0, 10, 3, 1));
        assertEquals(6, LaneModel.frameAtColumn(0, 10, 3, 2));
        State[] cols = LaneModel.of(tenFrames(), 10, DEFAULTS).columns(0, 10, 3);
        // [3,6) holds interpolated, hidden, absent: hidden wins; [6,10) ends on a keyframe.
        assertArrayEquals(new State[] {State.KEYFRAME, State.HIDDEN, State.KEYFRAME}, cols);
    }

    @Test
    void zoomedInColumnsRepeatFrames() {
        // Frames 2..3 over 4 columns: columns show frames 2, 2, 3, 3.
        State[] cols = LaneModel.of(tenFrames(), 10, DEFAULTS).columns(2, 2, 4);
        assertArrayEquals(new State[] {State.WEAK, State.WEAK, State.INTERPOLATED, State.INTERPOLATED}, cols);
    }

    @Test
    void framesOutsideTheVideoAreEmpty() {
        State[] cols = LaneModel.of(tenFrames(), 10, DEFAULTS).columns(8, 4, 4);
        assertArrayEquals(new State[] {State.WEAK, State.KEYFRAME, State.EMPTY, State.EMPTY}, cols);
        State[] before = LaneModel.of(tenFrames(), 10, DEFAULTS).columns(-2, 4, 4);
        assertArrayEquals(new State[] {State.EMPTY, State.EMPTY, State.KEYFRAME, State.TRACKED}, before);
    }

    @Test
    void oneWeakFrameInAnHourStillShows() {
        int n = 90_000;
        TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
        for (int f = 0; f < n; f++) {
            m.put(f, FrameAnnotation.tracked(f, BOX, f == 45_017 ? 0.2 : 0.9));
        }
        LaneModel lane = LaneModel.of(new Track(1, "car", "", m), n, DEFAULTS);
        State[] cols = lane.columns(0, n, 900); // 100 frames a column: frame 45,017 is in column 450
        for (int c = 0; c < cols.length; c++) {
            assertEquals(c == 450 ? State.WEAK : State.TRACKED, cols[c], "column " + c);
        }
    }

    @Test
    void blockSummaryAgreesWithEveryFrame() {
        Random random = new Random(7);
        int n = 5_000;
        TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
        for (int f = 0; f < n; f++) {
            int r = random.nextInt(100);
            // Mostly tracked, with rare other states so that the maximum varies from column to column.
            FrameAnnotation a = r < 80 ? FrameAnnotation.tracked(f, BOX, 0.8)
                    : r < 90 ? null
                    : r < 94 ? FrameAnnotation.interpolated(f, BOX)
                    : r < 97 ? FrameAnnotation.markedBy(f, Presence.ABSENT)
                    : r < 99 ? FrameAnnotation.markedBy(f, Presence.HIDDEN)
                    : FrameAnnotation.tracked(f, BOX, 0.1);
            if (a != null) {
                m.put(f, a);
            }
        }
        for (int f = 0; f < n; f += 97) {
            m.put(f, FrameAnnotation.keyframe(f, BOX));
        }
        LaneModel lane = LaneModel.of(new Track(2, "car", "", m), n, DEFAULTS);
        int[][] views = {{0, n, 37}, {13, 4_000, 61}, {100, 3_333, 1_000}, {4_900, 100, 700}, {0, n, 1}};
        for (int[] v : views) {
            byte[] cols = new byte[v[2]];
            byte[] bar = new byte[v[2]];
            boolean[] keys = new boolean[v[2]];
            lane.columns(v[0], v[1], v[2], cols);
            lane.columns(v[0], v[1], v[2], bar, keys);
            for (int c = 0; c < v[2]; c++) {
                int from = LaneModel.frameAtColumn(v[0], v[1], v[2], c);
                int to = Math.max(from + 1, LaneModel.frameAtColumn(v[0], v[1], v[2], c + 1));
                int max = 0;
                int barMax = 0;
                boolean key = false;
                for (int f = from; f < to; f++) {
                    State s = lane.stateAt(f);
                    max = Math.max(max, s.priority());
                    barMax = Math.max(barMax, (s == State.KEYFRAME ? State.TRACKED : s).priority());
                    key |= s == State.KEYFRAME;
                }
                String where = "view " + v[0] + "+" + v[1] + "/" + v[2] + " column " + c;
                assertEquals(max, cols[c], where);
                assertEquals(barMax, bar[c], where);
                assertEquals(key, keys[c], where);
            }
        }
    }

    @Test
    void priorityOrderIsTheDocumentedOne() {
        assertArrayEquals(new State[] {State.EMPTY, State.ABSENT, State.TRACKED, State.INTERPOLATED, State.HIDDEN,
            State.WEAK, State.KEYFRAME}, State.values());
        assertEquals(State.WEAK, State.ofPriority(State.WEAK.priority()));
    }

    @Test
    void configIsValidated() {
        assertThrows(IllegalArgumentException.class, () -> new LaneModel.Config(0));
        assertThrows(IllegalArgumentException.class, () -> new LaneModel.Config(1.01));
        assertThrows(IllegalArgumentException.class, () -> new LaneModel.Config(Double.NaN));
        assertEquals(1.0, new LaneModel.Config(1).weakScore());
        assertEquals(0.5, LaneModel.Config.defaults().weakScore());
        assertThrows(IllegalArgumentException.class, () -> LaneModel.of(tenFrames(), 0, DEFAULTS));
        assertThrows(IllegalArgumentException.class,
                () -> LaneModel.of(tenFrames(), 10, DEFAULTS).columns(0, 0, 5, new byte[5]));
    }

    /** An hour of video at about 28 frames a second, 50 tracks: building and summing every lane works. */
    @Test
    void anHourOfFiftyTracks() {
        int n = 100_000;
        int tracks = 50;
        Track[] all = new Track[tracks];
        for (int t = 0; t < tracks; t++) {
            TreeMap<Integer, FrameAnnotation> m = new TreeMap<>();
            int start = t * 1_400; // staggered; each track is annotated on 30,000 frames
            for (int f = start; f < start + 30_000; f++) {
                m.put(f, f == start ? FrameAnnotation.keyframe(f, BOX)
                        : FrameAnnotation.tracked(f, BOX, f % 1_000 == 0 ? 0.3 : 0.8));
            }
            all[t] = new Track(t + 1, "animal", "", m);
        }
        long t0 = System.nanoTime();
        LaneModel[] lanes = new LaneModel[tracks];
        for (int t = 0; t < tracks; t++) {
            lanes[t] = LaneModel.of(all[t], n, DEFAULTS);
        }
        long t1 = System.nanoTime();
        byte[] cols = new byte[1_200];
        for (LaneModel lane : lanes) {
            lane.columns(0, n, cols.length, cols);
        }
        long t2 = System.nanoTime();
        System.out.printf("lanes for %d tracks x %d frames: built in %.1f ms, summed to %d columns in %.1f ms%n",
                tracks, n, (t1 - t0) / 1e6, cols.length, (t2 - t1) / 1e6);
        // Track 50 starts on frame 68,600 and its first weak frame is 69,000.
        LaneModel last = lanes[tracks - 1];
        assertEquals(State.EMPTY, last.stateAt(68_599));
        assertEquals(State.KEYFRAME, last.stateAt(68_600));
        assertEquals(State.WEAK, last.stateAt(69_000));
        assertEquals(State.TRACKED, last.stateAt(98_599));
        assertEquals(State.EMPTY, last.stateAt(98_600));
        assertEquals(30, last.count(State.WEAK));
        // Columns of 83 or 84 frames: column 823 holds frame 68,600 (the keyframe) from 68,583 on.
        assertEquals(State.KEYFRAME.priority(), cols[823]);
        assertEquals(State.EMPTY.priority(), cols[822]);
        assertEquals(State.WEAK.priority(), cols[828]); // 69,000 is in [69,000, 69,083)
        assertEquals(State.TRACKED.priority(), cols[829]);
    }
}
