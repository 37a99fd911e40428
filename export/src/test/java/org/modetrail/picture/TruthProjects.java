package org.modetrail.picture;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

/** Projects and series made from the committed demo clips' truth files, for the picture and overlay tests. */
public final class TruthProjects {
    /** The committed clips, seen from a module's folder (where surefire runs). */
    public static final Path CLIPS = Path.of("..", "clips");
    public static final Path ARENA = CLIPS.resolve("arena.mp4");
    public static final Path ARENA_TRUTH = CLIPS.resolve("arena-truth.csv");
    public static final Path ROAD = CLIPS.resolve("road.mp4");
    public static final Path ROAD_TRUTH = CLIPS.resolve("road-truth.csv");

    private TruthProjects() {
    }

    /** One truth row. */
    public record Row(int track, String cls, int frame, double timeS, double x, double y, double w, double h,
                      double visible, double worldX, double worldY, double speed) {
    }

    public static List<Row> rows(Path csv) throws IOException {
        List<String> lines = Files.readAllLines(csv);
        List<Row> rows = new ArrayList<>();
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            boolean world = f.length >= 12;
            rows.add(new Row(Integer.parseInt(f[0]), f[1], Integer.parseInt(f[2]), Double.parseDouble(f[3]),
                    Double.parseDouble(f[4]), Double.parseDouble(f[5]), Double.parseDouble(f[6]),
                    Double.parseDouble(f[7]), Double.parseDouble(f[8]),
                    world ? number(f[9]) : Double.NaN, world ? number(f[10]) : Double.NaN,
                    world ? number(f[11]) : Double.NaN));
        }
        return rows;
    }

    private static double number(String s) {
        return s.isEmpty() ? Double.NaN : Double.parseDouble(s);
    }

    /**
     * The arena clip's truth as a project: every class in {@code classColour}'s colour; frames {@code from..to}
     * (inclusive) only. Frame f's source is keyframe when {@code f % 10 == 0}, interpolated when {@code f % 10 >= 7},
     * tracked otherwise, so all three looks are drawn. Rows with visible 0 or an empty box are hidden.
     */
    public static Project arena(int classColour, int from, int to) throws IOException {
        return project(ARENA_TRUTH, new VideoRef("arena.mp4", 640, 480, 450, ""), c -> classColour, from, to);
    }

    /** The road clip's truth as a project, one palette colour per class, with the same sources as {@link #arena}. */
    public static Project road(int from, int to) throws IOException {
        Map<String, Integer> colours = new HashMap<>();
        return project(ROAD_TRUTH, new VideoRef("road.mp4", 960, 540, 450, ""),
                c -> colours.computeIfAbsent(c, k -> Palette.colour(colours.size())), from, to);
    }

    private static Project project(Path truth, VideoRef video, java.util.function.ToIntFunction<String> colourOf,
                                   int from, int to) throws IOException {
        Map<Integer, String> classOf = new LinkedHashMap<>();
        Map<Integer, TreeMap<Integer, FrameAnnotation>> frames = new TreeMap<>();
        for (Row r : rows(truth)) {
            if (r.frame() < from || r.frame() > to) {
                continue;
            }
            classOf.putIfAbsent(r.track(), r.cls());
            FrameAnnotation a;
            if (r.visible() <= 0 || r.w() <= 0 || r.h() <= 0) {
                a = new FrameAnnotation(r.frame(), Presence.HIDDEN, null,
                        org.modetrail.model.BoxSource.TRACKED, 0);
            } else {
                Box b = new Box(r.x(), r.y(), r.w(), r.h());
                int k = r.frame() % 10;
                a = k == 0 ? FrameAnnotation.keyframe(r.frame(), b)
                        : k >= 7 ? FrameAnnotation.interpolated(r.frame(), b)
                        : FrameAnnotation.tracked(r.frame(), b, 0.9);
            }
            frames.computeIfAbsent(r.track(), t -> new TreeMap<>()).put(r.frame(), a);
        }
        Map<String, ObjectClass> classes = new HashMap<>();
        List<Track> tracks = new ArrayList<>();
        for (Map.Entry<Integer, TreeMap<Integer, FrameAnnotation>> e : frames.entrySet()) {
            String cls = classOf.get(e.getKey());
            classes.computeIfAbsent(cls, n -> new ObjectClass(n, colourOf.applyAsInt(n)));
            tracks.add(new Track(e.getKey(), cls, "", e.getValue()));
        }
        List<ObjectClass> sorted = new ArrayList<>(classes.values());
        sorted.sort(java.util.Comparator.comparing(ObjectClass::name));
        return new Project(video, sorted, tracks);
    }

    /** Ground-plane series of the road clip's truth, one per road user, palette colours. */
    public static List<PlotSeries> roadGround() throws IOException {
        Map<Integer, List<Row>> byTrack = byTrack(rows(ROAD_TRUTH));
        List<PlotSeries> out = new ArrayList<>();
        int k = 0;
        for (Map.Entry<Integer, List<Row>> e : byTrack.entrySet()) {
            List<Row> rs = e.getValue();
            double[] t = new double[rs.size()], x = new double[rs.size()], y = new double[rs.size()];
            for (int i = 0; i < rs.size(); i++) {
                t[i] = rs.get(i).timeS();
                x[i] = rs.get(i).worldX();
                y[i] = rs.get(i).worldY();
            }
            out.add(new PlotSeries(e.getKey(), e.getKey() + " " + rs.get(0).cls(), Palette.colour(k++), t, x, y));
        }
        return out;
    }

    /** Speed series of the road clip's truth, with a made-up sigma of 5% + 0.2 m/s when {@code withSigma}. */
    public static List<SpeedSeries> roadSpeeds(boolean withSigma) throws IOException {
        Map<Integer, List<Row>> byTrack = byTrack(rows(ROAD_TRUTH));
        List<SpeedSeries> out = new ArrayList<>();
        int k = 0;
        for (Map.Entry<Integer, List<Row>> e : byTrack.entrySet()) {
            List<Row> rs = e.getValue();
            double[] t = new double[rs.size()], v = new double[rs.size()], s = new double[rs.size()];
            for (int i = 0; i < rs.size(); i++) {
                t[i] = rs.get(i).timeS();
                v[i] = rs.get(i).speed();
                s[i] = 0.05 * v[i] + 0.2;
            }
            out.add(new SpeedSeries(e.getKey(), e.getKey() + " " + rs.get(0).cls(), Palette.colour(k++), t, v,
                    withSigma ? s : null));
        }
        return out;
    }

    private static Map<Integer, List<Row>> byTrack(List<Row> rows) {
        Map<Integer, List<Row>> m = new TreeMap<>();
        for (Row r : rows) {
            m.computeIfAbsent(r.track(), x -> new ArrayList<>()).add(r);
        }
        return m;
    }
}
