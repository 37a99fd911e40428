package org.modetrail.model;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * What the project knows about the scene itself: the ground calibration (if the user made one), and the zones and
 * counting lines drawn on the video.
 *
 * @param calibration null while the ground is not calibrated
 */
public record Site(GroundCalibration calibration, List<Zone> zones, List<CountingLine> lines) {
    public static final Site NONE = new Site(null, List.of(), List.of());

    public Site {
        zones = List.copyOf(zones);
        lines = List.copyOf(lines);
        Set<String> names = new HashSet<>();
        for (Zone z : zones) {
            if (!names.add(z.name())) {
                throw new IllegalArgumentException("zone '" + z.name() + "' is listed twice");
            }
        }
        names.clear();
        for (CountingLine l : lines) {
            if (!names.add(l.name())) {
                throw new IllegalArgumentException("counting line '" + l.name() + "' is listed twice");
            }
        }
    }

    public Optional<GroundCalibration> groundCalibration() {
        return Optional.ofNullable(calibration);
    }

    public Site withCalibration(GroundCalibration c) {
        return new Site(c, zones, lines);
    }

    public Site withZones(List<Zone> z) {
        return new Site(calibration, z, lines);
    }

    public Site withLines(List<CountingLine> l) {
        return new Site(calibration, zones, l);
    }
}
