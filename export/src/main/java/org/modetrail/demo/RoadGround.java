package org.modetrail.demo;

import java.util.ArrayList;
import java.util.List;

/**
 * The static ground of the road scenario, and its surveyed points. Four 3.5 m lanes with {@code x} in 0..14 m,
 * edge lines, a solid centre line, dashed lane lines (3 m dash every 9 m), a zebra crossing at
 * {@code y} 45..48 m, kerbs, paved footpaths and grass verges. Every marking has exact world coordinates, which is
 * what makes its corners usable as calibration points.
 */
final class RoadGround {

    static final double ROAD_WIDTH_M = 4 * RoadTraffic.LANE_WIDTH_M;
    static final double LINE_WIDTH_M = 0.15;
    static final double DASH_LENGTH_M = 3;
    static final double DASH_PERIOD_M = 9;
    static final double ZEBRA_NEAR_M = 45;
    static final double ZEBRA_FAR_M = 48;
    static final double STRIPE_M = 0.5;
    private static final double KERB_M = 0.25;
    private static final double FOOTPATH_M = 2.25;
    private static final double SLAB_M = 0.9;

    private static final int ASPHALT = Rgb.pack(78, 80, 84);
    private static final int PAINT = Rgb.pack(214, 214, 206);
    private static final int KERB = Rgb.pack(168, 168, 162);
    private static final int PAVING = Rgb.pack(130, 126, 118);
    private static final int JOINT = Rgb.pack(104, 100, 94);
    private static final int GRASS = Rgb.pack(84, 112, 58);
    private static final int SKY = Rgb.pack(176, 194, 214);

    private RoadGround() {
    }

    /** Lane lines that are dashed: between lanes 0 and 1, and between lanes 2 and 3. */
    static double[] dashedLineX() {
        return new double[] {RoadTraffic.LANE_WIDTH_M, 3 * RoadTraffic.LANE_WIDTH_M};
    }

    /** Colour of the ground at world (x, y), without pixel grain. */
    static int colour(long seed, double x, double y) {
        if (x >= 0 && x <= ROAD_WIDTH_M) {
            if (isMarking(x, y)) {
                return Rgb.offset(PAINT, (int) Math.round(6 * NoiseHash.valueNoise(seed + 3, x * 3, y * 3)));
            }
            double wear = 5 * NoiseHash.valueNoise(seed, x / 0.7, y / 0.7)
                    + 4 * NoiseHash.valueNoise(seed + 1, x / 5, y / 5);
            // Wheel tracks are slightly darker and smoother, half a lane width apart.
            double inLane = (x % RoadTraffic.LANE_WIDTH_M) / RoadTraffic.LANE_WIDTH_M;
            double track = Math.abs(inLane - 0.25) < 0.08 || Math.abs(inLane - 0.75) < 0.08 ? -5 : 0;
            return Rgb.offset(ASPHALT, (int) Math.round(wear + track));
        }
        double side = x < 0 ? -x : x - ROAD_WIDTH_M;
        if (side <= KERB_M) {
            return Rgb.offset(KERB, (int) Math.round(4 * NoiseHash.valueNoise(seed + 2, x * 4, y * 4)));
        }
        if (side <= KERB_M + FOOTPATH_M) {
            double a = (side - KERB_M) % SLAB_M;
            double b = ((y % SLAB_M) + SLAB_M) % SLAB_M;
            boolean joint = a < 0.03 || b < 0.03;
            long slab = NoiseHash.hash(seed + 4, (long) Math.floor((side - KERB_M) / SLAB_M) * (x < 0 ? -1 : 1),
                    (long) Math.floor(y / SLAB_M));
            return joint ? JOINT : Rgb.offset(PAVING, (int) Math.round(10 * (NoiseHash.unit(slab) - 0.5)));
        }
        double tuft = 12 * NoiseHash.valueNoise(seed + 5, x / 1.3, y / 1.3)
                + 6 * NoiseHash.valueNoise(seed + 6, x * 2, y * 2);
        return Rgb.offset(GRASS, (int) Math.round(tuft));
    }

    static int sky() {
        return SKY;
    }

    static boolean isMarking(double x, double y) {
        double edge = 0.3;
        boolean leftEdge = x >= edge && x < edge + LINE_WIDTH_M;
        boolean rightEdge = x > ROAD_WIDTH_M - edge - LINE_WIDTH_M && x <= ROAD_WIDTH_M - edge;
        if (leftEdge || rightEdge) {
            return true;
        }
        if (Math.abs(x - ROAD_WIDTH_M / 2) < 0.1) {
            return true;
        }
        if (y >= ZEBRA_NEAR_M && y < ZEBRA_FAR_M) {
            double s = x - 0.5;
            return s >= 0 && x < ROAD_WIDTH_M - 0.5 && (s % (2 * STRIPE_M)) < STRIPE_M;
        }
        for (double lx : dashedLineX()) {
            if (Math.abs(x - lx) < LINE_WIDTH_M / 2) {
                double along = ((y % DASH_PERIOD_M) + DASH_PERIOD_M) % DASH_PERIOD_M;
                return along < DASH_LENGTH_M;
            }
        }
        return false;
    }

    /**
     * Surveyed ground points: corners of lane-line dashes and of zebra stripes, spread over near and far ground
     * up to 66 m away, where a dash is still several pixels long.
     * Names say what each one is, e.g. {@code dash_x3.425_y18} is the dash corner at x = 3.425 m, y = 18 m.
     */
    static List<double[]> landmarks() {
        List<double[]> points = new ArrayList<>();
        double half = LINE_WIDTH_M / 2;
        for (double lx : dashedLineX()) {
            for (int k = 1; k <= 7; k++) {
                double y0 = k * DASH_PERIOD_M;
                if (y0 + DASH_LENGTH_M > ZEBRA_NEAR_M - 1 && y0 < ZEBRA_FAR_M + 1) {
                    continue;
                }
                points.add(new double[] {lx - half, y0});
                points.add(new double[] {lx + half, y0 + DASH_LENGTH_M});
            }
        }
        for (int m = 0; m < 13; m += 4) {
            double x0 = 0.5 + m * 2 * STRIPE_M;
            points.add(new double[] {x0, ZEBRA_NEAR_M});
            points.add(new double[] {x0 + STRIPE_M, ZEBRA_FAR_M});
        }
        return points;
    }

    static String landmarkName(double[] p) {
        boolean zebra = p[1] == ZEBRA_NEAR_M || p[1] == ZEBRA_FAR_M;
        return (zebra ? "zebra" : "dash") + "_x" + TruthCsv.number(p[0], 3) + "_y" + TruthCsv.number(p[1], 3);
    }
}
