package org.modetrail.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;

/**
 * The edits of the zones and counting lines drawn on the video, as pure functions from a project to an
 * {@link Edit} (nothing to track again), as {@link Edits} has for tracks. Zones and lines are named by their name,
 * which is unique among the zones and among the lines. A refused edit throws {@link IllegalArgumentException}
 * with a message fit for the user and leaves the project as it was.
 */
public final class SiteEdits {
    /** Below this area (square image pixels) a zone's corners are taken to lie on one line. */
    public static final double MIN_AREA = 1;

    private SiteEdits() {
    }

    /** "zone 1", "zone 2", ...: the first of these no zone of the site has. */
    public static String freeZoneName(Site site) {
        return freeName("zone", site.zones().stream().map(Zone::name).toList());
    }

    /** "line 1", "line 2", ...: the first of these no counting line of the site has. */
    public static String freeLineName(Site site) {
        return freeName("line", site.lines().stream().map(CountingLine::name).toList());
    }

    private static String freeName(String stem, List<String> taken) {
        for (int n = 1; ; n++) {
            String name = stem + " " + n;
            if (!taken.contains(name)) {
                return name;
            }
        }
    }

    public static Edit addZone(Project p, Zone z) {
        checkArea(z.name(), z.polygon());
        if (zoneIndex(p.site(), z.name()) >= 0) {
            throw new IllegalArgumentException("there is a zone named '" + z.name() + "' already; choose another name");
        }
        List<Zone> zones = new ArrayList<>(p.site().zones());
        zones.add(z);
        return edit(p, p.site().withZones(zones));
    }

    public static Edit addLine(Project p, CountingLine l) {
        if (lineIndex(p.site(), l.name()) >= 0) {
            throw new IllegalArgumentException("there is a counting line named '" + l.name()
                    + "' already; choose another name");
        }
        List<CountingLine> lines = new ArrayList<>(p.site().lines());
        lines.add(l);
        return edit(p, p.site().withLines(lines));
    }

    /** Zone {@code name} with new corners (moved, or the whole zone shifted). */
    public static Edit reshapeZone(Project p, String name, List<PixelPoint> polygon) {
        checkArea(name, polygon);
        return replaceZone(p, name, z -> new Zone(z.name(), polygon));
    }

    /** Counting line {@code name} with new end points; its direction stays from the first to the second. */
    public static Edit moveLine(Project p, String name, PixelPoint from, PixelPoint to) {
        return replaceLine(p, name, l -> new CountingLine(l.name(), from, to));
    }

    public static Edit renameZone(Project p, String name, String newName) {
        String n = stripped(newName, "zone");
        if (!n.equals(name) && zoneIndex(p.site(), n) >= 0) {
            throw new IllegalArgumentException("there is a zone named '" + n + "' already; choose another name");
        }
        return replaceZone(p, name, z -> new Zone(n, z.polygon()));
    }

    public static Edit renameLine(Project p, String name, String newName) {
        String n = stripped(newName, "counting line");
        if (!n.equals(name) && lineIndex(p.site(), n) >= 0) {
            throw new IllegalArgumentException("there is a counting line named '" + n
                    + "' already; choose another name");
        }
        return replaceLine(p, name, l -> new CountingLine(n, l.from(), l.to()));
    }

    public static Edit removeZone(Project p, String name) {
        List<Zone> zones = new ArrayList<>(p.site().zones());
        zones.remove(zoneIndex(p.site(), existingZone(p.site(), name)));
        return edit(p, p.site().withZones(zones));
    }

    public static Edit removeLine(Project p, String name) {
        List<CountingLine> lines = new ArrayList<>(p.site().lines());
        lines.remove(lineIndex(p.site(), existingLine(p.site(), name)));
        return edit(p, p.site().withLines(lines));
    }

    /**
     * The project's zones and lines with those of {@code imported} added (a zones file): one of the same name as an
     * existing one replaces it in its place, the others come after. The calibration stays the project's.
     */
    public static Edit merge(Project p, Site imported) {
        List<Zone> zones = new ArrayList<>(p.site().zones());
        for (Zone z : imported.zones()) {
            int i = zoneIndex(p.site(), z.name());
            if (i >= 0) {
                zones.set(i, z);
            } else {
                zones.add(z);
            }
        }
        List<CountingLine> lines = new ArrayList<>(p.site().lines());
        for (CountingLine l : imported.lines()) {
            int i = lineIndex(p.site(), l.name());
            if (i >= 0) {
                lines.set(i, l);
            } else {
                lines.add(l);
            }
        }
        return edit(p, new Site(p.site().calibration(), zones, lines));
    }

    /** The area enclosed by a polygon, by the shoelace formula (for a self-crossing one, the net area). */
    public static double area(List<PixelPoint> polygon) {
        double twice = 0;
        int n = polygon.size();
        for (int i = 0, j = n - 1; i < n; j = i++) {
            twice += polygon.get(j).x() * polygon.get(i).y() - polygon.get(i).x() * polygon.get(j).y();
        }
        return Math.abs(twice) / 2;
    }

    private static void checkArea(String name, List<PixelPoint> polygon) {
        if (polygon.size() < 3) {
            throw new IllegalArgumentException("zone '" + name + "' needs at least 3 corners, got "
                    + polygon.size());
        }
        if (area(polygon) < MIN_AREA) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "zone '%s' has no area: its corners lie on one line", name));
        }
    }

    private static Edit replaceZone(Project p, String name, UnaryOperator<Zone> change) {
        List<Zone> zones = new ArrayList<>(p.site().zones());
        int i = zoneIndex(p.site(), existingZone(p.site(), name));
        zones.set(i, change.apply(zones.get(i)));
        return edit(p, p.site().withZones(zones));
    }

    private static Edit replaceLine(Project p, String name, UnaryOperator<CountingLine> change) {
        List<CountingLine> lines = new ArrayList<>(p.site().lines());
        int i = lineIndex(p.site(), existingLine(p.site(), name));
        lines.set(i, change.apply(lines.get(i)));
        return edit(p, p.site().withLines(lines));
    }

    private static String stripped(String name, String what) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a " + what + " needs a name");
        }
        return name.strip();
    }

    private static String existingZone(Site s, String name) {
        if (zoneIndex(s, name) < 0) {
            throw new IllegalArgumentException("there is no zone named '" + name + "'");
        }
        return name;
    }

    private static String existingLine(Site s, String name) {
        if (lineIndex(s, name) < 0) {
            throw new IllegalArgumentException("there is no counting line named '" + name + "'");
        }
        return name;
    }

    private static int zoneIndex(Site s, String name) {
        for (int i = 0; i < s.zones().size(); i++) {
            if (s.zones().get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    private static int lineIndex(Site s, String name) {
        for (int i = 0; i < s.lines().size(); i++) {
            if (s.lines().get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    private static Edit edit(Project p, Site s) {
        return new Edit(p.withSite(s), 0, 0, 0, false);
    }
}
