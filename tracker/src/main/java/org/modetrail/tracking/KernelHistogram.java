package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * A colour histogram of the pixels inside the ellipse inscribed in a box, each pixel weighted by the Epanechnikov
 * profile k(x) = 1 - x of its normalised squared distance from the centre, then normalised to sum 1: the target
 * model q_u and the target candidate p_u(y) of Comaniciu, Ramesh and Meer ("Kernel-based object tracking", PAMI
 * 2003, section 3; the kernel's constant cancels in the normalisation). Pixel centres are at (i + 0.5, j + 0.5).
 * Parts of the ellipse outside the bin image do not count (a constant border policy); the normalisation then
 * keeps what remains a distribution.
 *
 * <p>Only the bins actually touched are listed and cleared, so a 60x40 box costs its 2400 pixels, not 4096 bins.
 */
final class KernelHistogram {
    final float[] values;
    final int[] touched;
    int touchedCount;
    /** Sum of kernel weights before normalisation; 0 when the ellipse missed the image. */
    double mass;

    KernelHistogram(int binCount) {
        values = new float[binCount];
        touched = new int[binCount];
    }

    void clear() {
        for (int k = 0; k < touchedCount; k++) {
            values[touched[k]] = 0;
        }
        touchedCount = 0;
        mass = 0;
    }

    /** Fills this with the kernel-weighted histogram of {@code box} over {@code image}. */
    void compute(BinImage image, Box box) {
        compute(image, box.centreX(), box.centreY(), box.width(), box.height());
    }

    /** The same for the box of {@code width x height} centred on (cx, cy), without making a box. */
    void compute(BinImage image, double cx, double cy, double width, double height) {
        clear();
        double ax = width / 2;
        double ay = height / 2;
        if (ax <= 0 || ay <= 0) {
            return;
        }
        double invAx2 = 1 / (ax * ax);
        double invAy2 = 1 / (ay * ay);
        int xa = image.firstColumn(cx - ax);
        int xb = image.endColumn(cx + ax);
        int ya = image.firstRow(cy - ay);
        int yb = image.endRow(cy + ay);
        int[] bins = image.raw();
        int stride = image.width();
        double total = 0;
        for (int y = ya; y < yb; y++) {
            double dy = y + 0.5 - cy;
            double ry = dy * dy * invAy2;
            if (ry >= 1) {
                continue;
            }
            int row = (y - image.y0()) * stride - image.x0();
            for (int x = xa; x < xb; x++) {
                double dx = x + 0.5 - cx;
                double r = dx * dx * invAx2 + ry;
                if (r < 1) {
                    float k = (float) (1 - r);
                    int u = bins[row + x];
                    if (values[u] == 0) {
                        touched[touchedCount++] = u;
                    }
                    values[u] += k;
                    total += k;
                }
            }
        }
        mass = total;
        if (total > 0) {
            float inv = (float) (1 / total);
            for (int k = 0; k < touchedCount; k++) {
                values[touched[k]] *= inv;
            }
        }
    }

    /** Copies another histogram's content into this one. */
    void copyFrom(KernelHistogram other) {
        clear();
        for (int k = 0; k < other.touchedCount; k++) {
            int u = other.touched[k];
            values[u] = other.values[u];
            touched[touchedCount++] = u;
        }
        mass = other.mass;
    }

    /** Bhattacharyya coefficient with {@code q}, over this histogram's non-zero bins only. */
    double bhattacharyya(float[] q) {
        return BhattacharyyaCoefficient.overBins(values, q, touched, touchedCount);
    }
}
