package org.modetrail.demo;

import java.util.List;
import java.util.Random;

/**
 * Paths of the arena animals, simulated once for the whole clip. Each animal keeps a speed and a turn rate that
 * drift as Ornstein-Uhlenbeck processes (smooth, with inertia), steers away from the wall and bounces off it. At
 * three scheduled moments two animals are drawn towards each other and then run straight on, so that one passes
 * over the other: the crossings a tracker has to survive.
 */
final class ArenaMotion {

    /** Fractions of the clip at which a pair meets, and which pair. */
    private static final double[] MEETING_AT = {0.25, 0.55, 0.82};
    private static final int[][] MEETING_PAIR = {{0, 1}, {1, 2}, {2, 0}};
    private static final double SEEK_S = 3.0;
    private static final double COAST_S = 1.0;
    private static final double TURN_TAU_S = 0.8;
    private static final double TURN_STD_RAD_S = 1.2;
    private static final double SPEED_TAU_S = 1.5;
    private static final double SPEED_STD = 0.3;
    /** How fast the body turns to face where it is going. */
    private static final double BODY_TURN_RAD_S = 8.0;

    private final int animals;
    private final double[] x;
    private final double[] y;
    private final double[] heading;

    private ArenaMotion(int frames, int animals) {
        this.animals = animals;
        this.x = new double[frames * animals];
        this.y = new double[frames * animals];
        this.heading = new double[frames * animals];
    }

    double x(int frame, int animal) {
        return x[frame * animals + animal];
    }

    double y(int frame, int animal) {
        return y[frame * animals + animal];
    }

    /** Direction the body faces, radians from +x towards +y (image down). */
    double heading(int frame, int animal) {
        return heading[frame * animals + animal];
    }

    static ArenaMotion simulate(ArenaConfig config, List<Animal> cast) {
        int n = cast.size();
        int frames = config.frameCount();
        ArenaMotion m = new ArenaMotion(frames, n);
        // java.util.Random's algorithm is fixed by its specification, and StrictMath's results are too (unlike
        // Math's, which may differ by an ulp between CPUs), so paths are identical on every JVM.
        Random random = new Random(config.seed());
        double dt = 1.0 / config.fps();
        double cx = config.centreX();
        double cy = config.centreY();
        double radius = config.radius();

        double[] px = new double[n];
        double[] py = new double[n];
        double[] dir = new double[n];
        double[] body = new double[n];
        double[] speed = new double[n];
        double[] turn = new double[n];
        double[] coastUntil = new double[n];
        boolean[] met = new boolean[MEETING_AT.length];
        for (int a = 0; a < n; a++) {
            double angle = 2 * Math.PI * (a + random.nextDouble() * 0.5) / n;
            double r = radius * (0.35 + 0.3 * random.nextDouble());
            px[a] = cx + r * StrictMath.cos(angle);
            py[a] = cy + r * StrictMath.sin(angle);
            dir[a] = random.nextDouble() * 2 * Math.PI;
            body[a] = dir[a];
            speed[a] = cast.get(a).cruiseSpeed();
        }
        double turnSigma = TURN_STD_RAD_S * Math.sqrt(2 / TURN_TAU_S);
        double duration = frames * dt;
        for (int f = 0; f < frames; f++) {
            double t = f * dt;
            for (int a = 0; a < n; a++) {
                int k = f * n + a;
                m.x[k] = px[a];
                m.y[k] = py[a];
                m.heading[k] = body[a];
            }
            int[] seekPartner = seekPartners(n, t, duration, met, px, py, cast);
            for (int a = 0; a < n; a++) {
                Animal animal = cast.get(a);
                double cruise = animal.cruiseSpeed();
                double speedSigma = SPEED_STD * cruise * Math.sqrt(2 / SPEED_TAU_S);
                double sq = Math.sqrt(dt);
                double gTurn = random.nextGaussian();
                double gSpeed = random.nextGaussian();
                double target = cruise;
                if (seekPartner[a] >= 0) {
                    int b = seekPartner[a];
                    double want = StrictMath.atan2(py[b] - py[a], px[b] - px[a]);
                    dir[a] += clamp(angleDiff(want, dir[a]), 3.0 * dt);
                    turn[a] = 0;
                    target = 1.3 * cruise;
                    coastUntil[a] = t + COAST_S;
                } else if (t < coastUntil[a]) {
                    turn[a] = 0;
                } else {
                    turn[a] += -turn[a] / TURN_TAU_S * dt + turnSigma * sq * gTurn;
                    turn[a] += wallSteer(px[a] - cx, py[a] - cy, dir[a], radius, animal.semiLength());
                    dir[a] += turn[a] * dt;
                }
                speed[a] += (target - speed[a]) / SPEED_TAU_S * dt + speedSigma * sq * gSpeed;
                speed[a] = Math.max(0.2 * cruise, Math.min(2.2 * cruise, speed[a]));
                double nx = px[a] + speed[a] * dt * StrictMath.cos(dir[a]);
                double ny = py[a] + speed[a] * dt * StrictMath.sin(dir[a]);
                double limit = radius - animal.semiLength();
                double rx = nx - cx;
                double ry = ny - cy;
                double r = StrictMath.hypot(rx, ry);
                if (r > limit) {
                    // Mirror the direction of travel in the wall's normal, as a ball bounces.
                    double ux = rx / r;
                    double uy = ry / r;
                    double vx = StrictMath.cos(dir[a]);
                    double vy = StrictMath.sin(dir[a]);
                    double dot = vx * ux + vy * uy;
                    dir[a] = StrictMath.atan2(vy - 2 * dot * uy, vx - 2 * dot * ux);
                    turn[a] = -0.5 * turn[a];
                    nx = cx + ux * limit;
                    ny = cy + uy * limit;
                }
                px[a] = nx;
                py[a] = ny;
                dir[a] = wrap(dir[a]);
                body[a] = wrap(body[a] + clamp(angleDiff(dir[a], body[a]), BODY_TURN_RAD_S * dt));
            }
        }
        return m;
    }

    /** For each animal, the partner it is currently heading for, or -1. Marks a meeting done once they touch. */
    private static int[] seekPartners(int n, double t, double duration, boolean[] met,
                                      double[] px, double[] py, List<Animal> cast) {
        int[] partner = new int[n];
        java.util.Arrays.fill(partner, -1);
        for (int e = 0; e < MEETING_AT.length; e++) {
            int a = MEETING_PAIR[e][0] % n;
            int b = MEETING_PAIR[e][1] % n;
            double at = MEETING_AT[e] * duration;
            if (met[e] || a == b || t < at - SEEK_S || t > at + 1.0) {
                continue;
            }
            double touch = 0.5 * (cast.get(a).semiLength() + cast.get(b).semiLength());
            if (StrictMath.hypot(px[a] - px[b], py[a] - py[b]) < touch) {
                met[e] = true;
                continue;
            }
            partner[a] = b;
            partner[b] = a;
        }
        return partner;
    }

    /** Extra turn rate away from the wall when close to it and heading outwards. */
    private static double wallSteer(double rx, double ry, double dir, double radius, double semiLength) {
        double r = StrictMath.hypot(rx, ry);
        double room = radius - semiLength - r;
        double outward = StrictMath.cos(dir) * rx / Math.max(r, 1e-9) + StrictMath.sin(dir) * ry / Math.max(r, 1e-9);
        if (room > 2.5 * semiLength || outward <= 0 || r < 1e-9) {
            return 0;
        }
        double inward = StrictMath.atan2(-ry, -rx);
        double urgency = 1 - Math.max(0, room) / (2.5 * semiLength);
        return 0.25 * urgency * angleDiff(inward, dir);
    }

    static double angleDiff(double to, double from) {
        return wrap(to - from);
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

    private static double clamp(double v, double limit) {
        return Math.max(-limit, Math.min(limit, v));
    }
}
