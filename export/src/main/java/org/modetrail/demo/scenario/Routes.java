package org.modetrail.demo.scenario;

import java.util.Random;

/**
 * Path generators, all in pixels per frame. {@link Random} is used because its sequence is fixed by its
 * specification and {@link StrictMath} because its results are, so a seed gives the same path on every JVM.
 */
final class Routes {

    /** Most a smooth path turns in a frame; at 5 px per frame that is a turning circle of about 60 px radius. */
    private static final double MAX_TURN = 0.08;
    /** Frames a smooth path looks ahead for the edge of its area. */
    private static final int LOOK_AHEAD = 30;

    private Routes() {
    }

    /**
     * A wandering path with inertia: the speed swings smoothly between {@code minSpeed} and {@code maxSpeed}, the
     * turn rate drifts, and the path turns back towards the middle when it would leave {@code area} within a second
     * or so.
     */
    static Route smooth(Random random, int frames, Route.Area area, double minSpeed, double maxSpeed) {
        double[] xs = new double[frames];
        double[] ys = new double[frames];
        double x = area.minX() + (0.2 + 0.2 * random.nextDouble()) * (area.maxX() - area.minX());
        double y = area.minY() + (0.3 + 0.4 * random.nextDouble()) * (area.maxY() - area.minY());
        double dir = StrictMath.atan2(area.centreY() - y, area.centreX() - x) + 0.6 * (random.nextDouble() - 0.5);
        double turn = 0;
        double period = 70 + 50 * random.nextDouble();
        double phase = 2 * Math.PI * random.nextDouble();
        double mid = (minSpeed + maxSpeed) / 2;
        double swing = (maxSpeed - minSpeed) / 2;
        for (int f = 0; f < frames; f++) {
            xs[f] = x;
            ys[f] = y;
            double speed = mid + swing * StrictMath.sin(2 * Math.PI * f / period + phase);
            // Ornstein-Uhlenbeck drift of the turn rate: smooth, with no preferred side.
            turn += -0.05 * turn + 0.006 * random.nextGaussian();
            double ahead = LOOK_AHEAD * speed;
            if (!area.contains(x + ahead * StrictMath.cos(dir), y + ahead * StrictMath.sin(dir))) {
                double home = StrictMath.atan2(area.centreY() - y, area.centreX() - x);
                turn = MAX_TURN * Math.signum(wrap(home - dir));
            }
            turn = Math.max(-MAX_TURN, Math.min(MAX_TURN, turn));
            dir = wrap(dir + turn);
            x = clamp(x + speed * StrictMath.cos(dir), area.minX(), area.maxX());
            y = clamp(y + speed * StrictMath.sin(dir), area.minY(), area.maxY());
        }
        return new Route(xs, ys);
    }

    /**
     * Jumps of {@code minSpeed..maxSpeed} px per frame in one direction for a few frames, then an abrupt turn of
     * 60 to 180 degrees. A jump that would leave the area is redrawn in another direction, so every frame-to-frame
     * step keeps its full length.
     */
    static Route erratic(Random random, int frames, Route.Area area, double minSpeed, double maxSpeed,
                         int minRun, int maxRun) {
        double[] xs = new double[frames];
        double[] ys = new double[frames];
        double x = area.centreX();
        double y = area.centreY();
        double dir = 2 * Math.PI * random.nextDouble();
        double speed = minSpeed;
        int left = 0;
        for (int f = 0; f < frames; f++) {
            xs[f] = x;
            ys[f] = y;
            if (left == 0) {
                dir = wrap(dir + (random.nextBoolean() ? 1 : -1) * Math.toRadians(60 + 120 * random.nextDouble()));
                speed = minSpeed + (maxSpeed - minSpeed) * random.nextDouble();
                left = minRun + random.nextInt(maxRun - minRun + 1);
            }
            left--;
            for (int attempt = 0; attempt < 16 && !fits(area, x, y, speed, dir); attempt++) {
                dir = 2 * Math.PI * random.nextDouble();
            }
            if (!fits(area, x, y, speed, dir)) {
                dir = StrictMath.atan2(area.centreY() - y, area.centreX() - x);
            }
            x = clamp(x + speed * StrictMath.cos(dir), area.minX(), area.maxX());
            y = clamp(y + speed * StrictMath.sin(dir), area.minY(), area.maxY());
        }
        return new Route(xs, ys);
    }

    /**
     * Constant velocity {@code (vx, vy)} through {@code (x0, y0)} at frame {@code f0}, holding still before
     * {@code start} and after {@code end} (a long clip would otherwise carry the object out of the frame).
     */
    static Route straight(int frames, double x0, double y0, int f0, double vx, double vy, int start, int end) {
        double[] xs = new double[frames];
        double[] ys = new double[frames];
        for (int f = 0; f < frames; f++) {
            int t = Math.max(start, Math.min(end, f)) - f0;
            xs[f] = x0 + vx * t;
            ys[f] = y0 + vy * t;
        }
        return new Route(xs, ys);
    }

    /**
     * Cubic Hermite interpolation through keys {@code {frame, x, y, vx, vy}} (velocities in px per frame), keys in
     * increasing frame order, the first at frame 0 and the last at {@code frames - 1}.
     */
    static Route keyed(int frames, double[][] keys) {
        if (keys[0][0] != 0 || keys[keys.length - 1][0] != frames - 1) {
            throw new IllegalArgumentException("keys must span frames 0.." + (frames - 1));
        }
        double[] xs = new double[frames];
        double[] ys = new double[frames];
        int k = 0;
        for (int f = 0; f < frames; f++) {
            while (k < keys.length - 2 && f > keys[k + 1][0]) {
                k++;
            }
            double[] p = keys[k];
            double[] q = keys[k + 1];
            double span = q[0] - p[0];
            double t = (f - p[0]) / span;
            double t2 = t * t;
            double t3 = t2 * t;
            double h00 = 2 * t3 - 3 * t2 + 1;
            double h10 = t3 - 2 * t2 + t;
            double h01 = -2 * t3 + 3 * t2;
            double h11 = t3 - t2;
            xs[f] = h00 * p[1] + h10 * span * p[3] + h01 * q[1] + h11 * span * q[3];
            ys[f] = h00 * p[2] + h10 * span * p[4] + h01 * q[2] + h11 * span * q[4];
        }
        return new Route(xs, ys);
    }

    /** A slow sway of the heading, {@code amplitude} radians either way: objects turn a little as they go. */
    static double[] sway(Random random, int frames, double amplitude) {
        double[] h = new double[frames];
        double period = 80 + 60 * random.nextDouble();
        double phase = 2 * Math.PI * random.nextDouble();
        for (int f = 0; f < frames; f++) {
            h[f] = amplitude * StrictMath.sin(2 * Math.PI * f / period + phase);
        }
        return h;
    }

    private static boolean fits(Route.Area area, double x, double y, double step, double dir) {
        return area.contains(x + step * StrictMath.cos(dir), y + step * StrictMath.sin(dir));
    }

    static double wrap(double angle) {
        double a = angle % (2 * Math.PI);
        if (a > Math.PI) {
            a -= 2 * Math.PI;
        } else if (a < -Math.PI) {
            a += 2 * Math.PI;
        }
        return a;
    }

    private static double clamp(double v, double lo, double hi) {
        return v < lo ? lo : Math.min(hi, v);
    }
}
