package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ArenaScenarioTest {

    /** Half the default size: motion scales with the frame, so the same seed gives the same story, faster. */
    private static final ArenaConfig SMALL = ArenaConfig.defaults().withSize(320, 240);

    @Test
    void truthBoxesTightlyContainTheRenderedBodies() {
        ArenaConfig flat = SMALL.withStyle(RenderStyle.flat());
        ArenaScene scene = new ArenaScene(flat);
        int[] rgb = new int[320 * 240];
        int checked = 0;
        for (int f = 0; f < flat.frameCount(); f += 7) {
            List<TruthRow> rows = scene.render(f, rgb);
            assertEquals(3, rows.size(), "three animals in frame " + f);
            checked += PixelBoxes.check(rgb, 320, 240, rows, "frame " + f);
        }
        assertTrue(checked > 100, "most boxes were isolated and checked, got " + checked);
    }

    @Test
    void bodiesAreAboutThirtyToFiftyPixelsLongAtTheDefaultSize() {
        ArenaScene scene = new ArenaScene(ArenaConfig.defaults().withStyle(RenderStyle.flat()).withTiming(25, 1));
        for (TruthRow r : scene.render(0, new int[640 * 480])) {
            double length = Math.max(r.width(), r.height());
            assertTrue(length >= 28 && length <= 52, "track " + r.trackId() + " is " + length + " px long");
        }
    }

    @Test
    void everySeedHasAtLeastTwoCrossingsWithRealOcclusion() {
        for (long seed = 1; seed <= 3; seed++) {
            ArenaScene scene = new ArenaScene(SMALL.withSeed(seed).withStyle(RenderStyle.flat()));
            int[] rgb = new int[320 * 240];
            // An episode: consecutive frames in which some animal is less than 80 % visible.
            int episodes = 0;
            boolean inEpisode = false;
            for (int f = 0; f < scene.frameCount(); f++) {
                boolean occluded = scene.render(f, rgb).stream().anyMatch(r -> r.visible() < 0.8);
                if (occluded && !inEpisode) {
                    episodes++;
                }
                inEpisode = occluded;
            }
            assertTrue(episodes >= 2, "seed " + seed + " has " + episodes + " crossings");
        }
    }

    @Test
    void animalsStayInsideTheArenaWallAndMoveSmoothly() {
        ArenaScene scene = new ArenaScene(SMALL.withStyle(RenderStyle.flat()));
        ArenaConfig c = scene.config();
        int[] rgb = new int[320 * 240];
        Map<Integer, TruthRow> previous = new HashMap<>();
        for (int f = 0; f < c.frameCount(); f++) {
            for (TruthRow r : scene.render(f, rgb)) {
                // Every box corner lies within the wall's inner circle (the ellipse touches it at most).
                for (double[] corner : new double[][] {{r.x(), r.y()}, {r.x() + r.width(), r.y() + r.height()}}) {
                    double d = Math.hypot(corner[0] - c.centreX(), corner[1] - c.centreY());
                    assertTrue(d < c.radius() * Math.sqrt(2) + 1, "box corner beyond the wall in frame " + f);
                }
                double cx = r.x() + r.width() / 2;
                double cy = r.y() + r.height() / 2;
                assertTrue(Math.hypot(cx - c.centreX(), cy - c.centreY()) < c.radius(), "centre inside the wall");
                TruthRow p = previous.put(r.trackId(), r);
                if (p != null) {
                    double step = Math.hypot(cx - p.x() - p.width() / 2, cy - p.y() - p.height() / 2);
                    // Fastest animal: 2.2 x 90 px/s at 480 lines, i.e. about 2 px per frame here, plus turning.
                    assertTrue(step < 8, "track " + r.trackId() + " jumped " + step + " px at frame " + f);
                }
            }
        }
    }

    @Test
    void configurationIsValidatedOnCreation() {
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> ArenaConfig.defaults().withSize(10, 480));
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> ArenaConfig.defaults().withTiming(0, 10));
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new RenderStyle(true, 99, false));
    }
}
