package org.modetrail.format.coco;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.format.ExportCancelledException;
import org.modetrail.format.ExportProgress;
import org.modetrail.format.TrackSamples;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoSource;

/**
 * The COCO output checked field by field against the object-detection "Data format" description on
 * cocodataset.org (from memory): info{}, licenses[], images[{id, width, height, file_name}], annotations[{id,
 * image_id, category_id, segmentation, area, bbox [x, y, width, height], iscrowd}], categories[{id, name,
 * supercategory}]; plus the video extensions (images' video_id and frame_index, annotations' track_id, videos[],
 * tracks[]) as open video benchmarks use them (from memory).
 */
class CocoWriterTest {
    private static final Path ARENA = Path.of("../clips/arena.mp4");

    @TempDir
    Path dir;

    private JsonNode written(Project p) throws Exception {
        Path out = dir.resolve("set.json");
        CocoWriter.write(p, f -> f / 25.0, out);
        return new ObjectMapper().readTree(out.toFile());
    }

    @Test
    void everyRequiredKeyIsThereWithItsJsonType() throws Exception {
        JsonNode root = written(TrackSamples.small());
        // cocodataset.org, Data format: the top level has info, licenses, images, annotations, categories.
        assertTrue(root.get("info").isObject());
        assertTrue(root.get("licenses").isArray());
        for (String list : List.of("images", "annotations", "categories", "videos", "tracks")) {
            assertTrue(root.get(list).isArray(), list);
        }
        for (JsonNode im : root.get("images")) {
            // image{"id": int, "width": int, "height": int, "file_name": str}
            assertTrue(im.get("id").isInt() && im.get("width").isInt() && im.get("height").isInt(), im.toString());
            assertTrue(im.get("file_name").isTextual(), im.toString());
            assertTrue(im.get("video_id").isInt() && im.get("frame_index").isInt(), im.toString());
        }
        for (JsonNode a : root.get("annotations")) {
            // annotation{"id": int, "image_id": int, "category_id": int, "segmentation": [polygon] or RLE,
            // "area": float, "bbox": [x, y, width, height], "iscrowd": 0 or 1}
            assertTrue(a.get("id").isInt() && a.get("image_id").isInt() && a.get("category_id").isInt(), a.toString());
            assertTrue(a.get("segmentation").isArray() && a.get("segmentation").isEmpty(), a.toString());
            assertTrue(a.get("area").isNumber(), a.toString());
            assertTrue(a.get("bbox").isArray() && a.get("bbox").size() == 4, a.toString());
            for (JsonNode v : a.get("bbox")) {
                assertTrue(v.isNumber(), a.toString());
            }
            assertEquals(0, a.get("iscrowd").asInt(-1), "iscrowd 0 for single objects: " + a);
            assertTrue(a.get("iscrowd").isInt(), a.toString());
            assertTrue(a.get("track_id").isInt() && a.get("score").isNumber(), a.toString());
            assertTrue(Set.of("keyframe", "tracked", "interpolated").contains(a.get(CocoWriter.SOURCE_KEY).asText()));
        }
        for (JsonNode c : root.get("categories")) {
            // category{"id": int, "name": str, "supercategory": str}
            assertTrue(c.get("id").isInt() && c.get("name").isTextual() && c.get("supercategory").isTextual());
        }
        JsonNode v = root.get("videos").get(0);
        assertEquals(List.of(1, 640, 480, 300), List.of(v.get("id").asInt(), v.get("width").asInt(),
                v.get("height").asInt(), v.get("frame_count").asInt()));
        assertEquals("clips/arena.mp4", v.get("file_name").asText());
        assertEquals(25.0, v.get("fps").asDouble(), 1e-6);
        for (JsonNode t : root.get("tracks")) {
            assertTrue(t.get("id").isInt() && t.get("category_id").isInt() && t.get("video_id").isInt());
        }
    }

    private static List<Integer> ids(JsonNode list) {
        List<Integer> ids = new ArrayList<>();
        for (JsonNode n : list) {
            ids.add(n.get("id").asInt());
        }
        return ids;
    }

    @Test
    void idsAreUniqueFromOneAndEveryReferenceResolves() throws Exception {
        JsonNode root = written(TrackSamples.small());
        // Frames 0, 1, 2 and 299 have boxes (frame 3 only a hidden mark): four images, six annotations.
        assertEquals(List.of(1, 2, 3, 4), ids(root.get("images")));
        assertEquals(List.of(1, 2, 3, 4, 5, 6), ids(root.get("annotations")));
        assertEquals(List.of(1, 2), ids(root.get("categories")));
        assertEquals(List.of(1, 4), ids(root.get("tracks")));
        List<Integer> frames = new ArrayList<>();
        for (JsonNode im : root.get("images")) {
            frames.add(im.get("frame_index").asInt());
        }
        assertEquals(List.of(0, 1, 2, 299), frames);
        assertEquals("arena.mp4/frame_000299.png", root.get("images").get(3).get("file_name").asText());
        assertEquals(299 / 25.0, root.get("images").get(3).get(CocoWriter.TIME_KEY).asDouble(), 1e-9);

        Set<Integer> images = new HashSet<>(ids(root.get("images")));
        Set<Integer> categories = new HashSet<>(ids(root.get("categories")));
        Set<Integer> tracks = new HashSet<>(ids(root.get("tracks")));
        for (JsonNode a : root.get("annotations")) {
            assertTrue(images.contains(a.get("image_id").asInt()), "image_id resolves: " + a);
            assertTrue(categories.contains(a.get("category_id").asInt()), "category_id resolves: " + a);
            assertTrue(tracks.contains(a.get("track_id").asInt()), "track_id resolves: " + a);
        }
        for (JsonNode t : root.get("tracks")) {
            assertTrue(categories.contains(t.get("category_id").asInt()));
            assertEquals(1, t.get("video_id").asInt());
        }
        assertEquals("käfer, groß", root.get("categories").get(1).get("name").asText());
        assertEquals(2, root.get("tracks").get(1).get("category_id").asInt(), "track 4 is a käfer, category 2");
    }

    @Test
    void boxesLieInsideTheImageAndAreaIsWidthTimesHeight() throws Exception {
        Map<Integer, FrameAnnotation> m = new TreeMap<>();
        m.put(0, FrameAnnotation.keyframe(0, new Box(-5, -2.5, 20, 10)));       // over the top-left corner
        m.put(1, FrameAnnotation.tracked(1, new Box(630.25, 470, 20, 20), 0.5)); // over the bottom-right corner
        m.put(2, FrameAnnotation.tracked(2, new Box(700, 10, 20, 20), 0.5));     // wholly outside: left out
        m.put(3, FrameAnnotation.keyframe(3, new Box(1.0004, 2.0006, 3.0004, 4.9996)));
        Project p = new Project(TrackSamples.VIDEO, List.of(new ObjectClass("ant", 0)),
                List.of(new Track(1, "ant", "", m)));
        Path out = dir.resolve("clip.json");
        CocoSummary s = CocoWriter.write(p, f -> f / 25.0, out);
        assertEquals(new CocoSummary(3, 3, 2, 1, 0), s);
        JsonNode root = new ObjectMapper().readTree(out.toFile());
        List<List<Double>> boxes = new ArrayList<>();
        for (JsonNode a : root.get("annotations")) {
            JsonNode b = a.get("bbox");
            double x = b.get(0).asDouble();
            double y = b.get(1).asDouble();
            double w = b.get(2).asDouble();
            double h = b.get(3).asDouble();
            // COCO bbox: [x, y, width, height] from the top-left corner, in pixels, inside the image.
            assertTrue(x >= 0 && y >= 0 && w > 0 && h > 0 && x + w <= 640 && y + h <= 480, b.toString());
            assertEquals(w * h, a.get("area").asDouble(), 1e-6 * Math.max(1, w * h), "area = width * height");
            boxes.add(List.of(x, y, w, h));
        }
        assertEquals(List.of(List.of(0.0, 0.0, 15.0, 7.5), List.of(630.25, 470.0, 9.75, 10.0),
                List.of(1.0, 2.001, 3.0, 5.0)), boxes, "clipped to the frame, rounded to 0.001 px");
    }

    private static Project onArena(VideoSource video, int... frames) {
        VideoRef ref = new VideoRef("arena.mp4", video.info().width(), video.info().height(), video.frameCount(), "");
        Map<Integer, FrameAnnotation> m = new TreeMap<>();
        for (int f : frames) {
            m.put(f, FrameAnnotation.keyframe(f, new Box(10, 10, 50, 40)));
        }
        return new Project(ref, List.of(new ObjectClass("animal", 0)), List.of(new Track(1, "animal", "", m)));
    }

    @Test
    void frameImagesHoldTheDecodedPixels() throws Exception {
        try (VideoSource video = VideoSource.open(ARENA)) {
            Project p = onArena(video, 0, 7, 41);
            Path out = dir.resolve("set/arena.json");
            List<String> calls = new ArrayList<>();
            CocoSummary s = CocoWriter.write(p, video.index()::timeSeconds, out,
                    new CocoFrameImages(video, dir.resolve("set/frames")), (done, total) -> {
                        calls.add(done + "/" + total);
                        return true;
                    });
            assertEquals(3, s.imageFiles());
            assertEquals(List.of("0/3", "1/3", "2/3", "3/3"), calls);
            JsonNode root = new ObjectMapper().readTree(out.toFile());
            assertEquals("frames/frame_000041.png", root.get("images").get(2).get("file_name").asText(),
                    "file_name is the image's path relative to the JSON file");
            for (int n : new int[] {0, 7, 41}) {
                BufferedImage png = ImageIO.read(out.resolveSibling("frames").resolve(CocoWriter.frameFileName(n))
                        .toFile());
                Frame f = video.frame(n);
                assertEquals(f.width(), png.getWidth());
                assertEquals(f.height(), png.getHeight());
                int[] pixels = png.getRGB(0, 0, f.width(), f.height(), null, 0, f.width());
                int differ = 0;
                for (int i = 0; i < f.width() * f.height(); i++) {
                    if (pixels[i] != f.rgb()[i]) {
                        differ++;
                    }
                }
                assertEquals(0, differ, "PNG is lossless: frame " + n + " pixel for pixel");
            }
        }
    }

    @Test
    void cancellingLeavesTheOldJsonAsItWas() throws Exception {
        try (VideoSource video = VideoSource.open(ARENA)) {
            Project p = onArena(video, 0, 1, 2);
            Path out = dir.resolve("arena.json");
            Files.writeString(out, "the user's earlier export");
            ExportProgress stopAfterOne = (done, total) -> done < 1;
            assertThrows(ExportCancelledException.class, () -> CocoWriter.write(p, video.index()::timeSeconds, out,
                    new CocoFrameImages(video, dir.resolve("frames")), stopAfterOne));
            assertEquals("the user's earlier export", Files.readString(out));
            // The image written before the cancel is taken away again, and the folder the run made with it.
            assertFalse(Files.exists(dir.resolve("frames")));
        }
    }

    @Test
    void cancellingKeepsImagesAnEarlierExportWroteAndTheUsersOwnFiles() throws Exception {
        try (VideoSource video = VideoSource.open(ARENA)) {
            Project p = onArena(video, 0, 1, 2);
            Path out = dir.resolve("arena.json");
            Path frames = dir.resolve("frames");
            assertThrows(ExportCancelledException.class, () -> CocoWriter.write(p, video.index()::timeSeconds, out,
                    new CocoFrameImages(video, frames), (done, total) -> done < 1)); // cancelled: nothing stays
            assertFalse(Files.exists(frames));
            Files.createDirectories(frames);
            Files.writeString(frames.resolve("notes.txt"), "the user's own file");
            Path earlier = frames.resolve(CocoWriter.frameFileName(0));
            Files.writeString(earlier, "an earlier export's image");
            ExportProgress stopAfterTwo = (done, total) -> done < 2;
            assertThrows(ExportCancelledException.class, () -> CocoWriter.write(p, video.index()::timeSeconds, out,
                    new CocoFrameImages(video, frames), stopAfterTwo));
            assertTrue(Files.size(earlier) > 1000, "frame 0 was replaced by a whole PNG and kept");
            assertFalse(Files.exists(frames.resolve(CocoWriter.frameFileName(1))), "frame 1 was new: deleted");
            assertEquals("the user's own file", Files.readString(frames.resolve("notes.txt")));
        }
    }
}
