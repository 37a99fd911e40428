package org.modetrail.trackbench;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.modetrail.demo.scenario.ScenarioKind;

/**
 * The effort a simulated annotator spends (keyframes added per 1000 frames until every judged frame has IoU 0.5
 * or more) on every scenario kind: Modetrail against plain linear interpolation from the same keyframes (target:
 * at most a tenth) and against the better of the two reference trackers restarted at each keyframe, BoofCV's
 * Comaniciu mean shift and OpenCV's CamShift (target: at most a third). Measured when written: Modetrail 0 on
 * every kind, interpolation 135 to 960, the better reference 0 to 10 ({@link EffortBench} prints the table).
 */
class EffortTest {
    @ParameterizedTest(name = "{0}")
    @EnumSource(ScenarioKind.class)
    void modetrailNeedsATenthOfInterpolationsKeyframesAndAThirdOfTheBetterReferences(ScenarioKind kind) throws Exception {
        BenchClip clip = ScenarioClips.create(kind, ScenarioClips.SEED);
        RenderedVideo video = new RenderedVideo(clip);
        double modetrail = EffortSimulation.keyframesPer1000(clip, video, EffortSimulation.modetrail());
        double interpolation = EffortSimulation.keyframesPer1000(clip, video, EffortSimulation.interpolation());
        assertTrue(interpolation >= 100, kind + ": the scenario should be hard for interpolation, got "
                + interpolation);
        assertTrue(modetrail <= interpolation / 10, kind + ": Modetrail " + modetrail + " per 1000 frames, "
                + "interpolation " + interpolation);
        double boofcv = EffortSimulation.keyframesPer1000(clip, video,
                EffortSimulation.restarted("BoofCV", BoofComaniciuTracker::new));
        double camshift = EffortSimulation.keyframesPer1000(clip, video,
                EffortSimulation.restarted("CamShift", OpenCvCamShiftTracker::new));
        assertTrue(modetrail <= Math.min(boofcv, camshift) / 3, kind + ": Modetrail " + modetrail
                + " per 1000 frames, BoofCV " + boofcv + ", CamShift " + camshift);
    }
}
