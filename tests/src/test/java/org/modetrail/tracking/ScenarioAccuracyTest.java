package org.modetrail.tracking;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.modetrail.demo.scenario.ScenarioKind;
import org.modetrail.trackbench.BenchClip;
import org.modetrail.trackbench.BoofComaniciuTracker;
import org.modetrail.trackbench.BoxTracker;
import org.modetrail.trackbench.ModetrailTracker;
import org.modetrail.trackbench.OpenCvCamShiftTracker;
import org.modetrail.trackbench.ScenarioClips;
import org.modetrail.trackbench.TrackRun;
import org.modetrail.trackbench.TrackScore;

/**
 * Accuracy on every synthetic scenario kind from a single keyframe (the truth box of object 0 on frame 0), against
 * two outside references run on the same pixels: BoofCV's Comaniciu 2003 mean-shift tracker (scale on, 16 bins) and
 * OpenCV's CamShift (16^3 BGR histogram, search region three times the window). Scored by the OTB success AUC
 * (Wu, Lim and Yang, CVPR 2013; see {@link org.modetrail.trackbench.TrackMetrics}).
 *
 * <p>Asserted per scenario: Modetrail's AUC above both references', and at least 0.80 (the aim; a perfect
 * track scores 0.952). Prints a table of every figure. Times are not asserted here (see TrackBench).
 */
class ScenarioAccuracyTest {
    static final double AIM_AUC = 0.80;
    static final List<String> rows = new ArrayList<>();

    @BeforeAll
    static void header() {
        rows.add(String.format(Locale.ROOT, "%-16s | %-23s | %-23s | %-23s", "scenario", "Modetrail AUC P@20 fail",
                "BoofCV AUC P@20 fail", "CamShift AUC P@20 fail"));
    }

    @AfterAll
    static void table() {
        System.out.println("Scenario accuracy, one keyframe (fail = frames tracked before the first IoU 0):");
        rows.forEach(System.out::println);
    }

    static String cell(TrackScore s) {
        return String.format(Locale.ROOT, "%.3f %.3f %4d/%-4d", s.successAuc(), s.precision20(),
                s.framesUntilFailure(), s.trackedFrames());
    }

    static TrackScore run(BoxTracker tracker, BenchClip clip) {
        try (tracker) {
            return TrackRun.of(tracker, clip).score();
        }
    }

    @ParameterizedTest
    @EnumSource(ScenarioKind.class)
    void modetrailBeatsBothReferencesAndReachesTheAim(ScenarioKind kind) {
        BenchClip clip = ScenarioClips.create(kind, ScenarioClips.SEED);
        TrackScore mt = run(new ModetrailTracker(), clip);
        TrackScore boof = run(new BoofComaniciuTracker(), clip);
        TrackScore cam = run(new OpenCvCamShiftTracker(), clip);
        synchronized (rows) {
            rows.add(String.format(Locale.ROOT, "%-16s | %-23s | %-23s | %-23s", kind.slug(), cell(mt), cell(boof),
                    cell(cam)));
        }
        assertAll(
                () -> assertTrue(mt.successAuc() > boof.successAuc(), kind.slug() + ": Modetrail AUC "
                        + mt.successAuc() + " not above BoofCV's " + boof.successAuc()),
                () -> assertTrue(mt.successAuc() > cam.successAuc(), kind.slug() + ": Modetrail AUC "
                        + mt.successAuc() + " not above CamShift's " + cam.successAuc()),
                () -> assertTrue(mt.successAuc() >= AIM_AUC, kind.slug() + ": Modetrail AUC " + mt.successAuc()
                        + " under the aim " + AIM_AUC));
    }
}
