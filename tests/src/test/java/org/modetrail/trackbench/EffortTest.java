package org.modetrail.trackbench;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.modetrail.demo.scenario.ScenarioKind;

/**
 * The effort a simulated annotator spends (keyframes added per 1000 frames until every judged frame has IoU 0.5
 * or more), Modetrail against plain linear interpolation from the same keyframes, on every scenario kind. The
 * issue's target: at most a tenth of interpolation's. Measured when written: Modetrail 0 on seven kinds and 10 on
 * occlusion, interpolation 135 to 960. (The comparison with the reference trackers, whose target of a third is
 * not yet met on occlusion, is in {@link EffortBench}.)
 */
class EffortTest {
    @ParameterizedTest(name = "{0}")
    @EnumSource(ScenarioKind.class)
    void modetrailNeedsAtMostATenthOfTheKeyframesOfInterpolation(ScenarioKind kind) throws Exception {
        BenchClip clip = ScenarioClips.create(kind, ScenarioClips.SEED);
        RenderedVideo video = new RenderedVideo(clip);
        double modetrail = EffortSimulation.keyframesPer1000(clip, video, EffortSimulation.modetrail());
        double interpolation = EffortSimulation.keyframesPer1000(clip, video, EffortSimulation.interpolation());
        assertTrue(interpolation >= 100, kind + ": the scenario should be hard for interpolation, got "
                + interpolation);
        assertTrue(modetrail <= interpolation / 10, kind + ": Modetrail " + modetrail + " per 1000 frames, "
                + "interpolation " + interpolation);
    }
}
