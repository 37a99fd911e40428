package org.modetrail.app.editor;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.modetrail.calibration.HomographyFit;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.model.WorldPoint;

/**
 * A project like the demo's without tracking it (which would cost the tests seconds): the arena clip copied to a
 * scratch folder, and its generator's true boxes (clips/arena-truth.csv, frames where an animal is at least half
 * visible) as keyframes of three tracks of the class "animal".
 */
final class ExportTestProjects {
    static final Path CLIP = Path.of("..", "clips", "arena.mp4");
    static final Path TRUTH = Path.of("..", "clips", "arena-truth.csv");
    static final int FRAMES = 450;

    private ExportTestProjects() {
    }

    /** Writes {@code dir/arena.mp4} and {@code dir/arena.modetrail.json}; returns the project file. */
    static Path arena(Path dir) throws IOException {
        Path clip = Files.copy(CLIP, dir.resolve("arena.mp4"));
        Path file = dir.resolve("arena.modetrail.json");
        ProjectFile.write(arenaProject(clip), file);
        return file;
    }

    static Project arenaProject(Path clip) throws IOException {
        Map<Integer, Map<Integer, FrameAnnotation>> frames = new TreeMap<>();
        List<String> lines = Files.readAllLines(TRUTH);
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",");
            int id = Integer.parseInt(c[0]);
            int frame = Integer.parseInt(c[2]);
            Box b = new Box(Double.parseDouble(c[4]), Double.parseDouble(c[5]), Double.parseDouble(c[6]),
                    Double.parseDouble(c[7]));
            if (Double.parseDouble(c[8]) >= 0.5) {
                frames.computeIfAbsent(id, k -> new TreeMap<>()).put(frame, FrameAnnotation.keyframe(frame, b));
            }
        }
        List<Track> tracks = new ArrayList<>();
        frames.forEach((id, f) -> tracks.add(new Track(id, "animal", "", f)));
        VideoRef ref = new VideoRef(clip.toAbsolutePath().toString(), 640, 480, FRAMES, "");
        return new Project(ref, List.of(new ObjectClass("animal", 0xE69F00)), tracks);
    }

    /** The arena seen from straight above at 1 cm a pixel: six image points and their ground positions. */
    static GroundCalibration arenaCalibration() {
        List<GroundPoint> points = new ArrayList<>();
        double[][] px = {{40, 40}, {600, 40}, {600, 440}, {40, 440}, {320, 240}, {200, 120}};
        for (double[] p : px) {
            points.add(new GroundPoint(new PixelPoint(p[0], p[1]), new WorldPoint(p[0] / 100, (480 - p[1]) / 100)));
        }
        return HomographyFit.fit(points);
    }

    static Project calibrated(Project p) {
        return p.withSite(p.site().withCalibration(arenaCalibration()));
    }
}
