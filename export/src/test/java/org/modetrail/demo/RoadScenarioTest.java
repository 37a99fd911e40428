package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

class RoadScenarioTest {

    private static final RoadConfig SMALL = RoadConfig.defaults().withSize(480, 270);

    /** Renders every {@code step}-th frame and returns all truth rows. */
    private static List<TruthRow> truth(RoadScene scene, int step) {
        int[] rgb = new int[scene.width() * scene.height()];
        List<TruthRow> rows = new ArrayList<>();
        for (int f = 0; f < scene.frameCount(); f += step) {
            rows.addAll(scene.render(f, rgb));
        }
        return rows;
    }

    @Test
    void truthBoxesTightlyContainTheRenderedBodies() {
        RoadScene scene = new RoadScene(SMALL.withStyle(RenderStyle.flat()));
        int[] rgb = new int[480 * 270];
        int checked = 0;
        for (int f = 0; f < scene.frameCount(); f += 9) {
            checked += PixelBoxes.check(rgb, 480, 270, scene.render(f, rgb), "frame " + f);
        }
        assertTrue(checked > 50, "enough isolated boxes checked, got " + checked);
    }

    @Test
    void worldReferencePointImagesInsideItsBoxByAnIndependentPinholeModel() {
        RoadScene scene = new RoadScene(SMALL.withStyle(RenderStyle.flat()));
        PinholeReference reference = PinholeReference.of(scene.config().camera());
        int inside = 0;
        for (TruthRow r : truth(scene, 5)) {
            boolean clipped = r.x() <= 0 || r.y() <= 0 || r.x() + r.width() >= 480 || r.y() + r.height() >= 270;
            if (clipped) {
                continue;
            }
            // The footprint centre lies inside the body's convex hull, so it images within the body's box.
            double[] uv = reference.project(r.worldXM(), r.worldYM(), 0);
            String id = "track " + r.trackId() + " frame " + r.frame();
            assertTrue(uv[0] >= r.x() - 0.5 && uv[0] <= r.x() + r.width() + 0.5, id + " u " + uv[0]);
            assertTrue(uv[1] >= r.y() - 0.5 && uv[1] <= r.y() + r.height() + 0.5, id + " v " + uv[1]);
            inside++;
        }
        assertTrue(inside > 100, "checked " + inside);
    }

    @Test
    void speedEqualsDistanceBetweenFramesTimesFps() {
        RoadScene scene = new RoadScene(SMALL.withStyle(RenderStyle.flat()));
        Map<Integer, TruthRow> previous = new HashMap<>();
        Set<String> classes = new HashSet<>();
        int constant = 0;
        int changing = 0;
        for (TruthRow r : truth(scene, 1)) {
            classes.add(r.objectClass());
            TruthRow p = previous.put(r.trackId(), r);
            if (p == null || p.frame() != r.frame() - 1) {
                continue;
            }
            double measured = Math.hypot(r.worldXM() - p.worldXM(), r.worldYM() - p.worldYM()) * scene.fps();
            if (p.speedMS() == r.speedMS()) {
                assertEquals(r.speedMS(), measured, 1e-9, "constant speed, track " + r.trackId());
                constant++;
            } else if (!atLimit(scene, r)) {
                // Under constant acceleration the mean speed over a step is the mean of its end speeds.
                assertEquals((p.speedMS() + r.speedMS()) / 2, measured, 1e-9, "accelerating, track " + r.trackId());
                changing++;
            }
        }
        assertTrue(constant > 100 && changing > 100, constant + " constant and " + changing + " changing steps");
        assertTrue(classes.containsAll(List.of("car", "van", "truck", "cyclist", "pedestrian")), "classes " + classes);
    }

    private static boolean atLimit(RoadScene scene, TruthRow r) {
        return scene.users().stream().filter(u -> u.trackId() == r.trackId())
                .anyMatch(u -> Math.abs(r.speedMS() - u.motion().limitMS()) < 1e-12);
    }

    @Test
    void someRoadUsersHideOthers() {
        List<TruthRow> rows = truth(new RoadScene(SMALL.withStyle(RenderStyle.flat())), 3);
        assertTrue(rows.stream().anyMatch(r -> r.visible() < 0.7), "a passing vehicle hides another");
        assertTrue(rows.stream().allMatch(r -> r.visible() >= 0 && r.visible() <= 1));
    }

    @Test
    void footprintsNeverOverlapOverThreeTimetableCycles() {
        List<RoadUser> users = RoadTraffic.timetable(60);
        for (double t = 0; t < 60; t += 0.04) {
            for (int a = 0; a < users.size(); a++) {
                for (int b = a + 1; b < users.size(); b++) {
                    RoadUser ua = users.get(a);
                    RoadUser ub = users.get(b);
                    if (ua.motion().present(t) && ub.motion().present(t)) {
                        double gap = gap(ua, ub, t);
                        assertTrue(gap > 0.5, ua.objectClass() + " " + ua.trackId() + " and " + ub.objectClass()
                                + " " + ub.trackId() + " come within " + gap + " m at t = " + t);
                    }
                }
            }
        }
    }

    /** Clearance between two footprints; all users travel along x or y, so footprints are axis-aligned. */
    private static double gap(RoadUser a, RoadUser b, double t) {
        double[] ra = footprint(a, t);
        double[] rb = footprint(b, t);
        double dx = Math.max(0, Math.max(ra[0] - rb[1], rb[0] - ra[1]));
        double dy = Math.max(0, Math.max(ra[2] - rb[3], rb[2] - ra[3]));
        return dx == 0 && dy == 0 ? -1 : Math.hypot(dx, dy);
    }

    private static double[] footprint(RoadUser u, double t) {
        LaneMotion m = u.motion();
        double halfX = Math.abs(m.directionX()) * u.lengthM() / 2 + Math.abs(m.directionY()) * u.widthM() / 2;
        double halfY = Math.abs(m.directionY()) * u.lengthM() / 2 + Math.abs(m.directionX()) * u.widthM() / 2;
        return new double[] {m.xM(t) - halfX, m.xM(t) + halfX, m.yM(t) - halfY, m.yM(t) + halfY};
    }

    @Test
    void calibrationPointsAreSpreadAndMatchTheIndependentModel() {
        RoadScene scene = new RoadScene(RoadConfig.defaults());
        PinholeReference reference = PinholeReference.of(scene.config().camera());
        List<CalibrationPoint> points = scene.calibrationPoints();
        assertTrue(points.size() >= 6, "at least six points, got " + points.size());
        double minV = Double.MAX_VALUE;
        double maxV = 0;
        for (CalibrationPoint p : points) {
            double[] uv = reference.project(p.xM(), p.yM(), 0);
            assertEquals(uv[0], p.uPx(), 1e-7, p.name());
            assertEquals(uv[1], p.vPx(), 1e-7, p.name());
            minV = Math.min(minV, p.vPx());
            maxV = Math.max(maxV, p.vPx());
        }
        assertTrue(maxV - minV > 0.5 * scene.height(), "points cover near and far ground");
    }

    @Test
    void dashCornersSeparatePaintFromAsphaltInTheRenderedGround() {
        // Rendered pixels, not the model, must show the marking where the calibration file says it is.
        RoadConfig noiseless = RoadConfig.defaults().withStyle(new RenderStyle(true, 0, false)).withTiming(25, 1);
        RoadScene scene = new RoadScene(noiseless);
        int[] rgb = new int[scene.width() * scene.height()];
        scene.render(0, rgb);
        RoadCamera cam = noiseless.camera();
        // Near dash of the left lane line, y = 18..21 m, x = 3.425..3.575 m: its middle is paint, 0.5 m aside is not.
        double[] paint = cam.project(3.5, 19.5, 0);
        double[] asphalt = cam.project(4.0, 19.5, 0);
        int p = Rgb.green(rgb[(int) paint[1] * scene.width() + (int) paint[0]]);
        int a = Rgb.green(rgb[(int) asphalt[1] * scene.width() + (int) asphalt[0]]);
        assertTrue(p > 150 && a < 110, "paint " + p + " vs asphalt " + a);
    }
}
