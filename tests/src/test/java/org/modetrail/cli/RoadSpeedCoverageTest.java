package org.modetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.calibration.GroundSample;
import org.modetrail.calibration.GroundTrajectory;
import org.modetrail.calibration.TrajectoryConfig;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * Whether the stated speed uncertainty tells the truth on the road clip when the boxes come from the product's own
 * tracking: one keyframe per road user (its first frame fully in view and inside the image, from
 * clips/road-truth.csv), {@code ./modetrail track}, {@code ./modetrail calibrate} with the 30 surveyed points of
 * clips/road-calibration.csv, then the ground speeds of {@link GroundTrajectory} against the generator's true speed
 * ({@code speed_m_s}, closed-form lane motion, clips/README.md). The share of frames whose true speed lies inside
 * the stated 95% interval, speed ± 1.96 sigma (the normal distribution's 97.5% quantile; JCGM 100:2008 annex G), is
 * the coverage the GUM asks a stated expanded uncertainty to have.
 *
 * <p>Frames counted: those with a speed whose true ground position lies within the calibrated stretch of the road
 * (y = 10 to 70 m, as in RoadSpeedTest). The same boxes are also run with their per-frame tracking uncertainty
 * removed, which gives what the old sigmas (calibration and scatter only) stated, for comparison.
 */
class RoadSpeedCoverageTest {
    private static final double NEAR_Y_M = 10;
    private static final double FAR_Y_M = 70;
    /** Two-sided 95% coverage factor of the normal distribution. */
    private static final double K95 = 1.959964;

    @TempDir
    static Path dir;
    static Project tracked;
    static Map<Integer, TreeMap<Integer, double[]>> truth; // id -> frame -> {world y, speed}

    @BeforeAll
    static void trackAndCalibrate() throws Exception {
        truth = new TreeMap<>();
        StringBuilder keys = new StringBuilder("track_id,frame,x,y,width,height,class\n");
        Map<Integer, String> keyRows = new TreeMap<>();
        List<String> lines = Files.readAllLines(RoadFixture.TRUTH);
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            int id = Integer.parseInt(f[0]);
            truth.computeIfAbsent(id, k -> new TreeMap<>()).put(Integer.parseInt(f[2]),
                    new double[] {Double.parseDouble(f[10]), Double.parseDouble(f[11])});
            double x = Double.parseDouble(f[4]);
            double y = Double.parseDouble(f[5]);
            double w = Double.parseDouble(f[6]);
            double h = Double.parseDouble(f[7]);
            boolean inside = x > 0 && y > 0 && x + w < 960 && y + h < 540;
            if (!keyRows.containsKey(id) && Double.parseDouble(f[8]) >= 1 && inside) {
                keyRows.put(id, id + "," + f[2] + "," + f[4] + "," + f[5] + "," + f[6] + "," + f[7] + "," + f[1]
                        + "\n");
            }
        }
        keyRows.values().forEach(keys::append);
        Path keyFile = Files.writeString(dir.resolve("keys.csv"), keys);
        Path projectFile = dir.resolve("road.json");
        RoadFixture.Run t = RoadFixture.run("track", RoadFixture.CLIP.toString(), "--keyframes", keyFile.toString(),
                "--out", dir.resolve("tracks.csv").toString(), "--project", projectFile.toString());
        assertEquals(0, t.code(), t.err());
        RoadFixture.Run c = RoadFixture.run("calibrate", projectFile.toString(), "--points",
                RoadFixture.points(dir).toString());
        assertEquals(0, c.code(), c.err());
        tracked = ProjectFile.read(projectFile);
    }

    /** Coverage and median sigma of the stated 95% intervals over the counted frames. */
    record Coverage(int frames, double share, double medianSigma, double medianAbsError) {
    }

    static Coverage coverage(Project p) {
        int n = 0;
        int inside = 0;
        List<Double> sigmas = new ArrayList<>();
        List<Double> errors = new ArrayList<>();
        for (Track t : p.tracks()) {
            TreeMap<Integer, double[]> truthOf = truth.get(t.id());
            for (GroundSample s : GroundTrajectory.of(p, t, GroundTrajectory.constantRate(25),
                    TrajectoryConfig.defaults())) {
                double[] tr = truthOf.get(s.frame());
                if (!s.hasSpeed() || tr == null || tr[0] < NEAR_Y_M || tr[0] > FAR_Y_M) {
                    continue;
                }
                n++;
                double err = Math.abs(s.speedMs() - tr[1]);
                if (err <= K95 * s.speedSigmaMs()) {
                    inside++;
                }
                sigmas.add(s.speedSigmaMs());
                errors.add(err);
            }
        }
        return new Coverage(n, (double) inside / n, median(sigmas), median(errors));
    }

    private static double median(List<Double> v) {
        double[] a = v.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        return a.length == 0 ? Double.NaN : a[a.length / 2];
    }

    /** The same project with every frame's tracking uncertainty unknown: what the old sigmas stated. */
    static Project withoutTrackingUncertainty(Project p) {
        List<Track> tracks = new ArrayList<>();
        for (Track t : p.tracks()) {
            Map<Integer, FrameAnnotation> frames = new TreeMap<>();
            for (FrameAnnotation a : t.frames().values()) {
                frames.put(a.frame(), new FrameAnnotation(a.frame(), a.presence(), a.box(), a.source(), a.score()));
            }
            tracks.add(new Track(t.id(), t.className(), t.note(), frames));
        }
        return new Project(p.video(), p.classes(), tracks, p.site());
    }

    @Test
    void diagnostics() {
        for (Track t : tracked.tracks()) {
            TreeMap<Integer, double[]> truthOf = truth.get(t.id());
            List<Double> u = new ArrayList<>();
            List<Double> sc = new ArrayList<>();
            for (FrameAnnotation a : t.frames().values()) {
                if (a.isVisible() && !a.isKeyframe()) {
                    u.add(a.uncertaintyPx());
                    sc.add(a.score());
                }
            }
            int n = 0;
            int in = 0;
            int inOld = 0;
            List<Double> sig = new ArrayList<>();
            List<Double> err = new ArrayList<>();
            List<GroundSample> old = GroundTrajectory.of(withoutTrackingUncertainty(tracked), 
                    withoutTrackingUncertainty(tracked).track(t.id()).orElseThrow(), GroundTrajectory.constantRate(25),
                    TrajectoryConfig.defaults());
            int k = 0;
            for (GroundSample s : GroundTrajectory.of(tracked, t, GroundTrajectory.constantRate(25),
                    TrajectoryConfig.defaults())) {
                GroundSample o = old.get(k++);
                double[] tr = truthOf.get(s.frame());
                if (!s.hasSpeed() || tr == null || tr[0] < NEAR_Y_M || tr[0] > FAR_Y_M) {
                    continue;
                }
                n++;
                double e = Math.abs(s.speedMs() - tr[1]);
                in += e <= K95 * s.speedSigmaMs() ? 1 : 0;
                inOld += Math.abs(o.speedMs() - tr[1]) <= K95 * o.speedSigmaMs() ? 1 : 0;
                sig.add(s.speedSigmaMs());
                err.add(e);
            }
            System.out.printf("track %d %s: %d boxes (first %d last %d), median u %.2f px, median score %.3f;"
                    + " %d speeds, inside %d (old %d), median sigma %.2f, median |err| %.2f%n", t.id(), t.className(),
                    t.frames().size(), t.frames().isEmpty() ? -1 : t.frames().keySet().iterator().next(),
                    t.frames().isEmpty() ? -1 : ((java.util.TreeMap<Integer, FrameAnnotation>) new TreeMap<>(t.frames())).lastKey(),
                    median(u), median(sc), n, in, inOld, median(sig), median(err));
        }
    }

    @Test
    void dump() throws Exception {
        java.util.Map<String, String> tb = new java.util.HashMap<>();
        List<String> lines = Files.readAllLines(RoadFixture.TRUTH);
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            tb.put(f[0] + ":" + f[2], f[4] + "," + f[5] + "," + f[6] + "," + f[7]);
        }
        for (int id : new int[] {3, 8}) {
            for (FrameAnnotation a : tracked.track(id).orElseThrow().frames().values()) {
                if (a.frame() % 5 != 0 && id == 3) continue;
                System.out.printf("T%d f%d %s %s score %.3f u %.2f truth %s%n", id, a.frame(), a.source(),
                        a.box(), a.score(), a.uncertaintyPx(), tb.get(id + ":" + a.frame()));
            }
        }
    }

    @Test
    void statedIntervalsContainTheTrueSpeed() {
        Coverage now = coverage(tracked);
        Coverage old = coverage(withoutTrackingUncertainty(tracked));
        System.out.printf("road, tracked from one keyframe per road user: %d frames with a speed in the stretch%n",
                now.frames());
        System.out.printf("  old sigmas: %.1f %% inside the 95%% interval, median sigma %.2f m/s%n",
                100 * old.share(), old.medianSigma());
        System.out.printf("  new sigmas: %.1f %% inside the 95%% interval, median sigma %.2f m/s%n",
                100 * now.share(), now.medianSigma());
        System.out.printf("  median |error| %.2f m/s%n", now.medianAbsError());
        assertTrue(now.frames() > 500, now.frames() + " frames");
        assertTrue(now.share() >= old.share(), "the tracking's share never makes coverage worse");
    }
}
