package org.modetrail.demo.scenario;

import static org.modetrail.demo.scenario.FamilyDesign.constant;
import static org.modetrail.demo.scenario.FamilyDesign.headings;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.modetrail.demo.Rgb;
import org.modetrail.demo.scenario.FamilyDesign.Setting;
import org.modetrail.demo.scenario.FamilyFloor.Style;

/**
 * The kinds about how a body moves and what happens around it: {@link FamilyKind#TURNING},
 * {@link FamilyKind#FAST_LARGE} and {@link FamilyKind#LIGHTING_OCCLUSION}. Speeds in px per frame.
 */
final class MotionPlans {

    private static final int[] PILLARS = {Rgb.pack(150, 148, 140), Rgb.pack(60, 64, 70), Rgb.pack(214, 212, 204),
        Rgb.pack(82, 96, 118)};

    private MotionPlans() {
    }

    /**
     * Object 0, a long body, turns round again and again ({@link FamilyPaths#turning}), its length and width
     * swinging 5 % with its gait. Object 1 walks away up the frame to a third of its size, turns round and comes
     * back: the horizon lies above the frame and its size is {@code (y - horizon) / (nearY - horizon)} of its near
     * size.
     */
    static FamilyPlan turning(Setting s) {
        int n = s.frames();
        FamilyFloor floor = FamilyDesign.anyFloor(s, Style.TILES, Style.SPECKLE, Style.GRADIENT, Style.PAVING,
                Style.PALE_NOISY);
        double a = s.uniform(30, 70);
        double b = a * s.uniform(0.22, 0.33);
        int colour = s.chance(0.5) ? FamilyDesign.saturated(s) : FamilyDesign.tint(s, s.integer(60, 120), 30);
        Route.Area area = Route.Area.inside(s.width(), s.height(), a * 1.06 + 6, a * 1.06 + 6);
        double[][] path = FamilyPaths.turning(s.random(), n, area, 1, s.uniform(2.5, 4.2));
        List<FamilyBody> bodies = new ArrayList<>();
        bodies.add(new FamilyBody(FamilyDesign.look(s, colour, a, b, 0), BodyTrack.of(path[0], path[1],
                FamilyDesign.pulse(s, n, a, 0.05, s.uniform(10, 24)), FamilyDesign.pulse(s, n, b, 0.05,
                s.uniform(10, 24)), path[2]), FamilyBody.Shadow.BENEATH));
        bodies.add(awayAndBack(s, n));
        if (s.chance(0.4)) {
            double ea = s.uniform(12, 30);
            Route r = FamilyDesign.wanderAway(s, Route.Area.inside(s.width(), s.height(), ea * 1.2 + 4,
                    ea * 1.2 + 4), 0.5, 2.5, path[0][0], path[1][0], 1.3 * (a + ea));
            bodies.add(new FamilyBody(FamilyDesign.look(s, FamilyDesign.saturated(s), ea, ea * 0.6, 2),
                    BodyTrack.of(r.x(), r.y(), constant(n, ea), constant(n, ea * 0.6), headings(r.x(), r.y(), 0.15,
                    0)), FamilyBody.Shadow.BENEATH));
        }
        return s.plan(bodies, floor, List.of(), List.of(), FamilyDesign.mildLighting(s), ShadowBand.NONE,
                new SoftShadows(s.uniform(-0.8, 0.8), s.uniform(0.3, 1), s.uniform(0.2, 0.4)));
    }

    private static FamilyBody awayAndBack(Setting s, int n) {
        int w = s.width();
        int h = s.height();
        double a1 = s.uniform(15, 45);
        double ratio = s.uniform(0.4, 0.55);
        double horizon = -h * s.uniform(0.15, 0.35);
        double nearY = h - a1 - 8;
        double farY = Math.max(horizon + (nearY - horizon) / 3, a1 / 3 + 4);
        double v0 = s.uniform(3, 5);
        double[] x = new double[n];
        double[] y = new double[n];
        double[] a = new double[n];
        double[] b = new double[n];
        double[] heading = new double[n];
        double px = s.uniform(0.2 * w, 0.8 * w);
        double py = s.chance(0.7) ? nearY : farY;
        double dir = py == nearY ? -Math.PI / 2 : Math.PI / 2;
        double turnLeft = 0;
        double turnRate = Math.toRadians(s.uniform(5, 9));
        double sense = s.chance(0.5) ? 1 : -1;
        double sideways = s.uniform(-0.3, 0.3);
        for (int f = 0; f < n; f++) {
            double scale = (py - horizon) / (nearY - horizon);
            x[f] = px;
            y[f] = py;
            a[f] = a1 * scale;
            b[f] = a1 * ratio * scale;
            heading[f] = dir;
            if (turnLeft != 0) {
                double step = Math.min(turnRate, Math.abs(turnLeft)) * Math.signum(turnLeft);
                dir = Routes.wrap(dir + step);
                turnLeft -= step;
                if (Math.abs(turnLeft) < 1e-9) {
                    turnLeft = 0;
                }
            } else if ((py <= farY && StrictMath.sin(dir) < 0) || (py >= nearY && StrictMath.sin(dir) > 0)) {
                turnLeft = Math.PI * sense;
            }
            double v = v0 * scale * (turnLeft != 0 ? 0.4 : 1);
            px = FamilyPaths.clamp(px + v * StrictMath.cos(dir) + sideways * scale, a1 + 4, w - a1 - 4);
            py = FamilyPaths.clamp(py + v * StrictMath.sin(dir), farY, nearY);
        }
        boolean[] shown = new boolean[n];
        Arrays.fill(shown, true);
        double[] depth = y.clone();
        int colour = FamilyDesign.tint(s, s.integer(70, 170), 30);
        return new FamilyBody(FamilyDesign.look(s, colour, a1, a1 * ratio, 1),
                new BodyTrack(x, y, a, b, heading, depth, shown), FamilyBody.Shadow.BENEATH);
    }

    /** Object 0 darts at 15 to 40 px a frame with abrupt turns; a second large body wanders at 3 to 10. */
    static FamilyPlan fastLarge(Setting s) {
        int n = s.frames();
        FamilyFloor floor = FamilyDesign.anyFloor(s, Style.TILES, Style.SPECKLE, Style.GRADIENT, Style.PAVING);
        double a = s.uniform(80, 250) / 2;
        double b = a * s.uniform(0.5, 0.85);
        Route.Area area = Route.Area.inside(s.width(), s.height(), a * 1.2 + 4, a * 1.2 + 4);
        Route r = FamilyPaths.darting(s.random(), n, area, 15, s.uniform(25, 40), 4, 12, 0);
        List<FamilyBody> bodies = new ArrayList<>();
        bodies.add(new FamilyBody(FamilyDesign.look(s, FamilyDesign.saturated(s), a, b, 0), BodyTrack.of(r.x(), r.y(),
                constant(n, a), constant(n, b), headings(r.x(), r.y(), 0.3, s.uniform(-Math.PI, Math.PI))),
                FamilyBody.Shadow.BENEATH));
        {
            double da = s.uniform(30, 75);
            Route d = FamilyDesign.wanderAway(s, Route.Area.inside(s.width(), s.height(), da * 1.2 + 4,
                    da * 1.2 + 4), 3, 10, r.x()[0], r.y()[0], 1.3 * (a + da));
            bodies.add(new FamilyBody(FamilyDesign.look(s, FamilyDesign.saturated(s), da, da * 0.7, 1),
                    BodyTrack.of(d.x(), d.y(), constant(n, da), constant(n, da * 0.7), headings(d.x(), d.y(), 0.1,
                    0)), FamilyBody.Shadow.BENEATH));
        }
        return s.plan(bodies, floor, List.of(), List.of(), FamilyDesign.mildLighting(s), ShadowBand.NONE,
                new SoftShadows(s.uniform(-0.8, 0.8), s.uniform(0.3, 1), s.uniform(0.2, 0.35)));
    }

    /**
     * Object 0 wanders among stains of its colour family (some on its way, some beside it), passes behind one to
     * three pillars, wide enough to hide it wholly in about 60 % of cases; the light dims (or, in 30 % of clips,
     * brightens) by up to half with a warm-to-cool or cool-to-warm cast, and a band of shade sweeps across; a
     * second body wanders, of the target's colour family in half the clips.
     */
    static FamilyPlan lightingOcclusion(Setting s) {
        int n = s.frames();
        int w = s.width();
        FamilyFloor floor = FamilyDesign.anyFloor(s, Style.TILES, Style.SPECKLE, Style.PAVING, Style.GRADIENT);
        double a = s.uniform(30, 90) / 2;
        double b = a * s.uniform(0.55, 0.85);
        int base = FamilyDesign.saturated(s);
        Route.Area area = Route.Area.inside(w, s.height(), a * 1.2 + 6, a * 1.2 + 6);
        Route r = Routes.smooth(s.random(), n, area, 1.5, s.uniform(3.5, 5.8));
        List<FamilyBody> bodies = new ArrayList<>();
        bodies.add(new FamilyBody(FamilyDesign.look(s, base, a, b, 0), BodyTrack.of(r.x(), r.y(), constant(n, a),
                constant(n, b), headings(r.x(), r.y(), 0.1, StrictMath.atan2(r.y()[1] - r.y()[0],
                r.x()[1] - r.x()[0]))), FamilyBody.Shadow.BENEATH));
        List<Post> posts = new ArrayList<>();
        int count = s.integer(1, 3);
        int pillar = PILLARS[s.random().nextInt(PILLARS.length)];
        for (int k = 0; k < count; k++) {
            int f = (int) (n * (0.2 + 0.65 * (k + s.uniform(0.2, 0.8)) / count));
            double x = r.x()[f];
            double width = s.chance(0.6) ? 2 * a * 1.1 + s.uniform(8, 30) : 2 * b * s.uniform(0.3, 0.7);
            Post p = new Post(x - width / 2, x + width / 2, pillar);
            boolean clear = Math.abs(x - r.x()[0]) > a * 1.1 + width / 2 + 4;
            for (Post q : posts) {
                clear &= p.left() > q.right() + 20 || p.right() < q.left() - 20;
            }
            if (clear && p.left() > 0 && p.right() < w) {
                posts.add(p);
            }
        }
        List<Blotch> stains = clutter(s, r, a, b, base);
        {
            // A second body: of the target's colour family in half the clips, of its own colour otherwise.
            double da = a * s.uniform(0.8, 1.2);
            Route d = FamilyDesign.wanderAway(s, Route.Area.inside(w, s.height(), da * 1.2 + 4, da * 1.2 + 4), 1, 3,
                    r.x()[0], r.y()[0], 1.3 * (a + da));
            int colour = s.chance(0.5) ? FamilyDesign.near(s, base, 35) : FamilyDesign.saturated(s);
            bodies.add(new FamilyBody(FamilyDesign.look(s, colour, da, da * b / a, 1),
                    BodyTrack.of(d.x(), d.y(), constant(n, da), constant(n, da * b / a), headings(d.x(), d.y(), 0.1,
                    0)), FamilyBody.Shadow.BENEATH));
        }
        double t = s.uniform(0.03, 0.1) * (s.chance(0.5) ? 1 : -1);
        boolean brighten = s.chance(0.3);
        double b0 = brighten ? s.uniform(0.5, 0.8) : s.uniform(0.95, 1.1);
        double b1 = brighten ? s.uniform(1.0, 1.1) : s.uniform(0.45, 0.8);
        Lighting light = new Lighting(b0 * (1 + t), b0, b0 * (1 - t), b1 * (1 - t), b1, b1 * (1 + t));
        return s.plan(bodies, floor, stains, posts, light, StreetPlans.slowBand(s, 0.3, 0.55),
                new SoftShadows(s.uniform(-0.8, 0.8), s.uniform(0.3, 1), s.uniform(0.2, 0.35)));
    }

    /** Stains of the target's colour family and size along its route: every other one beside it, not overlapping. */
    private static List<Blotch> clutter(Setting s, Route r, double a, double b, int base) {
        int n = r.frames();
        int count = s.integer(4, 9);
        List<Blotch> out = new ArrayList<>();
        for (int k = 0; k < count; k++) {
            int f = (int) Math.round((k + s.uniform(0.3, 0.7)) / count * (n - 1));
            double cx = r.x()[f];
            double cy = r.y()[f];
            double rx = a * s.uniform(0.7, 1.1);
            double ry = b * s.uniform(0.7, 1.1);
            if (k % 2 == 1) {
                int g = Math.min(n - 1, f + 1);
                int e = Math.max(0, f - 1);
                double dx = r.x()[g] - r.x()[e];
                double dy = r.y()[g] - r.y()[e];
                double len = Math.max(1e-9, Math.hypot(dx, dy));
                double side = (s.chance(0.5) ? 1 : -1) * (b + ry + s.uniform(8, 20));
                cx += -dy / len * side;
                cy += dx / len * side;
            }
            Blotch blotch = new Blotch(cx, cy, rx, ry, s.uniform(0, Math.PI),
                    Rgb.scale(FamilyDesign.near(s, base, 25), s.uniform(0.75, 1.05)), s.subSeed(100 + k));
            boolean fits = cx - blotch.reach() >= 0 && cy - blotch.reach() >= 0
                    && cx + blotch.reach() <= s.width() && cy + blotch.reach() <= s.height();
            for (Blotch o : out) {
                fits &= Math.hypot(cx - o.cx(), cy - o.cy()) >= blotch.reach() + o.reach();
            }
            // Not under the target's first box, so a tracker starts on the target alone.
            fits &= Math.hypot(cx - r.x()[0], cy - r.y()[0]) > blotch.reach() + a * 1.2;
            if (fits) {
                out.add(blotch);
            }
        }
        return out;
    }
}
