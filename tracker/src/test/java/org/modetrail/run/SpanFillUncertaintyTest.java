package org.modetrail.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;

/**
 * The uncertainty {@link SpanFill} gives each box it makes (the model is in {@link BoxUncertainty}), on synthetic
 * spans between keyframes on frames 0 and 20. Keyframes carry the user's 1 px.
 */
class SpanFillUncertaintyTest {
    private static final FrameAnnotation K0 = FrameAnnotation.keyframe(0, new Box(0, 0, 10, 10));
    private static final FrameAnnotation K20 = FrameAnnotation.keyframe(20, new Box(100, 50, 10, 10));

    private static Box at(double x) {
        return new Box(x, 0, 10, 10);
    }

    private static List<FrameAnnotation> fill(PassResult fwd, PassResult bwd) {
        return SpanFill.fill(K0, K20, fwd, bwd, 1, 19, PassMerge.MORE_SIMILAR);
    }

    @Test
    void twoAgreeingPassesGiveASmallUncertainty() {
        PassResult fwd = new PassResult(1, 19);
        PassResult bwd = new PassResult(1, 19);
        for (int f = 1; f <= 19; f++) {
            fwd.put(f, at(5 * f), 0.9);
            bwd.put(f, at(5 * f + 0.3), 0.9);
        }
        for (FrameAnnotation a : fill(fwd, bwd)) {
            // The keyframe's 1 px and the 0.3 px the passes differ by, in quadrature: 1.044 px.
            assertEquals(Math.hypot(1, 0.3), a.uncertaintyPx(), 1e-3, "frame " + a.frame());
        }
    }

    @Test
    void disagreeingPassesGiveAboutTheirDistance() {
        PassResult fwd = new PassResult(1, 19);
        PassResult bwd = new PassResult(1, 19);
        for (int f = 1; f <= 19; f++) {
            fwd.put(f, at(5 * f), 0.9);
            bwd.put(f, new Box(5 * f + 12, 16, 10, 10), 0.85); // centres 20 px apart (12, 16)
        }
        for (FrameAnnotation a : fill(fwd, bwd)) {
            assertEquals(5.0 * a.frame(), a.box().x(), 1e-9, "the more similar forward pass's box is kept");
            assertEquals(Math.hypot(1, 20), a.uncertaintyPx(), 1e-3, "frame " + a.frame());
        }
        // A size difference counts by half: the edges move by half the width or height.
        PassResult wide = new PassResult(1, 19);
        for (int f = 1; f <= 19; f++) {
            wide.put(f, Box.centredAt(5 * f + 5, 5, 18, 10), 0.85); // same centre, 8 px wider
        }
        assertEquals(Math.hypot(1, 4), fill(fwd, wide).get(9).uncertaintyPx(), 1e-3);
    }

    @Test
    void interpolationGrowsWithTheDistanceFromTheNearestKnownBox() {
        // No pass found anything: the whole span is the Brownian bridge between the keyframes (Horne et al. 2007,
        // equation 2). Motion variance from the one increment: the edges move 100, 100, 50, 50 px over 20 frames,
        // (2 * 100^2 + 2 * 50^2) / 4 / 20 = 312.5 px^2 per frame.
        List<FrameAnnotation> out = fill(new PassResult(1, 19), new PassResult(1, 19));
        assertEquals(19, out.size());
        for (int i = 0; i < out.size(); i++) {
            int k = out.get(i).frame();
            double alpha = k / 20.0;
            double expected = Math.sqrt(20 * alpha * (1 - alpha) * 312.5 + (1 - alpha) * (1 - alpha)
                    + alpha * alpha);
            assertEquals(expected, out.get(i).uncertaintyPx(), 1e-3, "frame " + k);
            assertEquals(BoxSource.INTERPOLATED, out.get(i).source());
        }
        for (int i = 1; i < 10; i++) {
            assertTrue(out.get(i).uncertaintyPx() > out.get(i - 1).uncertaintyPx(), "grows away from frame 0");
            assertTrue(out.get(18 - i).uncertaintyPx() > out.get(19 - i).uncertaintyPx(), "and from frame 20");
        }
        assertEquals(Math.sqrt(5 * 312.5 + 0.5), out.get(9).uncertaintyPx(), 1e-3, "largest mid-gap");
    }

    @Test
    void aGapInASteadyTrackTakesTheMotionVarianceOfItsBoxes() {
        // Boxes at a steady 5 px a frame either side of frames 8 to 11: every box is its neighbours' mean, so the
        // motion variance is 0 and the gap is only as uncertain as the boxes at its ends.
        PassResult fwd = new PassResult(1, 19);
        for (int f = 1; f <= 19; f++) {
            if (f < 8 || f > 11) {
                fwd.put(f, at(5 * f), 0.9);
            }
        }
        List<FrameAnnotation> out = SpanFill.fill(K0, null, fwd, new PassResult(1, 19), 1, 19, PassMerge.MORE_SIMILAR);
        for (int f = 8; f <= 11; f++) {
            FrameAnnotation a = out.get(f - 1);
            assertEquals(BoxSource.INTERPOLATED, a.source());
            double alpha = (f - 7) / 5.0;
            // Both ends carry the keyframe's 1 px: sqrt((1 - alpha)^2 + alpha^2) px.
            assertEquals(Math.hypot(1 - alpha, alpha), a.uncertaintyPx(), 1e-3, "frame " + f);
        }
    }

    @Test
    void aSimilarityBelowTheUsualWidensByTheBoxsSize() {
        // The first five boxes next to the keyframe have 0.9: a correct placement's similarity. Where it falls to
        // 0.6, e = 1 - (0.6 / 0.9)^2 = 5/9 of the kernel's weight is taken as off the object; for a 10 x 10 box
        // (semi-axes 5) sigma = sqrt(e / (2 / 25)) = 2.635 px, with the keyframe's 1 px in quadrature.
        PassResult fwd = new PassResult(1, 19);
        for (int f = 1; f <= 19; f++) {
            fwd.put(f, at(5 * f), f <= 10 ? 0.9 : 0.6);
        }
        List<FrameAnnotation> out = SpanFill.fill(K0, null, fwd, new PassResult(1, 19), 1, 19, PassMerge.MORE_SIMILAR);
        assertEquals(1, out.get(4).uncertaintyPx(), 1e-3);
        double e = 1 - (0.6 / 0.9) * (0.6 / 0.9);
        assertEquals(Math.hypot(1, Math.sqrt(e / (2.0 / 25))), out.get(14).uncertaintyPx(), 1e-3);
        // The same fall on a box twice the size is twice as uncertain.
        assertEquals(2 * Math.sqrt(e / (2.0 / 25)), BoxUncertainty.similarity(new Box(0, 0, 20, 20), 0.6, 0.9), 1e-9);
    }

    @Test
    void theKernelWeightUncoveredByASmallShiftIsTheShiftSquared() {
        // The step of the similarity model that is our own derivation, checked by numerical integration: the
        // Epanechnikov profile 1 - r^2 over the unit disc (the inscribed ellipse in normalised coordinates,
        // Comaniciu et al. 2003), shifted by f along x off a disc-shaped object: the share of the weight outside
        // the object is f^2 to first order (and a little less, the crescent's curvature).
        for (double f : new double[] {0.05, 0.1, 0.2}) {
            int n = 2000;
            double total = 0;
            double outside = 0;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double x = -1 + (i + 0.5) * 2 / n;
                    double y = -1 + (j + 0.5) * 2 / n;
                    double r2 = x * x + y * y;
                    if (r2 >= 1) {
                        continue;
                    }
                    total += 1 - r2;
                    if ((x - f) * (x - f) + y * y > 1) {
                        outside += 1 - r2;
                    }
                }
            }
            double share = outside / total;
            assertEquals(f * f, share, 0.12 * f * f, "shift " + f);
        }
    }

    @Test
    void aSizeJumpWidensByHalfTheJump() {
        PassResult fwd = new PassResult(1, 19);
        for (int f = 1; f <= 19; f++) {
            fwd.put(f, f == 10 ? Box.centredAt(5 * f + 5, 5, 20, 10) : at(5 * f), 0.9);
        }
        List<FrameAnnotation> out = SpanFill.fill(K0, null, fwd, new PassResult(1, 19), 1, 19, PassMerge.MORE_SIMILAR);
        assertEquals(Math.hypot(1, 5), out.get(9).uncertaintyPx(), 1e-3, "10 px wider than its neighbours");
        assertEquals(Math.hypot(1, 2.5), out.get(8).uncertaintyPx(), 1e-3, "a neighbour: 5 px off their mean");
        assertEquals(1, out.get(4).uncertaintyPx(), 1e-3, "away from the jump");
    }

    @Test
    void theTrackersOwnUncertaintyIsAddedInQuadrature() {
        PassResult fwd = new PassResult(1, 19);
        for (int f = 1; f <= 19; f++) {
            fwd.put(f, at(5 * f), 0.9, 3);
        }
        List<FrameAnnotation> out = SpanFill.fill(K0, null, fwd, new PassResult(1, 19), 1, 19, PassMerge.MORE_SIMILAR);
        assertEquals(Math.hypot(1, 3), out.get(6).uncertaintyPx(), 1e-3);
        assertThrows(IllegalArgumentException.class, () -> fwd.put(2, at(10), 0.9, -1));
        assertTrue(Double.isNaN(new PassResult(1, 3).uncertaintyPx(2)));
    }

    @Test
    void anAnnotationsUncertaintyIsValidated() {
        assertThrows(IllegalArgumentException.class, () -> FrameAnnotation.tracked(1, at(0), 0.5, -0.1));
        assertThrows(IllegalArgumentException.class,
                () -> FrameAnnotation.tracked(1, at(0), 0.5, Double.POSITIVE_INFINITY));
        assertTrue(Double.isNaN(FrameAnnotation.tracked(1, at(0), 0.5).uncertaintyPx()), "not known");
        assertEquals(FrameAnnotation.KEYFRAME_UNCERTAINTY_PX, FrameAnnotation.keyframe(3, at(0)).uncertaintyPx());
        assertEquals(2.5, FrameAnnotation.interpolated(4, at(0), 2.5).atFrame(5).uncertaintyPx());
    }
}
