package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.LongStream;

import org.modetrail.demo.DemoClips;
import org.modetrail.demo.scenario.ScenarioKind;
import org.modetrail.demo.scenario.TrackingScenarios;

/**
 * Stand-in clip set until the scenario family lands: the eight kinds of {@link TrackingScenarios} (one or two
 * objects, 200 frames at 640x480), tuning seeds 1 to 10 (seed 1 is the one the defaults were chosen on) and report
 * seeds 101 to 120, encoded at the committed demo clips' crf ({@link DemoClips#COMMITTED_CRF}).
 */
public final class ScenarioClipSet implements ClipSet {
    @Override
    public String name() {
        return "the eight tracking scenarios (stand-in for the scenario family)";
    }

    @Override
    public List<String> kinds() {
        List<String> kinds = new ArrayList<>();
        for (ScenarioKind k : ScenarioKind.values()) {
            kinds.add(k.slug());
        }
        return kinds;
    }

    @Override
    public long[] seeds(String kind, Split split) {
        kindOf(kind);
        return split == Split.TUNING ? LongStream.rangeClosed(1, 10).toArray()
                : LongStream.rangeClosed(101, 120).toArray();
    }

    @Override
    public MultiClip clip(String kind, long seed) {
        return new ScenarioMultiClip(kind + "-s" + seed, TrackingScenarios.create(kindOf(kind), seed));
    }

    @Override
    public int crf(String kind, long seed) {
        kindOf(kind);
        return DemoClips.COMMITTED_CRF;
    }

    private static ScenarioKind kindOf(String slug) {
        for (ScenarioKind k : ScenarioKind.values()) {
            if (k.slug().equals(slug)) {
                return k;
            }
        }
        throw new IllegalArgumentException("no scenario kind '" + slug + "'");
    }
}
