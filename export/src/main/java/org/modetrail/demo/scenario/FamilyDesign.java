package org.modetrail.demo.scenario;

import java.util.List;
import java.util.Random;
import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * What every kind of the family draws from its seed the same way: clip length, encoding quality, exposure, noise,
 * mild light drift, floors and colours. A kind's planner gets a {@link Setting} and adds its bodies.
 */
final class FamilyDesign {

    private FamilyDesign() {
    }

    /**
     * The draws common to every kind.
     *
     * @param kind    the situation
     * @param seed    its seed
     * @param random  the kind's random sequence, shared with its planner
     * @param width   frame width
     * @param height  frame height
     * @param frames  clip length
     * @param shutter exposure as a share of the frame interval
     * @param noise   sensor noise in grey levels
     */
    record Setting(FamilyKind kind, long seed, Random random, int width, int height, int frames, double shutter,
                   int noise) {

        double uniform(double lo, double hi) {
            return lo + (hi - lo) * random.nextDouble();
        }

        int integer(int lo, int hi) {
            return lo + random.nextInt(hi - lo + 1);
        }

        boolean chance(double p) {
            return random.nextDouble() < p;
        }

        long subSeed(int k) {
            return NoiseHash.mix(seed * 1_000_003L + kind.ordinal() * 101L + k);
        }

        FamilyPlan plan(List<FamilyBody> bodies, FamilyFloor floor, List<Blotch> blotches, List<Post> posts,
                        Lighting lighting, ShadowBand band, SoftShadows shadows) {
            return new FamilyPlan(kind, seed, width, height, ScenarioConfig.DEFAULT_FPS, frames, bodies, floor,
                    blotches, posts, lighting, band, shadows, shutter, noise, ScenarioFamily.crf(kind, seed));
        }
    }

    static Random random(FamilyKind kind, long seed) {
        return new Random(NoiseHash.mix(seed * 131 + kind.ordinal() * 7 + 3));
    }

    /** A little drift of brightness and colour over the clip, as daylight and auto-exposure give: a few percent. */
    static Lighting mildLighting(Setting s) {
        double b0 = s.uniform(0.94, 1.06);
        double b1 = b0 * s.uniform(0.9, 1.1);
        double t0 = s.uniform(-0.03, 0.03);
        double t1 = s.uniform(-0.03, 0.03);
        return new Lighting(b0 * (1 + t0), b0, b0 * (1 - t0), b1 * (1 + t1), b1, b1 * (1 - t1));
    }

    /** A floor of {@code style} in colours drawn from the seed. */
    static FamilyFloor floor(Setting s, FamilyFloor.Style style) {
        return switch (style) {
            case TILES -> {
                int base = tint(s, s.integer(120, 175), 14);
                yield new FamilyFloor(style, base, Rgb.offset(base, -28), s.uniform(28, 96) * s.width() / 640, 0, 0);
            }
            case SPECKLE -> new FamilyFloor(style, tint(s, s.integer(140, 195), 12), tint(s, s.integer(50, 90), 10),
                    8, 0, 0);
            case GRADIENT -> new FamilyFloor(style, tint(s, s.integer(80, 130), 16), tint(s, s.integer(165, 210), 16),
                    8, 0, 0);
            case PAVING -> {
                int base = tint(s, s.integer(105, 160), 18);
                yield new FamilyFloor(style, base, tint(s, s.integer(100, 170), 30), s.uniform(32, 72) * s.width() / 640,
                        0, 0);
            }
            case PALE_NOISY -> new FamilyFloor(style, tint(s, s.integer(195, 222), 8), 0, 8, 0, 0);
            case ROAD -> new FamilyFloor(style, tint(s, s.integer(86, 116), 6),
                    s.chance(0.5) ? Rgb.pack(s.integer(80, 100), s.integer(100, 124), s.integer(66, 84))
                            : tint(s, s.integer(140, 170), 10),
                    s.width() * s.uniform(0.45, 0.7), s.width() * s.uniform(0.38, 0.62),
                    s.height() * s.uniform(0.18, 0.3));
        };
    }

    /** One of {@code styles}, drawn. */
    static FamilyFloor anyFloor(Setting s, FamilyFloor.Style... styles) {
        return floor(s, styles[s.random().nextInt(styles.length)]);
    }

    /** A grey of {@code luma} with a hue drawn up to {@code spread} levels per channel. */
    static int tint(Setting s, int luma, int spread) {
        return Rgb.pack(luma + s.integer(-spread, spread), luma + s.integer(-spread / 2, spread / 2),
                luma + s.integer(-spread, spread));
    }

    /** A clearly coloured body colour: one of the hues of things people track, shade drawn. */
    static int saturated(Setting s) {
        int[][] hues = {{198, 74, 52}, {52, 96, 186}, {60, 150, 70}, {214, 160, 40}, {140, 60, 150}, {40, 150, 160},
            {220, 110, 40}, {170, 40, 70}};
        int[] h = hues[s.random().nextInt(hues.length)];
        double k = s.uniform(0.8, 1.1);
        return Rgb.pack(h[0] * k, h[1] * k, h[2] * k);
    }

    /** A colour near {@code c}: the same family, {@code spread} levels apart at most per channel. */
    static int near(Setting s, int c, int spread) {
        return Rgb.pack(Rgb.red(c) + s.integer(-spread, spread), Rgb.green(c) + s.integer(-spread, spread),
                Rgb.blue(c) + s.integer(-spread, spread));
    }

    /** The textured body look of the project's scenarios in {@code base}: darker patches and a paler band. */
    static ObjectLook look(Setting s, int base, double semiLength, double semiWidth, int k) {
        int accent = Rgb.scale(base, s.uniform(0.55, 0.75));
        int band = Rgb.mix(base, Rgb.pack(240, 232, 210), s.uniform(0.35, 0.6));
        return new ObjectLook(base, accent, band, Math.max(semiLength, semiWidth), Math.min(semiLength, semiWidth),
                s.chance(0.5), s.subSeed(k));
    }

    /**
     * Headings that follow the direction of travel, turning at most {@code maxTurn} radians a frame and holding
     * while the body is (nearly) still.
     */
    static double[] headings(double[] x, double[] y, double maxTurn, double initial) {
        int n = x.length;
        double[] h = new double[n];
        double current = initial;
        for (int f = 0; f < n; f++) {
            int g = Math.min(n - 1, f + 1);
            int e = Math.max(0, f - 1);
            double dx = x[g] - x[e];
            double dy = y[g] - y[e];
            if (Math.hypot(dx, dy) > 0.3) {
                double want = StrictMath.atan2(dy, dx);
                double turn = Routes.wrap(want - current);
                current = Routes.wrap(current + Math.max(-maxTurn, Math.min(maxTurn, turn)));
            }
            h[f] = current;
        }
        return h;
    }

    /**
     * A wandering path ({@link Routes#smooth}) that starts at least {@code clear} px from ({@code x0}, {@code y0}),
     * redrawn up to 20 times, each draw also tried mirrored left to right ({@link Routes#smooth} starts in the left
     * part of its area, as the target's path may): a second body must not hide the target in the frame a tracker
     * starts on.
     */
    static Route wanderAway(Setting s, Route.Area area, double minSpeed, double maxSpeed, double x0, double y0,
                            double clear) {
        Route r = null;
        for (int attempt = 0; attempt < 20; attempt++) {
            r = Routes.smooth(s.random(), s.frames(), area, minSpeed, maxSpeed);
            if (Math.hypot(r.x()[0] - x0, r.y()[0] - y0) >= clear) {
                return r;
            }
            double[] mirrored = new double[r.frames()];
            for (int f = 0; f < mirrored.length; f++) {
                mirrored[f] = area.minX() + area.maxX() - r.x()[f];
            }
            if (Math.hypot(mirrored[0] - x0, r.y()[0] - y0) >= clear) {
                return new Route(mirrored, r.y());
            }
        }
        return r;
    }

    /** {@code value} for every frame. */
    static double[] constant(int n, double value) {
        double[] v = new double[n];
        java.util.Arrays.fill(v, value);
        return v;
    }

    /** {@code base} times {@code 1 + amplitude * sin}: a gait's or a crawl's rhythm in a body's length or width. */
    static double[] pulse(Setting s, int n, double base, double amplitude, double period) {
        double[] v = new double[n];
        double phase = s.uniform(0, 2 * Math.PI);
        for (int f = 0; f < n; f++) {
            v[f] = base * (1 + amplitude * StrictMath.sin(2 * Math.PI * f / period + phase));
        }
        return v;
    }
}
