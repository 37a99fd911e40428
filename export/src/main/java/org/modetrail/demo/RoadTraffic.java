package org.modetrail.demo;

import java.util.ArrayList;
import java.util.List;

/**
 * Who uses the road and when. The road has four 3.5 m lanes: the two with {@code x} in 0..7 run away from the camera
 * (+y), the two in 7..14 towards it. A 20 s timetable repeats for as long as the clip lasts; every appearance gets
 * its own track id. Sizes are typical of their class (from general knowledge, not a standard).
 */
final class RoadTraffic {

    static final double PERIOD_S = 20;
    static final double LANE_WIDTH_M = 3.5;
    static final double ZEBRA_Y_M = 46.5;
    private static final double NEAR_Y_M = -10;
    private static final double FAR_Y_M = 220;
    private static final int DARK = Rgb.pack(28, 28, 30);

    private RoadTraffic() {
    }

    static double laneCentreX(int lane) {
        return (lane + 0.5) * LANE_WIDTH_M;
    }

    /** The timetable repeated to cover {@code durationS}, in order of appearance. */
    static List<RoadUser> timetable(double durationS) {
        List<RoadUser> template = List.of(
                away(car(Rgb.pack(178, 36, 40)), 0, laneCentreX(0), 13.9, 0, 13.9),
                away(van(), 1.0, laneCentreX(1), 9, 0.8, 16),
                towards(truck(), 0, laneCentreX(2), 11, 0, 11, 110),
                // Overtakes the truck in the next lane; seen from the pole it passes behind the truck's box.
                towards(car(Rgb.pack(150, 156, 164)), 0, laneCentreX(3), 17, 0, 17, 165),
                towards(car(Rgb.pack(214, 176, 30)), -1.5, laneCentreX(3), 15, -0.6, 9, FAR_Y_M),
                new RoadUser(0, "cyclist", cyclistParts(), 1.8, 0.6,
                        LaneMotion.constant(3.0, 0.9, -5, 1, 6, 115)),
                away(car(Rgb.pack(40, 132, 70)), 6.0, laneCentreX(1), 12, 0.4, 17),
                new RoadUser(0, "pedestrian", pedestrianParts(), 0.3, 0.5,
                        new LaneMotion(12.5, -2, ZEBRA_Y_M, 1, 0, 1.4, 0, 1.4, 18)));
        List<RoadUser> users = new ArrayList<>();
        for (int cycle = 0; cycle * PERIOD_S < durationS; cycle++) {
            for (RoadUser u : template) {
                double start = u.motion().startS() + cycle * PERIOD_S;
                if (start < durationS) {
                    users.add(u.withTiming(users.size() + 1, start));
                }
            }
        }
        return users;
    }

    private static RoadUser away(Body body, double startS, double x, double v0, double accel, double limit) {
        return new RoadUser(0, body.objectClass, body.parts, body.length, body.width,
                new LaneMotion(startS, x, NEAR_Y_M, 0, 1, v0, accel, limit, FAR_Y_M - NEAR_Y_M));
    }

    private static RoadUser towards(Body body, double startS, double x, double v0, double accel, double limit,
                                    double fromY) {
        return new RoadUser(0, body.objectClass, body.parts, body.length, body.width,
                new LaneMotion(startS, x, fromY, 0, -1, v0, accel, limit, fromY - NEAR_Y_M));
    }

    private record Body(String objectClass, List<BoxPart> parts, double length, double width) {
    }

    /** A saloon car, 4.4 x 1.8 m, 1.45 m high: wheels, body and glasshouse. */
    private static Body car(int colour) {
        return new Body("car", List.of(
                BoxPart.solid(-2.1, 2.1, 0.8, 0, 0.3, 0, DARK, DARK),
                BoxPart.solid(-2.2, 2.2, 0.9, 0.3, 0.95, 1, colour, Rgb.scale(colour, 1.08)),
                BoxPart.solid(-1.2, 0.9, 0.78, 0.95, 1.45, 2, BoxPart.GLASS, colour)), 4.4, 1.8);
    }

    /** A panel van, 5.2 x 2.0 m, 2.3 m high, with a windscreen band. */
    private static Body van() {
        int white = Rgb.pack(226, 226, 220);
        return new Body("van", List.of(
                BoxPart.solid(-2.5, 2.5, 0.9, 0, 0.35, 0, DARK, DARK),
                BoxPart.solid(-2.6, 2.6, 1.0, 0.35, 2.3, 1, white, Rgb.pack(206, 206, 200)).withWindow(1.35, 2.05)),
                5.2, 2.0);
    }

    /** A rigid box truck, 9.5 x 2.5 m, 3.7 m high: chassis, blue cab and a grey box body. */
    private static Body truck() {
        int cab = Rgb.pack(40, 88, 168);
        int box = Rgb.pack(188, 188, 178);
        return new Body("truck", List.of(
                BoxPart.solid(-4.6, 4.6, 1.1, 0, 0.6, 0, DARK, DARK),
                BoxPart.solid(2.95, 4.75, 1.25, 0.6, 3.0, 1, cab, cab).withWindow(1.9, 2.7),
                BoxPart.solid(-4.75, 2.8, 1.25, 0.6, 3.7, 1, box, Rgb.pack(172, 172, 164))), 9.5, 2.5);
    }

    /** Bicycle and rider, 1.8 x 0.6 m, 1.7 m high. */
    private static List<BoxPart> cyclistParts() {
        return List.of(
                BoxPart.solid(-0.9, 0.9, 0.1, 0, 1.0, 0, Rgb.pack(36, 36, 40), Rgb.pack(36, 36, 40)),
                BoxPart.solid(-0.35, 0.2, 0.25, 1.0, 1.7, 1, Rgb.pack(30, 150, 160), Rgb.pack(30, 150, 160)));
    }

    /** A walking person, 0.5 m across the shoulders, 1.75 m tall. */
    private static List<BoxPart> pedestrianParts() {
        int legs = Rgb.pack(44, 48, 62);
        int coat = Rgb.pack(196, 60, 136);
        int head = Rgb.pack(186, 148, 118);
        return List.of(
                BoxPart.solid(-0.12, 0.12, 0.18, 0, 0.9, 0, legs, legs),
                BoxPart.solid(-0.15, 0.15, 0.25, 0.9, 1.5, 1, coat, coat),
                BoxPart.solid(-0.1, 0.1, 0.1, 1.5, 1.75, 2, head, head));
    }
}
