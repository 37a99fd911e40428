package org.modetrail.tracking;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class TrackerConfigTest {
    @Test
    void theDefaultsAreTheDocumentedOnes() {
        TrackerConfig d = TrackerConfig.defaults();
        assertEquals(RgbBinning.DEFAULT, d.binning());
        assertEquals(32 * 32 * 32, d.binning().binCount());
        assertEquals(ScaleMethod.MOMENTS, d.scale());
        assertEquals(0.6, d.lostSimilarity());
        assertEquals(25, d.maxCoastFrames());
        assertEquals(0.0, d.modelUpdateRate());
        assertEquals(true, d.backgroundWeighting());
        assertEquals(true, d.compensateLighting());
    }

    @Test
    void aChangedSettingLeavesTheOthersAlone() {
        TrackerConfig d = TrackerConfig.defaults();
        TrackerConfig t = d.withScale(ScaleMethod.TEN_PERCENT);
        assertEquals(ScaleMethod.TEN_PERCENT, t.scale());
        assertEquals(d, t.withScale(ScaleMethod.MOMENTS));
    }

    @Test
    void settingsOutOfRangeAreRefusedWithTheirName() {
        TrackerConfig d = TrackerConfig.defaults();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> d.toBuilder().maxIterations(0).build());
        assertEquals(true, e.getMessage().contains("maxIterations"));
        assertThrows(IllegalArgumentException.class, () -> d.withSimilarityThresholds(0.7, 0.5));
        assertThrows(IllegalArgumentException.class, () -> d.withModelUpdateRate(0.9));
        assertThrows(IllegalArgumentException.class, () -> d.toBuilder().binning(null).build());
    }
}
