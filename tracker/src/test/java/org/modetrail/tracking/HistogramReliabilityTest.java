package org.modetrail.tracking;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.video.Frame;

/** The choice of colour bin size from the split-half agreement of the object's histogram. */
class HistogramReliabilityTest {

    /** A grey floor with one object of mean colour {@code colour} and per-channel Gaussian noise {@code sigma}. */
    private static Frame noisyObject(Box box, int colour, double sigma, long seed) {
        int w = 200;
        int h = 150;
        int[] rgb = new int[w * h];
        Random random = new Random(seed);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                boolean inside = x >= box.x() && x < box.right() && y >= box.y() && y < box.bottom();
                int base = inside ? colour : 0xFFB0B0B0;
                int r = clamp((base >>> 16 & 0xFF) + random.nextGaussian() * sigma);
                int g = clamp((base >>> 8 & 0xFF) + random.nextGaussian() * sigma);
                int b = clamp((base & 0xFF) + random.nextGaussian() * sigma);
                rgb[y * w + x] = 0xFF000000 | r << 16 | g << 8 | b;
            }
        }
        return new Frame(0, 0, w, h, rgb);
    }

    private static int clamp(double v) {
        return (int) Math.max(0, Math.min(255, Math.round(v)));
    }

    @Test
    void aFlatObjectAgreesWithItselfExactly() {
        // Bhattacharyya coefficient of two identical distributions is 1 (Bhattacharyya 1943, by definition).
        Box box = new Box(40, 30, 60, 40);
        Frame f = noisyObject(box, 0xFF305080, 0, 1);
        assertEquals(1.0, HistogramReliability.agreement(f, box, 5), 1e-12);
        assertEquals(5, HistogramReliability.bitsFor(f, box, 5));
    }

    @Test
    void aLargeObjectKeepsTheFinestBinsUnderMildNoise() {
        // Noise of 2 grey levels (clean footage) on a 120x90 px object: thousands of pixels fill few bins alike.
        Box box = new Box(40, 30, 120, 90);
        Frame f = noisyObject(box, 0xFF305080, 2, 2);
        assertTrue(HistogramReliability.agreement(f, box, 5) > 0.95);
        assertEquals(5, HistogramReliability.bitsFor(f, box, 5));
    }

    @Test
    void aSmallNoisyObjectGetsCoarserBins() {
        // A 12x9 px object with noise of 12 grey levels (compressed, dim footage): about 40 pixels per half spread
        // over hundreds of fine bins, so the halves share few bins; coarser bins make them agree.
        Box box = new Box(80, 60, 12, 9);
        Frame f = noisyObject(box, 0xFF305080, 12, 3);
        double fine = HistogramReliability.agreement(f, box, 5);
        double coarse = HistogramReliability.agreement(f, box, 3);
        assertTrue(fine < HistogramReliability.MIN_AGREEMENT, "fine agreement " + fine);
        assertTrue(coarse > fine, "coarse " + coarse + " fine " + fine);
        assertTrue(HistogramReliability.bitsFor(f, box, 5) < 5);
    }

    @Test
    void theTrackerTakesTheChosenBinningAndKeepsTheConfiguredOneWhenAskedTo() {
        Box box = new Box(80, 60, 12, 9);
        Frame f = noisyObject(box, 0xFF305080, 12, 4);
        MeanShiftTracker adaptive = new MeanShiftTracker(TrackerConfig.defaults());
        adaptive.start(f, box);
        assertTrue(((RgbBinning) adaptive.binning()).bitsPerChannel() < 5);
        MeanShiftTracker fixed = new MeanShiftTracker(TrackerConfig.defaults().toBuilder().adaptBinning(false).build());
        fixed.start(f, box);
        assertEquals(RgbBinning.DEFAULT, fixed.binning());
    }
}
