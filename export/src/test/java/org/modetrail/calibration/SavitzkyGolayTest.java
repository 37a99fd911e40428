package org.modetrail.calibration;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Weights against the tables of Savitzky and Golay, Analytical Chemistry 36(8), 1964 (the convolution integers over
 * their normalising factor). The values are the classic ones, quoted here from memory: quadratic/cubic smoothing
 * 5 points (-3 12 17 12 -3)/35 and 7 points (-2 3 6 7 6 3 -2)/21; quadratic first derivative 5 points
 * (-2 -1 0 1 2)/10 and 7 points (-3 -2 -1 0 1 2 3)/28; cubic/quartic first derivative 5 points (1 -8 0 8 -1)/12.
 */
class SavitzkyGolayTest {
    static final double[] FIVE = {-2, -1, 0, 1, 2};
    static final double[] SEVEN = {-3, -2, -1, 0, 1, 2, 3};

    static double[] over(double d, double... v) {
        double[] out = v.clone();
        for (int i = 0; i < out.length; i++) {
            out[i] /= d;
        }
        return out;
    }

    @Test
    void matchesThePublishedTables() {
        assertArrayEquals(over(35, -3, 12, 17, 12, -3), SavitzkyGolay.coefficients(FIVE, 0, 2, 0), 1e-12);
        assertArrayEquals(over(35, -3, 12, 17, 12, -3), SavitzkyGolay.coefficients(FIVE, 0, 3, 0), 1e-12,
                "quadratic and cubic smoothing weights are the same");
        assertArrayEquals(over(21, -2, 3, 6, 7, 6, 3, -2), SavitzkyGolay.coefficients(SEVEN, 0, 2, 0), 1e-12);
        assertArrayEquals(over(10, -2, -1, 0, 1, 2), SavitzkyGolay.coefficients(FIVE, 0, 2, 1), 1e-12);
        assertArrayEquals(over(28, -3, -2, -1, 0, 1, 2, 3), SavitzkyGolay.coefficients(SEVEN, 0, 2, 1), 1e-12);
        assertArrayEquals(over(12, 1, -8, 0, 8, -1), SavitzkyGolay.coefficients(FIVE, 0, 3, 1), 1e-12);
    }

    @Test
    void instanceWeightsMatchAndScaleWithTheSampleSpacing() {
        SavitzkyGolay sg = new SavitzkyGolay(2);
        double dt = 0.04; // 25 fps
        double[] t = {10, 10 + dt, 10 + 2 * dt, 10 + 3 * dt, 10 + 4 * dt};
        double[] value = new double[5];
        double[] slope = new double[5];
        assertTrue(sg.weights(t, 0, 5, t[2], value, slope));
        assertArrayEquals(over(35, -3, 12, 17, 12, -3), value, 1e-12);
        assertArrayEquals(over(10 * dt, -2, -1, 0, 1, 2), slope, 1e-9);
        assertFalse(sg.weights(t, 0, 2, t[0], value, slope), "2 samples do not fix a quadratic");
    }

    @Test
    void unevenTimesStillFitAQuadraticExactly() {
        // A least-squares quadratic reproduces any quadratic exactly, whatever the sample times: the check here is
        // against y = 3 - 2 t + 0.7 t^2 and its derivative -2 + 1.4 t, at the centre and off-centre.
        double[] t = {0, 0.04, 0.12, 0.16, 0.2, 0.28, 0.3};
        double[] y = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            y[i] = 3 - 2 * t[i] + 0.7 * t[i] * t[i];
        }
        SavitzkyGolay sg = new SavitzkyGolay(2);
        double[] value = new double[t.length];
        double[] slope = new double[t.length];
        for (double at : new double[] {0.16, 0.0, 0.3}) {
            assertTrue(sg.weights(t, 0, t.length, at, value, slope));
            double v = 0;
            double d = 0;
            for (int i = 0; i < t.length; i++) {
                v += value[i] * y[i];
                d += slope[i] * y[i];
            }
            assertEquals(3 - 2 * at + 0.7 * at * at, v, 1e-12);
            assertEquals(-2 + 1.4 * at, d, 1e-10);
        }
    }
}
