package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.modetrail.model.CountingLine;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.Homography;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.PointError;
import org.modetrail.model.Site;
import org.modetrail.model.WorldPoint;
import org.modetrail.model.Zone;

/**
 * The {@code "site"} object of schema 2: the ground calibration, zones and counting lines (docs/project-file.md).
 * Read with the streaming cursor like the rest of the file, so every error keeps its line and column.
 */
final class SiteJson {
    /** Zones, lines, calibration points and polygon corners each: far more than anyone draws. */
    static final int MAX_ITEMS = 10_000;

    private SiteJson() {
    }

    static void write(JsonGenerator g, Site site, NumberWriter number) throws IOException {
        g.writeObjectFieldStart("site");
        GroundCalibration c = site.calibration();
        if (c != null) {
            g.writeObjectFieldStart("calibration");
            g.writeArrayFieldStart("points");
            for (GroundPoint p : c.points()) {
                g.writeStartArray();
                number.write(g, p.image().x());
                number.write(g, p.image().y());
                number.write(g, p.world().x());
                number.write(g, p.world().y());
                g.writeEndArray();
            }
            g.writeEndArray();
            g.writeArrayFieldStart("image_to_world");
            for (double v : c.imageToWorld().entries()) {
                g.writeNumber(v);
            }
            g.writeEndArray();
            g.writeArrayFieldStart("errors");
            for (PointError e : c.errors()) {
                g.writeStartArray();
                g.writeNumber(e.pixels());
                g.writeNumber(e.metres());
                g.writeBoolean(e.inlier());
                g.writeEndArray();
            }
            g.writeEndArray();
            g.writeNumberField("rms_px", c.rmsPixels());
            g.writeNumberField("rms_m", c.rmsMetres());
            g.writeArrayFieldStart("warnings");
            for (String w : c.warnings()) {
                g.writeString(w);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeArrayFieldStart("zones");
        for (Zone z : site.zones()) {
            g.writeStartObject();
            g.writeStringField("name", z.name());
            g.writeArrayFieldStart("polygon");
            for (PixelPoint p : z.polygon()) {
                point(g, p, number);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("lines");
        for (CountingLine l : site.lines()) {
            g.writeStartObject();
            g.writeStringField("name", l.name());
            g.writeFieldName("from");
            point(g, l.from(), number);
            g.writeFieldName("to");
            point(g, l.to(), number);
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void point(JsonGenerator g, PixelPoint p, NumberWriter number) throws IOException {
        g.writeStartArray();
        number.write(g, p.x());
        number.write(g, p.y());
        g.writeEndArray();
    }

    /** How the writer prints a coordinate (whole numbers without ".0"). */
    interface NumberWriter {
        void write(JsonGenerator g, double d) throws IOException;
    }

    static Site read(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_OBJECT, "\"site\"");
        GroundCalibration calibration = null;
        List<Zone> zones = List.of();
        List<CountingLine> lines = List.of();
        while (c.next() == JsonToken.FIELD_NAME) {
            switch (c.fieldName()) {
                case "calibration" -> calibration = readCalibration(c);
                case "zones" -> zones = readZones(c);
                case "lines" -> lines = readLines(c);
                default -> throw c.fail("unknown field \"" + c.fieldName()
                        + "\" in \"site\"; it has calibration, zones, lines");
            }
        }
        try {
            return new Site(calibration, zones, lines);
        } catch (IllegalArgumentException e) {
            throw c.fail("in \"site\": " + e.getMessage());
        }
    }

    private static GroundCalibration readCalibration(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_OBJECT, "\"calibration\"");
        JsonLocation at = c.location();
        List<GroundPoint> points = null;
        double[] h = null;
        List<PointError> errors = null;
        Double rmsPx = null;
        Double rmsM = null;
        List<String> warnings = List.of();
        while (c.next() == JsonToken.FIELD_NAME) {
            switch (c.fieldName()) {
                case "points" -> points = readGroundPoints(c);
                case "image_to_world" -> h = readNumbers(c, "\"image_to_world\"", 9);
                case "errors" -> errors = readErrors(c);
                case "rms_px" -> rmsPx = c.readDouble("\"rms_px\"");
                case "rms_m" -> rmsM = c.readDouble("\"rms_m\"");
                case "warnings" -> warnings = readStrings(c, "\"warnings\"");
                default -> throw c.fail("unknown field \"" + c.fieldName() + "\" in \"calibration\"; it has "
                        + "points, image_to_world, errors, rms_px, rms_m, warnings");
            }
        }
        if (points == null || h == null || errors == null || rmsPx == null || rmsM == null) {
            throw c.failAt(at, "the calibration needs \"points\", \"image_to_world\", \"errors\", \"rms_px\" and "
                    + "\"rms_m\"; calibrate again to rebuild it");
        }
        try {
            return new GroundCalibration(points, new Homography(h), errors, rmsPx, rmsM, warnings);
        } catch (IllegalArgumentException e) {
            throw c.failAt(at, "the calibration is not usable: " + e.getMessage() + "; calibrate again");
        }
    }

    private static List<GroundPoint> readGroundPoints(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_ARRAY, "the calibration's \"points\"");
        List<GroundPoint> out = new ArrayList<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_ARRAY) {
                throw c.fail("each calibration point is [image_x, image_y, world_x_m, world_y_m], found "
                        + JsonCursor.describe(c.current()));
            }
            limit(c, out.size(), "calibration points");
            String what = "calibration point " + (out.size() + 1);
            double ix = c.readDouble(what + ": image_x");
            double iy = c.readDouble(what + ": image_y");
            double wx = c.readDouble(what + ": world_x_m");
            double wy = c.readDouble(what + ": world_y_m");
            if (c.next() != JsonToken.END_ARRAY) {
                throw c.fail(what + " has more than 4 numbers; it is [image_x, image_y, world_x_m, world_y_m]");
            }
            out.add(new GroundPoint(new PixelPoint(ix, iy), new WorldPoint(wx, wy)));
        }
        return out;
    }

    private static List<PointError> readErrors(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_ARRAY, "the calibration's \"errors\"");
        List<PointError> out = new ArrayList<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_ARRAY) {
                throw c.fail("each calibration error is [pixels, metres, inlier], found "
                        + JsonCursor.describe(c.current()));
            }
            limit(c, out.size(), "calibration errors");
            String what = "calibration error " + (out.size() + 1);
            double px = c.readDouble(what + ": pixels");
            double m = c.readDouble(what + ": metres");
            JsonToken t = c.next();
            if (t != JsonToken.VALUE_TRUE && t != JsonToken.VALUE_FALSE) {
                throw c.fail(what + ": inlier should be true or false, found " + JsonCursor.describe(t));
            }
            boolean inlier = t == JsonToken.VALUE_TRUE;
            if (c.next() != JsonToken.END_ARRAY) {
                throw c.fail(what + " has more than 3 values; it is [pixels, metres, inlier]");
            }
            try {
                out.add(new PointError(px, m, inlier));
            } catch (IllegalArgumentException e) {
                throw c.fail(what + ": " + e.getMessage());
            }
        }
        return out;
    }

    private static List<Zone> readZones(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_ARRAY, "\"zones\"");
        List<Zone> out = new ArrayList<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_OBJECT) {
                throw c.fail("each zone is {\"name\": …, \"polygon\": [[x, y], …]}, found "
                        + JsonCursor.describe(c.current()));
            }
            limit(c, out.size(), "zones");
            JsonLocation at = c.location();
            String name = null;
            List<PixelPoint> polygon = null;
            while (c.next() == JsonToken.FIELD_NAME) {
                switch (c.fieldName()) {
                    case "name" -> name = c.readString("a zone's \"name\"");
                    case "polygon" -> polygon = readPoints(c, "a zone's \"polygon\"");
                    default -> throw c.fail("unknown field \"" + c.fieldName() + "\" in a zone; it has name, polygon");
                }
            }
            try {
                out.add(new Zone(name, polygon == null ? List.of() : polygon));
            } catch (IllegalArgumentException e) {
                throw c.failAt(at, e.getMessage());
            }
        }
        return out;
    }

    private static List<CountingLine> readLines(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_ARRAY, "\"lines\"");
        List<CountingLine> out = new ArrayList<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_OBJECT) {
                throw c.fail("each counting line is {\"name\": …, \"from\": [x, y], \"to\": [x, y]}, found "
                        + JsonCursor.describe(c.current()));
            }
            limit(c, out.size(), "counting lines");
            JsonLocation at = c.location();
            String name = null;
            PixelPoint from = null;
            PixelPoint to = null;
            while (c.next() == JsonToken.FIELD_NAME) {
                switch (c.fieldName()) {
                    case "name" -> name = c.readString("a counting line's \"name\"");
                    case "from" -> from = readPoint(c, "a counting line's \"from\"");
                    case "to" -> to = readPoint(c, "a counting line's \"to\"");
                    default -> throw c.fail("unknown field \"" + c.fieldName()
                            + "\" in a counting line; it has name, from, to");
                }
            }
            try {
                out.add(new CountingLine(name, from, to));
            } catch (IllegalArgumentException e) {
                throw c.failAt(at, e.getMessage());
            }
        }
        return out;
    }

    private static List<PixelPoint> readPoints(JsonCursor c, String what) throws IOException {
        c.expect(JsonToken.START_ARRAY, what);
        List<PixelPoint> out = new ArrayList<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_ARRAY) {
                throw c.fail(what + ": each corner is [x, y], found " + JsonCursor.describe(c.current()));
            }
            limit(c, out.size(), "corners");
            out.add(finishPoint(c, what));
        }
        return out;
    }

    private static PixelPoint readPoint(JsonCursor c, String what) throws IOException {
        c.expect(JsonToken.START_ARRAY, what + " (a point [x, y])");
        return finishPoint(c, what);
    }

    private static PixelPoint finishPoint(JsonCursor c, String what) throws IOException {
        double x = c.readDouble(what + ": x");
        double y = c.readDouble(what + ": y");
        if (c.next() != JsonToken.END_ARRAY) {
            throw c.fail(what + ": a point has 2 numbers, [x, y]");
        }
        return new PixelPoint(x, y);
    }

    private static double[] readNumbers(JsonCursor c, String what, int count) throws IOException {
        c.expect(JsonToken.START_ARRAY, what);
        double[] out = new double[count];
        for (int i = 0; i < count; i++) {
            out[i] = c.readDouble(what + ", entry " + (i + 1));
        }
        if (c.next() != JsonToken.END_ARRAY) {
            throw c.fail(what + " has more than " + count + " numbers");
        }
        return out;
    }

    private static List<String> readStrings(JsonCursor c, String what) throws IOException {
        c.expect(JsonToken.START_ARRAY, what);
        List<String> out = new ArrayList<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.VALUE_STRING) {
                throw c.fail(what + ": each entry is a string, found " + JsonCursor.describe(c.current()));
            }
            limit(c, out.size(), "entries");
            out.add(c.textOfCurrent());
        }
        return out;
    }

    private static void limit(JsonCursor c, int count, String what) throws IOException {
        if (count >= MAX_ITEMS) {
            throw c.fail("more than " + MAX_ITEMS + " " + what + "; this is not a project we wrote");
        }
    }
}
