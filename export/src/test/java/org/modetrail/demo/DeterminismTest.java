package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Same seed, same pixels and truth, whatever order frames are rendered in; another seed, other pixels. */
class DeterminismTest {

    private static final ArenaConfig ARENA = ArenaConfig.defaults().withSize(200, 150).withTiming(25, 60);
    private static final RoadConfig ROAD = RoadConfig.defaults().withSize(320, 180).withTiming(25, 60);

    @Test
    void arenaSameSeedRendersIdenticalFramesInAnyOrder() {
        ArenaScene forwards = new ArenaScene(ARENA);
        ArenaScene backwards = new ArenaScene(ARENA);
        int[] frames = {0, 31, 59};
        int[][] pixels = new int[frames.length][200 * 150];
        List<List<TruthRow>> truth = new java.util.ArrayList<>();
        for (int k = 0; k < frames.length; k++) {
            truth.add(forwards.render(frames[k], pixels[k]));
        }
        // Rendering in the other order must not matter: any frame comes out the same on demand.
        int[] b = new int[200 * 150];
        for (int k = frames.length - 1; k >= 0; k--) {
            List<TruthRow> tb = backwards.render(frames[k], b);
            assertArrayEquals(pixels[k], b, "frame " + frames[k]);
            assertEquals(truth.get(k), tb, "truth of frame " + frames[k]);
        }
    }

    @Test
    void arenaOtherSeedRendersOtherPixels() {
        int[] a = new int[200 * 150];
        int[] b = new int[200 * 150];
        List<TruthRow> ta = new ArenaScene(ARENA).render(40, a);
        List<TruthRow> tb = new ArenaScene(ARENA.withSeed(2)).render(40, b);
        assertTrue(differingPixels(a, b) > a.length / 2, "texture and noise should differ almost everywhere");
        assertTrue(!ta.get(0).equals(tb.get(0)), "motion should differ too");
    }

    @Test
    void sensorNoiseChangesEveryFrameButBackgroundDoesNot() {
        ArenaConfig noNoise = ARENA.withStyle(new RenderStyle(true, 0, true));
        ArenaScene noisy = new ArenaScene(ARENA);
        ArenaScene clean = new ArenaScene(noNoise);
        int[] n0 = new int[200 * 150];
        int[] n1 = new int[200 * 150];
        int[] c0 = new int[200 * 150];
        int[] c1 = new int[200 * 150];
        noisy.render(10, n0);
        noisy.render(11, n1);
        clean.render(10, c0);
        clean.render(11, c1);
        // Only the animals move between clean frames; noise touches far more pixels.
        assertTrue(differingPixels(c0, c1) < c0.length / 20, "clean frames differ only where animals moved");
        assertTrue(differingPixels(n0, n1) > n0.length / 2, "noise is drawn afresh each frame");
        int maxDelta = 0;
        for (int i = 0; i < n0.length; i++) {
            maxDelta = Math.max(maxDelta, Math.abs(Rgb.green(n0[i]) - Rgb.green(c0[i])));
        }
        int amplitude = ARENA.style().sensorNoise();
        assertTrue(maxDelta > 0 && maxDelta <= amplitude + amplitude / 2, "noise stays mild, got " + maxDelta);
    }

    @Test
    void roadSameSeedSamePixelsOtherSeedOtherPixels() {
        int[] a = new int[320 * 180];
        int[] b = new int[320 * 180];
        int[] c = new int[320 * 180];
        List<TruthRow> ta = new RoadScene(ROAD).render(30, a);
        List<TruthRow> tb = new RoadScene(ROAD).render(30, b);
        new RoadScene(ROAD.withSeed(9)).render(30, c);
        assertArrayEquals(a, b);
        assertEquals(ta, tb);
        assertTrue(differingPixels(a, c) > a.length / 2);
    }

    static int differingPixels(int[] a, int[] b) {
        int n = 0;
        for (int i = 0; i < a.length; i++) {
            if (a[i] != b[i]) {
                n++;
            }
        }
        return n;
    }
}
