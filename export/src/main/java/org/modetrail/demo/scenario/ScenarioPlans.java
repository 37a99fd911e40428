package org.modetrail.demo.scenario;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * Designs each scenario kind. Figures are for the 640 x 480 design and are scaled by {@link ScenarioConfig#scale()};
 * speeds are in pixels per frame.
 */
final class ScenarioPlans {

    /** Frames the target of {@link ScenarioKind#OCCLUSION} is fully hidden. */
    static final int HIDDEN_FRAMES = 10;
    /** Last frame of the 200-frame design clip that the crossing keys are given for. */
    private static final double CROSSING_DESIGN_LAST_FRAME = 199;
    /** Design frame from which the target is in front of the other object in {@link ScenarioKind#CROSSING}. */
    private static final double CROSSING_SWAP_FRAME = 94;
    /** Reddish and brownish tones of the target's colour family. */
    private static final int[] CLUTTER_PALETTE = {Rgb.pack(176, 74, 54), Rgb.pack(150, 66, 48),
        Rgb.pack(190, 98, 66), Rgb.pack(136, 70, 52), Rgb.pack(204, 88, 62), Rgb.pack(164, 84, 58)};
    private static final int POST_COLOUR = Rgb.pack(82, 96, 118);

    private ScenarioPlans() {
    }

    static ScenarioPlan plan(ScenarioKind kind, ScenarioConfig config) {
        Random random = new Random(NoiseHash.mix(config.seed() * 31 + kind.ordinal()));
        int n = config.frameCount();
        double s = config.scale();
        ObjectLook target = target(config);
        return switch (kind) {
            case TRANSLATION -> ScenarioPlan.single(kind, target, Track.of(
                    Routes.smooth(random, n, area(config, target, 1), 2.2 * s, 4.8 * s),
                    Routes.sway(random, n, 0.1)), Backdrop.Floor.TILED);
            case FAST_MOTION -> ScenarioPlan.single(kind, target, Track.of(
                    Routes.erratic(random, n, area(config, target, 1), 15.5 * s, 24.5 * s, 3, 7),
                    Routes.sway(random, n, 0.08)), Backdrop.Floor.TILED);
            case SCALE_CHANGE -> scaleChange(config, random, target);
            case CLUTTER -> clutter(config, random, target);
            case OCCLUSION -> occlusion(config, target);
            case CROSSING -> crossing(config, random, target);
            case SMALL_DARK -> {
                ObjectLook dark = new ObjectLook(Rgb.pack(56, 52, 70), Rgb.pack(34, 32, 42), Rgb.pack(92, 86, 104),
                        12 * s, 8 * s, true, NoiseHash.mix(config.seed()) + 7);
                yield ScenarioPlan.single(kind, dark, Track.of(
                        Routes.smooth(random, n, area(config, dark, 1), 1.5 * s, 3.5 * s), new double[n]),
                        Backdrop.Floor.PALE);
            }
            case LIGHTING_DRIFT -> ScenarioPlan.single(kind, target, Track.of(
                    Routes.smooth(random, n, area(config, target, 1), 2 * s, 4.5 * s),
                    Routes.sway(random, n, 0.08)), Backdrop.Floor.TILED)
                    .withLighting(Lighting.dimmingAndCooling(0.6, 0.07));
        };
    }

    /** The reddish target of every kind but {@link ScenarioKind#SMALL_DARK}: 60 x 40 px, a pale band across. */
    static ObjectLook target(ScenarioConfig config) {
        double s = config.scale();
        return new ObjectLook(Rgb.pack(198, 74, 52), Rgb.pack(126, 42, 34), Rgb.pack(236, 164, 104), 30 * s, 20 * s,
                true, NoiseHash.mix(config.seed()));
    }

    /** Where a body of {@code look} at up to {@code maxSize} may be centred, turned up to about 6 degrees. */
    private static Route.Area area(ScenarioConfig config, ObjectLook look, double maxSize) {
        double a = look.semiLength() * maxSize;
        double b = look.semiWidth() * maxSize;
        double turn = 0.1;
        return Route.Area.inside(config.width(), config.height(), a + b * turn + 4, b + a * turn + 4);
    }

    /** Size 1, up to 1.4 at a quarter of the clip, down to 0.6 at three quarters, back to 1: 60x40, 84x56, 36x24. */
    private static ScenarioPlan scaleChange(ScenarioConfig config, Random random, ObjectLook target) {
        int n = config.frameCount();
        double s = config.scale();
        Route route = Routes.smooth(random, n, area(config, target, 1.4), 1.5 * s, 3.5 * s);
        double[] size = new double[n];
        for (int f = 0; f < n; f++) {
            size[f] = 1 + 0.4 * StrictMath.sin(2 * Math.PI * f / (n - 1));
        }
        return ScenarioPlan.single(ScenarioKind.SCALE_CHANGE, target,
                new Track(route.x(), route.y(), new double[n], size), Backdrop.Floor.TILED);
    }

    /**
     * Blotches of the target's colour family and size: five on its path (it passes over them) and four beside it
     * (it passes near them, edge to edge about 15 px), placed where they do not overlap one another.
     */
    private static ScenarioPlan clutter(ScenarioConfig config, Random random, ObjectLook target) {
        int n = config.frameCount();
        double s = config.scale();
        Route route = Routes.smooth(random, n, area(config, target, 1), 2 * s, 4 * s);
        ScenarioPlan plan = ScenarioPlan.single(ScenarioKind.CLUTTER, target,
                Track.of(route, Routes.sway(random, n, 0.08)), Backdrop.Floor.TILED);
        List<Blotch> blotches = new ArrayList<>();
        double[] at = {0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9};
        for (int k = 0; k < at.length; k++) {
            int f = (int) Math.round(at[k] * (n - 1));
            double rx = (26 + 10 * random.nextDouble()) * s;
            double ry = (18 + 8 * random.nextDouble()) * s;
            double cx = route.x()[f];
            double cy = route.y()[f];
            if (k % 2 == 1) {
                // Beside the path: along the normal of the direction of travel, to one side or the other.
                int g = Math.min(n - 1, f + 1);
                int e = Math.max(0, f - 1);
                double dx = route.x()[g] - route.x()[e];
                double dy = route.y()[g] - route.y()[e];
                double len = Math.max(1e-9, Math.hypot(dx, dy));
                double side = (random.nextBoolean() ? 1 : -1) * (target.semiWidth() + ry + 15 * s);
                cx += -dy / len * side;
                cy += dx / len * side;
            }
            Blotch b = new Blotch(cx, cy, rx, ry, Math.PI * random.nextDouble(),
                    CLUTTER_PALETTE[k % CLUTTER_PALETTE.length], NoiseHash.mix(config.seed() + 101 + k));
            if (inside(b, config) && apart(b, blotches)) {
                blotches.add(b);
            }
        }
        return plan.withBlotches(blotches);
    }

    private static boolean inside(Blotch b, ScenarioConfig config) {
        double r = b.reach();
        return b.cx() - r >= 0 && b.cy() - r >= 0 && b.cx() + r <= config.width() && b.cy() + r <= config.height();
    }

    private static boolean apart(Blotch b, List<Blotch> others) {
        for (Blotch o : others) {
            if (Math.hypot(b.cx() - o.cx(), b.cy() - o.cy()) < b.reach() + o.reach()) {
                return false;
            }
        }
        return true;
    }

    /**
     * A straight constant-velocity pass behind a post centred in the frame. The post is as wide as the body plus
     * 9.5 frames of travel, so the body is entirely behind it for exactly {@value #HIDDEN_FRAMES} frames with a
     * quarter-frame of travel to spare at either end.
     */
    private static ScenarioPlan occlusion(ScenarioConfig config, ObjectLook target) {
        int n = config.frameCount();
        double s = config.scale();
        // At least 1.5 px per frame, so that the frames either side of the hidden run show a column of the body.
        double vx = Math.max(1.5, 2.6 * s);
        double vy = 0.3 * vx;
        int hiddenFrom = n / 2 - HIDDEN_FRAMES / 2;
        double x0 = config.width() / 2.0 - (HIDDEN_FRAMES - 1) / 2.0 * vx;
        double y0 = config.height() / 2.0 - 10 * s;
        Route.Area area = area(config, target, 1);
        int start = Math.max(0, hiddenFrom - (int) Math.floor((x0 - area.minX()) / vx));
        int end = Math.min(n - 1, hiddenFrom + (int) Math.floor((area.maxX() - x0) / vx));
        Route route = Routes.straight(n, x0, y0, hiddenFrom, vx, vy, start, end);
        double a = target.semiLength();
        Post post = new Post(x0 - a - vx / 4, x0 + (HIDDEN_FRAMES - 1) * vx + a + vx / 4, POST_COLOUR);
        return ScenarioPlan.single(ScenarioKind.OCCLUSION, target, Track.of(route, new double[n]),
                Backdrop.Floor.TILED).withPosts(List.of(post));
    }

    /**
     * Two objects of one colour family. The other object first comes head-on and passes over the target (design
     * frame 44), loops back and overtakes it with the target on top (design frame 144). Keys are
     * {frame, x, y, vx, vy} on the 200-frame, 640 x 480 design.
     */
    private static ScenarioPlan crossing(ScenarioConfig config, Random random, ObjectLook target) {
        double[][] targetKeys = {
            {0, 70, 282, 2.7, -0.45}, {44, 190, 262, 2.6, -0.5}, {100, 330, 225, 2.4, -0.2},
            {144, 440, 235, 2.4, 0.3}, {199, 570, 280, 2.3, 0.9}};
        double[][] otherKeys = {
            {0, 340, 246, -3.4, 0.35}, {44, 190, 262, -3.4, 0.35}, {64, 128, 292, -1.5, 2.6},
            {84, 150, 345, 3.6, 0.6}, {112, 290, 300, 4.8, -1.6}, {144, 440, 235, 4.2, -0.6},
            {199, 590, 190, 2.0, -0.5}};
        int n = config.frameCount();
        ObjectLook other = new ObjectLook(Rgb.pack(184, 86, 60), Rgb.pack(138, 54, 40), Rgb.pack(228, 150, 96),
                target.semiLength(), target.semiWidth(), false, NoiseHash.mix(config.seed()) + 1);
        Track t0 = Track.of(Routes.keyed(n, design(config, targetKeys)), Routes.sway(random, n, 0.08));
        Track t1 = Track.of(Routes.keyed(n, design(config, otherKeys)), Routes.sway(random, n, 0.08));
        int[] front = new int[n];
        int swap = (int) Math.round(CROSSING_SWAP_FRAME / CROSSING_DESIGN_LAST_FRAME * (n - 1));
        Arrays.fill(front, 0, swap, 1);
        return new ScenarioPlan(ScenarioKind.CROSSING, List.of(target, other), List.of(t0, t1), front,
                Backdrop.Floor.TILED, List.of(), List.of(), Lighting.CONSTANT);
    }

    /** Design keys to this clip: frames stretched to its length, positions about its centre scaled to its size. */
    private static double[][] design(ScenarioConfig config, double[][] keys) {
        double s = config.scale();
        double stretch = (config.frameCount() - 1) / CROSSING_DESIGN_LAST_FRAME;
        double[][] out = new double[keys.length][];
        for (int k = 0; k < keys.length; k++) {
            double[] d = keys[k];
            out[k] = new double[] {Math.round(d[0] * stretch), config.width() / 2.0 + (d[1] - 320) * s,
                config.height() / 2.0 + (d[2] - 240) * s, d[3] * s / stretch, d[4] * s / stretch};
        }
        return out;
    }
}
