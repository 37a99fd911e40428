package org.modetrail.demo.scenario;

import java.util.List;
import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * A scenario of the family rendered from its {@link FamilyPlan}: floor, the bodies' soft shadows, the bodies back to
 * front with motion blur, the posts, then lighting (drift and a moving band of shade) and sensor noise.
 *
 * <p>Motion blur follows the exposure model of image synthesis (Potmesil and Chakravarty 1983, "Modeling motion
 * blur in computer-generated images"; Cook, Porter and Carpenter 1984, "Distributed ray tracing", temporal
 * sampling): a pixel records the time average of the scene over the exposure, a box filter in time. The exposure is
 * centred on the frame's instant and lasts {@code shutter} of the frame interval; it is sampled at an odd number of
 * instants spaced at most a pixel of the body's travel apart, and each pixel takes the mean of what the samples show
 * there (the body's texel where a sample covers it, what lies under the body elsewhere).
 *
 * <p>Truth is the body at the frame's instant (the middle sample): the box of its pixels inside the frame
 * (including pixels hidden behind a post or a nearer body, as an amodal box), width and height 0 when none is
 * inside, and the visible fraction of the whole body, pixels outside the frame counted as not seen. Computed when
 * the scenario is made with the pixel test the painter uses.
 */
final class FamilyScenario implements TrackingScenario {

    static final int ALL_OBJECTS = -1;
    private static final int GAIN_ONE = 1 << 12;
    private static final int OPAQUE = 0xFF000000;
    /** Most exposure samples per body and frame: 40 px of travel at one sample per pixel. */
    private static final int MAX_SAMPLES = 41;
    /** Steps per pixel of the band-of-shade table. */
    private static final int BAND_STEPS = 4;

    private final FamilyPlan plan;
    private final FamilyRendering rendering;
    private final Backdrop backdrop;
    private final BodyTexture[] textures;
    private final int objects;
    private final int width;
    private final int height;
    /** Per frame and object: x, y, width, height, visible. */
    private final double[] boxes;
    /** Per frame: bodies in painting order (shown or not). */
    private final int[] order;
    /** Per frame and object: exposure samples. */
    private final int[] samples;
    /** Per frame: red, green and blue gain in 1/4096. */
    private final int[] gains;

    FamilyScenario(FamilyPlan plan, FamilyRendering rendering) {
        this.plan = plan;
        this.rendering = rendering;
        this.width = plan.width();
        this.height = plan.height();
        this.objects = plan.bodies().size();
        int[] floor = new int[width * height];
        if (rendering.texture()) {
            plan.floor().paint(floor, width, height, plan.seed());
        }
        this.backdrop = new Backdrop(width, height, floor, rendering.texture(), plan.blotches(), plan.posts(),
                plan.seed());
        this.textures = new BodyTexture[objects];
        for (int k = 0; k < objects; k++) {
            BodyTrack t = track(k);
            textures[k] = new BodyTexture(plan.bodies().get(k).look(), t.maxA(), t.maxB());
        }
        int frames = plan.frames();
        this.boxes = new double[frames * objects * 5];
        this.order = new int[frames * objects];
        this.samples = new int[frames * objects];
        this.gains = new int[frames * 3];
        Pose[] poses = new Pose[objects];
        int[] extent = new int[6];
        for (int f = 0; f < frames; f++) {
            double t = (double) f / (frames - 1);
            for (int c = 0; c < 3; c++) {
                gains[f * 3 + c] = rendering.lighting() ? (int) Math.round(plan.lighting().gain(c, t) * GAIN_ONE)
                        : GAIN_ONE;
            }
            sortByDepth(f);
            for (int k = 0; k < objects; k++) {
                poses[k] = track(k).shown(f) ? track(k).pose(f) : null;
                samples[f * objects + k] = exposureSamples(track(k), f);
            }
            for (int rank = 0; rank < objects; rank++) {
                int k = order[f * objects + rank];
                if (poses[k] == null) {
                    continue;
                }
                measure(poses, f, rank, extent);
                int at = (f * objects + k) * 5;
                if (extent[4] > 0 && extent[2] >= 0) {
                    boxes[at] = extent[0];
                    boxes[at + 1] = extent[1];
                    boxes[at + 2] = extent[2] - extent[0] + 1;
                    boxes[at + 3] = extent[3] - extent[1] + 1;
                    boxes[at + 4] = (double) extent[5] / extent[4];
                }
            }
        }
    }

    @Override
    public ScenarioKind kind() {
        return plan.kind().nearest();
    }

    @Override
    public String name() {
        return plan.kind().slug() + "-" + plan.seed();
    }

    FamilyKind familyKind() {
        return plan.kind();
    }

    FamilyPlan plan() {
        return plan;
    }

    @Override
    public int width() {
        return width;
    }

    @Override
    public int height() {
        return height;
    }

    @Override
    public int fps() {
        return plan.fps();
    }

    @Override
    public int frameCount() {
        return plan.frames();
    }

    @Override
    public int objectCount() {
        return objects;
    }

    @Override
    public String toString() {
        return name();
    }

    @Override
    public void render(int frame, int[] rgb) {
        render(frame, rgb, ALL_OBJECTS, true);
    }

    /**
     * Renders with only some objects (bit {@code k} of {@code objectMask} for object {@code k}, with its shadow) and
     * with or without the posts; the same frame as {@link #render(int, int[])} otherwise.
     */
    void render(int frame, int[] rgb, int objectMask, boolean posts) {
        checkFrame(frame);
        if (rgb.length != width * height) {
            throw new IllegalArgumentException("frame buffer must hold " + width + " x " + height + " pixels, got "
                    + rgb.length);
        }
        System.arraycopy(backdrop.floor(), 0, rgb, 0, rgb.length);
        if (rendering.shadows() && plan.shadows().darkness() > 0) {
            for (int k = 0; k < objects; k++) {
                if ((objectMask & (1 << k)) != 0 && track(k).shown(frame)) {
                    paintShadow(rgb, plan.bodies().get(k), frame);
                }
            }
        }
        for (int rank = 0; rank < objects; rank++) {
            int k = order[frame * objects + rank];
            if ((objectMask & (1 << k)) != 0 && track(k).shown(frame)) {
                paintBody(rgb, k, frame);
            }
        }
        if (posts) {
            backdrop.paintPosts(rgb);
        }
        finish(frame, rgb);
    }

    @Override
    public ScenarioBox truth(int object, int frame) {
        if (object < 0 || object >= objects) {
            throw new IllegalArgumentException("object " + object + " outside 0.." + (objects - 1));
        }
        checkFrame(frame);
        int at = (frame * objects + object) * 5;
        return new ScenarioBox(boxes[at], boxes[at + 1], boxes[at + 2], boxes[at + 3], boxes[at + 4]);
    }

    /** Exposure samples used for {@code object} in {@code frame} (1 when it hardly moves during the exposure). */
    int exposureSamples(int object, int frame) {
        return rendering.blur() ? samples[frame * objects + object] : 1;
    }

    private BodyTrack track(int k) {
        return plan.bodies().get(k).track();
    }

    private void checkFrame(int frame) {
        if (frame < 0 || frame >= plan.frames()) {
            throw new IllegalArgumentException("frame " + frame + " outside 0.." + (plan.frames() - 1));
        }
    }

    /** Insertion sort of the frame's bodies by depth, ties by index: far first, painted first. */
    private void sortByDepth(int f) {
        int base = f * objects;
        for (int k = 0; k < objects; k++) {
            int r = k;
            while (r > 0 && track(order[base + r - 1]).depth(f) > track(k).depth(f)) {
                order[base + r] = order[base + r - 1];
                r--;
            }
            order[base + r] = k;
        }
    }

    /**
     * Odd sample count keeping samples at most a pixel of travel apart: the travel of the body's farthest point over
     * the exposure, bounded by the centre's path, the turn times the semi-length, and the change of the semi-axes.
     */
    private int exposureSamples(BodyTrack t, int f) {
        double half = plan.shutter() / 2;
        if (half == 0 || !t.shown(f)) {
            return 1;
        }
        Pose before = t.at(f - half);
        Pose now = t.pose(f);
        Pose after = t.at(f + half);
        double travel = travel(before, now) + travel(now, after);
        int s = 2 * (int) Math.ceil(travel / 2) + 1;
        return Math.min(MAX_SAMPLES, s);
    }

    private static double travel(Pose p, Pose q) {
        double turn = Math.abs(Math.atan2(p.sin() * q.cos() - p.cos() * q.sin(), p.cos() * q.cos() + p.sin() * q.sin()));
        return Math.hypot(q.cx() - p.cx(), q.cy() - p.cy()) + Math.max(p.a(), q.a()) * turn
                + Math.abs(q.a() - p.a()) + Math.abs(q.b() - p.b());
    }

    /**
     * Extent of the body at {@code rank} of the frame's order: {minX, minY, maxX, maxY} of its pixels inside the
     * frame, its pixels in all (inside or not), and those seen (inside, not under a post or a later-painted body).
     */
    private void measure(Pose[] poses, int f, int rank, int[] out) {
        Pose p = poses[order[f * objects + rank]];
        int minX = Integer.MAX_VALUE;
        int minY = Integer.MAX_VALUE;
        int maxX = -1;
        int maxY = -1;
        int pixels = 0;
        int seen = 0;
        for (int j = p.firstRow(); j <= p.lastRow(); j++) {
            for (int i = p.firstColumn(); i <= p.lastColumn(); i++) {
                if (!p.covers(i, j)) {
                    continue;
                }
                pixels++;
                if (i < 0 || j < 0 || i >= width || j >= height) {
                    continue;
                }
                minX = Math.min(minX, i);
                maxX = Math.max(maxX, i);
                minY = Math.min(minY, j);
                maxY = Math.max(maxY, j);
                boolean hidden = backdrop.hides(i);
                for (int later = rank + 1; later < objects && !hidden; later++) {
                    Pose q = poses[order[f * objects + later]];
                    hidden = q != null && q.covers(i, j);
                }
                if (!hidden) {
                    seen++;
                }
            }
        }
        out[0] = minX;
        out[1] = minY;
        out[2] = maxX;
        out[3] = maxY;
        out[4] = pixels;
        out[5] = seen;
    }

    /** The body as the time average of its exposure samples over what lies under it. */
    private void paintBody(int[] rgb, int k, int frame) {
        BodyTrack track = track(k);
        BodyTexture texture = textures[k];
        int n = exposureSamples(k, frame);
        double[] cx = new double[n];
        double[] cy = new double[n];
        double[] cos = new double[n];
        double[] sin = new double[n];
        double[] a = new double[n];
        double[] b = new double[n];
        int[] box = new int[4 * n];
        int[] level = new int[n];
        int i0 = width;
        int j0 = height;
        int i1 = -1;
        int j1 = -1;
        for (int s = 0; s < n; s++) {
            // Odd n: the middle sample is the frame's instant exactly.
            Pose p = n == 1 ? track.pose(frame) : track.at(frame + plan.shutter() * ((s + 0.5) / n - 0.5));
            cx[s] = p.cx();
            cy[s] = p.cy();
            cos[s] = p.cos();
            sin[s] = p.sin();
            a[s] = p.a();
            b[s] = p.b();
            level[s] = texture.level(p.a());
            box[4 * s] = Math.max(0, p.firstColumn());
            box[4 * s + 1] = Math.max(0, p.firstRow());
            box[4 * s + 2] = Math.min(width - 1, p.lastColumn());
            box[4 * s + 3] = Math.min(height - 1, p.lastRow());
            i0 = Math.min(i0, box[4 * s]);
            j0 = Math.min(j0, box[4 * s + 1]);
            i1 = Math.max(i1, box[4 * s + 2]);
            j1 = Math.max(j1, box[4 * s + 3]);
        }
        int half = n / 2;
        int[] from = new int[n];
        int[] to = new int[n];
        for (int j = j0; j <= j1; j++) {
            double py = j + 0.5;
            int rowFirst = Integer.MAX_VALUE;
            int rowLast = -1;
            for (int s = 0; s < n; s++) {
                rowSpan(cx[s], py - cy[s], cos[s], sin[s], a[s], b[s], s, from, to);
                if (j < box[4 * s + 1] || j > box[4 * s + 3]) {
                    from[s] = 1;
                    to[s] = 0;
                }
                from[s] = Math.max(from[s], box[4 * s]);
                to[s] = Math.min(to[s], box[4 * s + 2]);
                if (from[s] <= to[s]) {
                    rowFirst = Math.min(rowFirst, from[s]);
                    rowLast = Math.max(rowLast, to[s]);
                }
            }
            for (int i = Math.max(i0, rowFirst); i <= Math.min(i1, rowLast); i++) {
                int covered = 0;
                int sr = 0;
                int sg = 0;
                int sb = 0;
                for (int s = 0; s < n; s++) {
                    if (i < from[s] || i > to[s]) {
                        continue;
                    }
                    // The same arithmetic as Pose.q, so coverage agrees with the truth to the last bit.
                    double dx = i + 0.5 - cx[s];
                    double dy = py - cy[s];
                    double nu = (dx * cos[s] + dy * sin[s]) / a[s];
                    double nv = (-dx * sin[s] + dy * cos[s]) / b[s];
                    double u2 = nu * nu;
                    double v2 = nv * nv;
                    if (u2 * u2 + v2 * v2 < 1) {
                        int c = texture.at(level[s], nu, nv);
                        sr += (c >>> 16) & 0xFF;
                        sg += (c >>> 8) & 0xFF;
                        sb += c & 0xFF;
                        covered++;
                    }
                }
                if (covered == 0) {
                    continue;
                }
                int at = j * width + i;
                if (covered < n) {
                    int under = rgb[at];
                    int rest = n - covered;
                    sr += rest * ((under >>> 16) & 0xFF);
                    sg += rest * ((under >>> 8) & 0xFF);
                    sb += rest * (under & 0xFF);
                }
                rgb[at] = ((sr + half) / n) << 16 | ((sg + half) / n) << 8 | ((sb + half) / n);
            }
        }
    }

    /**
     * Columns of row offset {@code dy} (from the body's centre) that the body's rotated a x b rectangle reaches, a
     * pixel wider either side: a bound for the exact superellipse test, which the rectangle holds.
     */
    private static void rowSpan(double cx, double dy, double cos, double sin, double a, double b, int s, int[] from,
                                int[] to) {
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        // |dx cos + dy sin| <= a and |-dx sin + dy cos| <= b, each an interval of dx (or all or nothing).
        double[] k = {cos, -sin};
        double[] c = {dy * sin, dy * cos};
        double[] r = {a, b};
        for (int m = 0; m < 2; m++) {
            if (Math.abs(k[m]) < 1e-12) {
                if (Math.abs(c[m]) > r[m]) {
                    from[s] = 1;
                    to[s] = 0;
                    return;
                }
                continue;
            }
            double e0 = (-r[m] - c[m]) / k[m];
            double e1 = (r[m] - c[m]) / k[m];
            lo = Math.max(lo, Math.min(e0, e1));
            hi = Math.min(hi, Math.max(e0, e1));
        }
        if (lo > hi) {
            from[s] = 1;
            to[s] = 0;
            return;
        }
        from[s] = (int) Math.floor(cx + lo - 0.5) - 1;
        to[s] = (int) Math.ceil(cx + hi - 0.5) + 1;
    }

    /** A soft shadow: light multiplied by {@code 1 - darkness} at the core, fading to none at the rim. */
    private void paintShadow(int[] rgb, FamilyBody body, int frame) {
        BodyTrack t = body.track();
        SoftShadows light = plan.shadows();
        double cx;
        double cy;
        double ra;
        double rb;
        double cos;
        double sin;
        Pose p = t.pose(frame);
        if (body.shadow() == FamilyBody.Shadow.BENEATH) {
            double lift = Math.min(p.a(), p.b()) * 0.5;
            cx = p.cx() + light.dx() * lift;
            cy = p.cy() + light.dy() * lift;
            ra = p.a() * 1.08;
            rb = p.b() * 1.15;
            cos = p.cos();
            sin = p.sin();
        } else if (body.shadow() == FamilyBody.Shadow.FEET) {
            double tall = p.halfExtentY();
            cx = p.cx() + light.dx() * tall * 0.5;
            cy = p.cy() + tall * 0.96;
            ra = p.halfExtentX() * 1.4 + Math.abs(light.dx()) * tall * 0.5;
            rb = Math.max(1.5, tall * 0.12);
            cos = 1;
            sin = 0;
        } else {
            return;
        }
        double reach = Math.max(ra, rb) + 1;
        int i0 = Math.max(0, (int) Math.floor(cx - reach));
        int i1 = Math.min(width - 1, (int) Math.ceil(cx + reach));
        int j0 = Math.max(0, (int) Math.floor(cy - reach));
        int j1 = Math.min(height - 1, (int) Math.ceil(cy + reach));
        double dark = light.darkness();
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                double dx = i + 0.5 - cx;
                double dy = j + 0.5 - cy;
                double u = (dx * cos + dy * sin) / ra;
                double v = (-dx * sin + dy * cos) / rb;
                double r2 = u * u + v * v;
                if (r2 >= 1) {
                    continue;
                }
                // Penumbra over the outer half of the radius.
                double x = Math.min(1, (1 - Math.sqrt(r2)) * 2);
                int keep = (int) Math.round((1 - dark * x * x * (3 - 2 * x)) * GAIN_ONE);
                int at = j * width + i;
                int c = rgb[at];
                rgb[at] = (((((c >>> 16) & 0xFF) * keep) >> 12) << 16) | (((((c >>> 8) & 0xFF) * keep) >> 12) << 8)
                        | (((c & 0xFF) * keep) >> 12);
            }
        }
    }

    /**
     * Lighting gains times the band of shade, then zero-mean sensor noise (a brightness offset per pixel and a
     * weaker one per channel, a function of seed, frame and pixel only), then opaque alpha.
     */
    private void finish(int frame, int[] rgb) {
        int gr = gains[frame * 3];
        int gg = gains[frame * 3 + 1];
        int gb = gains[frame * 3 + 2];
        ShadowBand band = rendering.lighting() ? plan.band() : ShadowBand.NONE;
        boolean banded = !band.isNone();
        double bandCos = StrictMath.cos(band.angle());
        double bandSin = StrictMath.sin(band.angle());
        double centre = band.centre(frame);
        // The band's light factor by distance from its centre line, on a quarter-pixel grid (its edges are at
        // least 10 px soft, so the steps are below a grey level): a table look-up per pixel.
        int[] bandTable = banded ? new int[(int) Math.ceil((band.halfWidth() + band.soft()) * BAND_STEPS) + 1] : null;
        if (banded) {
            for (int k = 0; k < bandTable.length; k++) {
                bandTable[k] = (int) Math.round(band.factor((k + 0.5) / BAND_STEPS) * GAIN_ONE);
            }
        }
        int amplitude = rendering.noise() ? plan.sensorNoise() : 0;
        int span = 2 * amplitude + 1;
        int chromaHalf = amplitude / 2;
        int chromaSpan = 2 * chromaHalf + 1;
        long seed = NoiseHash.mix(plan.seed() * 64 + plan.kind().ordinal()) ^ 0x5E75L;
        int half = GAIN_ONE / 2;
        for (int j = 0; j < height; j++) {
            double rowOffset = (j + 0.5) * bandSin - centre;
            for (int i = 0; i < width; i++) {
                int at = j * width + i;
                int c = rgb[at];
                int r = (c >>> 16) & 0xFF;
                int g = (c >>> 8) & 0xFF;
                int b = c & 0xFF;
                int pr = gr;
                int pg = gg;
                int pb = gb;
                if (banded) {
                    int k = (int) (Math.abs((i + 0.5) * bandCos + rowOffset) * BAND_STEPS);
                    int f = k < bandTable.length ? bandTable[k] : GAIN_ONE;
                    pr = (pr * f + half) >> 12;
                    pg = (pg * f + half) >> 12;
                    pb = (pb * f + half) >> 12;
                }
                r = (r * pr + half) >> 12;
                g = (g * pg + half) >> 12;
                b = (b * pb + half) >> 12;
                if (amplitude > 0) {
                    long h = NoiseHash.hash(seed, frame, at);
                    int luma = (int) ((h >>> 40) % span) - amplitude;
                    r += luma + (int) ((h & 0xFF) % chromaSpan) - chromaHalf;
                    g += luma + (int) (((h >>> 8) & 0xFF) % chromaSpan) - chromaHalf;
                    b += luma + (int) (((h >>> 16) & 0xFF) % chromaSpan) - chromaHalf;
                }
                rgb[at] = OPAQUE | Rgb.pack(r, g, b);
            }
        }
    }

    /** The bodies, for tests. */
    List<FamilyBody> bodies() {
        return plan.bodies();
    }
}
