package org.modetrail.tracking;

import org.modetrail.model.Box;

/**
 * Mean shift on a weight image with a flat (uniform) window: each step moves the window's centre to the
 * weighted centroid of the weights inside it, until the move is under {@code epsilon} pixels or after
 * {@code maxIterations} steps. This is the mode seeking of Fukunaga and Hostetler (1975) and of Comaniciu, Ramesh
 * and Meer (PAMI 2003, equation 13) with the uniform kernel, whose shadow is the flat window; the wide search uses
 * it on a back-projected likelihood map, where it is cheap with no per-pixel kernel weights.
 *
 * <p>Pixel (i, j) counts with centre (i + 0.5, j + 0.5); the parts of the window outside the image count as zero
 * weight (a constant border policy).
 */
public final class FlatMeanShift {
    private FlatMeanShift() {
    }

    /**
     * @param weights row-major, {@code width * height}, non-negative
     * @return the window after convergence, same size as {@code window}
     */
    public static Box seek(float[] weights, int width, int height, Box window, int maxIterations, double epsilon) {
        double cx = window.centreX();
        double cy = window.centreY();
        double hw = window.width() / 2;
        double hh = window.height() / 2;
        for (int it = 0; it < maxIterations; it++) {
            int x0 = Math.max(0, (int) Math.floor(cx - hw + 0.5));
            int y0 = Math.max(0, (int) Math.floor(cy - hh + 0.5));
            int x1 = Math.min(width, (int) Math.floor(cx + hw + 0.5));
            int y1 = Math.min(height, (int) Math.floor(cy + hh + 0.5));
            double m00 = 0;
            double m10 = 0;
            double m01 = 0;
            for (int y = y0; y < y1; y++) {
                int row = y * width;
                double rowSum = 0;
                double rowX = 0;
                for (int x = x0; x < x1; x++) {
                    float w = weights[row + x];
                    rowSum += w;
                    rowX += w * (x + 0.5);
                }
                m00 += rowSum;
                m10 += rowX;
                m01 += rowSum * (y + 0.5);
            }
            if (m00 <= 0) {
                break;
            }
            double nx = m10 / m00;
            double ny = m01 / m00;
            double shift = Math.hypot(nx - cx, ny - cy);
            cx = nx;
            cy = ny;
            if (shift < epsilon) {
                break;
            }
        }
        return Box.centredAt(cx, cy, window.width(), window.height());
    }
}
