package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.ContactPoint;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Site;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/**
 * Reads the current schema with a streaming parser, so a long video's frames never sit in memory twice and every
 * error keeps its line and column. Fields may come in any order: the header (video, classes) is read in one pass
 * and the tracks in the next, so tracks are checked against the video and classes as they are read. Files we
 * write put the header first, so the first pass stops after a few lines.
 */
final class ProjectReader {

    /** Opens a fresh parser over the same document for each pass. */
    interface ParserSource {
        JsonParser open() throws IOException;
    }

    private static final Set<String> TOP_FIELDS = Set.of("format", "schema", "video", "classes", "site", "tracks");

    private final ParserSource source;
    private final java.nio.file.Path file;
    private final ProjectLimits limits;

    ProjectReader(ParserSource source, java.nio.file.Path file, ProjectLimits limits) {
        this.source = source;
        this.file = file;
        this.limits = limits;
    }

    /** The schema the document says it follows, after checking that it is a project file at all. */
    int schema() throws IOException {
        try (JsonParser p = source.open()) {
            JsonCursor c = new JsonCursor(p, file);
            startRoot(c);
            String format = null;
            Integer schema = null;
            while (c.next() == JsonToken.FIELD_NAME && (format == null || schema == null)) {
                switch (c.fieldName()) {
                    case "format" -> {
                        format = c.readString("\"format\"");
                        if (!format.equals(ProjectJson.FORMAT)) {
                            throw c.fail("this is not a Modetrail project file (its format is \"" + format
                                    + "\", a project says \"" + ProjectJson.FORMAT + "\")");
                        }
                    }
                    case "schema" -> {
                        schema = c.readInt("\"schema\"");
                        if (schema < 0) {
                            throw c.fail("\"schema\" is " + schema + "; schema versions start at 0");
                        }
                    }
                    default -> c.skipValue();
                }
            }
            if (format == null) {
                throw c.fail("this is not a Modetrail project file (no \"format\": \"" + ProjectJson.FORMAT
                        + "\" field)");
            }
            if (schema == null) {
                throw c.fail("the project has no \"schema\" field, so it cannot be read safely");
            }
            return schema;
        }
    }

    /** Whether a visible frame may carry its uncertainty (schema 3 on). */
    private boolean uncertainties = true;

    /** Reads the whole project; call after {@link #schema()} said it is the current schema. */
    Project read() throws IOException {
        return read(ProjectFile.CURRENT_SCHEMA);
    }

    /**
     * Reads the whole project of a schema whose layout is the current one's or a subset of it
     * ({@link ProjectFile#STREAMED_FROM} on), refusing what that schema did not have.
     */
    Project read(int schema) throws IOException {
        uncertainties = schema >= 3;
        Header header = readHeader();
        try (JsonParser p = source.open()) {
            JsonCursor c = new JsonCursor(p, file);
            startRoot(c);
            List<Track> tracks = null;
            Site site = Site.NONE;
            while (c.next() == JsonToken.FIELD_NAME) {
                String name = c.fieldName();
                if (!TOP_FIELDS.contains(name)) {
                    throw c.fail("unknown field \"" + name + "\"; a project has " + String.join(", ",
                            new java.util.TreeSet<>(TOP_FIELDS)) + " (remove the field or update Modetrail)");
                }
                if (name.equals("tracks")) {
                    tracks = readTracks(c, header);
                } else if (name.equals("site")) {
                    site = SiteJson.read(c);
                } else {
                    c.skipValue();
                }
            }
            if (tracks == null) {
                throw c.fail("the project has no \"tracks\" list (write \"tracks\": [] for none)");
            }
            if (!c.atEnd()) {
                throw c.fail("there is more after the end of the project; remove it");
            }
            try {
                return new Project(header.video, header.classes, tracks, site);
            } catch (IllegalArgumentException e) {
                throw new ProjectFileException(file, 0, 0, e.getMessage(), e);
            }
        }
    }

    private record Header(VideoRef video, List<ObjectClass> classes, Set<String> classNames) {
    }

    private Header readHeader() throws IOException {
        try (JsonParser p = source.open()) {
            JsonCursor c = new JsonCursor(p, file);
            startRoot(c);
            VideoRef video = null;
            List<ObjectClass> classes = null;
            while (c.next() == JsonToken.FIELD_NAME && (video == null || classes == null)) {
                switch (c.fieldName()) {
                    case "video" -> video = readVideo(c);
                    case "classes" -> classes = readClasses(c);
                    default -> c.skipValue();
                }
            }
            if (video == null) {
                throw c.fail("the project has no \"video\" object");
            }
            if (classes == null) {
                throw c.fail("the project has no \"classes\" list (write \"classes\": [] for none)");
            }
            Set<String> names = new HashSet<>();
            for (ObjectClass k : classes) {
                names.add(k.name());
            }
            return new Header(video, classes, names);
        }
    }

    private static void startRoot(JsonCursor c) throws IOException {
        if (c.next() != JsonToken.START_OBJECT) {
            throw c.fail("this is not a Modetrail project file: it should start with '{', found "
                    + JsonCursor.describe(c.current()));
        }
    }

    private VideoRef readVideo(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_OBJECT, "\"video\"");
        JsonLocation at = c.location();
        String path = null;
        String fingerprint = "";
        int width = 0;
        int height = 0;
        int frames = 0;
        while (c.next() == JsonToken.FIELD_NAME) {
            switch (c.fieldName()) {
                case "path" -> path = c.readString("the video's \"path\"");
                case "width" -> width = c.readInt("the video's \"width\"");
                case "height" -> height = c.readInt("the video's \"height\"");
                case "frames" -> frames = c.readInt("the video's \"frames\"");
                case "fingerprint" -> fingerprint = c.readString("the video's \"fingerprint\"");
                default -> throw c.fail("unknown field \"" + c.fieldName()
                        + "\" in \"video\"; it has path, width, height, frames, fingerprint");
            }
        }
        if (path == null || path.isBlank()) {
            throw c.failAt(at, "the video has no \"path\"");
        }
        if (width <= 0 || height <= 0 || frames <= 0) {
            throw c.failAt(at, "the video needs a positive \"width\", \"height\" and \"frames\", found " + width
                    + ", " + height + ", " + frames);
        }
        return new VideoRef(path, width, height, frames, fingerprint);
    }

    private List<ObjectClass> readClasses(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_ARRAY, "\"classes\"");
        List<ObjectClass> classes = new ArrayList<>();
        Set<String> names = new HashSet<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_OBJECT) {
                throw c.fail("each class should be an object {\"name\": …, \"colour\": \"#RRGGBB\"}, found "
                        + JsonCursor.describe(c.current()));
            }
            JsonLocation at = c.location();
            if (classes.size() >= limits.maxClasses()) {
                throw c.fail("more than " + limits.maxClasses() + " classes; this is not a project we wrote");
            }
            String name = null;
            Integer colour = null;
            ContactPoint contact = ContactPoint.BOTTOM_CENTRE;
            while (c.next() == JsonToken.FIELD_NAME) {
                switch (c.fieldName()) {
                    case "name" -> name = c.readString("a class's \"name\"");
                    case "colour" -> colour = colour(c, c.readString("a class's \"colour\""));
                    case "contact" -> contact = contact(c);
                    default -> throw c.fail("unknown field \"" + c.fieldName()
                            + "\" in a class; a class has name, colour and contact");
                }
            }
            if (name == null || name.isBlank() || colour == null) {
                throw c.failAt(at, "a class needs a \"name\" and a \"colour\"");
            }
            ObjectClass k = new ObjectClass(name, colour, contact);
            if (!names.add(k.name())) {
                throw c.failAt(at, "class \"" + k.name() + "\" is listed twice; remove one");
            }
            classes.add(k);
        }
        return classes;
    }

    private static ContactPoint contact(JsonCursor c) throws IOException {
        c.expect(JsonToken.START_ARRAY, "a class's \"contact\" ([fraction of width, fraction of height])");
        JsonLocation at = c.location();
        double w = c.readDouble("a class's contact: fraction of the width");
        double h = c.readDouble("a class's contact: fraction of the height");
        if (c.next() != JsonToken.END_ARRAY) {
            throw c.fail("a class's \"contact\" has 2 numbers, like [0.5, 1] for the bottom centre");
        }
        try {
            return new ContactPoint(w, h);
        } catch (IllegalArgumentException e) {
            throw c.failAt(at, e.getMessage() + ", like [0.5, 1] for the bottom centre");
        }
    }

    private static int colour(JsonCursor c, String text) throws IOException {
        if (text.length() != 7 || text.charAt(0) != '#') {
            throw c.fail("colour \"" + text + "\" should be written #RRGGBB, like \"#1F77B4\"");
        }
        try {
            return Integer.parseInt(text.substring(1), 16);
        } catch (NumberFormatException e) {
            throw c.fail("colour \"" + text + "\" should be written #RRGGBB in hexadecimal, like \"#1F77B4\"");
        }
    }

    private List<Track> readTracks(JsonCursor c, Header header) throws IOException {
        c.expect(JsonToken.START_ARRAY, "\"tracks\"");
        List<Track> tracks = new ArrayList<>();
        Map<Integer, JsonLocation> ids = new HashMap<>();
        long[] annotations = {0};
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_OBJECT) {
                throw c.fail("each track should be an object {\"id\": …, \"class\": …, \"frames\": […]}, found "
                        + JsonCursor.describe(c.current()));
            }
            if (tracks.size() >= limits.maxTracks()) {
                throw c.fail("more than " + limits.maxTracks() + " tracks; this is not a project we wrote");
            }
            JsonLocation at = c.location();
            Track t = readTrack(c, header, tracks.size() + 1, annotations);
            JsonLocation first = ids.putIfAbsent(t.id(), at);
            if (first != null) {
                throw c.failAt(at, "track id " + t.id() + " is used twice (first at line " + first.getLineNr()
                        + "); give one of them a new id");
            }
            tracks.add(t);
        }
        return tracks;
    }

    private Track readTrack(JsonCursor c, Header header, int position, long[] annotations) throws IOException {
        JsonLocation at = c.location();
        Integer id = null;
        String className = null;
        JsonLocation classAt = null;
        String note = "";
        TreeMap<Integer, FrameAnnotation> frames = null;
        while (c.next() == JsonToken.FIELD_NAME) {
            String name = c.fieldName();
            switch (name) {
                case "id" -> {
                    id = c.readInt("a track's \"id\"");
                    if (id <= 0) {
                        throw c.fail("track id " + id + " is not allowed; ids start at 1");
                    }
                }
                case "class" -> {
                    className = c.readString("a track's \"class\"");
                    classAt = c.location();
                }
                case "note" -> note = c.readString("a track's \"note\"");
                case "frames" -> frames = readFrames(c, header.video, trackName(id, position), annotations);
                default -> throw c.fail("unknown field \"" + name + "\" in " + trackName(id, position)
                        + "; a track has id, class, note, frames");
            }
        }
        if (id == null) {
            throw c.failAt(at, trackName(null, position) + " has no \"id\"");
        }
        if (className == null || className.isBlank()) {
            throw c.failAt(at, "track " + id + " has no \"class\"");
        }
        if (!header.classNames.contains(className.strip())) {
            throw c.failAt(classAt, "track " + id + " has class \"" + className
                    + "\", which \"classes\" does not list; add it there or correct the name");
        }
        if (frames == null) {
            throw c.failAt(at, "track " + id + " has no \"frames\" list");
        }
        return new Track(id, className, note, frames);
    }

    private static String trackName(Integer id, int position) {
        return id != null ? "track " + id : "track number " + position + " in the list";
    }

    private TreeMap<Integer, FrameAnnotation> readFrames(JsonCursor c, VideoRef video, String track,
                                                         long[] annotations) throws IOException {
        c.expect(JsonToken.START_ARRAY, track + ": \"frames\"");
        TreeMap<Integer, FrameAnnotation> frames = new TreeMap<>();
        while (c.next() != JsonToken.END_ARRAY) {
            if (c.current() != JsonToken.START_ARRAY) {
                throw c.fail(track + ": each frame should be a list [frame, source, presence, …], found "
                        + JsonCursor.describe(c.current()));
            }
            if (++annotations[0] > limits.maxAnnotations()) {
                throw c.fail("more than " + limits.maxAnnotations() + " frame annotations in all; "
                        + "this is not a project we wrote");
            }
            FrameAnnotation a = readFrame(c, video, track);
            if (frames.put(a.frame(), a) != null) {
                throw c.fail(track + " frame " + a.frame() + " is listed twice; remove one");
            }
        }
        return frames;
    }

    private FrameAnnotation readFrame(JsonCursor c, VideoRef video, String track) throws IOException {
        JsonLocation at = c.location();
        int frame = c.readInt(track + ": the frame number");
        String here = track + " frame " + frame;
        if (frame < 0 || frame >= video.frameCount()) {
            throw c.failAt(at, here + " is beyond the video, which has frames 0 to " + (video.frameCount() - 1));
        }
        String sourceLetter = c.readString(here + ": the source");
        BoxSource source = Letters.source(sourceLetter);
        if (source == null) {
            throw c.fail(here + ": unknown source \"" + sourceLetter
                    + "\"; it is k (keyframe), t (tracked) or i (interpolated)");
        }
        String presenceLetter = c.readString(here + ": the presence");
        Presence presence = Letters.presence(presenceLetter);
        if (presence == null) {
            throw c.fail(here + ": unknown presence \"" + presenceLetter
                    + "\"; it is v (visible), h (hidden) or a (absent)");
        }
        Box box = null;
        if (presence == Presence.VISIBLE) {
            double x = c.readDouble(here + ": box x");
            double y = c.readDouble(here + ": box y");
            double w = c.readDouble(here + ": box width");
            double h = c.readDouble(here + ": box height");
            if (w < 0 || h < 0) {
                throw c.failAt(at, here + ": the box has a negative size " + w + " x " + h);
            }
            box = new Box(x, y, w, h);
        }
        double score = c.readDouble(here + ": the score");
        if (!(score >= 0 && score <= 1)) {
            throw c.fail(here + ": score " + score + " should be between 0 and 1");
        }
        double uncertainty = Double.NaN;
        JsonToken next = c.next();
        if (box != null && uncertainties && next != JsonToken.END_ARRAY) {
            uncertainty = c.currentDouble(here + ": the uncertainty in pixels");
            if (!(uncertainty >= 0)) {
                throw c.fail(here + ": uncertainty " + uncertainty + " px should be 0 or more (leave it out where"
                        + " not known)");
            }
            next = c.next();
        }
        if (next != JsonToken.END_ARRAY) {
            boolean nine = box != null && uncertainties;
            throw c.fail(here + ": too many values; a " + (box == null ? "mark has 4" : nine ? "visible frame has 8"
                    + " or 9" : "visible frame has 8 in schema 2") + " ([frame, source, presence, "
                    + (box != null ? "x, y, width, height, " : "") + "score" + (nine ? "[, uncertainty_px]" : "")
                    + "])");
        }
        return new FrameAnnotation(frame, presence, box, source, score, uncertainty);
    }
}
