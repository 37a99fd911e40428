package org.modetrail.demo.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Each scenario is what its kind claims, measured from truth and pixels at the default configuration. */
class ScenarioPropertiesTest {

    private static final ScenarioConfig DEFAULTS = ScenarioConfig.defaults();
    private static final ScenarioConfig CLEAN = DEFAULTS.withSensorNoise(0);
    private static final ScenarioConfig FLAT = CLEAN.withTexture(false);

    private static SyntheticTrackingScenario create(ScenarioKind kind, ScenarioConfig config) {
        return (SyntheticTrackingScenario) TrackingScenarios.create(kind, config);
    }

    @ParameterizedTest
    @EnumSource(ScenarioKind.class)
    void defaultsAreShortClipsWithBoxesInsideTheFrame(ScenarioKind kind) {
        TrackingScenario s = TrackingScenarios.create(kind, 1);
        assertEquals(640, s.width());
        assertEquals(480, s.height());
        assertEquals(25, s.fps());
        assertTrue(s.frameCount() >= 150 && s.frameCount() <= 250, "frames " + s.frameCount());
        assertEquals(kind == ScenarioKind.CROSSING ? 2 : 1, s.objectCount());
        for (int f = 0; f < s.frameCount(); f++) {
            for (int k = 0; k < s.objectCount(); k++) {
                ScenarioBox b = s.truth(k, f);
                assertTrue(b.width() > 0 && b.height() > 0, kind + " frame " + f + " empty box");
                // Strictly inside: a body cut by the frame edge would make the amodal box a clipped one.
                assertTrue(b.x() > 0 && b.y() > 0 && b.x() + b.width() < s.width()
                        && b.y() + b.height() < s.height(), kind + " frame " + f + " box " + b + " touches the edge");
            }
        }
        int[] rgb = new int[640 * 480];
        s.render(s.frameCount() / 2, rgb);
        for (int c : rgb) {
            assertEquals(0xFF, c >>> 24, "opaque alpha, as Modetrail's video frames have");
        }
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void translationMovesTwoToFivePixelsPerFrame(long seed) {
        TrackingScenario s = TrackingScenarios.create(ScenarioKind.TRANSLATION, seed);
        double[] steps = Pixels.steps(s, 0);
        for (int f = 0; f < steps.length; f++) {
            // Box edges are whole pixels of a body at sub-pixel positions, and the body sways, so the box centre
            // jitters by up to about 0.8 px around the centre's own path of 2.2..4.8 px per frame.
            assertTrue(steps[f] >= 1.2 && steps[f] <= 5.8, "step " + steps[f] + " at frame " + f);
        }
        double median = Pixels.median(steps);
        assertTrue(median >= 2 && median <= 5, "median step " + median);
        for (int f = 0; f < s.frameCount(); f++) {
            ScenarioBox b = s.truth(0, f);
            // 60 x 40, turned by at most about 6 degrees.
            assertTrue(b.width() >= 59 && b.width() <= 66 && b.height() >= 39 && b.height() <= 47, "size " + b);
        }
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void fastMotionJumpsFifteenToTwentyFivePixelsAndTurnsAbruptly(long seed) {
        TrackingScenario s = TrackingScenarios.create(ScenarioKind.FAST_MOTION, seed);
        double[] steps = Pixels.steps(s, 0);
        assertTrue(Pixels.median(steps) >= 15, "median step " + Pixels.median(steps));
        int abrupt = 0;
        for (int f = 1; f < s.frameCount() - 1; f++) {
            assertTrue(steps[f - 1] <= 26, "step " + steps[f - 1] + " at frame " + f);
            ScenarioBox a = s.truth(0, f - 1);
            ScenarioBox b = s.truth(0, f);
            ScenarioBox c = s.truth(0, f + 1);
            double turn = Math.abs(Routes.wrap(Math.atan2(c.centreY() - b.centreY(), c.centreX() - b.centreX())
                    - Math.atan2(b.centreY() - a.centreY(), b.centreX() - a.centreX())));
            if (turn > Math.toRadians(60)) {
                abrupt++;
            }
        }
        // Runs of 3 to 7 frames: about 40 turns in 200 frames.
        assertTrue(abrupt >= 20, "abrupt turns " + abrupt);
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void scaleChangeGrowsAndShrinksByFortyPercent(long seed) {
        TrackingScenario s = TrackingScenarios.create(ScenarioKind.SCALE_CHANGE, seed);
        ScenarioBox first = s.truth(0, 0);
        double minW = Double.MAX_VALUE;
        double maxW = 0;
        double minH = Double.MAX_VALUE;
        double maxH = 0;
        for (int f = 0; f < s.frameCount(); f++) {
            ScenarioBox b = s.truth(0, f);
            minW = Math.min(minW, b.width());
            maxW = Math.max(maxW, b.width());
            minH = Math.min(minH, b.height());
            maxH = Math.max(maxH, b.height());
            assertEquals(1.5, b.width() / b.height(), 0.1, "aspect ratio of " + b);
        }
        assertEquals(60, first.width(), 1);
        // 60 x 40 to 84 x 56 and 36 x 24: +-40 %, within a pixel.
        assertTrue(maxW >= 83 && maxH >= 55, "largest " + maxW + " x " + maxH);
        assertTrue(minW <= 37 && minH <= 25, "smallest " + minW + " x " + minH);
        assertTrue(maxW / minW >= 2.2, "width ratio " + maxW / minW);
        double travelled = java.util.Arrays.stream(Pixels.steps(s, 0)).sum();
        assertTrue(travelled > 200, "it moves while it scales, " + travelled + " px in all");
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void clutterBlotchesShareTheTargetsColourAndLieOnItsWay(long seed) {
        SyntheticTrackingScenario s = create(ScenarioKind.CLUTTER, CLEAN.withSeed(seed));
        double[] target = objectColour(create(ScenarioKind.CLUTTER, FLAT.withSeed(seed)), 0);
        int[] floorOnly = new int[640 * 480];
        s.render(0, floorOnly, 0, false);
        int similar = 0;
        int passedOver = 0;
        for (Blotch b : s.blotches()) {
            boolean[] core = new boolean[floorOnly.length];
            for (int p = 0; p < core.length; p++) {
                core[p] = b.core(p % 640, p / 640);
            }
            double[] mean = Pixels.meanColour(floorOnly, core);
            // 60 RGB levels: the same reddish family, far closer than the grey floor (checked below).
            if (Pixels.distance(mean, target) <= 60) {
                similar++;
            }
            double nearest = Double.MAX_VALUE;
            for (int f = 0; f < s.frameCount(); f++) {
                ScenarioBox t = s.truth(0, f);
                nearest = Math.min(nearest, Math.hypot(t.centreX() - b.cx(), t.centreY() - b.cy()));
            }
            // Within one and a half body lengths of the target's centre: inside a search window around it.
            assertTrue(nearest <= 90, "blotch at " + b.cx() + ", " + b.cy() + " is " + nearest + " px from the path");
            if (nearest <= Math.min(b.rx(), b.ry())) {
                passedOver++;
            }
        }
        assertTrue(similar >= 4, "blotches of the target's colour family: " + similar);
        assertTrue(passedOver >= 3, "blotches the target passes over: " + passedOver);
        boolean[] floorMask = Pixels.outside(s.truth(0, 0), 640, 480, 0);
        for (Blotch b : s.blotches()) {
            for (int p = 0; p < floorMask.length; p++) {
                floorMask[p] &= b.radial(p % 640, p / 640) > 1 + Blotch.WOBBLE;
            }
        }
        assertTrue(Pixels.distance(Pixels.meanColour(floorOnly, floorMask), target) > 90, "floor is not reddish");
    }

    @Test
    void occlusionHidesTheTargetForExactlyTenFramesOnAStraightPath() {
        SyntheticTrackingScenario s = create(ScenarioKind.OCCLUSION, DEFAULTS);
        List<int[]> runs = hiddenRuns(s);
        assertEquals(1, runs.size(), "one hidden run");
        int from = runs.get(0)[0];
        int to = runs.get(0)[1];
        assertEquals(10, to - from + 1, "hidden frames " + from + ".." + to);
        assertEquals(1.0, s.truth(0, 0).visible());
        assertEquals(1.0, s.truth(0, s.frameCount() - 1).visible());
        assertTrue(s.truth(0, from - 1).visible() > 0 && s.truth(0, to + 1).visible() > 0, "seen either side");
        // Hidden means hidden: the frame is the same with and without the object.
        int[] with = new int[640 * 480];
        int[] without = new int[640 * 480];
        for (int f = from; f <= to; f++) {
            s.render(f, with);
            s.render(f, without, 0, true);
            assertArrayEquals(without, with, "frame " + f);
        }
        // Constant velocity through the hidden run: every step within a pixel of the median.
        double[] steps = Pixels.steps(s, 0);
        double median = Pixels.median(steps);
        for (int f = from - 20; f <= to + 20; f++) {
            assertEquals(median, steps[f], 1.0, "step at frame " + f);
        }
        ScenarioBox before = s.truth(0, from - 1);
        ScenarioBox after = s.truth(0, to + 1);
        assertEquals(11 * median, Math.hypot(after.centreX() - before.centreX(), after.centreY() - before.centreY()),
                1.5, "reappears where the straight path puts it");
        // The post is slate grey, unlike the reddish target.
        SyntheticTrackingScenario flat = create(ScenarioKind.OCCLUSION, FLAT);
        double[] target = objectColour(flat, 0);
        Post post = s.posts().get(0);
        boolean[] postMask = new boolean[640 * 480];
        for (int p = 0; p < postMask.length; p++) {
            postMask[p] = post.coversColumn(p % 640);
        }
        create(ScenarioKind.OCCLUSION, CLEAN).render(0, without, 0, true);
        assertTrue(Pixels.distance(Pixels.meanColour(without, postMask), target) > 100, "post colour differs");
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void crossingOverlapsTwiceTargetUnderThenOver(long seed) {
        TrackingScenario s = TrackingScenarios.create(ScenarioKind.CROSSING, seed);
        List<int[]> events = new ArrayList<>();
        for (int f = 0; f < s.frameCount(); f++) {
            if (s.truth(0, f).iou(s.truth(1, f)) > 0.5) {
                if (events.isEmpty() || events.get(events.size() - 1)[1] != f - 1) {
                    events.add(new int[] {f, f});
                }
                events.get(events.size() - 1)[1] = f;
            }
        }
        assertEquals(2, events.size(), "two crossings with IoU > 0.5");
        for (int[] e : events) {
            assertTrue(e[1] - e[0] + 1 >= 3, "IoU > 0.5 for " + (e[1] - e[0] + 1) + " frames from " + e[0]);
        }
        assertTrue(minVisible(s, 0, events.get(0)) < 0.2 && minVisible(s, 1, events.get(0)) == 1,
                "first crossing: the target passes under");
        assertTrue(minVisible(s, 0, events.get(1)) == 1 && minVisible(s, 1, events.get(1)) < 0.2,
                "second crossing: the target passes over");
        for (int f = 1; f < s.frameCount(); f++) {
            for (int k = 0; k < 2; k++) {
                // No sudden swap of which object is in front while they overlap.
                assertEquals(s.truth(k, f - 1).visible(), s.truth(k, f).visible(), 0.2, "object " + k + " at " + f);
            }
            assertEquals(s.truth(0, f).area(), s.truth(1, f).area(), 0.15 * s.truth(0, f).area(), "same size");
        }
        double[] c0 = objectColour(create(ScenarioKind.CROSSING, FLAT.withSeed(seed)), 0);
        double[] c1 = objectColour(create(ScenarioKind.CROSSING, FLAT.withSeed(seed)), 1);
        double d = Pixels.distance(c0, c1);
        assertTrue(d > 3 && d < 40, "one colour family, slightly different shades: distance " + d);
    }

    @Test
    void smallDarkObjectIsTwentyFourBySixteenAndMuchDarkerThanTheFloor() {
        SyntheticTrackingScenario s = create(ScenarioKind.SMALL_DARK, DEFAULTS);
        double[] widths = new double[s.frameCount()];
        double[] heights = new double[s.frameCount()];
        for (int f = 0; f < s.frameCount(); f++) {
            ScenarioBox b = s.truth(0, f);
            assertTrue(b.width() >= 23 && b.width() <= 24 && b.height() >= 15 && b.height() <= 16, "size " + b);
            widths[f] = b.width();
            heights[f] = b.height();
        }
        assertEquals(24, Pixels.median(widths));
        assertEquals(16, Pixels.median(heights));
        int[] frame = new int[640 * 480];
        int[] floor = new int[640 * 480];
        for (int f : new int[] {0, 100, 199}) {
            s.render(f, frame);
            s.render(f, floor, 0, true);
            double object = luma(frame, Pixels.differ(frame, floor));
            double around = luma(frame, Pixels.outside(s.truth(0, f), 640, 480, 4));
            // Our stated margin: 100 luma levels of 255.
            assertTrue(object <= around - 100, "object luma " + object + ", floor " + around + " at " + f);
        }
    }

    @Test
    void lightingDimsByAtLeastThirtyPercentAndCools() {
        SyntheticTrackingScenario s = create(ScenarioKind.LIGHTING_DRIFT, DEFAULTS);
        int last = s.frameCount() - 1;
        int[] a = new int[640 * 480];
        int[] b = new int[640 * 480];
        s.render(0, a);
        s.render(last, b);
        double[] start = Pixels.meanColour(a, Pixels.outside(s.truth(0, 0), 640, 480, 4));
        double[] end = Pixels.meanColour(b, Pixels.outside(s.truth(0, last), 640, 480, 4));
        double ratio = lumaOf(end) / lumaOf(start);
        assertTrue(ratio <= 0.7, "floor brightness last / first " + ratio);
        double tint = (end[2] / end[0]) / (start[2] / start[0]);
        assertTrue(tint >= 1.15, "blue / red of the floor grows (warm to cool) by " + tint);
        for (int f = 1; f < s.frameCount(); f++) {
            assertEquals(1.0, s.truth(0, f).visible(), "nothing hides the target");
        }
        // Gradual: no frame-to-frame jump in brightness a tracker could take for a cut.
        int[] c = new int[640 * 480];
        s.render(last / 2, c);
        s.render(last / 2 + 1, a);
        boolean[] everywhere = Pixels.outside(new ScenarioBox(-10, -10, 0, 0, 1), 640, 480, 0);
        assertEquals(lumaOf(Pixels.meanColour(c, everywhere)), lumaOf(Pixels.meanColour(a, everywhere)), 1.5);
    }

    /** Mean colour of an object's pixels on the flat floor, over a few frames. */
    private static double[] objectColour(SyntheticTrackingScenario flat, int object) {
        int[] one = new int[flat.width() * flat.height()];
        int[] empty = new int[one.length];
        double[] sum = new double[3];
        int[] frames = {0, 60, 120};
        for (int f : frames) {
            flat.render(f, one, 1 << object, false);
            flat.render(f, empty, 0, false);
            double[] m = Pixels.meanColour(one, Pixels.differ(one, empty));
            for (int c = 0; c < 3; c++) {
                sum[c] += m[c] / frames.length;
            }
        }
        return sum;
    }

    private static List<int[]> hiddenRuns(TrackingScenario s) {
        List<int[]> runs = new ArrayList<>();
        for (int f = 0; f < s.frameCount(); f++) {
            if (s.truth(0, f).visible() == 0) {
                if (runs.isEmpty() || runs.get(runs.size() - 1)[1] != f - 1) {
                    runs.add(new int[] {f, f});
                }
                runs.get(runs.size() - 1)[1] = f;
            }
        }
        return runs;
    }

    private static double minVisible(TrackingScenario s, int object, int[] frames) {
        double v = 1;
        for (int f = frames[0]; f <= frames[1]; f++) {
            v = Math.min(v, s.truth(object, f).visible());
        }
        return v;
    }

    private static double luma(int[] rgb, boolean[] mask) {
        return lumaOf(Pixels.meanColour(rgb, mask));
    }

    private static double lumaOf(double[] rgb) {
        return 0.299 * rgb[0] + 0.587 * rgb[1] + 0.114 * rgb[2];
    }
}
