package org.modetrail.tracking;

/**
 * A Kalman filter (Kalman, "A new approach to linear filtering and prediction problems", 1960) with the constant
 * velocity model for the centre of a box, one position-velocity pair per image axis, frame interval 1. The
 * process noise is the discrete white-noise acceleration model, Q = q [[1/4, 1/2], [1/2, 1]] per axis (the usual
 * textbook choice, common practice); the measurement is the position with variance r.
 *
 * <p>Both axes share one covariance because they share the same model and noise; the state is six numbers and
 * updates allocate nothing.
 */
final class ConstantVelocityKalman {
    private final double q;
    private final double r;
    private double x;
    private double y;
    private double vx;
    private double vy;
    // Covariance [[pPos, pPV], [pPV, pVel]], the same for both axes.
    private double pPos;
    private double pPV;
    private double pVel;

    ConstantVelocityKalman(double processNoise, double measurementNoise) {
        this.q = processNoise;
        this.r = measurementNoise;
    }

    /** Starts at a position with unknown velocity. */
    void reset(double px, double py) {
        x = px;
        y = py;
        vx = 0;
        vy = 0;
        pPos = r;
        pPV = 0;
        pVel = 100; // velocity unknown: a few tens of pixels per frame are possible
    }

    /** Advances one frame: x = F x, P = F P F' + Q. */
    void predict() {
        x += vx;
        y += vy;
        double nPos = pPos + 2 * pPV + pVel + q / 4;
        double nPV = pPV + pVel + q / 2;
        double nVel = pVel + q;
        pPos = nPos;
        pPV = nPV;
        pVel = nVel;
    }

    /** Corrects with a measured position: K = P H' / (H P H' + R). */
    void correct(double mx, double my) {
        double s = pPos + r;
        double kPos = pPos / s;
        double kVel = pPV / s;
        double ex = mx - x;
        double ey = my - y;
        x += kPos * ex;
        y += kPos * ey;
        vx += kVel * ex;
        vy += kVel * ey;
        double nPos = (1 - kPos) * pPos;
        double nPV = (1 - kPos) * pPV;
        double nVel = pVel - kVel * pPV;
        pPos = nPos;
        pPV = nPV;
        pVel = nVel;
    }

    double x() {
        return x;
    }

    double y() {
        return y;
    }

    double vx() {
        return vx;
    }

    double vy() {
        return vy;
    }

    /** Standard deviation of the predicted position, per axis, in pixels. */
    double positionSigma() {
        return Math.sqrt(pPos);
    }
}
