package org.modetrail.trackbench;

import java.util.ArrayList;
import java.util.List;

import org.modetrail.demo.scenario.FamilyKind;
import org.modetrail.demo.scenario.ScenarioFamily;

/**
 * The scenario family as the benchmark report's clip set: every {@link FamilyKind}, its tuning and report seeds
 * and the crf of each seed's clip, all from {@link ScenarioFamily}.
 *
 * <p>Compiled only when export has {@code org.modetrail.demo.scenario.ScenarioFamily} (tests/pom.xml leaves this
 * file out otherwise; the profile {@code scenario-family} there puts it back); {@link ClipSets#standard()} then
 * uses it instead of the stand-in {@link ScenarioClipSet}.
 */
public final class FamilyClipSet implements ClipSet {
    @Override
    public String name() {
        return "the scenario family";
    }

    @Override
    public List<String> kinds() {
        // -Dbench.kinds=a,b narrows a tuning run to some kinds; the report always takes all of them.
        List<String> only = List.of(System.getProperty("bench.kinds", "").split(","));
        List<String> kinds = new ArrayList<>();
        for (FamilyKind k : FamilyKind.values()) {
            if (only.equals(List.of("")) || only.contains(k.slug())) {
                kinds.add(k.slug());
            }
        }
        return kinds;
    }

    @Override
    public long[] seeds(String kind, Split split) {
        FamilyKind k = kindOf(kind);
        return split == Split.TUNING ? ScenarioFamily.tuningSeeds(k) : ScenarioFamily.reportSeeds(k);
    }

    @Override
    public MultiClip clip(String kind, long seed) {
        return new ScenarioMultiClip(kind + "-s" + seed, ScenarioFamily.create(kindOf(kind), seed));
    }

    @Override
    public int crf(String kind, long seed) {
        return ScenarioFamily.crf(kindOf(kind), seed);
    }

    private static FamilyKind kindOf(String slug) {
        for (FamilyKind k : FamilyKind.values()) {
            if (k.slug().equals(slug)) {
                return k;
            }
        }
        throw new IllegalArgumentException("no scenario family kind '" + slug + "'");
    }
}
