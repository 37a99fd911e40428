package org.modetrail.calibration;

/**
 * Savitzky-Golay smoothing and differentiation: the value and the derivatives at one sample of the polynomial fitted
 * by least squares to the samples of a window around it, written as fixed weights on the samples (Savitzky and
 * Golay, "Smoothing and Differentiation of Data by Simplified Least Squares Procedures", Analytical Chemistry 36(8),
 * 1627-1639, 1964; the weights are their convolution integers divided by the normalising factor, as in their tables
 * for the 5- and 7-point quadratic/cubic windows).
 *
 * <p>The weights are computed here by least squares for any window, order and sample times, not read from a table:
 * with s_j = (t_j - t0) / h (h the largest |t_j - t0|, for conditioning) and A the Vandermonde matrix A_jk = s_j^k,
 * k = 0..order, the fitted coefficients are (A^T A)^-1 A^T y, so the weights of the value at t0 are row 0 of
 * (A^T A)^-1 A^T and those of the d-th derivative are d! h^-d times row d. On evenly spaced samples with t0 at the
 * centre these are the published integers; on uneven times (dropped frames, variable frame rate) they are the same
 * least-squares fit on the actual times, and t0 need not be the centre (windows shifted inside a run's ends).
 *
 * <p>An instance keeps its work arrays, so it allocates nothing per call; it is not safe to share between threads.
 */
public final class SavitzkyGolay {
    private final int order;
    private final int size;
    private final double[] normal;
    private final double[] solution;
    private final double[] powers;

    /** @param order polynomial order, 0 to 6 */
    public SavitzkyGolay(int order) {
        if (order < 0 || order > 6) {
            throw new IllegalArgumentException("the Savitzky-Golay order must be 0 to 6, got " + order);
        }
        this.order = order;
        this.size = order + 1;
        this.normal = new double[size * size];
        this.solution = new double[2 * size];
        this.powers = new double[2 * size];
    }

    public int order() {
        return order;
    }

    /**
     * Weights for the value and the first derivative at time {@code at} of the fit to samples {@code from..to-1}
     * of {@code t}: value = sum value[j] y[from + j], slope = sum slope[j] y[from + j] (per unit of t).
     *
     * @return false when the window has fewer than order + 1 distinct times (no unique fit); the arrays are then
     *         left unspecified
     */
    public boolean weights(double[] t, int from, int to, double at, double[] value, double[] slope) {
        int m = to - from;
        if (m < size) {
            return false;
        }
        double h = 0;
        for (int j = from; j < to; j++) {
            h = Math.max(h, Math.abs(t[j] - at));
        }
        if (!(h > 0) || !Double.isFinite(h)) {
            return false;
        }
        // Normal matrix sum_j s_j^(a+b), from the power sums 0..2 order.
        java.util.Arrays.fill(powers, 0);
        for (int j = from; j < to; j++) {
            double s = (t[j] - at) / h;
            double p = 1;
            for (int k = 0; k <= 2 * order; k++) {
                powers[k] += p;
                p *= s;
            }
        }
        for (int a = 0; a < size; a++) {
            for (int b = 0; b < size; b++) {
                normal[a * size + b] = powers[a + b];
            }
        }
        if (!cholesky(normal, size)) {
            return false;
        }
        // Rows 0 and 1 of the inverse (it is symmetric): solve N z = e_0 and N z = e_1.
        int rows = Math.min(2, size);
        for (int r = 0; r < rows; r++) {
            solve(normal, size, r, solution, r * size);
        }
        for (int j = 0; j < m; j++) {
            double s = (t[from + j] - at) / h;
            double v = 0;
            double d = 0;
            double p = 1;
            for (int k = 0; k < size; k++) {
                v += solution[k] * p;
                if (rows > 1) {
                    d += solution[size + k] * p;
                }
                p *= s;
            }
            value[j] = v;
            slope[j] = rows > 1 ? d / h : 0;
        }
        return true;
    }

    /**
     * Weights of the {@code derivative}-th derivative at {@code at} of the order-{@code order} least-squares
     * polynomial through samples at times {@code t} (allocates; for tables and tests).
     */
    public static double[] coefficients(double[] t, double at, int order, int derivative) {
        if (derivative < 0 || derivative > order) {
            throw new IllegalArgumentException("derivative must be 0 to the order " + order + ", got " + derivative);
        }
        int size = order + 1;
        if (t.length < size) {
            throw new IllegalArgumentException("a fit of order " + order + " needs " + size + " samples, got "
                    + t.length);
        }
        double h = 0;
        for (double v : t) {
            h = Math.max(h, Math.abs(v - at));
        }
        double[] n = new double[size * size];
        for (double v : t) {
            double s = (v - at) / h;
            for (int a = 0; a < size; a++) {
                for (int b = 0; b < size; b++) {
                    n[a * size + b] += Math.pow(s, a + b);
                }
            }
        }
        if (!cholesky(n, size)) {
            throw new IllegalArgumentException("the sample times do not determine a polynomial of order " + order);
        }
        double[] z = new double[size];
        solve(n, size, derivative, z, 0);
        double factor = 1;
        for (int k = 2; k <= derivative; k++) {
            factor *= k;
        }
        factor /= Math.pow(h, derivative);
        double[] w = new double[t.length];
        for (int j = 0; j < t.length; j++) {
            double s = (t[j] - at) / h;
            double v = 0;
            for (int k = 0; k < size; k++) {
                v += z[k] * Math.pow(s, k);
            }
            w[j] = v * factor;
        }
        return w;
    }

    /** In-place Cholesky factor (lower triangle) of the n x n matrix; false when not positive definite. */
    private static boolean cholesky(double[] a, int n) {
        double scale = 0;
        for (int i = 0; i < n; i++) {
            scale = Math.max(scale, a[i * n + i]);
        }
        for (int j = 0; j < n; j++) {
            double d = a[j * n + j];
            for (int k = 0; k < j; k++) {
                d -= a[j * n + k] * a[j * n + k];
            }
            if (!(d > 1e-13 * scale)) {
                return false;
            }
            double l = Math.sqrt(d);
            a[j * n + j] = l;
            for (int i = j + 1; i < n; i++) {
                double s = a[i * n + j];
                for (int k = 0; k < j; k++) {
                    s -= a[i * n + k] * a[j * n + k];
                }
                a[i * n + j] = s / l;
            }
        }
        return true;
    }

    /** Solves L L^T z = e_r into out[offset..offset+n). */
    private static void solve(double[] l, int n, int r, double[] out, int offset) {
        for (int i = 0; i < n; i++) {
            double s = i == r ? 1 : 0;
            for (int k = 0; k < i; k++) {
                s -= l[i * n + k] * out[offset + k];
            }
            out[offset + i] = s / l[i * n + i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = out[offset + i];
            for (int k = i + 1; k < n; k++) {
                s -= l[k * n + i] * out[offset + k];
            }
            out[offset + i] = s / l[i * n + i];
        }
    }
}
