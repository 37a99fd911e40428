package org.modetrail.demo.scenario;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Each kind of the family is what it claims, over its tuning seeds, measured from truth boxes and pixels: sizes and
 * speeds within the stated ranges and spread over them, and the situation itself (turns, pushes, crossings, growth,
 * turning round, occlusion, light).
 */
class FamilyKindsTest {

    /** Truth boxes are whole pixels about a sub-pixel centre: a box centre jitters by up to a pixel. */
    private static final double BOX_JITTER = 1.5;

    @ParameterizedTest
    @EnumSource(FamilyKind.class)
    void targetSizesAndSpeedsStayInTheKindsRangesAndSpreadOverThem(FamilyKind kind) {
        double smallest = Double.MAX_VALUE;
        double largest = 0;
        double fastest = 0;
        for (long seed : ScenarioFamily.tuningSeeds(kind)) {
            FamilyScenario s = ScenarioFamily.create(kind, seed, FamilyRendering.BARE);
            BodyTrack t = s.bodies().get(0).track();
            for (int f = 0; f < s.frameCount(); f++) {
                ScenarioBox b = s.truth(0, f);
                if (!wholly(s, b)) {
                    continue;
                }
                double length = 2 * t.a(f);
                smallest = Math.min(smallest, length);
                largest = Math.max(largest, length);
                double side = Math.max(b.width(), b.height());
                // The box of a body of length L turned any way: its longer side is L/sqrt(2) to 1.2 L.
                assertTrue(side >= length * 0.7 - 1 && side <= length * 1.2 + 1, s.name() + " frame " + f + " box "
                        + b + " for a body " + length + " long");
                assertTrue(length >= kind.minSize() - 0.5 && length <= kind.maxSize() + 0.5, s.name() + " frame "
                        + f + " body length " + length + " outside " + kind.minSize() + ".." + kind.maxSize());
                if (f > 0 && wholly(s, s.truth(0, f - 1))) {
                    ScenarioBox p = s.truth(0, f - 1);
                    double step = Math.hypot(b.centreX() - p.centreX(), b.centreY() - p.centreY());
                    assertTrue(step <= kind.maxSpeed() + BOX_JITTER, s.name() + " frame " + f + " step " + step);
                }
            }
            // How fast the kind gets: any body, wholly in view (a vehicle is fastest as it nears the camera).
            for (int k = 0; k < s.objectCount(); k++) {
                for (int f = 1; f < s.frameCount(); f++) {
                    ScenarioBox b = s.truth(k, f);
                    ScenarioBox p = s.truth(k, f - 1);
                    if (wholly(s, b) && wholly(s, p)) {
                        fastest = Math.max(fastest, Math.hypot(b.centreX() - p.centreX(), b.centreY() - p.centreY()));
                    }
                }
            }
        }
        double span = kind.maxSize() - kind.minSize();
        assertTrue(smallest <= kind.minSize() + 0.45 * span, kind + ": smallest target " + smallest);
        assertTrue(largest >= kind.maxSize() - 0.45 * span, kind + ": largest target " + largest);
        assertTrue(fastest >= 0.6 * kind.maxSpeed() && fastest <= kind.maxSpeed() + BOX_JITTER, kind
                + ": fastest step " + fastest);
    }

    @Test
    void noBodyOfAnyKindMovesMoreThanFortyPixelsAFrame() {
        for (FamilyKind kind : FamilyKind.values()) {
            for (long seed : ScenarioFamily.tuningSeeds(kind)) {
                FamilyScenario s = ScenarioFamily.create(kind, seed, FamilyRendering.BARE);
                for (int k = 0; k < s.objectCount(); k++) {
                    BodyTrack t = s.bodies().get(k).track();
                    for (int f = 1; f < s.frameCount(); f++) {
                        if (t.shown(f) && t.shown(f - 1)) {
                            double step = Math.hypot(t.cx(f) - t.cx(f - 1), t.cy(f) - t.cy(f - 1));
                            assertTrue(step <= 40, s.name() + " object " + k + " frame " + f + " step " + step);
                        }
                    }
                }
            }
        }
    }

    @Test
    void smallErraticTurnsAbruptlyRestsAndComesDarkOrLight() {
        int dark = 0;
        int light = 0;
        for (long seed : ScenarioFamily.tuningSeeds(FamilyKind.SMALL_ERRATIC)) {
            FamilyScenario s = ScenarioFamily.create(FamilyKind.SMALL_ERRATIC, seed, FamilyRendering.BARE);
            BodyTrack t = s.bodies().get(0).track();
            int abrupt = 0;
            int rests = 0;
            for (int f = 1; f < s.frameCount() - 1; f++) {
                double ax = t.cx(f) - t.cx(f - 1);
                double ay = t.cy(f) - t.cy(f - 1);
                double bx = t.cx(f + 1) - t.cx(f);
                double by = t.cy(f + 1) - t.cy(f);
                if (Math.hypot(ax, ay) < 1e-9) {
                    rests++;
                } else if (Math.hypot(bx, by) > 1e-9 && Math.abs(Routes.wrap(Math.atan2(by, bx)
                        - Math.atan2(ay, ax))) > Math.toRadians(45)) {
                    abrupt++;
                }
            }
            // Runs of 2 to 8 frames: a turn of 45 degrees or more every few frames.
            assertTrue(abrupt >= s.frameCount() / 15, s.name() + " abrupt turns " + abrupt);
            assertTrue(rests >= 3, s.name() + " rest frames " + rests);
            double[] colour = bodyColour(s, 0, 0);
            double luma = luma(colour);
            if (luma < 100) {
                dark++;
            } else if (luma > 150) {
                light++;
            }
        }
        assertTrue(dark >= 3 && light >= 2, "dark " + dark + ", light " + light + " targets");
    }

    @Test
    void lookalikesCrossTwiceTheTargetUnderThenOver() {
        for (long seed : ScenarioFamily.tuningSeeds(FamilyKind.LOOKALIKES)) {
            FamilyScenario s = ScenarioFamily.create(FamilyKind.LOOKALIKES, seed, FamilyRendering.BARE);
            List<int[]> meetings = new ArrayList<>();
            for (int f = 0; f < s.frameCount(); f++) {
                if (s.truth(0, f).iou(s.truth(1, f)) > 0.2) {
                    if (meetings.isEmpty() || meetings.get(meetings.size() - 1)[1] < f - 5) {
                        meetings.add(new int[] {f, f});
                    }
                    meetings.get(meetings.size() - 1)[1] = f;
                }
            }
            assertTrue(meetings.size() >= 2, s.name() + ": meetings " + meetings.size());
            // At the closest moment of each meeting the one underneath shows less (a third body may cover either).
            int first = closest(s, meetings.get(0));
            int last = closest(s, meetings.get(meetings.size() - 1));
            assertTrue(s.truth(0, first).visible() < 0.9 && s.truth(0, first).visible() < s.truth(1, first).visible(),
                    s.name() + ": the target passes under first, at frame " + first);
            assertTrue(s.truth(1, last).visible() < 0.9 && s.truth(1, last).visible() < s.truth(0, last).visible(),
                    s.name() + ": and over at the last meeting, at frame " + last);
            double[] c0 = bodyColour(s, 0, 0);
            double[] c1 = bodyColour(s, 1, 0);
            // One colour family: within 40 RGB levels of each other (the target's own patches span more).
            assertTrue(Pixels.distance(c0, c1) < 40, s.name() + ": look-alikes " + Pixels.distance(c0, c1) + " apart");
        }
    }

    @Test
    void pushedRestsAndJumpsInSingleBlurredFrames() {
        int withPusher = 0;
        for (long seed : ScenarioFamily.tuningSeeds(FamilyKind.PUSHED)) {
            FamilyScenario s = ScenarioFamily.create(FamilyKind.PUSHED, seed, FamilyRendering.FULL);
            BodyTrack t = s.bodies().get(0).track();
            int still = 0;
            int pushes = 0;
            for (int f = 1; f < s.frameCount(); f++) {
                double step = Math.hypot(t.cx(f) - t.cx(f - 1), t.cy(f) - t.cy(f - 1));
                if (step == 0) {
                    still++;
                }
                if (step >= 15) {
                    pushes++;
                    assertTrue(s.exposureSamples(0, f) >= 5, s.name() + " push at " + f + " is blurred");
                }
            }
            assertTrue(still >= 0.85 * s.frameCount(), s.name() + " at rest in " + still + " frames");
            assertTrue(pushes >= 2, s.name() + " pushes " + pushes);
            if (s.bodies().get(1).track().frames() > 0 && !s.bodies().get(1).track().shown(0)) {
                withPusher++;
            }
        }
        assertTrue(withPusher >= 3, "clips with a pusher coming in: " + withPusher);
    }

    @Test
    void perspectiveGrowsAndShrinksUpToTenTimesAndVehiclesComeAndGo() {
        double mostGrowth = 0;
        int comeAndGo = 0;
        for (long seed : ScenarioFamily.tuningSeeds(FamilyKind.PERSPECTIVE)) {
            FamilyScenario s = ScenarioFamily.create(FamilyKind.PERSPECTIVE, seed, FamilyRendering.BARE);
            for (int k = 0; k < s.objectCount(); k++) {
                double min = Double.MAX_VALUE;
                double max = 0;
                boolean gone = false;
                for (int f = 0; f < s.frameCount(); f++) {
                    ScenarioBox b = s.truth(k, f);
                    if (b.width() == 0) {
                        gone = true;
                    } else if (wholly(s, b)) {
                        min = Math.min(min, b.width());
                        max = Math.max(max, b.width());
                    }
                }
                if (max > 0) {
                    double growth = max / min;
                    // A tenth of the largest width, rounded to whole pixels either side.
                    assertTrue(growth <= 10 * (1 + 2 / min), s.name() + " object " + k + " grows " + growth);
                    mostGrowth = Math.max(mostGrowth, growth);
                }
                comeAndGo += gone ? 1 : 0;
            }
        }
        assertTrue(mostGrowth >= 8, "largest size change " + mostGrowth);
        assertTrue(comeAndGo >= 12, "vehicles out of view for part of their clip: " + comeAndGo);
    }

    @Test
    void plazaPeopleAreUprightAndHideBehindPillarsAndEachOther() {
        int fullyHidden = 0;
        int partly = 0;
        int targetLeaves = 0;
        for (long seed : ScenarioFamily.tuningSeeds(FamilyKind.PLAZA)) {
            FamilyScenario s = ScenarioFamily.create(FamilyKind.PLAZA, seed, FamilyRendering.BARE);
            boolean hidden = false;
            for (int k = 0; k < s.objectCount(); k++) {
                for (int f = 0; f < s.frameCount(); f++) {
                    ScenarioBox b = s.truth(k, f);
                    if (!wholly(s, b)) {
                        continue;
                    }
                    double aspect = b.width() / b.height();
                    // Width a third to a half of the height, the gait swinging it by 7 %, plus a pixel of rounding.
                    assertTrue(aspect >= 0.27 - 1 / b.height() && aspect <= 0.54 + 1 / b.height(), s.name()
                            + " person " + k + " frame " + f + " aspect " + aspect);
                    hidden |= b.visible() == 0;
                    partly += b.visible() > 0 && b.visible() < 1 ? 1 : 0;
                }
            }
            fullyHidden += hidden ? 1 : 0;
            if (s.truth(0, s.frameCount() - 1).width() == 0) {
                targetLeaves++;
            }
        }
        assertTrue(fullyHidden >= 4, "clips where someone is wholly hidden: " + fullyHidden);
        assertTrue(partly >= 500, "person-frames partly hidden: " + partly);
        assertTrue(targetLeaves >= 4, "clips where the target has left by the end: " + targetLeaves);
    }

    @Test
    void turningBodiesGoFromTallToWideAndTheWalkerToAThirdOfItsSize() {
        int walkerThirds = 0;
        for (long seed : ScenarioFamily.tuningSeeds(FamilyKind.TURNING)) {
            FamilyScenario s = ScenarioFamily.create(FamilyKind.TURNING, seed, FamilyRendering.BARE);
            double minAspect = Double.MAX_VALUE;
            double maxAspect = 0;
            double minArea = Double.MAX_VALUE;
            double maxArea = 0;
            for (int f = 0; f < s.frameCount(); f++) {
                ScenarioBox b = s.truth(0, f);
                minAspect = Math.min(minAspect, b.width() / b.height());
                maxAspect = Math.max(maxAspect, b.width() / b.height());
                BodyTrack walker = s.bodies().get(1).track();
                minArea = Math.min(minArea, walker.a(f));
                maxArea = Math.max(maxArea, walker.a(f));
            }
            assertTrue(minAspect <= 0.6 && maxAspect >= 2.5, s.name() + " box aspect " + minAspect + ".."
                    + maxAspect);
            if (maxArea / minArea >= 2.7) {
                walkerThirds++;
            }
        }
        assertTrue(walkerThirds >= 8, "walkers reaching about a third of their size: " + walkerThirds);
    }

    @Test
    void lightingOcclusionHidesTheTargetAndChangesTheLight() {
        int hidden = 0;
        for (long seed : ScenarioFamily.tuningSeeds(FamilyKind.LIGHTING_OCCLUSION)) {
            FamilyScenario s = ScenarioFamily.create(FamilyKind.LIGHTING_OCCLUSION, seed,
                    new FamilyRendering(true, false, false, false, true));
            boolean wholly = false;
            for (int f = 0; f < s.frameCount(); f++) {
                wholly |= s.truth(0, f).width() > 0 && s.truth(0, f).visible() == 0;
            }
            hidden += wholly ? 1 : 0;
            int[] first = new int[s.width() * s.height()];
            int[] last = new int[first.length];
            s.render(0, first);
            s.render(s.frameCount() - 1, last);
            boolean[] everywhere = Pixels.outside(new ScenarioBox(-10, -10, 0, 0, 1), s.width(), s.height(), 0);
            double ratio = luma(Pixels.meanColour(last, everywhere)) / luma(Pixels.meanColour(first, everywhere));
            // Dimming to 0.45..0.8 or brightening from 0.5..0.8, a band of shade on top: at least 15 % either way.
            assertTrue(ratio <= 0.85 || ratio >= 1.15, s.name() + " brightness last / first " + ratio);
            assertTrue(s.plan().blotches().size() >= 2, s.name() + " stains " + s.plan().blotches().size());
        }
        assertTrue(hidden >= 8, "clips where the target is wholly hidden: " + hidden);
    }

    private static boolean wholly(TrackingScenario s, ScenarioBox b) {
        return b.width() > 0 && b.x() > 0 && b.y() > 0 && b.x() + b.width() < s.width()
                && b.y() + b.height() < s.height();
    }

    /** The frame of a run where objects 0 and 1 overlap most. */
    private static int closest(TrackingScenario s, int[] frames) {
        int best = frames[0];
        for (int f = frames[0]; f <= frames[1]; f++) {
            if (s.truth(0, f).iou(s.truth(1, f)) > s.truth(0, best).iou(s.truth(1, best))) {
                best = f;
            }
        }
        return best;
    }

    /** Mean colour of an object's pixels alone on the flat floor in {@code frame}. */
    private static double[] bodyColour(FamilyScenario s, int object, int frame) {
        int[] one = new int[s.width() * s.height()];
        int[] empty = new int[one.length];
        s.render(frame, one, 1 << object, false);
        s.render(frame, empty, 0, false);
        return Pixels.meanColour(one, Pixels.differ(one, empty));
    }

    private static double luma(double[] rgb) {
        // ITU-R BT.601 luma weights.
        return 0.299 * rgb[0] + 0.587 * rgb[1] + 0.114 * rgb[2];
    }
}
