package org.modetrail.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.stream.Collectors;
import java.util.stream.IntStream;

import org.modetrail.app.Main;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

import picocli.CommandLine;

/**
 * Projects on the bundled road clip made from the generator's truth (clips/README.md), and the command runner the
 * command tests share.
 */
final class RoadFixture {
    static final Path CLIP = Path.of("..", "clips", "road.mp4");
    static final Path TRUTH = Path.of("..", "clips", "road-truth.csv");
    static final Path CALIBRATION = Path.of("..", "clips", "road-calibration.csv");

    record Run(int code, String out, String err) {
    }

    private RoadFixture() {
    }

    static Run run(String... args) {
        CommandLine cli = Main.commandLine();
        StringWriter err = new StringWriter();
        StringWriter out = new StringWriter();
        cli.setErr(new PrintWriter(err, true));
        cli.setOut(new PrintWriter(out, true));
        return new Run(cli.execute(args), out.toString(), err.toString());
    }

    /** A project whose tracks are the true boxes of {@code ids} on their fully visible frames, as keyframes. */
    static Path truthProject(Path dir, int... ids) throws Exception {
        Set<Integer> wanted = IntStream.of(ids).boxed().collect(Collectors.toSet());
        Map<Integer, Map<Integer, FrameAnnotation>> frames = new TreeMap<>();
        Map<Integer, String> classes = new TreeMap<>();
        List<String> lines = Files.readAllLines(TRUTH);
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            int id = Integer.parseInt(f[0]);
            if (!wanted.contains(id) || Double.parseDouble(f[8]) < 1) {
                continue;
            }
            int frame = Integer.parseInt(f[2]);
            classes.put(id, f[1]);
            frames.computeIfAbsent(id, k -> new TreeMap<>()).put(frame, FrameAnnotation.keyframe(frame,
                    new Box(Double.parseDouble(f[4]), Double.parseDouble(f[5]), Double.parseDouble(f[6]),
                            Double.parseDouble(f[7]))));
        }
        List<Track> tracks = new ArrayList<>();
        frames.forEach((id, f) -> tracks.add(new Track(id, classes.get(id), "", f)));
        List<ObjectClass> kinds = new ArrayList<>();
        int[] palette = {0xD55E00, 0x0072B2, 0x009E73, 0xCC79A7, 0xE69F00, 0x56B4E9};
        for (String name : new java.util.TreeSet<>(classes.values())) {
            kinds.add(new ObjectClass(name, palette[kinds.size() % palette.length]));
        }
        Project p = new Project(new VideoRef(CLIP.toAbsolutePath().normalize().toString(), 960, 540, 450, ""),
                kinds, tracks);
        Path projectFile = dir.resolve("road.json");
        ProjectFile.write(p, projectFile);
        return projectFile;
    }

    /** The 30 surveyed ground points of road-calibration.csv as POINTS.csv. */
    static Path points(Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("image_x,image_y,world_x_m,world_y_m\n");
        for (String line : Files.readAllLines(CALIBRATION)) {
            String[] f = line.split(",", -1);
            if (f[0].equals("point")) {
                csv.append(f[3]).append(',').append(f[4]).append(',').append(f[5]).append(',').append(f[6])
                        .append('\n');
            }
        }
        return Files.writeString(dir.resolve("points.csv"), csv);
    }
}
