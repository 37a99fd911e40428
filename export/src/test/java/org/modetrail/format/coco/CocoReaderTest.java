package org.modetrail.format.coco;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.ImportException;
import org.modetrail.format.ImportLimits;
import org.modetrail.format.TrackSamples;
import org.modetrail.model.BoxSource;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;

/** COCO JSON read back into a project; bad files are refused with file, line, column and JSON Pointer. */
class CocoReaderTest {
    @TempDir
    Path dir;

    @Test
    void roundTripKeepsIdsClassesColoursSourcesScoresAndBoxes() throws Exception {
        Project p = TrackSamples.small();
        Path out = dir.resolve("set.json");
        CocoWriter.write(p, f -> f / 25.0, out);
        Project back = CocoReader.read(out, p.video());
        TrackSamples.assertSameTracks(p, back);
        assertEquals(p.classes(), back.classes(), "names and colours, in category id order");
        assertEquals(BoxSource.TRACKED, back.track(4).orElseThrow().at(2).orElseThrow().source());
        assertEquals(p.video(), back.video());
    }

    @Test
    void withoutModetrailKeysBoxesComeInAsKeyframesWithScoreOne() throws Exception {
        Path f = write(ann("{\"id\": 2, \"image_id\": 2, \"category_id\": 1, \"bbox\": [1, 2, 3, 4], \"track_id\": 7}"));
        Project back = CocoReader.read(f, TrackSamples.VIDEO);
        var a = back.track(7).orElseThrow().at(1).orElseThrow();
        assertEquals(BoxSource.KEYFRAME, a.source());
        assertEquals(1.0, a.score());
        assertEquals(List.of(new ObjectClass("mouse", 0x1F77B4)), back.classes(), "palette colour for class 1");
    }

    /**
     * A small COCO file with the second annotation on line 10: line 1 {"images": [, 2-3 images of frames 0 and 1,
     * 4 ], 5 "categories": [, 6 mouse, 7 ], 8 "annotations": [, 9 first annotation, 10 the one given, 11 ]}.
     */
    private static String ann(String second) {
        return "{\"images\": [\n"
                + "{\"id\": 1, \"width\": 640, \"height\": 480, \"file_name\": \"a/0.png\", \"video_id\": 1,"
                + " \"frame_index\": 0},\n"
                + "{\"id\": 2, \"width\": 640, \"height\": 480, \"file_name\": \"a/1.png\", \"video_id\": 1,"
                + " \"frame_index\": 1}\n"
                + "],\n"
                + "\"categories\": [\n"
                + "{\"id\": 1, \"name\": \"mouse\", \"supercategory\": \"animal\"}\n"
                + "],\n"
                + "\"annotations\": [\n"
                + "{\"id\": 1, \"image_id\": 1, \"category_id\": 1, \"bbox\": [10, 10, 20, 20], \"area\": 400,"
                + " \"iscrowd\": 0, \"track_id\": 7},\n"
                + second + "\n"
                + "]}\n";
    }

    private Path write(String text) throws Exception {
        Path f = dir.resolve("bad.json");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    private ImportException refused(String text) throws Exception {
        return refused(write(text), ImportLimits.DEFAULT);
    }

    private ImportException refused(Path f, ImportLimits limits) {
        ImportException e = assertTimeoutPreemptively(Duration.ofSeconds(10),
                () -> assertThrows(ImportException.class, () -> CocoReader.read(f, TrackSamples.VIDEO, limits)));
        assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
        return e;
    }

    private static final String GOOD = "{\"id\": 2, \"image_id\": 2, \"category_id\": 1, \"bbox\": [11, 10, 20, 20],"
            + " \"track_id\": 7}";

    @Test
    void theRefusalsNameLineColumnAndJsonPointer() throws Exception {
        ImportException e = refused(ann(GOOD.replace("\"category_id\": 1", "\"category_id\": 9")));
        assertEquals(10, e.line());
        assertEquals(1, e.column());
        assertEquals("/annotations/1", e.jsonPath());
        assertTrue(e.getMessage().contains("category_id 9 is not in \"categories\""), e.getMessage());

        e = refused(ann(GOOD.replace("[11, 10, 20, 20]", "[650, 10, 20, 20]")));
        assertEquals(10, e.line());
        assertEquals("/annotations/1/bbox", e.jsonPath());
        assertTrue(e.getMessage().contains("lies wholly outside the 640x480 frame"), e.getMessage());

        e = refused(ann(GOOD.replace("[11, 10, 20, 20]", "[11, 10, 20]")));
        assertEquals(10, e.line());
        assertTrue(e.getMessage().contains("\"bbox\" has 3 numbers"), e.getMessage());

        e = refused(ann(GOOD.replace("[11, 10, 20, 20]", "[11, \"10\", 20, 20]")));
        assertEquals(10, e.line());
        assertTrue(e.getMessage().contains("must hold numbers"), e.getMessage());

        e = refused(ann(GOOD.replace("\"image_id\": 2", "\"image_id\": 1")));
        assertEquals(10, e.line());
        assertTrue(e.getMessage().contains("track 7 already has a box on frame 0"), e.getMessage());

        e = refused(ann(GOOD.replace("\"image_id\": 2", "\"image_id\": 5")));
        assertTrue(e.getMessage().contains("image_id 5 is not in \"images\""), e.getMessage());

        e = refused(ann(GOOD.replace("\"track_id\": 7", "\"track_id\": 7.5")));
        assertEquals(10, e.line());
        assertEquals("/annotations/1/track_id", e.jsonPath());
        assertTrue(e.getMessage().contains("\"track_id\" must be a whole number"), e.getMessage());

        e = refused(ann(GOOD.replace("\"track_id\": 7", "\"track_id\": 7, \"modetrail_source\": \"guessed\"")));
        assertEquals(10, e.line());
        assertEquals("/annotations/1/modetrail_source", e.jsonPath());
        assertTrue(e.getMessage().contains("must be keyframe, tracked or interpolated"), e.getMessage());

        e = refused(ann(GOOD.replace("\"track_id\": 7", "\"track_id\": 7, \"score\": 1.5")));
        assertEquals(10, e.line());
        assertTrue(e.getMessage().contains("score must be between 0 and 1"), e.getMessage());

        e = refused(ann(GOOD.replace(", \"track_id\": 7", "")));
        assertTrue(e.getMessage().contains("no \"track_id\""), e.getMessage());
    }

    @Test
    void frameBeyondTheVideoAndWrongImageSizeAreRefused() throws Exception {
        ImportException e = refused(ann(GOOD).replace("\"frame_index\": 1}", "\"frame_index\": 300}"));
        assertEquals(3, e.line());
        assertEquals("/images/1", e.jsonPath());
        assertTrue(e.getMessage().contains("frame 300 is beyond the video"), e.getMessage());

        e = refused(ann(GOOD).replaceFirst("\"width\": 640", "\"width\": 1920"));
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("image 1 is 1920x480 but the video"), e.getMessage());
    }

    @Test
    void truncatedJsonIsRefusedAtTheLineWhereItEnds() throws Exception {
        String whole = ann(GOOD);
        String cut = whole.substring(0, whole.indexOf("\"bbox\": [11"));
        ImportException e = refused(cut);
        assertEquals(10, e.line());
        assertTrue(e.getMessage().contains("ends in the middle of the JSON"), e.getMessage());

        e = refused(ann(GOOD.replace("\"track_id\": 7}", "\"track_id\": 7,,}")));
        assertEquals(10, e.line());
        assertTrue(e.getMessage().contains("not valid JSON here"), e.getMessage());

        e = refused("{\"images\": [], \"categories\": []}");
        assertTrue(e.getMessage().contains("lacks \"annotations\""), e.getMessage());
    }

    @Test
    void hostileFilesAreRefusedQuickly() throws Exception {
        Path big = write(ann(GOOD).replace("{\"images\"", "{\"info\": {\"description\": \"" + "x".repeat(2000)
                + "\"}, \"images\""));
        ImportException e = refused(big, ImportLimits.DEFAULT.withMaxFileBytes(1024));
        assertTrue(e.getMessage().contains("more than the limit of 1024"), e.getMessage());

        Path deep = dir.resolve("deep.json");
        try (BufferedWriter w = Files.newBufferedWriter(deep)) {
            w.write("{\"info\": ");
            w.write("[".repeat(100_000));
            w.write("]".repeat(100_000));
            w.write("}");
        }
        e = refused(deep, ImportLimits.DEFAULT);
        assertEquals(1, e.line());
        assertTrue(e.getMessage().contains("safety limit"), e.getMessage());

        StringBuilder many = new StringBuilder();
        for (int i = 3; i < 6; i++) {
            many.append(",\n").append(GOOD.replace("\"id\": 2", "\"id\": " + i).replace("\"track_id\": 7",
                    "\"track_id\": " + i));
        }
        e = refused(write(ann(GOOD + many)), ImportLimits.DEFAULT.withMaxBoxes(3));
        assertEquals(12, e.line());
        assertTrue(e.getMessage().contains("more than 3 boxes"), e.getMessage());
    }
}
