package org.modetrail.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Presence;

/** Keyframe semantics on synthetic spans between keyframes on frames 0 and 10. */
class SpanFillTest {
    private static final FrameAnnotation K0 = FrameAnnotation.keyframe(0, new Box(0, 0, 10, 10));
    private static final FrameAnnotation K10 = FrameAnnotation.keyframe(10, new Box(100, 50, 20, 10));

    private static Box at(double x) {
        return new Box(x, 0, 10, 10);
    }

    @Test
    void whereBothPassesFoundTheObjectTheMoreSimilarWins() {
        PassResult fwd = new PassResult(1, 9);
        PassResult bwd = new PassResult(1, 9);
        for (int f = 1; f <= 9; f++) {
            fwd.put(f, at(f), f < 5 ? 0.9 : 0.6);
            bwd.put(f, at(f + 0.5), f < 5 ? 0.7 : 0.8);
        }
        List<FrameAnnotation> out = SpanFill.fill(K0, K10, fwd, bwd, 1, 9, PassMerge.MORE_SIMILAR);
        assertEquals(9, out.size());
        assertEquals(at(2), out.get(1).box(), "frame 2: forward 0.9 beats backward 0.7");
        assertEquals(at(7.5), out.get(6).box(), "frame 7: backward 0.8 beats forward 0.6");
        assertEquals(0.8, out.get(6).score(), 1e-12);
        assertTrue(out.stream().allMatch(a -> a.source() == BoxSource.TRACKED));
    }

    @Test
    void framesAPassSearchedForALostObjectOnAreNotInterpolated() {
        PassResult fwd = new PassResult(1, 9);
        PassResult bwd = new PassResult(1, 9);
        fwd.put(1, at(1), 0.9);
        fwd.put(2, at(2), 0.9);
        for (int f = 3; f <= 6; f++) {
            fwd.markSearching(f); // the object left: the tracker looked for it there
        }
        bwd.put(9, at(9), 0.9);
        bwd.put(8, at(8), 0.9);
        List<FrameAnnotation> out = SpanFill.fill(K0, K10, fwd, bwd, 1, 9, PassMerge.MORE_SIMILAR);
        assertEquals(List.of(1, 2, 8, 9), out.stream().map(FrameAnnotation::frame).toList(),
                "frames 3-7 stay empty: a gap with a search in it is not bridged by a straight line");
        // The same gap without the search is interpolated, as before.
        PassResult plain = new PassResult(1, 9);
        plain.put(1, at(1), 0.9);
        plain.put(2, at(2), 0.9);
        assertEquals(9, SpanFill.fill(K0, K10, plain, bwd, 1, 9, PassMerge.MORE_SIMILAR).size());
    }

    @Test
    void aBlendWeighsAgreeingPassesBySimilarityAndNearnessToTheirKeyframe() {
        PassResult fwd = new PassResult(1, 9);
        PassResult bwd = new PassResult(1, 9);
        for (int f = 1; f <= 9; f++) {
            fwd.put(f, at(f), 0.9);
            bwd.put(f, at(f + 2), 0.6);
        }
        bwd.put(8, at(40), 0.95); // on something else: no overlap with the forward box, so not blended
        List<FrameAnnotation> out = SpanFill.fill(K0, K10, fwd, bwd, 1, 9, PassMerge.BLEND);
        // Frame 5, half-way: weights 0.9 * 0.5 and 0.6 * 0.5, so x = 5 + 2 * 0.6 / 1.5 = 5.8.
        assertEquals(5.8, out.get(4).box().x(), 1e-9);
        assertEquals(0.9 * 0.6 + 0.6 * 0.4, out.get(4).score(), 1e-9);
        // Frame 1, next to the forward pass's keyframe: weights 0.81 and 0.06, x = 1 + 2 * 0.06 / 0.87.
        assertEquals(1 + 2 * 0.06 / 0.87, out.get(0).box().x(), 1e-9);
        assertEquals(at(40), out.get(7).box(), "disagreeing passes: the more similar one, as without a blend");
    }

    @Test
    void whereNeitherPassFoundItTheGapIsInterpolatedBetweenTheNearestBoxes() {
        PassResult fwd = new PassResult(1, 9);
        PassResult bwd = new PassResult(1, 9);
        fwd.put(1, at(10), 0.9);
        fwd.put(2, at(20), 0.9);
        bwd.put(6, at(60), 0.9);
        List<FrameAnnotation> out = SpanFill.fill(K0, K10, fwd, bwd, 1, 9, PassMerge.MORE_SIMILAR);
        assertEquals(9, out.size());
        // Frames 3..5 lie between frame 2 (x 20) and frame 6 (x 60): x = 30, 40, 50.
        assertEquals(BoxSource.INTERPOLATED, out.get(2).source());
        assertEquals(30, out.get(2).box().x(), 1e-9);
        assertEquals(50, out.get(4).box().x(), 1e-9);
        // Frames 7..9 lie between frame 6 (x 60, 10x10) and keyframe 10 (x 100, 20x10): a quarter of the way each.
        assertEquals(70, out.get(6).box().x(), 1e-9);
        assertEquals(12.5, out.get(6).box().width(), 1e-9);
        assertEquals(0.0, out.get(6).score());
    }

    @Test
    void noPassAtAllInterpolatesTheWholeSpanBetweenTheKeyframes() {
        List<FrameAnnotation> out = SpanFill.fill(K0, K10, new PassResult(1, 9), new PassResult(1, 9), 1, 9,
                PassMerge.MORE_SIMILAR);
        assertEquals(9, out.size());
        assertEquals(50, out.get(4).box().x(), 1e-9, "frame 5 is half way from x 0 to x 100");
        assertEquals(25, out.get(4).box().y(), 1e-9);
    }

    @Test
    void beforeTheFirstKeyframeOnlyWhatThePassFoundIsKept() {
        PassResult bwd = new PassResult(0, 9);
        for (int f = 6; f <= 9; f++) {
            bwd.put(f, at(f), 0.8);
        }
        List<FrameAnnotation> out = SpanFill.fill(null, K10, new PassResult(0, -1), bwd, 0, 9, PassMerge.MORE_SIMILAR);
        assertEquals(4, out.size(), "frames 0..5 were lost: nothing to interpolate from before them");
        assertEquals(6, out.get(0).frame());
    }

    @Test
    void aHiddenMarkIsNotABoxToInterpolateFrom() {
        FrameAnnotation hidden = FrameAnnotation.markedBy(0, Presence.HIDDEN);
        PassResult bwd = new PassResult(1, 9);
        bwd.put(8, at(80), 0.9);
        bwd.put(9, at(90), 0.9);
        List<FrameAnnotation> out = SpanFill.fill(hidden, K10, new PassResult(1, 9), bwd, 1, 9, PassMerge.MORE_SIMILAR);
        assertEquals(2, out.size());
        assertEquals(8, out.get(0).frame());
    }

    @Test
    void interpolationIsLinearInCornerAndSize() {
        Box b = LinearInterpolation.between(new Box(0, 0, 10, 20), new Box(10, 20, 30, 40), 0.25);
        assertEquals(new Box(2.5, 5, 15, 25), b);
    }
}
