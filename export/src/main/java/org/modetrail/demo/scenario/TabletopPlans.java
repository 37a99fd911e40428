package org.modetrail.demo.scenario;

import static org.modetrail.demo.scenario.FamilyDesign.anyFloor;
import static org.modetrail.demo.scenario.FamilyDesign.constant;
import static org.modetrail.demo.scenario.FamilyDesign.headings;

import java.util.ArrayList;
import java.util.List;
import org.modetrail.demo.Rgb;
import org.modetrail.demo.scenario.FamilyDesign.Setting;
import org.modetrail.demo.scenario.FamilyFloor.Style;

/**
 * The kinds seen from above a floor or a bench: {@link FamilyKind#SMALL_ERRATIC}, {@link FamilyKind#LOOKALIKES} and
 * {@link FamilyKind#PUSHED}. Sizes in px at 640 x 480, speeds in px per frame.
 */
final class TabletopPlans {

    private static final int[] PALE_COLOURS = {Rgb.pack(252, 236, 150), Rgb.pack(255, 190, 150),
        Rgb.pack(160, 210, 255), Rgb.pack(200, 250, 190), Rgb.pack(250, 250, 246)};
    private static final int[] TOOL_COLOURS = {Rgb.pack(150, 156, 166), Rgb.pack(228, 120, 34),
        Rgb.pack(40, 40, 46), Rgb.pack(230, 200, 40)};

    private TabletopPlans() {
    }

    static FamilyPlan smallErratic(Setting s) {
        int n = s.frames();
        FamilyFloor floor = s.chance(0.75) ? FamilyDesign.floor(s, Style.PALE_NOISY)
                : FamilyDesign.floor(s, Style.SPECKLE);
        double a = s.uniform(10, 30) / 2;
        double b = a * s.uniform(0.45, 0.9);
        boolean dark = s.chance(0.6);
        int colour = dark ? FamilyDesign.tint(s, s.integer(34, 80), 16)
                : PALE_COLOURS[s.random().nextInt(PALE_COLOURS.length)];
        List<FamilyBody> bodies = new ArrayList<>();
        Route.Area area = Route.Area.inside(s.width(), s.height(), a * 1.2 + 4, a * 1.2 + 4);
        Route r = FamilyPaths.darting(s.random(), n, area, 2, s.uniform(4.5, 8), 2, 8, 0.15);
        double[] length = FamilyDesign.pulse(s, n, a, s.uniform(0, 0.1), s.uniform(6, 20));
        bodies.add(new FamilyBody(FamilyDesign.look(s, colour, a, b, 0), BodyTrack.of(r.x(), r.y(), length,
                constant(n, b), headings(r.x(), r.y(), 0.7, s.uniform(-Math.PI, Math.PI))),
                FamilyBody.Shadow.BENEATH));
        int extras = s.integer(1, 2);
        for (int k = 1; k <= extras; k++) {
            double ea = s.uniform(5, 15);
            double eb = ea * s.uniform(0.5, 0.9);
            int c = dark ? (s.chance(0.5) ? FamilyDesign.tint(s, s.integer(90, 140), 20) : FamilyDesign.saturated(s))
                    : FamilyDesign.tint(s, s.integer(40, 90), 20);
            Route.Area ar = Route.Area.inside(s.width(), s.height(), ea + 4, ea + 4);
            Route e = FamilyDesign.wanderAway(s, ar, 0.3, s.uniform(1, 3), r.x()[0], r.y()[0], 1.3 * (a + ea) + 4);
            bodies.add(new FamilyBody(FamilyDesign.look(s, c, ea, eb, k), BodyTrack.of(e.x(), e.y(), constant(n, ea),
                    constant(n, eb), headings(e.x(), e.y(), 0.2, 0)), FamilyBody.Shadow.BENEATH));
        }
        List<Blotch> stains = new ArrayList<>();
        int count = s.integer(0, 4);
        for (int k = 0; k < count; k++) {
            double rx = s.uniform(4, 14);
            stains.add(new Blotch(s.uniform(20, s.width() - 20), s.uniform(20, s.height() - 20), rx,
                    rx * s.uniform(0.5, 1), s.uniform(0, Math.PI), Rgb.offset(floor.base(), -s.integer(20, 50)),
                    s.subSeed(50 + k)));
        }
        return s.plan(bodies, floor, stains, List.of(), FamilyDesign.mildLighting(s), ShadowBand.NONE,
                new SoftShadows(s.uniform(-0.8, 0.8), s.uniform(0.3, 1), s.uniform(0.15, 0.3)));
    }

    /**
     * Object 0 wanders; object 1, of its colour family, meets it twice at an angle: first passing over it (object 1
     * in front), then, after a swing to one side, under it. Object 2 circles a loop in two colours; object 3, in about half
     * the clips, wanders in a colour of its own.
     */
    static FamilyPlan lookalikes(Setting s) {
        int n = s.frames();
        FamilyFloor floor = anyFloor(s, Style.TILES, Style.SPECKLE, Style.GRADIENT, Style.PAVING);
        double a = s.uniform(20, 60) / 2;
        double b = a * s.uniform(0.5, 0.8);
        double a2 = a * s.uniform(0.92, 1.08);
        int base = FamilyDesign.saturated(s);
        Route.Area area = Route.Area.inside(s.width(), s.height(), a * 1.2 + 6, a * 1.2 + 6);
        Route ra = Routes.smooth(s.random(), n, area, 1.5, s.uniform(2.5, 3.8));
        int t1 = (int) (n * s.uniform(0.15, 0.28));
        int t2 = (int) (n * s.uniform(0.68, 0.85));
        int tm = (t1 + t2) / 2;
        Route rb = crossingRoute(ra, area, t1, t2, s.uniform(50, 120), s.chance(0.5) ? 1 : -1);
        double[] depthA = constant(n, 0);
        double[] depthB = new double[n];
        for (int f = 0; f < n; f++) {
            depthB[f] = f < tm ? 1 : -1;
        }
        List<FamilyBody> bodies = new ArrayList<>();
        bodies.add(new FamilyBody(FamilyDesign.look(s, base, a, b, 0), track(ra, a, b, depthA, 0.12),
                FamilyBody.Shadow.BENEATH));
        bodies.add(new FamilyBody(FamilyDesign.look(s, FamilyDesign.near(s, base, 16), a2, b * a2 / a, 1),
                track(rb, a2, b * a2 / a, depthB, 0.12), FamilyBody.Shadow.BENEATH));
        double ca = s.uniform(20, 60) / 2;
        double cb = ca * s.uniform(0.6, 1);
        double rx = s.uniform(50, 130);
        double ry = s.uniform(50, 130);
        double mx = Math.max(1, (area.maxX() - area.minX()) / 2 - 4);
        double my = Math.max(1, (area.maxY() - area.minY()) / 2 - 4);
        rx = Math.min(rx, mx);
        ry = Math.min(ry, my);
        Route rc = FamilyPaths.loop(s.random(), n, s.uniform(area.minX() + rx, area.maxX() - rx),
                s.uniform(area.minY() + ry, area.maxY() - ry), rx, ry, s.uniform(1.5, 4));
        int front = FamilyDesign.saturated(s);
        int back = s.chance(0.3) ? Rgb.pack(238, 236, 228) : FamilyDesign.saturated(s);
        if (Math.abs(Rgb.red(front) - Rgb.red(back)) + Math.abs(Rgb.blue(front) - Rgb.blue(back)) < 80) {
            back = Rgb.pack(255 - Rgb.red(front), 255 - Rgb.green(front), 255 - Rgb.blue(front));
        }
        bodies.add(new FamilyBody(FigureLook.halves(front, back, s.subSeed(2)), track(rc, ca, cb, constant(n, 0.5),
                0.2), FamilyBody.Shadow.BENEATH));
        if (s.chance(0.5)) {
            double da = s.uniform(12, 30);
            Route rd = FamilyDesign.wanderAway(s, Route.Area.inside(s.width(), s.height(), da * 1.2 + 4,
                    da * 1.2 + 4), 1, 3, ra.x()[0], ra.y()[0], 1.3 * (a + da));
            bodies.add(new FamilyBody(FamilyDesign.look(s, FamilyDesign.saturated(s), da, da * 0.6, 3),
                    track(rd, da, da * 0.6, constant(n, 0.2), 0.12), FamilyBody.Shadow.BENEATH));
        }
        return s.plan(bodies, floor, List.of(), List.of(), FamilyDesign.mildLighting(s), ShadowBand.NONE,
                new SoftShadows(s.uniform(-0.8, 0.8), s.uniform(0.3, 1), s.uniform(0.2, 0.35)));
    }

    /**
     * Meets {@code a} at {@code t1} and {@code t2} at an angle: between them it follows {@code a} displaced across
     * the chord from {@code a(t1)} to {@code a(t2)} by {@code offset * sin(pi (t - t1) / (t2 - t1))}, so it crosses
     * {@code a} at both instants with a sideways speed {@code offset * pi / (t2 - t1)}; before and after it keeps
     * its crossing velocity in a straight line (held at the edge of {@code area}). The swing goes to the side with
     * more room, stays in the area, and is cut until no step exceeds 5.8 px.
     */
    private static Route crossingRoute(Route a, Route.Area area, int t1, int t2, double offset, double side) {
        int n = a.frames();
        double span = t2 - t1;
        double cx = a.x()[t2] - a.x()[t1];
        double cy = a.y()[t2] - a.y()[t1];
        double len = Math.max(1e-9, Math.hypot(cx, cy));
        double[] nrm = {-cy / len, cx / len};
        double[] room = new double[2];
        for (int k = 0; k < 2; k++) {
            double sign = k == 0 ? side : -side;
            double lo = offset;
            for (int f = t1; f <= t2; f++) {
                double w = StrictMath.sin(Math.PI * (f - t1) / span);
                if (w > 0.05) {
                    lo = Math.min(lo, clearance(area, a.x()[f], a.y()[f], sign * nrm[0], sign * nrm[1]) / w);
                }
            }
            room[k] = lo;
        }
        double sign = room[0] >= room[1] ? side : -side;
        double swing = Math.max(room[0], room[1]);
        Route r = null;
        for (int attempt = 0; attempt < 12; attempt++) {
            r = swung(a, area, t1, t2, nrm[0] * sign * swing, nrm[1] * sign * swing);
            if (maxStep(r) <= 5.8) {
                break;
            }
            swing *= 0.85;
        }
        return r;
    }

    private static Route swung(Route a, Route.Area area, int t1, int t2, double ox, double oy) {
        int n = a.frames();
        double span = t2 - t1;
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int f = t1; f <= t2; f++) {
            double w = StrictMath.sin(Math.PI * (f - t1) / span);
            xs[f] = a.x()[f] + ox * w;
            ys[f] = a.y()[f] + oy * w;
        }
        double vx1 = xs[t1 + 1] - xs[t1];
        double vy1 = ys[t1 + 1] - ys[t1];
        double vx2 = xs[t2] - xs[t2 - 1];
        double vy2 = ys[t2] - ys[t2 - 1];
        for (int f = 0; f < t1; f++) {
            xs[f] = FamilyPaths.clamp(xs[t1] - vx1 * (t1 - f), area.minX(), area.maxX());
            ys[f] = FamilyPaths.clamp(ys[t1] - vy1 * (t1 - f), area.minY(), area.maxY());
        }
        for (int f = t2 + 1; f < n; f++) {
            xs[f] = FamilyPaths.clamp(xs[t2] + vx2 * (f - t2), area.minX(), area.maxX());
            ys[f] = FamilyPaths.clamp(ys[t2] + vy2 * (f - t2), area.minY(), area.maxY());
        }
        return new Route(xs, ys);
    }

    /** How far from ({@code x}, {@code y}) along the unit direction ({@code dx}, {@code dy}) {@code area} ends. */
    private static double clearance(Route.Area area, double x, double y, double dx, double dy) {
        double t = Double.MAX_VALUE;
        if (dx > 1e-9) {
            t = Math.min(t, (area.maxX() - x) / dx);
        } else if (dx < -1e-9) {
            t = Math.min(t, (area.minX() - x) / dx);
        }
        if (dy > 1e-9) {
            t = Math.min(t, (area.maxY() - y) / dy);
        } else if (dy < -1e-9) {
            t = Math.min(t, (area.minY() - y) / dy);
        }
        return Math.max(0, t);
    }

    static double maxStep(Route r) {
        double m = 0;
        for (int f = 1; f < r.frames(); f++) {
            m = Math.max(m, Math.hypot(r.x()[f] - r.x()[f - 1], r.y()[f] - r.y()[f - 1]));
        }
        return m;
    }

    private static BodyTrack track(Route r, double a, double b, double[] depth, double maxTurn) {
        int n = r.frames();
        boolean[] shown = new boolean[n];
        java.util.Arrays.fill(shown, true);
        return new BodyTrack(r.x(), r.y(), constant(n, a), constant(n, b), headings(r.x(), r.y(), maxTurn,
                StrictMath.atan2(r.y()[Math.min(n - 1, 1)] - r.y()[0], r.x()[Math.min(n - 1, 1)] - r.x()[0])),
                depth, shown);
    }

    /**
     * A small object at rest, pushed 15 to 40 px in one frame, sliding 12 % and 3 % of that in the next two, turned
     * a little by each push. With a pusher (about half the clips), a tool-like body comes in along the push's line
     * to touch the object in the frame before the push, moves with it, and withdraws out of the frame.
     */
    static FamilyPlan pushed(Setting s) {
        int n = s.frames();
        FamilyFloor floor = anyFloor(s, Style.TILES, Style.SPECKLE, Style.PALE_NOISY, Style.PAVING);
        double a = s.uniform(14, 40) / 2;
        double b = a * s.uniform(0.5, 0.9);
        int colour = s.chance(0.5) ? FamilyDesign.saturated(s) : FamilyDesign.tint(s, s.integer(40, 80), 14);
        boolean pusher = s.chance(0.5);
        int pushes = pusher ? s.integer(2, 3) : s.integer(2, 5);
        Route.Area area = Route.Area.inside(s.width(), s.height(), a * 1.2 + 8, a * 1.2 + 8);
        double[] x = new double[n];
        double[] y = new double[n];
        double[] h = new double[n];
        double px = s.uniform(area.minX() + 0.25 * (area.maxX() - area.minX()), area.maxX()
                - 0.25 * (area.maxX() - area.minX()));
        double py = s.uniform(area.minY() + 0.25 * (area.maxY() - area.minY()), area.maxY()
                - 0.25 * (area.maxY() - area.minY()));
        double heading = s.uniform(-Math.PI, Math.PI);
        int spacing = (n - 40) / pushes;
        int[] at = new int[pushes];
        double[][] dirs = new double[pushes][];
        for (int k = 0; k < pushes; k++) {
            at[k] = 20 + k * spacing + s.integer(0, Math.max(0, spacing / 3));
        }
        int next = 0;
        double[] slide = {1, 0.12, 0.03};
        for (int f = 0; f < n; f++) {
            if (next < pushes && f == at[next]) {
                double d = s.uniform(15, 40);
                double u = s.uniform(-Math.PI, Math.PI);
                for (int attempt = 0; attempt < 24 && !area.contains(px + 1.2 * d * StrictMath.cos(u),
                        py + 1.2 * d * StrictMath.sin(u)); attempt++) {
                    u = s.uniform(-Math.PI, Math.PI);
                }
                if (!area.contains(px + 1.2 * d * StrictMath.cos(u), py + 1.2 * d * StrictMath.sin(u))) {
                    u = StrictMath.atan2(area.centreY() - py, area.centreX() - px);
                }
                dirs[next] = new double[] {u, d, s.uniform(-0.6, 0.6), px, py, heading};
                next++;
            }
            for (int k = 0; k < next; k++) {
                int since = f - at[k];
                if (since >= 0 && since < slide.length) {
                    double step = dirs[k][1] * slide[since];
                    px = FamilyPaths.clamp(px + step * StrictMath.cos(dirs[k][0]), area.minX(), area.maxX());
                    py = FamilyPaths.clamp(py + step * StrictMath.sin(dirs[k][0]), area.minY(), area.maxY());
                    heading = Routes.wrap(heading + dirs[k][2] * slide[since]);
                }
            }
            x[f] = px;
            y[f] = py;
            h[f] = heading;
        }
        List<FamilyBody> bodies = new ArrayList<>();
        bodies.add(new FamilyBody(FamilyDesign.look(s, colour, a, b, 0), BodyTrack.of(x, y, constant(n, a),
                constant(n, b), h), FamilyBody.Shadow.BENEATH));
        if (pusher) {
            double ta = s.uniform(30, 60);
            double tb = s.uniform(4, 8);
            bodies.add(new FamilyBody(FamilyDesign.look(s, TOOL_COLOURS[s.random().nextInt(TOOL_COLOURS.length)],
                    ta, tb, 1), pusherTrack(s, x, y, a, b, h, at, dirs, ta, tb), FamilyBody.Shadow.BENEATH));
        }
        // Another object resting on the bench, of a size and colour of its own, clear of the target's path.
        double ra = s.uniform(7, 20);
        for (int attempt = 0; attempt < 40; attempt++) {
            double rx = s.uniform(area.minX(), area.maxX());
            double ry = s.uniform(area.minY(), area.maxY());
            boolean clear = true;
            for (int f = 0; f < n && clear; f++) {
                clear = Math.hypot(rx - x[f], ry - y[f]) > a * 1.3 + ra * 1.3 + 30;
            }
            if (clear) {
                int c = s.chance(0.5) ? FamilyDesign.saturated(s) : FamilyDesign.tint(s, s.integer(40, 170), 20);
                bodies.add(new FamilyBody(FamilyDesign.look(s, c, ra, ra * s.uniform(0.5, 0.9), 2),
                        BodyTrack.of(constant(n, rx), constant(n, ry), constant(n, ra), constant(n, ra * 0.7),
                        constant(n, s.uniform(-Math.PI, Math.PI))), FamilyBody.Shadow.BENEATH));
                break;
            }
        }
        return s.plan(bodies, floor, List.of(), List.of(), FamilyDesign.mildLighting(s), ShadowBand.NONE,
                new SoftShadows(s.uniform(-0.8, 0.8), s.uniform(0.3, 1), s.uniform(0.15, 0.3)));
    }

    /**
     * The tool: hidden off the frame but for the pushes whose approach and withdrawal fit between the others; it
     * comes in along the push's line at up to 20 px a frame, touches the object's rim in the frame before the push,
     * moves with it and goes back the way it came; {@code ta} and {@code tb} are its semi-axes.
     */
    private static BodyTrack pusherTrack(Setting s, double[] ox, double[] oy, double a, double b, double[] oh,
                                         int[] at, double[][] dirs, double ta, double tb) {
        int n = ox.length;
        double[] x = new double[n];
        double[] y = new double[n];
        double[] h = new double[n];
        boolean[] shown = new boolean[n];
        java.util.Arrays.fill(x, -4 * ta);
        java.util.Arrays.fill(y, -4 * ta);
        int free = 0;
        for (int k = 0; k < at.length; k++) {
            double u = dirs[k][0];
            double cu = StrictMath.cos(u);
            double su = StrictMath.sin(u);
            int contact = at[k] - 1;
            double rel = u - oh[contact];
            double rim = a * Math.abs(StrictMath.cos(rel)) + b * Math.abs(StrictMath.sin(rel));
            double cx = ox[contact] - cu * (rim + ta + 1);
            double cy = oy[contact] - su * (rim + ta + 1);
            // Back along the line until the tool is wholly outside the frame.
            double away = 0;
            while (away < 4000 && insideFrame(cx - cu * away, cy - su * away, ta + tb + 2, s)) {
                away += 4;
            }
            int approach = Math.max(s.integer(8, 16), (int) Math.ceil(away / 20));
            int withdraw = Math.max(s.integer(8, 16), (int) Math.ceil(away / 20));
            int from = contact - approach;
            int to = at[k] + withdraw;
            if (from < free || to >= n) {
                continue;
            }
            for (int f = from; f <= to; f++) {
                double back;
                if (f <= contact) {
                    double t = (double) (contact - f) / approach;
                    back = away * t * t * (3 - 2 * t);
                } else if (f == at[k]) {
                    back = -dirs[k][1];
                } else {
                    double t = (double) (f - at[k]) / withdraw;
                    back = -dirs[k][1] + (away + dirs[k][1]) * t * t * (3 - 2 * t);
                }
                x[f] = cx - cu * back;
                y[f] = cy - su * back;
                h[f] = u;
                shown[f] = true;
            }
            free = to + 1;
        }
        double[] depth = constant(n, 1);
        return new BodyTrack(x, y, constant(n, ta), constant(n, tb), h, depth, shown);
    }

    private static boolean insideFrame(double x, double y, double reach, Setting s) {
        return x + reach > 0 && y + reach > 0 && x - reach < s.width() && y - reach < s.height();
    }
}
