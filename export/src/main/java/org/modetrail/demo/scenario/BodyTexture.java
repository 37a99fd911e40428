package org.modetrail.demo.scenario;

import org.modetrail.demo.Rgb;

/**
 * A body's look sampled once on a grid over its body coordinates ({@code nu, nv} in -1..1), at the resolution of
 * its largest size in the clip, with 2 x 2 box-averaged smaller levels for when it is far away (a mip-map, Williams
 * 1983, "Pyramidal parametrics"), so a receding body's pattern averages rather than shimmers. Painting reads
 * texels, which keeps the per-pixel cost of motion blur, many samples per pixel, low.
 */
final class BodyTexture {

    private static final int MAX_SIDE = 1024;

    private final int[][] levels;
    private final int[] columns;
    private final int[] rows;

    BodyTexture(BodyLook look, double maxA, double maxB) {
        int w = Math.max(4, Math.min(MAX_SIDE, (int) Math.ceil(2 * maxA) + 2));
        int h = Math.max(4, Math.min(MAX_SIDE, (int) Math.ceil(2 * maxB) + 2));
        int count = 1;
        while ((w >> count) >= 4 && (h >> count) >= 4) {
            count++;
        }
        levels = new int[count][];
        columns = new int[count];
        rows = new int[count];
        int[] top = new int[w * h];
        for (int v = 0; v < h; v++) {
            double nv = -1 + (v + 0.5) * 2 / h;
            for (int u = 0; u < w; u++) {
                double nu = -1 + (u + 0.5) * 2 / w;
                double u2 = nu * nu;
                double v2 = nv * nv;
                // Texels outside the rim take the rim's colour: a pixel just inside may sample them.
                top[v * w + u] = look.colour(nu, nv, Math.min(0.999, u2 * u2 + v2 * v2));
            }
        }
        levels[0] = top;
        columns[0] = w;
        rows[0] = h;
        for (int l = 1; l < count; l++) {
            int pw = columns[l - 1];
            int ph = rows[l - 1];
            int lw = pw / 2;
            int lh = ph / 2;
            int[] prev = levels[l - 1];
            int[] next = new int[lw * lh];
            for (int v = 0; v < lh; v++) {
                for (int u = 0; u < lw; u++) {
                    int c00 = prev[2 * v * pw + 2 * u];
                    int c10 = prev[2 * v * pw + 2 * u + 1];
                    int c01 = prev[(2 * v + 1) * pw + 2 * u];
                    int c11 = prev[(2 * v + 1) * pw + 2 * u + 1];
                    next[v * lw + u] = Rgb.pack(
                            (Rgb.red(c00) + Rgb.red(c10) + Rgb.red(c01) + Rgb.red(c11) + 2) / 4,
                            (Rgb.green(c00) + Rgb.green(c10) + Rgb.green(c01) + Rgb.green(c11) + 2) / 4,
                            (Rgb.blue(c00) + Rgb.blue(c10) + Rgb.blue(c01) + Rgb.blue(c11) + 2) / 4);
                }
            }
            levels[l] = next;
            columns[l] = lw;
            rows[l] = lh;
        }
    }

    /** The level whose texels are about a pixel for a body of semi-length {@code a}. */
    int level(double a) {
        int l = 0;
        while (l + 1 < levels.length && columns[l + 1] >= 2 * a) {
            l++;
        }
        return l;
    }

    /** Texel of level {@code l} at body point ({@code nu, nv}), nearest; points past the rim clamp to it. */
    int at(int l, double nu, double nv) {
        int w = columns[l];
        int h = rows[l];
        int u = (int) ((nu + 1) * 0.5 * w);
        int v = (int) ((nv + 1) * 0.5 * h);
        u = u < 0 ? 0 : Math.min(w - 1, u);
        v = v < 0 ? 0 : Math.min(h - 1, v);
        return levels[l][v * w + u];
    }
}
