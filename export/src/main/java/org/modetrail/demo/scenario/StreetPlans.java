package org.modetrail.demo.scenario;

import static org.modetrail.demo.scenario.FamilyDesign.constant;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.modetrail.demo.Rgb;
import org.modetrail.demo.scenario.FamilyDesign.Setting;
import org.modetrail.demo.scenario.FamilyFloor.Style;

/**
 * The kinds seen by a fixed camera looking along the ground: {@link FamilyKind#PERSPECTIVE} and
 * {@link FamilyKind#PLAZA}. Sizes in px at 640 x 480, speeds in px per frame.
 */
final class StreetPlans {

    private static final int[] PAINT = {Rgb.pack(232, 232, 228), Rgb.pack(170, 172, 176), Rgb.pack(36, 36, 40),
        Rgb.pack(170, 36, 36), Rgb.pack(40, 66, 140), Rgb.pack(70, 74, 80), Rgb.pack(226, 190, 40),
        Rgb.pack(50, 100, 70), Rgb.pack(130, 30, 40)};
    private static final int[] DARK_TOPS = {Rgb.pack(30, 32, 38), Rgb.pack(40, 44, 60), Rgb.pack(28, 28, 30),
        Rgb.pack(55, 50, 48), Rgb.pack(34, 40, 52)};
    private static final int[] DARK_BOTTOMS = {Rgb.pack(30, 34, 50), Rgb.pack(25, 25, 28), Rgb.pack(45, 45, 50)};
    private static final int[] TOPS = {Rgb.pack(170, 40, 40), Rgb.pack(40, 80, 160), Rgb.pack(60, 130, 70),
        Rgb.pack(220, 210, 190), Rgb.pack(210, 170, 50), Rgb.pack(120, 60, 120), Rgb.pack(200, 110, 60)};
    private static final int[] BOTTOMS = {Rgb.pack(50, 70, 120), Rgb.pack(30, 30, 34), Rgb.pack(110, 110, 115),
        Rgb.pack(160, 140, 100)};
    private static final int[] SKIN = {Rgb.pack(224, 180, 150), Rgb.pack(190, 140, 110), Rgb.pack(140, 96, 70),
        Rgb.pack(96, 66, 50)};
    private static final int[] HAIR = {Rgb.pack(30, 24, 20), Rgb.pack(70, 48, 30), Rgb.pack(150, 120, 80),
        Rgb.pack(120, 120, 118)};
    private static final int[] PILLARS = {Rgb.pack(150, 148, 140), Rgb.pack(60, 64, 70), Rgb.pack(214, 212, 204)};
    /** Fastest a vehicle may move in the image, px per frame: the kind's stated 40 less a margin. */
    private static final double MAX_VEHICLE_STEP = 38;
    /** Narrowest a vehicle is shown: beyond that it is lost in the distance. */
    private static final double MIN_VEHICLE_WIDTH = 8;
    /** Most a vehicle's width changes over its time in view, wholly in the frame. */
    static final double MAX_GROWTH = 10;

    private StreetPlans() {
    }

    /**
     * Vehicles on a road seen from behind or in front. Ground depth {@code z} is 1 at the bottom row and grows to
     * the horizon; a vehicle at depth {@code z} is {@code 1/z} of its bottom-row size, its contact point on the row
     * {@code horizon + (height - horizon) / z}, its lane offset scaled the same way, and it moves at constant
     * ground speed, so its image speed and growth follow the pinhole model (Hartley and Zisserman, "Multiple View
     * Geometry", section 6.1).
     */
    static FamilyPlan perspective(Setting s) {
        int n = s.frames();
        FamilyFloor road = FamilyDesign.floor(s, Style.ROAD);
        boolean approachRight = s.chance(0.5);
        List<FamilyBody> bodies = new ArrayList<>();
        int others = s.integer(1, 3);
        for (int k = 0; k <= others; k++) {
            boolean approaching = s.chance(0.5);
            double lane = road.cell() * (s.chance(k == 0 ? 1 : 0.5) ? 0.25 : 0.75)
                    * ((approaching == approachRight) ? 1 : -1);
            boolean truck = s.chance(0.3);
            double a0 = s.uniform(truck ? 70 : 50, truck ? 95 : 85);
            double b0 = a0 / (truck ? s.uniform(1.0, 1.3) : s.uniform(1.3, 1.8));
            int start;
            double z0;
            if (k == 0) {
                start = 0;
                z0 = approaching ? 2 * a0 / s.uniform(14, 26) : 1 / s.uniform(0.75, 0.92);
            } else {
                start = s.integer(0, (int) (0.6 * n));
                z0 = approaching ? 2 * a0 / s.uniform(8, 14) : s.uniform(0.55, 0.7);
            }
            double vz = s.uniform(0.025, 0.06) * (approaching ? -1 : 1);
            BodyTrack t = null;
            for (int attempt = 0; attempt < 12; attempt++) {
                t = vehicle(s, road, n, lane, a0, b0, start, z0, vz);
                double step = maxShownStep(t, s);
                if (step > MAX_VEHICLE_STEP) {
                    vz *= MAX_VEHICLE_STEP / step * 0.97;
                } else if (k == 0 && !t.shown(0)) {
                    // The target must be in view at frame 0: start it nearer, within its x10 span.
                    z0 *= 0.85;
                } else {
                    break;
                }
            }
            int paint = PAINT[s.random().nextInt(PAINT.length)];
            ObjectLook look = new ObjectLook(paint, Rgb.scale(paint, 0.82), Rgb.mix(paint, Rgb.pack(40, 44, 52),
                    0.7), a0, b0, false, s.subSeed(k));
            bodies.add(new FamilyBody(look, t, FamilyBody.Shadow.BENEATH));
        }
        ShadowBand band = s.chance(0.3) ? slowBand(s, 0.15, 0.3) : ShadowBand.NONE;
        return s.plan(bodies, road, List.of(), List.of(), FamilyDesign.mildLighting(s), band,
                new SoftShadows(s.uniform(-0.4, 0.4), s.uniform(0.4, 0.9), s.uniform(0.3, 0.45)));
    }

    private static BodyTrack vehicle(Setting s, FamilyFloor road, int n, double lane, double a0, double b0,
                                     int start, double z0, double vz) {
        double horizon = road.vanishY();
        double below = s.height() - horizon;
        double[] x = new double[n];
        double[] y = new double[n];
        double[] a = new double[n];
        double[] b = new double[n];
        double[] depth = new double[n];
        boolean[] shown = new boolean[n];
        for (int f = 0; f < n; f++) {
            double z = Math.max(0.2, z0 + vz * Math.max(0, f - start));
            double scale = 1 / z;
            double contact = horizon + below * scale;
            a[f] = a0 * scale;
            b[f] = b0 * scale;
            x[f] = road.vanishX() + lane * scale;
            y[f] = contact - b[f];
            depth[f] = contact;
            boolean visible = x[f] + a[f] > 0 && x[f] - a[f] < s.width() && y[f] - b[f] < s.height();
            shown[f] = f >= start && 2 * a[f] >= MIN_VEHICLE_WIDTH && visible;
        }
        // Within a tenth of its largest size in view: the kind's growth and shrinking stay within x10.
        double largest = 0;
        for (int f = 0; f < n; f++) {
            if (shown[f] && y[f] + b[f] <= s.height()) {
                largest = Math.max(largest, 2 * a[f]);
            }
        }
        for (int f = 0; f < n; f++) {
            shown[f] &= 2 * a[f] >= largest / MAX_GROWTH;
        }
        return new BodyTrack(x, y, a, b, constant(n, 0), depth, shown);
    }

    private static double maxShownStep(BodyTrack t, Setting s) {
        double m = 0;
        for (int f = 1; f < t.frames(); f++) {
            if (t.shown(f) && t.shown(f - 1)) {
                m = Math.max(m, Math.hypot(t.cx(f) - t.cx(f - 1), t.cy(f) - t.cy(f - 1)));
            }
        }
        return m;
    }

    /** A band of shade crossing the frame once or so over the clip, slowly, as a building's shadow. */
    static ShadowBand slowBand(Setting s, double minDepth, double maxDepth) {
        double angle = s.uniform(-Math.PI, Math.PI);
        double c = StrictMath.cos(angle);
        double sn = StrictMath.sin(angle);
        double lo = Math.min(0, c * s.width()) + Math.min(0, sn * s.height());
        double hi = Math.max(0, c * s.width()) + Math.max(0, sn * s.height());
        double half = s.uniform(40, 160);
        double soft = s.uniform(10, Math.min(40, half));
        double speed = (hi - lo + 2 * half) / s.frames() * s.uniform(0.6, 1.2);
        return new ShadowBand(angle, half, soft, s.uniform(minDepth, maxDepth), lo - half * s.uniform(0, 1), speed);
    }

    /**
     * People crossing a plaza. The horizon lies above the frame, so a person is {@code (feet - horizon) / (height -
     * horizon)} of their bottom-row height; each has a gait (width swinging 7 %, height 1.5 %, one stride every 0.7
     * of their height walked). Object 0 is in view at frame 0 and walks towards an edge, passing a pillar; walkers
     * come in from the sides; a group may stand together.
     */
    static FamilyPlan plaza(Setting s) {
        int n = s.frames();
        int w = s.width();
        int h = s.height();
        FamilyFloor floor = FamilyDesign.anyFloor(s, Style.PAVING, Style.PAVING, Style.TILES, Style.SPECKLE);
        double horizon = -h * s.uniform(0.4, 1.5);
        double tallest = s.uniform(90, 130);
        List<FamilyBody> bodies = new ArrayList<>();
        // The target.
        double x0 = s.uniform(0.2 * w, 0.8 * w);
        double feet0 = s.uniform(0.55 * h, 0.92 * h);
        double dir = x0 < w / 2.0 ? -1 : 1;
        if (s.chance(0.3)) {
            dir = -dir;
        }
        double v0 = s.uniform(1.0, 2.4);
        int pauseFrom = s.chance(0.3) ? (int) (n * s.uniform(0.15, 0.4)) : n;
        int pauseLength = s.integer(20, 50);
        bodies.add(person(s, n, x0, feet0, dir, v0, 0, pauseFrom, pauseLength, horizon, tallest, 0));
        BodyTrack target = bodies.get(0).track();
        // Pillars: the first where the target passes a fifth to a third into the clip.
        List<Post> posts = new ArrayList<>();
        int passAt = (int) (n * s.uniform(0.15, 0.35));
        double px = FamilyPaths.clamp(target.cx(passAt), 60, w - 60);
        double pw = s.uniform(18, 46);
        int pillar = PILLARS[s.random().nextInt(PILLARS.length)];
        if (Math.abs(px - x0) > target.b(0) + pw / 2 + 6) {
            posts.add(new Post(px - pw / 2, px + pw / 2, pillar));
        }
        if (s.chance(0.5)) {
            double qx = s.uniform(40, w - 40);
            double qw = s.uniform(18, 46);
            if (Math.abs(qx - x0) > target.b(0) + qw / 2 + 6 && (posts.isEmpty() || Math.abs(qx - px) > 80)) {
                posts.add(new Post(qx - qw / 2, qx + qw / 2, pillar));
            }
        }
        int people = s.integer(4, 8);
        if (s.chance(0.7) && people >= 3) {
            int size = s.integer(2, 3);
            double gx = s.uniform(0.15 * w, 0.85 * w);
            double gFeet = s.uniform(0.45 * h, 0.85 * h);
            // Clear of the target in frame 0, where a tracker is started on it.
            for (int attempt = 0; attempt < 20 && Math.abs(gx - x0) < tallest * 0.75 + target.b(0) + 8; attempt++) {
                gx = s.uniform(0.15 * w, 0.85 * w);
            }
            double gap = s.uniform(0.5, 0.9);
            for (int g = 0; g < size; g++) {
                double scale = (gFeet - horizon) / (h - horizon);
                double width = tallest * scale * 0.4;
                bodies.add(person(s, n, gx + (g - (size - 1) / 2.0) * width * gap, gFeet + s.uniform(-6, 6), 1, 0, 0,
                        n, 0, horizon, tallest, bodies.size()));
            }
        }
        while (bodies.size() < people) {
            double feet = s.uniform(0.4 * h, 0.95 * h);
            boolean inside = s.chance(0.3);
            double side = s.chance(0.5) ? -1 : 1;
            double x = inside ? s.uniform(0.1 * w, 0.9 * w) : (side < 0 ? -40 : w + 40);
            if (inside && Math.abs(x - x0) < tallest * 0.3 + target.b(0) + 8) {
                // Would stand in front of or behind the target in frame 0: come in from the side instead.
                inside = false;
                x = side < 0 ? -40 : w + 40;
            }
            int start = inside ? 0 : s.integer(0, (int) (0.7 * n));
            bodies.add(person(s, n, x, feet, -side, s.uniform(0.8, 2.4), start, n, 0, horizon, tallest,
                    bodies.size()));
        }
        ShadowBand band = s.chance(0.4) ? slowBand(s, 0.2, 0.35) : ShadowBand.NONE;
        return s.plan(bodies, floor, List.of(), posts, FamilyDesign.mildLighting(s), band,
                new SoftShadows(s.uniform(-0.7, 0.7), 0, s.uniform(0.25, 0.45)));
    }

    /**
     * One person walking from ({@code x0}, feet row {@code feet0}) along {@code dir} (+1 right, -1 left) at
     * {@code v0} px a frame at the bottom row (less further up), from frame {@code start}, resting for
     * {@code pauseLength} frames from {@code pauseFrom}; {@code v0 = 0} stands, swaying a little.
     */
    private static FamilyBody person(Setting s, int n, double x0, double feet0, double dir, double v0, int start,
                                     int pauseFrom, int pauseLength, double horizon, double tallest, int k) {
        int h = s.height();
        double ratio = s.uniform(0.3, 0.5);
        double stature = s.uniform(0.85, 1.05) * tallest;
        double drift = s.uniform(-0.3, 0.3);
        double[] x = new double[n];
        double[] y = new double[n];
        double[] a = new double[n];
        double[] b = new double[n];
        double[] depth = new double[n];
        double px = x0;
        double feet = feet0;
        double phase = s.uniform(0, 2 * Math.PI);
        double sway = s.uniform(0, 2 * Math.PI);
        for (int f = 0; f < n; f++) {
            double scale = (feet - horizon) / (h - horizon);
            double tall = stature * scale;
            boolean walking = v0 > 0 && f >= start && (f < pauseFrom || f >= pauseFrom + pauseLength);
            double gait = walking ? StrictMath.sin(phase) : 0;
            a[f] = tall / 2 * (1 + 0.015 * StrictMath.sin(2 * phase));
            b[f] = tall / 2 * ratio * (1 + 0.07 * gait);
            double still = v0 == 0 ? 0.8 * StrictMath.sin(2 * Math.PI * f / 90 + sway) : 0;
            x[f] = px + still;
            y[f] = feet - a[f];
            depth[f] = feet;
            if (walking) {
                double step = v0 * scale;
                px += dir * step;
                feet = FamilyPaths.clamp(feet + drift * scale, 0.35 * h, h - 2);
                phase += 2 * Math.PI * step / (0.7 * tall);
            }
        }
        boolean dark = s.chance(0.5);
        int top = dark ? DARK_TOPS[s.random().nextInt(DARK_TOPS.length)] : TOPS[s.random().nextInt(TOPS.length)];
        int bottom = dark || s.chance(0.4) ? DARK_BOTTOMS[s.random().nextInt(DARK_BOTTOMS.length)]
                : BOTTOMS[s.random().nextInt(BOTTOMS.length)];
        FigureLook look = new FigureLook(SKIN[s.random().nextInt(SKIN.length)], HAIR[s.random().nextInt(HAIR.length)],
                s.uniform(0.11, 0.15),
                FamilyDesign.near(s, top, 8), FamilyDesign.near(s, bottom, 6), s.uniform(-0.15, 0.1), s.subSeed(k));
        boolean[] shown = new boolean[n];
        Arrays.fill(shown, true);
        return new FamilyBody(look, new BodyTrack(x, y, a, b, constant(n, -Math.PI / 2), depth, shown),
                FamilyBody.Shadow.FEET);
    }
}
