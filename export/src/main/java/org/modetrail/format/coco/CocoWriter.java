package org.modetrail.format.coco;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamWriteFeature;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.IntToDoubleFunction;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;
import javax.imageio.stream.MemoryCacheImageOutputStream;

import org.modetrail.format.ExportCancelledException;
import org.modetrail.format.ExportProgress;
import org.modetrail.format.project.AtomicWrite;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.video.Frame;
import org.modetrail.video.FrameUnreadableException;
import org.modetrail.video.VideoException;

/**
 * Writes tracks as a COCO object-detection JSON file, following the "Data format" page of cocodataset.org (from
 * memory): top-level {@code info}, {@code licenses} (empty), {@code images} (one per annotated frame),
 * {@code annotations} (one per box, {@code bbox} = [x, y, width, height] in pixels from the top-left,
 * {@code area} = width * height, {@code iscrowd} 0, {@code segmentation} []) and {@code categories} (one per
 * class). The video extensions of COCO used by open video benchmarks add {@code video_id} and {@code frame_index}
 * to images, {@code track_id} to annotations, and {@code videos} and {@code tracks} lists; these are written too.
 * Keys of Modetrail's own start with {@code modetrail_}: each box's source ({@value #SOURCE_KEY}: keyframe, tracked
 * or interpolated), each frame's presentation time ({@value #TIME_KEY}) and each class's colour
 * ({@value #COLOUR_KEY}, "#rrggbb").
 *
 * <p>Ids of images, annotations and categories count from 1; tracks keep their Modetrail ids (1 or more), videos
 * have id 1. {@code frame_index} is the 0-based Modetrail frame. Boxes are clipped to the frame; a box wholly
 * outside is left out. Coordinates are rounded to a thousandth of a pixel. Hidden and absent marks are not written
 * (COCO has boxes only). The JSON file is replaced atomically, each PNG file too; when the export is cancelled or
 * fails the JSON file is not touched, and the frame images this run added are deleted (those that replaced an
 * earlier export's stay, each complete).
 */
public final class CocoWriter {
    public static final String SOURCE_KEY = "modetrail_source";
    public static final String TIME_KEY = "modetrail_time_s";
    public static final String COLOUR_KEY = "modetrail_colour";
    static final int VIDEO_ID = 1;

    private CocoWriter() {
    }

    /** The PNG file name of frame {@code frame} (0-based). */
    public static String frameFileName(int frame) {
        return String.format(Locale.ROOT, "frame_%06d.png", frame);
    }

    /** Writes the JSON only; images are named after the video and frame, e.g. {@code arena.mp4/frame_000123.png}. */
    public static CocoSummary write(Project project, IntToDoubleFunction timeOfFrame, Path out) throws IOException {
        return write(project, timeOfFrame, out, null, ExportProgress.NONE);
    }

    /**
     * @param timeOfFrame seconds from the first frame for each frame index (the video's frame index)
     * @param images      where and from what to write the annotated frames as PNG files, or null for none
     * @param progress    told after each frame image; returning false cancels (then the JSON is not written)
     */
    public static CocoSummary write(Project project, IntToDoubleFunction timeOfFrame, Path out,
                                    CocoFrameImages images, ExportProgress progress) throws IOException {
        VideoRef video = project.video();
        List<ObjectClass> classes = project.classes();
        Map<String, Integer> categoryOf = new java.util.HashMap<>();
        for (int i = 0; i < classes.size(); i++) {
            categoryOf.put(classes.get(i).name(), i + 1);
        }
        record Entry(Track track, FrameAnnotation a, Box box) {
        }
        TreeMap<Integer, List<Entry>> byFrame = new TreeMap<>();
        int clipped = 0;
        int dropped = 0;
        List<Track> tracks = new ArrayList<>(project.tracks());
        tracks.sort(Comparator.comparingInt(Track::id));
        for (Track t : tracks) {
            for (FrameAnnotation a : t.frames().values()) {
                if (!a.isVisible()) {
                    continue;
                }
                Box box = clip(a.box(), video.width(), video.height());
                if (box == null) {
                    dropped++;
                    continue;
                }
                Box b = a.box();
                if (b.x() < 0 || b.y() < 0 || b.right() > video.width() || b.bottom() > video.height()) {
                    clipped++;
                }
                byFrame.computeIfAbsent(a.frame(), f -> new ArrayList<>()).add(new Entry(t, a, box));
            }
        }
        int imageFiles = 0;
        Path folder = out.toAbsolutePath().getParent();
        if (images != null) {
            int total = byFrame.size();
            if (!progress.update(0, total)) {
                throw new ExportCancelledException(out);
            }
            boolean folderIsNew = !Files.exists(images.folder());
            List<Path> created = new ArrayList<>();
            try {
                for (int frame : byFrame.keySet()) {
                    Path file = images.imageFile(frame);
                    boolean isNew = !Files.exists(file);
                    writeFrameImage(images, frame, video);
                    if (isNew) {
                        created.add(file);
                    }
                    imageFiles++;
                    if (!progress.update(imageFiles, total)) {
                        throw new ExportCancelledException(out);
                    }
                }
            } catch (IOException | RuntimeException e) {
                removeUnfinished(created, folderIsNew ? images.folder() : null);
                throw e;
            }
        }
        String videoName = videoFileName(video);
        JsonFactory factory = JsonFactory.builder().disable(StreamWriteFeature.AUTO_CLOSE_TARGET).build();
        int[] annotations = {0};
        AtomicWrite.replace(out, raw -> {
            try (JsonGenerator g = factory.createGenerator(raw, JsonEncoding.UTF8)) {
                g.useDefaultPrettyPrinter();
                g.writeStartObject();
                g.writeObjectFieldStart("info");
                g.writeStringField("description", "Tracks of " + videoName + " exported by Modetrail");
                g.writeStringField("version", "1.0");
                g.writeNumberField("year", LocalDate.now().getYear());
                g.writeStringField("contributor", "");
                g.writeStringField("url", "");
                g.writeStringField("date_created", LocalDate.now().toString());
                g.writeEndObject();
                g.writeArrayFieldStart("licenses");
                g.writeEndArray();

                g.writeArrayFieldStart("videos");
                g.writeStartObject();
                g.writeNumberField("id", VIDEO_ID);
                g.writeStringField("file_name", video.path());
                g.writeNumberField("width", video.width());
                g.writeNumberField("height", video.height());
                g.writeNumberField("frame_count", video.frameCount());
                g.writeNumberField("fps", round(frameRate(timeOfFrame, video.frameCount()), 1e6));
                g.writeEndObject();
                g.writeEndArray();

                g.writeArrayFieldStart("images");
                int imageId = 0;
                for (int frame : byFrame.keySet()) {
                    imageId++;
                    g.writeStartObject();
                    g.writeNumberField("id", imageId);
                    g.writeNumberField("width", video.width());
                    g.writeNumberField("height", video.height());
                    String fileName = images == null ? videoName + "/" + frameFileName(frame)
                            : folder.relativize(images.imageFile(frame).toAbsolutePath()).toString()
                                    .replace(java.io.File.separatorChar, '/');
                    g.writeStringField("file_name", fileName);
                    g.writeNumberField("video_id", VIDEO_ID);
                    g.writeNumberField("frame_index", frame);
                    g.writeNumberField(TIME_KEY, round(timeOfFrame.applyAsDouble(frame), 1e6));
                    g.writeEndObject();
                }
                g.writeEndArray();

                g.writeArrayFieldStart("annotations");
                imageId = 0;
                for (List<Entry> entries : byFrame.values()) {
                    imageId++;
                    for (Entry e : entries) {
                        annotations[0]++;
                        Box b = e.box;
                        g.writeStartObject();
                        g.writeNumberField("id", annotations[0]);
                        g.writeNumberField("image_id", imageId);
                        g.writeNumberField("category_id", categoryOf.get(e.track.className()));
                        g.writeArrayFieldStart("bbox");
                        g.writeNumber(b.x());
                        g.writeNumber(b.y());
                        g.writeNumber(b.width());
                        g.writeNumber(b.height());
                        g.writeEndArray();
                        g.writeNumberField("area", round(b.width() * b.height(), 1e6));
                        g.writeNumberField("iscrowd", 0);
                        g.writeArrayFieldStart("segmentation");
                        g.writeEndArray();
                        g.writeNumberField("track_id", e.track.id());
                        g.writeNumberField("score", round(e.a.score(), 1e4));
                        g.writeStringField(SOURCE_KEY, e.a.source().name().toLowerCase(Locale.ROOT));
                        g.writeEndObject();
                    }
                }
                g.writeEndArray();

                g.writeArrayFieldStart("categories");
                for (int i = 0; i < classes.size(); i++) {
                    g.writeStartObject();
                    g.writeNumberField("id", i + 1);
                    g.writeStringField("name", classes.get(i).name());
                    g.writeStringField("supercategory", "object");
                    g.writeStringField(COLOUR_KEY, String.format(Locale.ROOT, "#%06x", classes.get(i).colour()));
                    g.writeEndObject();
                }
                g.writeEndArray();

                g.writeArrayFieldStart("tracks");
                for (Track t : tracks) {
                    g.writeStartObject();
                    g.writeNumberField("id", t.id());
                    g.writeNumberField("category_id", categoryOf.get(t.className()));
                    g.writeNumberField("video_id", VIDEO_ID);
                    g.writeEndObject();
                }
                g.writeEndArray();
                g.writeEndObject();
                g.writeRaw('\n');
            }
        });
        return new CocoSummary(byFrame.size(), annotations[0], clipped, dropped, imageFiles);
    }

    /**
     * The box clipped to the frame, then x, y, width and height each rounded to a thousandth of a pixel (as the
     * CSV and MOT files print them), or null when nothing is left.
     */
    static Box clip(Box b, int width, int height) {
        double x0 = Math.max(0, b.x());
        double y0 = Math.max(0, b.y());
        double x = round(x0, 1e3);
        double y = round(y0, 1e3);
        double w = round(Math.min(width, b.right()) - x0, 1e3);
        double h = round(Math.min(height, b.bottom()) - y0, 1e3);
        // Rounding can carry the far edge a last digit past the frame; never let the box end outside it.
        while (w > 0 && x + w > width) {
            w = Math.nextDown(Math.min(w, width - x));
        }
        while (h > 0 && y + h > height) {
            h = Math.nextDown(Math.min(h, height - y));
        }
        if (!(w > 0) || !(h > 0)) {
            return null;
        }
        return new Box(x, y, w, h);
    }

    private static double round(double v, double scale) {
        return Math.round(v * scale) / scale;
    }

    /** Frames per second: (frames - 1) over the time of the last frame; 0 for a single frame. */
    private static double frameRate(IntToDoubleFunction timeOfFrame, int frames) {
        if (frames < 2) {
            return 0;
        }
        double last = timeOfFrame.applyAsDouble(frames - 1);
        return last > 0 ? (frames - 1) / last : 0;
    }

    private static String videoFileName(VideoRef video) {
        String p = video.path().replace('\\', '/');
        int slash = p.lastIndexOf('/');
        return slash < 0 ? p : p.substring(slash + 1);
    }

    /**
     * After a cancelled or failed run: deletes the frame images this run added, and the folder when this run made it
     * and it is left empty. Images that replaced an earlier export's stay (each is complete).
     */
    private static void removeUnfinished(List<Path> created, Path newFolder) {
        for (Path file : created) {
            try {
                Files.deleteIfExists(file);
            } catch (IOException ignored) {
                // best effort: a left file is a complete image, nothing the user made is lost
            }
        }
        if (newFolder != null) {
            try (var left = Files.list(newFolder)) {
                if (left.findAny().isEmpty()) {
                    Files.delete(newFolder);
                }
            } catch (IOException ignored) {
                // best effort, as above
            }
        }
    }

    private static void writeFrameImage(CocoFrameImages images, int frame, VideoRef video) throws IOException {
        Frame f;
        try {
            f = images.video().frame(frame);
        } catch (FrameUnreadableException e) {
            throw new IOException("frame " + frame + " of " + images.video().path() + " cannot be decoded, so its"
                    + " image cannot be written: " + e.getMessage() + "; export without frame images", e);
        } catch (VideoException e) {
            throw new IOException(e.getMessage(), e);
        }
        if (f.width() != video.width() || f.height() != video.height()) {
            throw new IOException(images.video().path() + " has " + f.width() + "x" + f.height() + " frames but the"
                    + " project's video is " + video.width() + "x" + video.height() + "; open the project's own video");
        }
        BufferedImage image = new BufferedImage(f.width(), f.height(), BufferedImage.TYPE_INT_RGB);
        image.setRGB(0, 0, f.width(), f.height(), f.rgb(), 0, f.width());
        Files.createDirectories(images.folder());
        AtomicWrite.replace(images.imageFile(frame), raw -> {
            Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("png");
            if (!writers.hasNext()) {
                throw new IOException("this Java has no PNG writer");
            }
            ImageWriter writer = writers.next();
            try (ImageOutputStream ios = new MemoryCacheImageOutputStream(raw)) {
                writer.setOutput(ios);
                writer.write(image);
            } finally {
                writer.dispose();
            }
        });
    }
}
