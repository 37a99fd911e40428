package org.modetrail.demo.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.modetrail.demo.Rgb;

/**
 * Truth of the scenario family against rendered pixels. With the bare layers (flat floor, no noise, shadows, blur
 * or light change) an object's pixels are those that change when it alone is added to the empty frame, and the
 * pixels it shows in the full frame those that change when it alone is taken away: found by rendering, not from the
 * truth code.
 */
class FamilyTruthTest {

    private static final long[] SEEDS = {1, 2};

    @ParameterizedTest
    @EnumSource(FamilyKind.class)
    void truthBoxIsTheTightBoxOfTheBodyInTheFrameAndVisibleIsTheShareSeen(FamilyKind kind) {
        for (long seed : SEEDS) {
            FamilyScenario s = ScenarioFamily.create(kind, seed, FamilyRendering.BARE);
            int w = s.width();
            int n = w * s.height();
            int all = (1 << s.objectCount()) - 1;
            int[] empty = new int[n];
            int[] one = new int[n];
            int[] full = new int[n];
            int[] without = new int[n];
            int[] postsOnly = new int[n];
            int checked = 0;
            for (int f : framesToCheck(s, kind == FamilyKind.FAST_LARGE ? 6 : 14)) {
                s.render(f, empty, 0, false);
                s.render(f, full, all, true);
                s.render(f, postsOnly, 0, true);
                for (int k = 0; k < s.objectCount(); k++) {
                    ScenarioBox truth = s.truth(k, f);
                    String where = s.name() + " object " + k + " frame " + f;
                    s.render(f, one, 1 << k, false);
                    boolean[] body = Pixels.differ(one, empty);
                    int[] box = Pixels.box(body, w);
                    if (truth.width() == 0) {
                        assertNull(box, where + ": truth says out of view, yet it painted pixels");
                        assertEquals(0, truth.visible(), where);
                        continue;
                    }
                    assertNotNull(box, where + ": object painted nothing");
                    // Exact: bodies are not anti-aliased, and pixel column i spans [i, i+1).
                    assertEquals(box[0], truth.x(), 0, where + " x");
                    assertEquals(box[1], truth.y(), 0, where + " y");
                    assertEquals(box[2] - box[0], truth.width(), 0, where + " width");
                    assertEquals(box[3] - box[1], truth.height(), 0, where + " height");
                    s.render(f, without, all & ~(1 << k), true);
                    int seen = Pixels.count(Pixels.differ(full, without));
                    boolean wholly = truth.x() > 0 && truth.y() > 0 && truth.x() + truth.width() < w
                            && truth.y() + truth.height() < s.height();
                    if (wholly) {
                        // Slack for a body pixel that happens to match what is under it exactly.
                        assertEquals((double) seen / Pixels.count(body), truth.visible(), 0.01, where + " visible");
                        checked++;
                    } else {
                        // Part of the body is outside: the share seen is of the whole body, so less than in view.
                        assertTrue(truth.visible() <= (double) seen / Pixels.count(body) + 0.01, where + " visible "
                                + truth.visible() + " counts the part outside the frame as not seen");
                    }
                }
                boolean[] painted = Pixels.differ(full, postsOnly);
                for (int p = 0; p < n; p++) {
                    if (painted[p]) {
                        assertTrue(insideSomeBox(s, f, p % w, p / w), s.name() + " frame " + f + ": pixel (" + p % w
                                + ", " + p / w + ") changed outside every truth box");
                    }
                }
            }
            assertTrue(checked >= 5, s.name() + ": visible fraction checked " + checked + " times");
        }
    }

    /** The superellipse's area is 4ab Gamma(1 + 1/4)^2 / Gamma(1 + 2/4) (Lame curve of exponent 4). */
    private static final double SUPERELLIPSE_AREA_FACTOR = 4 * 0.9064024770554771 * 0.9064024770554771
            / 0.8862269254527580;

    @Test
    void aBodyHalfOutsideTheFrameIsHalfSeenAndItsBoxIsClipped() {
        // Centred on the left edge: columns -k-1 and k mirror each other, so exactly half the pixels are inside.
        FamilyScenario s = single(0, 120, 40, 20, List.of());
        ScenarioBox t = s.truth(0, 0);
        assertEquals(new ScenarioBox(0, 100, 40, 40, 0.5), t);
        int inside = paintedPixels(s);
        assertEquals(SUPERELLIPSE_AREA_FACTOR * 40 * 20 / 2, inside, 0.015 * inside, "half the area in view");
    }

    @Test
    void aBodyWhollyOutsideHasAnEmptyBoxAndPaintsNothing() {
        FamilyScenario s = single(-50, 120, 40, 20, List.of());
        assertEquals(new ScenarioBox(0, 0, 0, 0, 0), s.truth(0, 0));
        assertEquals(0, paintedPixels(s));
    }

    @Test
    void aBodyBehindAPostIsSeenOnlyWhereThePostLeavesIt() {
        Post post = new Post(150, 170, Rgb.pack(80, 90, 110));
        FamilyScenario s = single(160, 120, 40, 20, List.of(post));
        int whole = paintedPixels(s);
        int seen = seenPixels(s);
        ScenarioBox t = s.truth(0, 0);
        assertEquals((double) seen / whole, t.visible(), 1e-12);
        assertEquals(new ScenarioBox(120, 100, 80, 40, t.visible()), t, "amodal box: hidden pixels count");
        // The post hides the middle 20 of 80 columns, where the body is tallest: a little over a quarter.
        assertTrue(t.visible() > 0.65 && t.visible() < 0.75, "visible " + t.visible());
    }

    @Test
    void aBodyHalfOutsideAndPartlyBehindAPostCountsBothAsUnseen() {
        Post post = new Post(0, 20, Rgb.pack(80, 90, 110));
        FamilyScenario s = single(0, 120, 40, 20, List.of(post));
        int inside = paintedPixels(s);
        int seen = seenPixels(s);
        // The whole body is twice what is inside (mirror symmetry about the edge).
        assertEquals((double) seen / (2 * inside), s.truth(0, 0).visible(), 1e-12);
        assertTrue(s.truth(0, 0).visible() < 0.25, "visible " + s.truth(0, 0).visible());
    }

    /**
     * The exposure is a box filter in time (Potmesil and Chakravarty 1983): each pixel is the mean of the scene over
     * the exposure, so over a uniform floor a moving body's colour, summed over the picture, is that of the sharp
     * body, spread over a longer footprint. A renderer that divided by the covering samples only, or dropped the
     * floor's share, would add or lose colour here.
     */
    @Test
    void motionBlurSpreadsABodyButKeepsItsColour() {
        FamilyScenario blurred = moving(FamilyRendering.BARE.withBlur(true));
        FamilyScenario sharp = moving(FamilyRendering.BARE);
        assertEquals(21, blurred.exposureSamples(0, 1), "20 px of travel over the exposure, a sample per pixel");
        int n = blurred.width() * blurred.height();
        int[] a = new int[n];
        int[] b = new int[n];
        int[] floor = new int[n];
        blurred.render(1, a);
        sharp.render(1, b);
        sharp.render(1, floor, 0, false);
        double[] sumBlurred = excess(a, floor);
        double[] sumSharp = excess(b, floor);
        for (int c = 0; c < 3; c++) {
            assertEquals(sumSharp[c], sumBlurred[c], 0.01 * Math.abs(sumSharp[c]) + 200, "channel " + c);
        }
        int[] blurBox = Pixels.box(Pixels.differ(a, floor), blurred.width());
        int[] sharpBox = Pixels.box(Pixels.differ(b, floor), blurred.width());
        // A shutter open the whole frame interval smears the body over its 20 px of travel.
        assertEquals(sharpBox[2] - sharpBox[0] + 20, blurBox[2] - blurBox[0], 2, "blur length");
        assertEquals(sharpBox[3] - sharpBox[1], blurBox[3] - blurBox[1], 0, "no blur across the motion");
        assertEquals(sharp.truth(0, 1), blurred.truth(0, 1), "truth is the body at the frame's instant");
    }

    @ParameterizedTest
    @EnumSource(value = FamilyKind.class, names = {"PUSHED", "FAST_LARGE", "SMALL_ERRATIC"})
    void aBlurredBodyCoversItsTruthBoxAndReachesNoFurtherThanItsTravel(FamilyKind kind) {
        FamilyScenario s = ScenarioFamily.create(kind, 1, FamilyRendering.BARE.withBlur(true));
        int n = s.width() * s.height();
        int[] one = new int[n];
        int[] empty = new int[n];
        int blurred = 0;
        for (int f = 1; f < s.frameCount() - 1 && blurred < 8; f++) {
            if (s.exposureSamples(0, f) < 7) {
                continue;
            }
            blurred++;
            s.render(f, one, 1, false);
            s.render(f, empty, 0, false);
            int[] box = Pixels.box(Pixels.differ(one, empty), s.width());
            ScenarioBox t = s.truth(0, f);
            String where = s.name() + " frame " + f;
            assertTrue(box[0] <= t.x() && box[1] <= t.y() && box[2] >= t.x() + t.width()
                    && box[3] >= t.y() + t.height(), where + ": smear " + java.util.Arrays.toString(box)
                    + " holds the truth " + t);
            BodyTrack track = s.bodies().get(0).track();
            double reach = s.plan().shutter() / 2 * (Math.hypot(track.cx(f + 1) - track.cx(f), track.cy(f + 1)
                    - track.cy(f)) + Math.hypot(track.cx(f) - track.cx(f - 1), track.cy(f) - track.cy(f - 1)))
                    + track.a(f) * Math.abs(Routes.wrap(track.heading(f + 1) - track.heading(f - 1))) + 2;
            assertTrue(box[0] >= t.x() - reach && box[2] <= t.x() + t.width() + reach && box[1] >= t.y() - reach
                    && box[3] <= t.y() + t.height() + reach, where + ": smear " + java.util.Arrays.toString(box)
                    + " within " + reach + " px of " + t);
        }
        assertTrue(blurred >= 3, s.name() + ": only " + blurred + " strongly blurred frames");
    }

    @ParameterizedTest
    @EnumSource(value = FamilyKind.class, names = {"PLAZA", "PERSPECTIVE", "PUSHED"})
    void anObjectThatLeavesIsGoneFromTruthAndPixels(FamilyKind kind) {
        int left = 0;
        for (long seed : ScenarioFamily.tuningSeeds(kind)) {
            FamilyScenario s = ScenarioFamily.create(kind, seed, FamilyRendering.BARE);
            int n = s.width() * s.height();
            int[] with = new int[n];
            int[] without = new int[n];
            for (int k = 0; k < s.objectCount(); k++) {
                int leaves = -1;
                for (int f = 1; f < s.frameCount(); f++) {
                    if (s.truth(k, f - 1).width() > 0 && s.truth(k, f).width() == 0) {
                        leaves = f;
                    }
                }
                if (leaves < 0) {
                    continue;
                }
                left++;
                for (int f = leaves; f < Math.min(s.frameCount(), leaves + 30); f += 7) {
                    ScenarioBox t = s.truth(k, f);
                    if (t.width() > 0) {
                        break;
                    }
                    assertEquals(0, t.height(), s.name() + " object " + k + " frame " + f);
                    assertEquals(0, t.visible(), s.name() + " object " + k + " frame " + f);
                    s.render(f, with, 1 << k, false);
                    s.render(f, without, 0, false);
                    assertArrayEquals(without, with, s.name() + " object " + k + " left at " + leaves
                            + " but shows in frame " + f);
                }
            }
        }
        assertTrue(left >= 4, kind + ": objects leaving the view over the tuning seeds: " + left);
    }

    /** Rendered pixels of the single test body, measured against the empty frame. */
    private static int paintedPixels(FamilyScenario s) {
        int n = s.width() * s.height();
        int[] one = new int[n];
        int[] empty = new int[n];
        s.render(0, one, 1, false);
        s.render(0, empty, 0, false);
        return Pixels.count(Pixels.differ(one, empty));
    }

    private static int seenPixels(FamilyScenario s) {
        int n = s.width() * s.height();
        int[] one = new int[n];
        int[] empty = new int[n];
        s.render(0, one, 1, true);
        s.render(0, empty, 0, true);
        return Pixels.count(Pixels.differ(one, empty));
    }

    /** One upright-rectangle body, still, on a 320 x 240 flat floor, with the given posts. */
    private static FamilyScenario single(double cx, double cy, double a, double b, List<Post> posts) {
        double[] x = {cx, cx};
        double[] y = {cy, cy};
        BodyTrack t = BodyTrack.of(x, y, new double[] {a, a}, new double[] {b, b}, new double[2]);
        return new FamilyScenario(plan(t, posts, 0), FamilyRendering.BARE);
    }

    /** A textured body crossing the floor at 20 px a frame with the shutter open all the frame interval. */
    private static FamilyScenario moving(FamilyRendering rendering) {
        double[] x = {140, 160, 180};
        double[] y = {120, 120, 120};
        BodyTrack t = BodyTrack.of(x, y, new double[] {30, 30, 30}, new double[] {18, 18, 18}, new double[3]);
        return new FamilyScenario(plan(t, List.of(), 1), rendering);
    }

    private static FamilyPlan plan(BodyTrack track, List<Post> posts, double shutter) {
        ObjectLook look = new ObjectLook(Rgb.pack(198, 74, 52), Rgb.pack(126, 42, 34), Rgb.pack(236, 164, 104), 30,
                18, true, 5);
        return new FamilyPlan(FamilyKind.SMALL_ERRATIC, 1, 320, 240, 25, track.frames(),
                List.of(new FamilyBody(look, track, FamilyBody.Shadow.NONE)),
                new FamilyFloor(FamilyFloor.Style.TILES, 0x808080, 0x606060, 40, 0, 0), List.of(), posts,
                Lighting.CONSTANT, ShadowBand.NONE, SoftShadows.NONE, shutter, 0, 23);
    }

    /** Per channel, the sum over the picture of the frame less the floor. */
    private static double[] excess(int[] frame, int[] floor) {
        double[] sum = new double[3];
        for (int p = 0; p < frame.length; p++) {
            for (int c = 0; c < 3; c++) {
                int shift = 16 - 8 * c;
                sum[c] += ((frame[p] >>> shift) & 0xFF) - ((floor[p] >>> shift) & 0xFF);
            }
        }
        return sum;
    }

    /** Every {@code stride}-th part of the clip, the last frame, and around each change of object 0's visibility. */
    private static Set<Integer> framesToCheck(TrackingScenario s, int count) {
        Set<Integer> frames = new TreeSet<>();
        for (int k = 0; k < count; k++) {
            frames.add((int) ((long) k * (s.frameCount() - 1) / (count - 1)));
        }
        int extra = 0;
        for (int f = 1; f < s.frameCount() && extra < 6; f++) {
            boolean was = s.truth(0, f - 1).visible() == 1;
            boolean is = s.truth(0, f).visible() == 1;
            if (was != is) {
                frames.add(f);
                extra++;
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
