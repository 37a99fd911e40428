package org.modetrail.format.coco;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.modetrail.format.ImportException;
import org.modetrail.format.ImportLimits;
import org.modetrail.format.Place;
import org.modetrail.format.TrackAssembler;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;

/**
 * Reads a COCO JSON file with the video extensions (as {@link CocoWriter} writes it, or any file of one video with
 * {@code video_id}, {@code frame_index} and {@code track_id}) into a project on the given video. Boxes come in as
 * keyframes with score 1, unless the annotation carries {@value CocoWriter#SOURCE_KEY} (keyframe, tracked,
 * interpolated) and {@code score}, which are then kept. Categories become classes (colour from
 * {@value CocoWriter#COLOUR_KEY} or the palette), in id order. Keys the reader does not use are skipped.
 *
 * <p>Read with Jackson's streaming parser only (no data binding to classes), under the stream limits of
 * {@link ImportLimits}, in two passes: the first reads images, categories, tracks and videos and skips the
 * annotations, the second streams the annotations into the tracks, so keys may come in any order and no
 * annotation is held twice. Every problem names the file, the line and column, and the JSON Pointer of the value.
 */
public final class CocoReader {
    private CocoReader() {
    }

    private record Image(int id, int width, int height, Integer videoId, Integer frameIndex, Place at) {
    }

    private record Category(int id, String name, Integer colour, Place at) {
    }

    private record TrackEntry(int id, int categoryId, Integer videoId, Place at) {
    }

    private record VideoEntry(int id, Integer width, Integer height, Place at) {
    }

    private record Annotation(Integer imageId, Integer categoryId, double[] bbox, Place bboxAt, Integer trackId,
                              Double score, String source, Place sourceAt, int iscrowd, Place at) {
    }

    public static Project read(Path file, VideoRef video) throws IOException {
        return read(file, video, ImportLimits.DEFAULT);
    }

    public static Project read(Path file, VideoRef video, ImportLimits limits) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new ImportException(file, 0, 0, null, "no such file; check the path given for the COCO file");
        }
        long size = Files.size(file);
        if (size > limits.maxFileBytes()) {
            throw new ImportException(file, 0, 0, null, "the file is " + size + " bytes, more than the limit of "
                    + limits.maxFileBytes() + "; split it or raise the limit");
        }
        JsonFactory factory = JsonFactory.builder()
                .streamReadConstraints(StreamReadConstraints.builder()
                        .maxDocumentLength(limits.maxFileBytes())
                        .maxNestingDepth(limits.maxNestingDepth())
                        .maxStringLength(limits.maxStringChars())
                        .maxNumberLength(limits.maxNumberChars())
                        .maxNameLength(1000)
                        .build())
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .disable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
                .build();
        Parsed parsed = new Parsed();
        try (InputStream in = Files.newInputStream(file); JsonParser p = factory.createParser(in)) {
            Cursor c = new Cursor(p, file, limits);
            try {
                c.document(parsed, null);
            } catch (JsonProcessingException e) {
                throw c.translate(e);
            }
        }
        Header header = header(file, video, limits, parsed);
        // Second pass: the annotations go straight into the tracks, so they are never held twice.
        try (InputStream in = Files.newInputStream(file); JsonParser p = factory.createParser(in)) {
            Cursor c = new Cursor(p, file, limits);
            try {
                c.document(new Parsed(), a -> annotation(file, header, a));
            } catch (JsonProcessingException e) {
                throw c.translate(e);
            }
        }
        return header.tracks.build(header.classes);
    }

    /** What the annotations are checked against: the images' frames, the categories, the tracks so far. */
    private record Header(TrackAssembler tracks, Map<Integer, Integer> frameOfImage,
                          Map<Integer, Category> categories, List<ObjectClass> classes) {
    }

    private interface AnnotationSink {
        void accept(Annotation a) throws IOException;
    }

    private static final class Parsed {
        final List<Image> images = new ArrayList<>();
        final List<Category> categories = new ArrayList<>();
        final List<TrackEntry> tracks = new ArrayList<>();
        final List<VideoEntry> videos = new ArrayList<>();
        boolean hasImages;
        boolean hasAnnotations;
        boolean hasCategories;
    }

    private static Header header(Path file, VideoRef video, ImportLimits limits, Parsed d) throws IOException {
        Place top = new Place(0, 0, "");
        if (!d.hasImages || !d.hasAnnotations || !d.hasCategories) {
            throw top.error(file, "a COCO file needs the lists \"images\", \"annotations\" and \"categories\";"
                    + " this one lacks " + (!d.hasImages ? "\"images\"" : !d.hasAnnotations ? "\"annotations\""
                    : "\"categories\"") + ", so it is not a COCO object-detection file");
        }
        TrackAssembler tracks = new TrackAssembler(file, video, limits);
        Map<Integer, Category> categories = new HashMap<>();
        Map<String, Category> categoryNames = new HashMap<>();
        for (Category k : d.categories) {
            if (categories.put(k.id, k) != null) {
                throw k.at.error(file, "category id " + k.id + " is used twice; give each category its own id");
            }
            Category same = categoryNames.put(k.name, k);
            if (same != null) {
                throw k.at.error(file, "category name '" + k.name + "' is used twice (ids " + same.id + " and "
                        + k.id + "); give each category its own name");
            }
        }
        Map<Integer, VideoEntry> videos = new HashMap<>();
        for (VideoEntry v : d.videos) {
            if (videos.put(v.id, v) != null) {
                throw v.at.error(file, "video id " + v.id + " is used twice");
            }
        }
        Integer theVideo = null;
        Map<Integer, Integer> frameOfImage = new HashMap<>();
        for (Image im : d.images) {
            if (im.frameIndex == null) {
                throw im.at.error(file, "image " + im.id + " has no \"frame_index\"; Modetrail imports COCO files"
                        + " made from one video, whose images say which frame they are");
            }
            if (im.videoId != null) {
                if (theVideo == null) {
                    theVideo = im.videoId;
                } else if (!theVideo.equals(im.videoId)) {
                    throw im.at.error(file, "image " + im.id + " belongs to video " + im.videoId + " but earlier"
                            + " images to video " + theVideo + "; import one video at a time (split the file)");
                }
                if (!videos.isEmpty() && !videos.containsKey(im.videoId)) {
                    throw im.at.error(file, "image " + im.id + " names video " + im.videoId + ", which \"videos\""
                            + " does not list");
                }
            }
            if (im.width != video.width() || im.height != video.height()) {
                throw im.at.error(file, "image " + im.id + " is " + im.width + "x" + im.height + " but the video "
                        + video.path() + " is " + video.width() + "x" + video.height() + "; check that the file"
                        + " belongs to this video");
            }
            tracks.checkedFrame(im.frameIndex, im.frameIndex, im.at);
            if (frameOfImage.put(im.id, im.frameIndex) != null) {
                throw im.at.error(file, "image id " + im.id + " is used twice; give each image its own id");
            }
        }
        if (theVideo != null && videos.containsKey(theVideo)) {
            VideoEntry v = videos.get(theVideo);
            if ((v.width != null && v.width != video.width()) || (v.height != null && v.height != video.height())) {
                throw v.at.error(file, "video " + v.id + " is " + v.width + "x" + v.height + " but " + video.path()
                        + " is " + video.width() + "x" + video.height() + "; check that the file belongs to this video");
            }
        }
        for (TrackEntry t : d.tracks) {
            Category k = categories.get(t.categoryId);
            if (k == null) {
                throw t.at.error(file, "track " + t.id + " has category_id " + t.categoryId + ", which"
                        + " \"categories\" does not list; add the category or correct the id");
            }
            if (theVideo != null && t.videoId != null && !theVideo.equals(t.videoId)) {
                continue; // a track of another video that has no images here
            }
            tracks.declare(t.id, k.name, t.at);
        }
        List<Category> sorted = new ArrayList<>(d.categories);
        sorted.sort(java.util.Comparator.comparingInt(Category::id));
        List<ObjectClass> classes = new ArrayList<>();
        for (Category k : sorted) {
            int colour = k.colour != null ? k.colour : TrackAssembler.paletteColour(classes.size());
            classes.add(new ObjectClass(k.name, colour));
        }
        return new Header(tracks, frameOfImage, categories, classes);
    }

    private static void annotation(Path file, Header header, Annotation a) throws IOException {
        TrackAssembler tracks = header.tracks;
        if (a.imageId == null || a.categoryId == null || a.bbox == null) {
            throw a.at.error(file, "the annotation lacks " + (a.imageId == null ? "\"image_id\""
                    : a.categoryId == null ? "\"category_id\"" : "\"bbox\"") + "; every COCO annotation has"
                    + " image_id, category_id and bbox");
        }
        if (a.trackId == null) {
            throw a.at.error(file, "the annotation has no \"track_id\"; Modetrail imports tracks, so each box"
                    + " must say which object it belongs to");
        }
        Integer frame = header.frameOfImage.get(a.imageId);
        if (frame == null) {
            throw a.at.error(file, "image_id " + a.imageId + " is not in \"images\"; add the image or correct"
                    + " the id");
        }
        Category k = header.categories.get(a.categoryId);
        if (k == null) {
            throw a.at.error(file, "category_id " + a.categoryId + " is not in \"categories\"; add the"
                    + " category or correct the id");
        }
        if (a.iscrowd != 0) {
            throw a.at.error(file, "iscrowd is " + a.iscrowd + "; a crowd region is not one object, so"
                    + " remove it or set iscrowd to 0");
        }
        BoxSource source = BoxSource.KEYFRAME;
        if (a.source != null) {
            try {
                source = BoxSource.valueOf(a.source.toUpperCase(Locale.ROOT));
            } catch (IllegalArgumentException e) {
                throw a.sourceAt.error(file, CocoWriter.SOURCE_KEY + " must be keyframe, tracked or"
                        + " interpolated, got \"" + a.source + "\"");
            }
        }
        double score = a.score != null ? a.score : source == BoxSource.KEYFRAME ? 1 : 0;
        if (!(score >= 0 && score <= 1)) {
            throw a.at.error(file, "score must be between 0 and 1, got " + score);
        }
        Box box = tracks.checkedBox(a.bbox[0], a.bbox[1], a.bbox[2], a.bbox[3], a.bboxAt);
        tracks.add(a.trackId, k.name, new FrameAnnotation(frame, Presence.VISIBLE, box, source, score), a.at);
    }

    /** The streaming parser with typed reads that fail at the offending value. */
    private static final class Cursor {
        private final JsonParser p;
        private final Path file;
        private final ImportLimits limits;

        Cursor(JsonParser p, Path file, ImportLimits limits) {
            this.p = p;
            this.file = file;
            this.limits = limits;
        }

        Place here() {
            JsonLocation l = p.currentTokenLocation();
            return new Place(l.getLineNr(), l.getColumnNr(), pointer());
        }

        private String pointer() {
            String s = p.getParsingContext().pathAsPointer().toString();
            return s.isEmpty() ? "/" : s;
        }

        ImportException fail(String problem) {
            return here().error(file, problem);
        }

        ImportException translate(JsonProcessingException e) {
            JsonLocation l = e.getLocation() != null ? e.getLocation() : p.currentLocation();
            String original = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
            String problem;
            if (e instanceof StreamConstraintsException) {
                problem = "the file exceeds a safety limit (" + original + "); this is not a COCO file Modetrail"
                        + " can read safely, so it was not read";
            } else if (original.startsWith("Unexpected end-of-input")) {
                problem = "the file ends in the middle of the JSON (cut short while writing or copying?); export"
                        + " it again or copy it again";
            } else {
                int newline = original.indexOf('\n');
                problem = "this is not valid JSON here: " + (newline < 0 ? original : original.substring(0, newline))
                        + "; correct the file in a text editor";
            }
            return new ImportException(file, l == null ? 0 : l.getLineNr(), l == null ? 0 : l.getColumnNr(),
                    pointer(), problem);
        }

        JsonToken next() throws IOException {
            JsonToken t = p.nextToken();
            if (t == null) {
                throw new ImportException(file, p.currentLocation().getLineNr(), p.currentLocation().getColumnNr(),
                        pointer(), "the file ends in the middle of the JSON (cut short while writing or copying?);"
                        + " export it again or copy it again");
            }
            return t;
        }

        /** Reads the document; annotations go to {@code annotations}, or are skipped when it is null. */
        void document(Parsed d, AnnotationSink annotations) throws IOException {
            if (next() != JsonToken.START_OBJECT) {
                throw fail("a COCO file is a JSON object starting with '{'");
            }
            while (next() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                if (annotations != null && !name.equals("annotations")) {
                    next(); // the first pass has read it
                    p.skipChildren();
                    continue;
                }
                switch (name) {
                    case "images" -> {
                        d.hasImages = true;
                        list(() -> add(d.images, image(), "images"));
                    }
                    case "annotations" -> {
                        d.hasAnnotations = true;
                        if (annotations == null) {
                            next();
                            p.skipChildren();
                        } else {
                            list(() -> annotations.accept(annotation()));
                        }
                    }
                    case "categories" -> {
                        d.hasCategories = true;
                        list(() -> {
                            if (d.categories.size() >= limits.maxClasses()) {
                                throw fail("more than " + limits.maxClasses() + " categories");
                            }
                            d.categories.add(category());
                        });
                    }
                    case "tracks" -> list(() -> {
                        if (d.tracks.size() >= limits.maxTracks()) {
                            throw fail("more than " + limits.maxTracks() + " tracks; split the file");
                        }
                        d.tracks.add(track());
                    });
                    case "videos" -> list(() -> {
                        if (d.videos.size() >= limits.maxTracks()) {
                            throw fail("more than " + limits.maxTracks() + " videos");
                        }
                        d.videos.add(videoEntry());
                    });
                    default -> {
                        next();
                        p.skipChildren();
                    }
                }
            }
            if (p.nextToken() != null) {
                throw fail("there is more after the end of the JSON object; remove it");
            }
        }

        private <T> void add(List<T> list, T item, String what) throws ImportException {
            if (list.size() >= limits.maxBoxes()) {
                throw fail("more than " + limits.maxBoxes() + " " + what + "; split the file or raise the limit");
            }
            list.add(item);
        }

        private interface Element {
            void read() throws IOException;
        }

        /** The value after a field name must be a list; calls {@code element} at the start of each element. */
        private void list(Element element) throws IOException {
            String field = p.currentName();
            if (next() != JsonToken.START_ARRAY) {
                throw fail("\"" + field + "\" must be a list [...], found " + describe(p.currentToken()));
            }
            while (next() != JsonToken.END_ARRAY) {
                element.read();
            }
        }

        private void startObject(String what) throws IOException {
            if (p.currentToken() != JsonToken.START_OBJECT) {
                throw fail("each entry of \"" + what + "\" must be an object {...}, found "
                        + describe(p.currentToken()));
            }
        }

        private Image image() throws IOException {
            startObject("images");
            Place at = here();
            Integer id = null;
            Integer width = null;
            Integer height = null;
            Integer videoId = null;
            Integer frameIndex = null;
            while (next() == JsonToken.FIELD_NAME) {
                switch (p.currentName()) {
                    case "id" -> id = readInt();
                    case "width" -> width = readInt();
                    case "height" -> height = readInt();
                    case "video_id" -> videoId = readInt();
                    case "frame_index" -> frameIndex = readInt();
                    default -> skipValue();
                }
            }
            if (id == null || width == null || height == null) {
                throw at.error(file, "the image lacks " + (id == null ? "\"id\"" : width == null ? "\"width\""
                        : "\"height\"") + "; every COCO image has id, width and height");
            }
            return new Image(id, width, height, videoId, frameIndex, at);
        }

        private Annotation annotation() throws IOException {
            startObject("annotations");
            Place at = here();
            Integer imageId = null;
            Integer categoryId = null;
            double[] bbox = null;
            Place bboxAt = at;
            Integer trackId = null;
            Double score = null;
            String source = null;
            Place sourceAt = at;
            int iscrowd = 0;
            while (next() == JsonToken.FIELD_NAME) {
                switch (p.currentName()) {
                    case "image_id" -> imageId = readInt();
                    case "category_id" -> categoryId = readInt();
                    case "track_id" -> trackId = readInt();
                    case "iscrowd" -> iscrowd = readInt();
                    case "score" -> score = readDouble();
                    case "bbox" -> {
                        bboxAt = here();
                        bbox = readBox();
                    }
                    case CocoWriter.SOURCE_KEY -> {
                        sourceAt = here();
                        source = readString();
                    }
                    default -> skipValue();
                }
            }
            return new Annotation(imageId, categoryId, bbox, bboxAt, trackId, score, source, sourceAt, iscrowd, at);
        }

        private Category category() throws IOException {
            startObject("categories");
            Place at = here();
            Integer id = null;
            String name = null;
            Integer colour = null;
            while (next() == JsonToken.FIELD_NAME) {
                switch (p.currentName()) {
                    case "id" -> id = readInt();
                    case "name" -> name = readString();
                    case CocoWriter.COLOUR_KEY -> {
                        String s = readString();
                        if (!s.matches("#[0-9a-fA-F]{6}")) {
                            throw fail(CocoWriter.COLOUR_KEY + " must be #rrggbb, got \"" + s + "\"");
                        }
                        colour = Integer.parseInt(s.substring(1), 16);
                    }
                    default -> skipValue();
                }
            }
            if (id == null || name == null || name.isBlank()) {
                throw at.error(file, "the category lacks " + (id == null ? "\"id\"" : "a \"name\"")
                        + "; every COCO category has an id and a name");
            }
            return new Category(id, name.strip(), colour, at);
        }

        private TrackEntry track() throws IOException {
            startObject("tracks");
            Place at = here();
            Integer id = null;
            Integer categoryId = null;
            Integer videoId = null;
            while (next() == JsonToken.FIELD_NAME) {
                switch (p.currentName()) {
                    case "id" -> id = readInt();
                    case "category_id" -> categoryId = readInt();
                    case "video_id" -> videoId = readInt();
                    default -> skipValue();
                }
            }
            if (id == null || categoryId == null) {
                throw at.error(file, "the track lacks " + (id == null ? "\"id\"" : "\"category_id\""));
            }
            return new TrackEntry(id, categoryId, videoId, at);
        }

        private VideoEntry videoEntry() throws IOException {
            startObject("videos");
            Place at = here();
            Integer id = null;
            Integer width = null;
            Integer height = null;
            while (next() == JsonToken.FIELD_NAME) {
                switch (p.currentName()) {
                    case "id" -> id = readInt();
                    case "width" -> width = readInt();
                    case "height" -> height = readInt();
                    default -> skipValue();
                }
            }
            if (id == null) {
                throw at.error(file, "the video lacks \"id\"");
            }
            return new VideoEntry(id, width, height, at);
        }

        private void skipValue() throws IOException {
            next();
            p.skipChildren();
        }

        private int readInt() throws IOException {
            String field = p.currentName();
            JsonToken t = next();
            if (t != JsonToken.VALUE_NUMBER_INT) {
                throw fail("\"" + field + "\" must be a whole number, found " + describe(t));
            }
            if (p.getNumberType() != JsonParser.NumberType.INT) {
                throw fail("\"" + field + "\" is " + p.getText() + ", beyond the range of a whole number here");
            }
            return p.getIntValue();
        }

        private double readDouble() throws IOException {
            String field = p.currentName();
            JsonToken t = next();
            if (t != JsonToken.VALUE_NUMBER_INT && t != JsonToken.VALUE_NUMBER_FLOAT) {
                throw fail("\"" + field + "\" must be a number, found " + describe(t));
            }
            double v = p.getDoubleValue();
            if (!Double.isFinite(v)) {
                throw fail("\"" + field + "\" is " + p.getText() + ", too large for a number");
            }
            return v;
        }

        private String readString() throws IOException {
            String field = p.currentName();
            JsonToken t = next();
            if (t != JsonToken.VALUE_STRING) {
                throw fail("\"" + field + "\" must be a string, found " + describe(t));
            }
            return p.getText();
        }

        private double[] readBox() throws IOException {
            if (next() != JsonToken.START_ARRAY) {
                throw fail("\"bbox\" must be a list [x, y, width, height], found " + describe(p.currentToken()));
            }
            double[] b = new double[4];
            int n = 0;
            JsonToken t;
            while ((t = next()) != JsonToken.END_ARRAY) {
                if (t != JsonToken.VALUE_NUMBER_INT && t != JsonToken.VALUE_NUMBER_FLOAT) {
                    throw fail("\"bbox\" must hold numbers [x, y, width, height], found " + describe(t));
                }
                if (n == 4) {
                    throw fail("\"bbox\" has more than 4 numbers; COCO boxes are [x, y, width, height]");
                }
                b[n++] = p.getDoubleValue();
            }
            if (n != 4) {
                throw fail("\"bbox\" has " + n + " numbers; COCO boxes are [x, y, width, height]");
            }
            return b;
        }

        private static String describe(JsonToken t) {
            if (t == null) {
                return "the end of the file";
            }
            return switch (t) {
                case START_OBJECT -> "an object";
                case START_ARRAY -> "a list";
                case VALUE_STRING -> "a string";
                case VALUE_NUMBER_INT -> "a whole number";
                case VALUE_NUMBER_FLOAT -> "a decimal number";
                case VALUE_TRUE, VALUE_FALSE -> "true/false";
                case VALUE_NULL -> "null";
                default -> t.asString() == null ? t.name() : "'" + t.asString() + "'";
            };
        }
    }
}
