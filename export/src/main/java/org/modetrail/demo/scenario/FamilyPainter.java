package org.modetrail.demo.scenario;

import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * Paints a family scenario's frame layers over the floor: soft shadows, bodies with motion blur, and the finish
 * (lighting, band of shade, sensor noise). The exposure model and the truth it matches are described in
 * {@link FamilyScenario}.
 */
final class FamilyPainter {

    static final int GAIN_ONE = 1 << 12;
    private static final int OPAQUE = 0xFF000000;
    /** Steps per pixel of the band-of-shade table. */
    private static final int BAND_STEPS = 4;

    private final FamilyPlan plan;
    private final FamilyRendering rendering;
    private final BodyTexture[] textures;
    private final int width;
    private final int height;
    /** Per frame: red, green and blue gain in 1/4096. */
    private final int[] gains;

    FamilyPainter(FamilyPlan plan, FamilyRendering rendering, BodyTexture[] textures, int[] gains) {
        this.plan = plan;
        this.rendering = rendering;
        this.textures = textures;
        this.width = plan.width();
        this.height = plan.height();
        this.gains = gains;
    }

    /** The body as the time average of its exposure samples over what lies under it. */
    void paintBody(int[] rgb, int k, int frame, int n) {
        BodyTrack track = plan.bodies().get(k).track();
        BodyTexture texture = textures[k];
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
    void paintShadow(int[] rgb, FamilyBody body, int frame) {
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
    void finish(int frame, int[] rgb) {
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
}
