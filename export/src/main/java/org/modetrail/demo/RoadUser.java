package org.modetrail.demo;

import java.util.List;

/**
 * A vehicle, cyclist or pedestrian: a few boxes moving along a lane.
 *
 * @param lengthM footprint length along the direction of travel
 * @param widthM  footprint width
 */
record RoadUser(int trackId, String objectClass, List<BoxPart> parts, double lengthM, double widthM,
                LaneMotion motion) {

    RoadUser {
        parts = List.copyOf(parts);
        if (parts.isEmpty()) {
            throw new IllegalArgumentException("a road user needs at least one part");
        }
    }

    RoadUser withTiming(int newTrackId, double startS) {
        LaneMotion m = motion;
        return new RoadUser(newTrackId, objectClass, parts, lengthM, widthM, new LaneMotion(startS, m.x0M(), m.y0M(),
                m.directionX(), m.directionY(), m.speed0MS(), m.accelMS2(), m.limitMS(), m.pathM()));
    }
}
