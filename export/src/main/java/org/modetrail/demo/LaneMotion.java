package org.modetrail.demo;

/**
 * Straight-line motion along a lane: starts at a given time and place, with a speed that changes at a constant rate
 * until it reaches a limit and then holds it. Positions are closed-form, so any frame is exact without stepping.
 *
 * @param startS      time the object appears, seconds from the start of the clip
 * @param x0M         footprint centre at the start, across the road
 * @param y0M         footprint centre at the start, along the road
 * @param directionX  unit direction of travel, x part
 * @param directionY  unit direction of travel, y part
 * @param speed0MS    speed at the start, m/s
 * @param accelMS2    rate of change of speed, m/s^2; negative to slow down
 * @param limitMS     speed held once reached: an upper limit when accelerating, a lower one when slowing
 * @param pathM       distance after which the object has left the scene
 */
record LaneMotion(double startS, double x0M, double y0M, double directionX, double directionY,
                  double speed0MS, double accelMS2, double limitMS, double pathM) {

    LaneMotion {
        if (Math.abs(Math.hypot(directionX, directionY) - 1) > 1e-9) {
            throw new IllegalArgumentException("direction must be a unit vector");
        }
        if (!(speed0MS > 0) || !(limitMS > 0)) {
            throw new IllegalArgumentException("speeds must be positive: objects move forwards only");
        }
        if ((accelMS2 > 0 && limitMS < speed0MS) || (accelMS2 < 0 && limitMS > speed0MS)) {
            throw new IllegalArgumentException("speed limit must lie in the direction of the acceleration");
        }
        if (!(pathM > 0)) {
            throw new IllegalArgumentException("path length must be positive");
        }
    }

    static LaneMotion constant(double startS, double x0M, double y0M, double directionY, double speedMS,
                               double pathM) {
        return new LaneMotion(startS, x0M, y0M, 0, directionY, speedMS, 0, speedMS, pathM);
    }

    /** Seconds after the start at which the limit is reached; infinite when speed is constant. */
    double limitReachedAfterS() {
        return accelMS2 == 0 ? Double.POSITIVE_INFINITY : (limitMS - speed0MS) / accelMS2;
    }

    /** Distance travelled {@code tau} seconds after the start (tau &ge; 0). */
    double distanceM(double tau) {
        double tc = limitReachedAfterS();
        if (tau <= tc) {
            return speed0MS * tau + 0.5 * accelMS2 * tau * tau;
        }
        return speed0MS * tc + 0.5 * accelMS2 * tc * tc + limitMS * (tau - tc);
    }

    double speedMS(double tau) {
        return tau <= limitReachedAfterS() ? speed0MS + accelMS2 * tau : limitMS;
    }

    /** Whether the object is in the scene at clip time {@code t}. */
    boolean present(double t) {
        double tau = t - startS;
        return tau >= 0 && distanceM(tau) <= pathM;
    }

    double xM(double t) {
        return x0M + directionX * distanceM(t - startS);
    }

    double yM(double t) {
        return y0M + directionY * distanceM(t - startS);
    }
}
