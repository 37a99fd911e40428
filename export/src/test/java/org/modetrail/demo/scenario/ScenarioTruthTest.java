package org.modetrail.demo.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Truth boxes and visible fractions against the rendered pixels. On the flat floor without noise, an object's pixels
 * are exactly those that change when it alone is added to the empty frame, and the pixels it shows in the full
 * frame are those that change when it alone is taken away. Both are found by rendering, not from the truth code.
 */
class ScenarioTruthTest {

    @ParameterizedTest
    @EnumSource(ScenarioKind.class)
    void truthBoxIsTheTightBoxOfTheBodyAndVisibleIsTheShareSeen(ScenarioKind kind) {
        ScenarioConfig flat = ScenarioConfig.defaults().withTexture(false).withSensorNoise(0);
        SyntheticTrackingScenario s = (SyntheticTrackingScenario) TrackingScenarios.create(kind, flat);
        int w = s.width();
        int n = w * s.height();
        int all = (1 << s.objectCount()) - 1;
        int[] empty = new int[n];
        int[] one = new int[n];
        int[] full = new int[n];
        int[] without = new int[n];
        int[] postsOnly = new int[n];
        int partlySeen = 0;
        for (int f : framesToCheck(s)) {
            s.render(f, empty, 0, false);
            s.render(f, full, all, true);
            s.render(f, postsOnly, 0, true);
            for (int k = 0; k < s.objectCount(); k++) {
                ScenarioBox truth = s.truth(k, f);
                String where = kind + " object " + k + " frame " + f;
                s.render(f, one, 1 << k, false);
                boolean[] body = Pixels.differ(one, empty);
                int[] box = Pixels.box(body, w);
                assertNotNull(box, where + ": object painted nothing");
                // Exact: bodies are not anti-aliased, and pixel column i spans [i, i+1).
                assertEquals(box[0], truth.x(), 0, where + " x");
                assertEquals(box[1], truth.y(), 0, where + " y");
                assertEquals(box[2] - box[0], truth.width(), 0, where + " width");
                assertEquals(box[3] - box[1], truth.height(), 0, where + " height");
                s.render(f, without, all & ~(1 << k), true);
                int seen = Pixels.count(Pixels.differ(full, without));
                // Slack for a body pixel that happens to match the one under it exactly; none was seen in practice.
                assertEquals((double) seen / Pixels.count(body), truth.visible(), 0.01, where + " visible");
                if (truth.visible() > 0 && truth.visible() < 1) {
                    partlySeen++;
                }
            }
            boolean[] painted = Pixels.differ(full, postsOnly);
            for (int p = 0; p < n; p++) {
                if (painted[p]) {
                    assertTrue(insideSomeBox(s, f, p % w, p / w), kind + " frame " + f + ": pixel (" + p % w + ", "
                            + p / w + ") changed outside every truth box");
                }
            }
        }
        if (kind == ScenarioKind.OCCLUSION || kind == ScenarioKind.CROSSING) {
            assertTrue(partlySeen >= 4, kind + ": partial visibility was checked in " + partlySeen + " cases");
        }
    }

    /** Every 9th frame, the last, and around each change of visibility, where the bookkeeping is hardest. */
    private static Set<Integer> framesToCheck(TrackingScenario s) {
        Set<Integer> frames = new TreeSet<>();
        for (int f = 0; f < s.frameCount(); f += 9) {
            frames.add(f);
        }
        frames.add(s.frameCount() - 1);
        for (int f = 1; f < s.frameCount(); f++) {
            for (int k = 0; k < s.objectCount(); k++) {
                boolean was = s.truth(k, f - 1).visible() == 1;
                boolean is = s.truth(k, f).visible() == 1;
                boolean hiddenChange = (s.truth(k, f - 1).visible() == 0) != (s.truth(k, f).visible() == 0);
                if (was != is || hiddenChange) {
                    frames.add(f - 1);
                    frames.add(f);
                    frames.add(Math.min(s.frameCount() - 1, f + 3));
                }
            }
        }
        return frames;
    }

    private static boolean insideSomeBox(TrackingScenario s, int f, int i, int j) {
        for (int k = 0; k < s.objectCount(); k++) {
            ScenarioBox b = s.truth(k, f);
            if (i >= b.x() && i < b.x() + b.width() && j >= b.y() && j < b.y() + b.height()) {
                return true;
            }
        }
        return false;
    }
}
