package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.List;

import org.modetrail.demo.scenario.ScenarioConfig;
import org.modetrail.demo.scenario.ScenarioKind;
import org.modetrail.demo.scenario.TrackingScenarios;

/** The clips the accuracy tests and the benchmark run on: one per scenario kind, from a fixed seed. */
public final class ScenarioClips {
    /** The generator's default seed: the figures are for the scenarios as the generator ships them. */
    public static final long SEED = ScenarioConfig.DEFAULT_SEED;

    private ScenarioClips() {
    }

    public static BenchClip create(ScenarioKind kind, long seed) {
        return new ScenarioClip(TrackingScenarios.create(kind, seed));
    }

    public static List<BenchClip> all() {
        List<BenchClip> clips = new ArrayList<>();
        for (ScenarioKind kind : ScenarioKind.values()) {
            clips.add(create(kind, SEED));
        }
        return clips;
    }
}
