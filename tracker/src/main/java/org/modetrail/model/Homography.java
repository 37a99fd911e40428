package org.modetrail.model;

import java.util.Arrays;

/**
 * A plane-to-plane projective map, x' ~ H x in homogeneous coordinates (Hartley and Zisserman, Multiple View
 * Geometry, section 2.3): here from image pixels to ground metres. Immutable; the nine entries are row-major and
 * scaled so that the largest magnitude is 1 (a homography is defined up to scale).
 */
public final class Homography {
    private final double[] h;

    /** @param rowMajor the nine entries h11 h12 h13 h21 ... h33; not all zero, finite */
    public Homography(double[] rowMajor) {
        if (rowMajor == null || rowMajor.length != 9) {
            throw new IllegalArgumentException("a homography has 9 entries");
        }
        double max = 0;
        for (double v : rowMajor) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("a homography's entries must be finite: " + Arrays.toString(rowMajor));
            }
            max = Math.max(max, Math.abs(v));
        }
        if (max == 0) {
            throw new IllegalArgumentException("a homography cannot be all zeros");
        }
        h = new double[9];
        for (int i = 0; i < 9; i++) {
            h[i] = rowMajor[i] / max;
        }
    }

    /** The nine entries, row-major (a copy). */
    public double[] entries() {
        return h.clone();
    }

    public double get(int row, int column) {
        return h[3 * row + column];
    }

    /** Maps an image point to the ground; fails for points on the horizon line (they map to infinity). */
    public WorldPoint toWorld(PixelPoint p) {
        double[] w = apply(h, p.x(), p.y());
        return new WorldPoint(w[0], w[1]);
    }

    /** Maps a ground point to the image, through the inverse. */
    public PixelPoint toImage(WorldPoint p) {
        double[] w = apply(inverse(h), p.x(), p.y());
        return new PixelPoint(w[0], w[1]);
    }

    /** The inverse map, from ground to image. */
    public Homography inverse() {
        return new Homography(inverse(h));
    }

    private static double[] apply(double[] m, double x, double y) {
        double u = m[0] * x + m[1] * y + m[2];
        double v = m[3] * x + m[4] * y + m[5];
        double w = m[6] * x + m[7] * y + m[8];
        if (Math.abs(w) < 1e-12 * (Math.abs(u) + Math.abs(v) + 1e-300)) {
            throw new IllegalArgumentException("the point (" + x + ", " + y + ") lies on the horizon of the map");
        }
        return new double[] {u / w, v / w};
    }

    private static double[] inverse(double[] m) {
        double a = m[0], b = m[1], c = m[2], d = m[3], e = m[4], f = m[5], g = m[6], k = m[7], l = m[8];
        double c00 = e * l - f * k;
        double c01 = -(d * l - f * g);
        double c02 = d * k - e * g;
        double det = a * c00 + b * c01 + c * c02;
        if (Math.abs(det) < 1e-300) {
            throw new IllegalArgumentException("the homography is singular");
        }
        return new double[] {
            c00 / det, -(b * l - c * k) / det, (b * f - c * e) / det,
            c01 / det, (a * l - c * g) / det, -(a * f - c * d) / det,
            c02 / det, -(a * k - b * g) / det, (a * e - b * d) / det};
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Homography other && Arrays.equals(h, other.h);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(h);
    }

    @Override
    public String toString() {
        return "Homography" + Arrays.toString(h);
    }
}
