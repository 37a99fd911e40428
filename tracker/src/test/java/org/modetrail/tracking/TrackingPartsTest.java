package org.modetrail.tracking;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.video.Frame;

/** The tracker's parts one by one. */
class TrackingPartsTest {

    private static Frame twoColourFrame(int inside, int corners) {
        // A 40x20 box whose inscribed ellipse is one colour and whose corners another.
        int w = 60;
        int h = 40;
        int[] rgb = new int[w * h];
        Box box = new Box(10, 10, 40, 20);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                double dx = (x + 0.5 - box.centreX()) / 20;
                double dy = (y + 0.5 - box.centreY()) / 10;
                rgb[y * w + x] = dx * dx + dy * dy < 1 ? inside : corners;
            }
        }
        return new Frame(0, 0, w, h, rgb);
    }

    @Test
    void theKernelHistogramCountsOnlyTheInscribedEllipseAndSumsToOne() {
        Frame f = twoColourFrame(0xFFFF0000, 0xFF00FF00);
        BinImage image = new BinImage(RgbBinning.DEFAULT);
        image.load(f, 0, 0, f.width(), f.height());
        KernelHistogram h = new KernelHistogram(RgbBinning.DEFAULT.binCount());
        h.compute(image, new Box(10, 10, 40, 20));
        assertEquals(1.0, h.values[RgbBinning.DEFAULT.binOf(0xFFFF0000)], 1e-6);
        assertEquals(0.0, h.values[RgbBinning.DEFAULT.binOf(0xFF00FF00)]);
        assertEquals(1, h.touchedCount);
        // The Epanechnikov profile integrates to pi a b / 2 over the ellipse: the mass of 1 - r^2 (from calculus).
        assertEquals(Math.PI * 20 * 10 / 2, h.mass, Math.PI * 20 * 10 * 0.02);
    }

    @Test
    void bhattacharyyaIsOneForEqualAndZeroForDisjointHistograms() {
        float[] p = {0.25f, 0.25f, 0.5f, 0};
        float[] q = {0, 0, 0, 1};
        assertEquals(1.0, BhattacharyyaCoefficient.of(p, p), 1e-7);
        assertEquals(0.0, BhattacharyyaCoefficient.of(p, q), 1e-12);
        assertEquals(BhattacharyyaCoefficient.of(p, p), BhattacharyyaCoefficient.overBins(p, p, new int[] {0, 1, 2}, 3),
                1e-12);
        assertEquals(1.0, BhattacharyyaCoefficient.distance(0), 1e-12);
    }

    @Test
    void backgroundWeightingPlaysDownColoursSharedWithTheBackground() {
        // Left half of the object red, right half the floor's grey: CBWH must favour red (Ning et al. 2012).
        int w = 80;
        int h = 60;
        int red = 0xFFC02020;
        int grey = 0xFF808080;
        int[] rgb = new int[w * h];
        java.util.Arrays.fill(rgb, grey);
        for (int i = 0; i < rgb.length; i += 20) {
            rgb[i] = 0xFF2020C0; // a sprinkle of blue: the rarest background colour sets o* (Ning et al.)
        }
        Box box = new Box(20, 20, 40, 20);
        for (int y = 20; y < 40; y++) {
            for (int x = 20; x < 40; x++) {
                rgb[y * w + x] = red;
            }
        }
        Frame f = new Frame(0, 0, w, h, rgb);
        BinImage image = new BinImage(RgbBinning.DEFAULT);
        image.load(f, 0, 0, w, h);
        BackgroundWeightedModel model = new BackgroundWeightedModel(RgbBinning.DEFAULT.binCount(), true);
        model.build(image, box);
        int r = RgbBinning.DEFAULT.binOf(red);
        int g = RgbBinning.DEFAULT.binOf(grey);
        assertTrue(model.target.values[r] > 0.4 && model.target.values[g] > 0.4, "plain model: about half and half");
        // v_grey = o_blue / o_grey, about 0.05 / 0.95, v_red = v_blue = 1; with q about 0.46 red, 0.46 grey and
        // 0.05 blue, q' is about 0.46 : 0.024 : 0.05, so red keeps about 0.86 and grey about 0.045.
        assertTrue(model.weighted[r] > 0.8, "red, absent from the background, keeps the weight: " + model.weighted[r]);
        assertTrue(model.weighted[g] < 0.06, "grey, which fills the ring, loses it: " + model.weighted[g]);
    }

    @Test
    void hueSaturationBinsIgnoreBrightnessButSeparateGrey() {
        HueSaturationBinning hs = HueSaturationBinning.defaults();
        assertEquals(hs.binOf(0xFFE02010), hs.binOf(0xFF701008), "bright and dim red share a bin");
        assertNotEquals(hs.binOf(0xFFE02010), hs.binOf(0xFF10E020), "red and green differ");
        assertNotEquals(hs.binOf(0xFF808080), hs.binOf(0xFFE02010), "grey is not red");
        assertTrue(hs.binOf(0xFF808080) >= 16 * 4, "grey goes to the grey band");
        assertEquals(16 * 4 + 4, hs.binCount());
    }

    @Test
    void theKalmanFilterLearnsAConstantVelocity() {
        ConstantVelocityKalman k = new ConstantVelocityKalman(1, 4);
        k.reset(0, 0);
        for (int i = 1; i <= 30; i++) {
            k.predict();
            k.correct(5.0 * i, -2.0 * i);
        }
        assertEquals(5.0, k.vx(), 0.1);
        assertEquals(-2.0, k.vy(), 0.1);
        k.predict();
        assertEquals(155, k.x(), 0.5);
    }

    @Test
    void flatMeanShiftFindsTheCentroidOfABlob() {
        int w = 100;
        int h = 80;
        float[] weights = new float[w * h];
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                double dx = x + 0.5 - 62;
                double dy = y + 0.5 - 35;
                weights[y * w + x] = (float) Math.exp(-(dx * dx + dy * dy) / (2 * 36));
            }
        }
        Box end = FlatMeanShift.seek(weights, w, h, Box.centredAt(50, 45, 30, 30), 50, 0.01);
        assertEquals(62, end.centreX(), 0.1);
        assertEquals(35, end.centreY(), 0.1);
    }

    @Test
    void twoSimilarObjectsCrossingKeepTheirTracks() {
        // Red and a slightly different red cross head-on; each track must come out on its own object.
        SyntheticScene scene = new SyntheticScene(320, 200, 0xFFC03020, 11);
        int otherColour = 0xFFB04030;
        MultiObjectTracker multi = new MultiObjectTracker(TrackerConfig.defaults());
        Box a0 = new Box(20, 80, 40, 30);
        Box b0 = new Box(260, 90, 40, 30);
        multi.start(scene.frame(0, a0, b0, otherColour), List.of(a0, b0));
        Box a = a0;
        Box b = b0;
        List<TrackStep> steps = null;
        for (int i = 1; i <= 60; i++) {
            a = new Box(20 + 4 * i, 80, 40, 30);
            b = new Box(260 - 4 * i, 90, 40, 30);
            steps = multi.track(scene.frame(i, a, b, otherColour));
        }
        assertTrue(steps.get(0).box().iou(a) > 0.5, "track 0 on object A: " + steps.get(0));
        assertTrue(steps.get(1).box().iou(b) > 0.5, "track 1 on object B: " + steps.get(1));
    }

    @Test
    void aClaimedBoxIsAnotherTracksOnlyWhenItOverlapsMoreThanTheOwnPrediction() {
        Box other = new Box(100, 100, 40, 30);
        List<Box> claimed = List.of(other);
        // Crossing: the candidate is where this track expects its object, half over the other's box.
        Box crossing = new Box(120, 100, 40, 30);
        assertTrue(!ReDetection.claimedByOther(crossing, new Box(118, 100, 40, 30), claimed));
        // A track whose object has gone: the candidate is the other object, away from the own prediction.
        assertTrue(ReDetection.claimedByOther(new Box(101, 100, 40, 30), new Box(60, 90, 40, 30), claimed));
        // Coasting right onto it: the prediction overlaps, but the claimed box overlaps the candidate more.
        assertTrue(ReDetection.claimedByOther(new Box(100, 100, 40, 30), new Box(110, 104, 40, 30), claimed));
        // Nothing claimed nearby.
        assertTrue(!ReDetection.claimedByOther(new Box(300, 100, 40, 30), new Box(300, 100, 40, 30), claimed));
    }
}
