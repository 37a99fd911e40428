package org.modetrail.format;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/**
 * Collects the boxes an importer reads into tracks, checking what every tracks format must satisfy: frames inside
 * the video, boxes inside the frame, one box per track and frame, one class per track, and the size limits. Each
 * importer has its own; not for concurrent use.
 */
public final class TrackAssembler {
    /**
     * How far a box may reach past the frame edge and still be taken (clipped to the edge): printed coordinates are
     * rounded, so a box drawn to the edge can end a thousandth of a pixel past it.
     */
    public static final double EDGE_TOLERANCE = 0.01;

    /** Colours for classes a file names without one (the tab10 palette). */
    private static final int[] PALETTE = {0x1F77B4, 0xFF7F0E, 0x2CA02C, 0xD62728, 0x9467BD, 0x8C564B, 0xE377C2,
        0x7F7F7F, 0xBCBD22, 0x17BECF};

    private final Path file;
    private final VideoRef video;
    private final ImportLimits limits;
    private final Map<Integer, String> classOfTrack = new LinkedHashMap<>();
    private final Map<Integer, Place> firstPlaceOfTrack = new HashMap<>();
    private final Map<Integer, TreeMap<Integer, FrameAnnotation>> frames = new LinkedHashMap<>();
    private final Set<String> classNames = new LinkedHashSet<>();
    private long boxes;

    public TrackAssembler(Path file, VideoRef video, ImportLimits limits) {
        this.file = file;
        this.video = video;
        this.limits = limits;
    }

    public Path file() {
        return file;
    }

    public VideoRef video() {
        return video;
    }

    public ImportLimits limits() {
        return limits;
    }

    /** Declares a track (possibly without boxes), as a COCO {@code tracks} entry does. */
    public void declare(int trackId, String className, Place place) throws ImportException {
        if (trackId < 1) {
            throw place.error(file, "track id " + trackId + " is below 1; track ids start at 1");
        }
        String known = classOfTrack.get(trackId);
        if (known == null) {
            if (classOfTrack.size() >= limits.maxTracks()) {
                throw place.error(file, "more than " + limits.maxTracks() + " tracks; split the file or raise the"
                        + " track limit");
            }
            if (!classNames.contains(className) && classNames.size() >= limits.maxClasses()) {
                throw place.error(file, "more than " + limits.maxClasses() + " classes");
            }
            classOfTrack.put(trackId, className);
            firstPlaceOfTrack.put(trackId, place);
            classNames.add(className);
            frames.put(trackId, new TreeMap<>());
        } else if (!known.equals(className)) {
            throw place.error(file, "track " + trackId + " has class '" + className + "' here but '" + known
                    + "' at " + describe(firstPlaceOfTrack.get(trackId)) + "; a track keeps one class, so give the"
                    + " object a track id of its own or correct the class");
        }
    }

    /** Adds one box (or mark) of a track; the annotation's frame and box must have been checked already. */
    public void add(int trackId, String className, FrameAnnotation a, Place place) throws ImportException {
        declare(trackId, className, place);
        if (++boxes > limits.maxBoxes()) {
            throw place.error(file, "more than " + limits.maxBoxes() + " boxes; split the file or raise the limit");
        }
        if (frames.get(trackId).putIfAbsent(a.frame(), a) != null) {
            throw place.error(file, "track " + trackId + " already has a box on frame " + a.frame()
                    + "; keep one box per track and frame");
        }
    }

    /** The 0-based frame, checked against the video; {@code shown} is the frame as the file writes it. */
    public int checkedFrame(int frame, long shown, Place place) throws ImportException {
        if (frame < 0 || frame >= video.frameCount()) {
            throw place.error(file, "frame " + shown + " is beyond the video " + video.path() + ", which has "
                    + video.frameCount() + " frames; check that the file belongs to this video");
        }
        return frame;
    }

    /**
     * The box, checked to have a positive size and to overlap the frame. A box that reaches past an edge is kept as
     * it is (the tracker's boxes do, as an object leaves the picture, and a round trip must give them back); one
     * wholly outside the frame cannot belong to this video and is refused.
     */
    public Box checkedBox(double x, double y, double w, double h, Place place) throws ImportException {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !(w > 0) || !(h > 0) || !Double.isFinite(w)
                || !Double.isFinite(h)) {
            throw place.error(file, "the box needs a positive width and height, got " + w + "x" + h
                    + "; correct or remove it");
        }
        int width = video.width();
        int height = video.height();
        if (x >= width || y >= height || x + w <= 0 || y + h <= 0) {
            throw place.error(file, "the box " + x + "," + y + " " + w + "x" + h + " lies wholly outside the "
                    + width + "x" + height + " frame; check that the file belongs to this video");
        }
        return new Box(x, y, w, h);
    }

    /** The project: classes as {@code classes} lists them (missing ones added with a palette colour). */
    public Project build(List<ObjectClass> classes) {
        List<ObjectClass> all = new ArrayList<>(classes);
        Set<String> listed = new LinkedHashSet<>();
        for (ObjectClass c : classes) {
            listed.add(c.name());
        }
        for (String name : classNames) {
            if (listed.add(name)) {
                all.add(new ObjectClass(name, PALETTE[(all.size()) % PALETTE.length]));
            }
        }
        List<Track> tracks = new ArrayList<>();
        for (Map.Entry<Integer, String> e : classOfTrack.entrySet()) {
            tracks.add(new Track(e.getKey(), e.getValue(), "", frames.get(e.getKey())));
        }
        tracks.sort(java.util.Comparator.comparingInt(Track::id));
        return new Project(video, all, tracks);
    }

    /** The project, with the classes in the order the file first names them. */
    public Project build() {
        return build(List.of());
    }

    private static String describe(Place p) {
        if (p.jsonPath() != null) {
            return p.jsonPath() + (p.line() > 0 ? " (line " + p.line() + ")" : "");
        }
        return "line " + p.line();
    }

    /** The palette colour for the n-th class (0-based). */
    public static int paletteColour(int n) {
        return PALETTE[Math.floorMod(n, PALETTE.length)];
    }
}
