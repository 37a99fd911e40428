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
import org.modetrail.summary.GroundPaths;
import org.modetrail.summary.TrackSummaries;
import org.modetrail.summary.TrackSummary;
import org.modetrail.model.BoxSource;
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

    /** Per counted frame: |error|, stated sigma, and whether the frame may stand as a peak (TrackSummaries). */
    record Frame(int track, double error, double sigma, boolean peakWorthy) {
    }

    static List<Frame> frames(Project p) {
        List<Frame> out = new ArrayList<>();
        for (Track t : p.tracks()) {
            TreeMap<Integer, double[]> truthOf = truth.get(t.id());
            for (GroundSample s : GroundTrajectory.of(p, t, GroundTrajectory.constantRate(25),
                    TrajectoryConfig.defaults())) {
                double[] tr = truthOf.get(s.frame());
                if (!s.hasSpeed() || tr == null || tr[0] < NEAR_Y_M || tr[0] > FAR_Y_M) {
                    continue;
                }
                boolean interpolated = t.frames().get(s.frame()).source() == BoxSource.INTERPOLATED;
                out.add(new Frame(t.id(), Math.abs(s.speedMs() - tr[1]), s.speedSigmaMs(), !interpolated
                        && !(s.speedSigmaMs() > TrackSummaries.PEAK_MAX_RELATIVE_SIGMA * s.speedMs())));
            }
        }
        return out;
    }

    static Coverage coverage(List<Frame> frames) {
        int inside = 0;
        List<Double> sigmas = new ArrayList<>();
        List<Double> errors = new ArrayList<>();
        for (Frame f : frames) {
            if (f.error() <= K95 * f.sigma()) {
                inside++;
            }
            sigmas.add(f.sigma());
            errors.add(f.error());
        }
        return new Coverage(frames.size(), (double) inside / frames.size(), median(sigmas), median(errors));
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
    void statedIntervalsContainTheTrueSpeed() {
        List<Frame> now = frames(tracked);
        Coverage all = coverage(now);
        Coverage old = coverage(frames(withoutTrackingUncertainty(tracked)));
        Coverage trusted = coverage(now.stream().filter(Frame::peakWorthy).toList());
        System.out.printf("road, tracked from one keyframe per road user: %d frames with a speed in the stretch,"
                + " median |error| %.2f m/s%n", all.frames(), all.medianAbsError());
        System.out.printf("  old sigmas: %.1f %% inside the 95%% interval, median sigma %.2f m/s%n",
                100 * old.share(), old.medianSigma());
        System.out.printf("  new sigmas: %.1f %% inside the 95%% interval, median sigma %.2f m/s%n",
                100 * all.share(), all.medianSigma());
        System.out.printf("  frames a peak may use (%d): %.1f %% inside, median sigma %.2f m/s, median |error| %.2f"
                + " m/s%n", trusted.frames(), 100 * trusted.share(), trusted.medianSigma(), trusted.medianAbsError());
        for (Track t : tracked.tracks()) {
            List<Frame> mine = now.stream().filter(f -> f.track() == t.id()).toList();
            if (!mine.isEmpty()) {
                Coverage c = coverage(mine);
                System.out.printf("  track %d %s: %d frames, %.1f %% inside, median sigma %.2f m/s, median |error|"
                        + " %.2f m/s%n", t.id(), t.className(), c.frames(), 100 * c.share(), c.medianSigma(),
                        c.medianAbsError());
            }
        }
        double[] times = new double[tracked.video().frameCount()];
        for (int i = 0; i < times.length; i++) {
            times[i] = i / 25.0;
        }
        for (TrackSummary s : TrackSummaries.of(tracked, times, GroundPaths.of(tracked, times))) {
            double trueTop = truth.get(s.trackId()).values().stream().mapToDouble(v -> v[1]).max().orElse(Double.NaN);
            System.out.printf("  track %d: peak %.2f ± %.2f m/s (%d frames left out), true top speed %.2f m/s%n",
                    s.trackId(), s.peakSpeedMs(), s.peakSpeedSigmaMs(), s.peakLeftOut(), trueTop);
        }
        assertTrue(all.frames() > 500, all.frames() + " frames");
        // Measured 91.8 % (old sigmas 28.6 %) with a median sigma of 3.54 m/s on speeds of 6 to 17 m/s: the tracker
        // is far off on this clip (median error 1.65 m/s, several m/s on the vehicles whose boxes keep their size
        // as they recede), and the intervals say so. The target of issue 12 is 90 %.
        assertTrue(all.share() >= 0.90, "coverage " + all.share());
        assertTrue(old.share() < 0.5, "the old sigmas were far too small: " + old.share());
        // Not by making every interval huge: half the frames are stated to within 4 m/s.
        assertTrue(all.medianSigma() < 4, "median sigma " + all.medianSigma());
    }
}
