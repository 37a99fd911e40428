package org.modetrail.demo.scenario;

import java.util.Random;

/**
 * Centre paths of the family's kinds, in pixels per frame, beyond those of {@link Routes}. Deterministic for a
 * given {@link Random} (its sequence is fixed by its specification) and computed with {@link StrictMath}.
 */
final class FamilyPaths {

    private FamilyPaths() {
    }

    /**
     * Darts of {@code minSpeed..maxSpeed} px per frame in one direction for {@code minRun..maxRun} frames, then an
     * abrupt turn of 45 to 180 degrees; with probability {@code restChance} a run is a rest of 3 to 15 frames
     * instead. A dart that would leave {@code area} is redrawn in another direction.
     */
    static Route darting(Random random, int frames, Route.Area area, double minSpeed, double maxSpeed, int minRun,
                         int maxRun, double restChance) {
        double[] xs = new double[frames];
        double[] ys = new double[frames];
        double x = area.minX() + (0.25 + 0.5 * random.nextDouble()) * (area.maxX() - area.minX());
        double y = area.minY() + (0.25 + 0.5 * random.nextDouble()) * (area.maxY() - area.minY());
        double dir = 2 * Math.PI * random.nextDouble();
        double speed = minSpeed;
        int left = 0;
        for (int f = 0; f < frames; f++) {
            xs[f] = x;
            ys[f] = y;
            if (left == 0) {
                if (f > 0 && random.nextDouble() < restChance) {
                    speed = 0;
                    left = 3 + random.nextInt(13);
                } else {
                    dir = Routes.wrap(dir + (random.nextBoolean() ? 1 : -1)
                            * Math.toRadians(45 + 135 * random.nextDouble()));
                    speed = minSpeed + (maxSpeed - minSpeed) * random.nextDouble();
                    left = minRun + random.nextInt(maxRun - minRun + 1);
                }
            }
            left--;
            if (speed == 0) {
                continue;
            }
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

    /** Round an ellipse at constant angular rate, {@code speed} px per frame on average, either way round. */
    static Route loop(Random random, int frames, double cx, double cy, double rx, double ry, double speed) {
        double[] xs = new double[frames];
        double[] ys = new double[frames];
        double phase = 2 * Math.PI * random.nextDouble();
        double sense = random.nextBoolean() ? 1 : -1;
        double rate = speed / ((rx + ry) / 2);
        for (int f = 0; f < frames; f++) {
            double t = phase + sense * rate * f;
            xs[f] = cx + rx * StrictMath.cos(t);
            ys[f] = cy + ry * StrictMath.sin(t);
        }
        return new Route(xs, ys);
    }

    /**
     * A body moving at {@code minSpeed..maxSpeed} px per frame that turns round again and again: straight runs of
     * 15 to 50 frames with a slight drift, then a turn of 100 to 200 degrees at 4 to 10 degrees a frame, and a turn
     * back towards the middle of {@code area} when the edge is near. Returns {x, y, heading} per frame.
     */
    static double[][] turning(Random random, int frames, Route.Area area, double minSpeed, double maxSpeed) {
        double[] xs = new double[frames];
        double[] ys = new double[frames];
        double[] hs = new double[frames];
        double x = area.centreX() + (random.nextDouble() - 0.5) * 0.4 * (area.maxX() - area.minX());
        double y = area.centreY() + (random.nextDouble() - 0.5) * 0.4 * (area.maxY() - area.minY());
        double dir = 2 * Math.PI * random.nextDouble();
        double speed = minSpeed + (maxSpeed - minSpeed) * random.nextDouble();
        double turnLeft = 0;
        double rate = 0;
        int straight = 15 + random.nextInt(36);
        for (int f = 0; f < frames; f++) {
            xs[f] = x;
            ys[f] = y;
            hs[f] = dir;
            if (turnLeft == 0) {
                straight--;
                double ahead = 25 * speed;
                boolean edge = !area.contains(x + ahead * StrictMath.cos(dir), y + ahead * StrictMath.sin(dir));
                if (straight <= 0 || edge) {
                    double sense = edge ? Math.signum(Routes.wrap(StrictMath.atan2(area.centreY() - y,
                            area.centreX() - x) - dir)) : (random.nextBoolean() ? 1 : -1);
                    turnLeft = Math.toRadians(100 + 100 * random.nextDouble()) * (sense == 0 ? 1 : sense);
                    rate = Math.toRadians(4 + 6 * random.nextDouble());
                    speed = minSpeed + (maxSpeed - minSpeed) * random.nextDouble();
                } else {
                    dir = Routes.wrap(dir + 0.01 * random.nextGaussian());
                }
            }
            if (turnLeft != 0) {
                double step = Math.min(rate, Math.abs(turnLeft)) * Math.signum(turnLeft);
                dir = Routes.wrap(dir + step);
                turnLeft -= step;
                if (Math.abs(turnLeft) < 1e-9) {
                    turnLeft = 0;
                    straight = 15 + random.nextInt(36);
                }
            }
            // Turning slows the body: an animal turning round walks slower.
            double v = turnLeft != 0 ? 0.6 * speed : speed;
            x = clamp(x + v * StrictMath.cos(dir), area.minX(), area.maxX());
            y = clamp(y + v * StrictMath.sin(dir), area.minY(), area.maxY());
        }
        return new double[][] {xs, ys, hs};
    }

    private static boolean fits(Route.Area area, double x, double y, double step, double dir) {
        return area.contains(x + step * StrictMath.cos(dir), y + step * StrictMath.sin(dir));
    }

    static double clamp(double v, double lo, double hi) {
        return v < lo ? lo : Math.min(hi, v);
    }
}
