package org.modetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.app.Main;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Homography;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;
import org.modetrail.model.WorldPoint;

import picocli.CommandLine;

/**
 * The calibrate and summary commands end to end on the bundled road clip (the project's own generator: a pinhole
 * camera of known pose over a flat road, road users at known speeds, clips/README.md). The project holds the
 * generator's true boxes of two road users at constant speed, so what is measured is the calibration and the
 * speed estimate, not the tracker.
 */
class CalibrateAndSummaryCommandTest {
    private static final Path TRUTH = RoadFixture.TRUTH;
    private static final Path CALIBRATION = RoadFixture.CALIBRATION;

    @TempDir
    Path dir;
    Path projectFile;
    Path points;

    @BeforeEach
    void makeProjectAndPoints() throws Exception {
        projectFile = RoadFixture.truthProject(dir, 1, 3);
        points = RoadFixture.points(dir);
    }

    @Test
    void calibrationStoresTheFitAndTheSummaryGivesTheSpeedsOfTheRoadUsers() throws Exception {
        RoadFixture.Run c = RoadFixture.run("calibrate", projectFile.toString(), "--points", points.toString());
        assertEquals(0, c.code(), c.err());
        // The points are exact projections (clips/README.md), so the fit reproduces them to rounding.
        assertTrue(c.out().contains("rms error over 30 of 30 points"), c.out());
        assertTrue(c.out().contains("Caution:"), c.out());
        Project calibrated = ProjectFile.read(projectFile);
        assertTrue(calibrated.site().calibration().rmsPixels() < 0.01, "rms " + calibrated.site().calibration());
        assertTrue(Files.exists(ProjectFile.backupFile(projectFile)), "the uncalibrated version is kept as .bak");

        Path out = dir.resolve("summary.csv");
        RoadFixture.Run s = RoadFixture.run("summary", projectFile.toString(), "--out", out.toString());
        assertEquals(0, s.code(), s.err());
        assertTrue(s.out().contains("Caution:"), s.out());
        List<String> rows = Files.readAllLines(out);
        assertTrue(rows.get(0).startsWith("track_id,class,first_frame,last_frame,boxed_frames,duration_s,path_px,"
                + "path_m,mean_speed_m_s,peak_speed_m_s"), rows.get(0));
        // Two references. (1) The generator's own camera: the true boxes' bottom centres mapped through the
        // ground-to-image homography listed in road-calibration.csv (the exact camera model, not our fit), their
        // displacement over the elapsed time; the summary must agree within 2%. (2) The generator's nominal speeds
        // (clips/README.md: car 13.9 m/s, truck 11 m/s, both constant): within 10%, because the bottom centre of a
        // box is not a fixed point of the body; for the 9.5 m truck it slides from the front of the footprint
        // towards its middle as the view steepens (the 10% is a rule of thumb for this test, no source).
        double[] expected = contactSpeeds();
        double car = Double.parseDouble(rows.get(1).split(",")[8]);
        double truck = Double.parseDouble(rows.get(2).split(",")[8]);
        assertEquals(expected[0], car, 0.02 * expected[0], rows.get(1));
        assertEquals(expected[1], truck, 0.02 * expected[1], rows.get(2));
        assertEquals(13.9, car, 0.10 * 13.9, rows.get(1));
        assertEquals(11.0, truck, 0.10 * 11.0, rows.get(2));
    }

    @Test
    void zonesAndCountingLinesFromAFileGiveTimesAndCrossingsWithDirection() throws Exception {
        assertEquals(0, RoadFixture.run("calibrate", projectFile.toString(), "--points", points.toString()).code());
        // Drawn where the generator's camera sees the ground (clips/README.md): a counting line across the road at
        // y = 30 m and the zebra crossing, y 45 to 48 m, as a zone.
        Homography groundToImage = new Homography(generatorHomography());
        PixelPoint a = toImage(groundToImage, -1, 30);
        PixelPoint b = toImage(groundToImage, 15, 30);
        String zones = "{\"zones\": [{\"name\": \"zebra\", \"polygon\": [" + pair(toImage(groundToImage, 0, 45))
                + ", " + pair(toImage(groundToImage, 14, 45)) + ", " + pair(toImage(groundToImage, 14, 48)) + ", "
                + pair(toImage(groundToImage, 0, 48)) + "]}],\n \"lines\": [{\"name\": \"y30\", \"from\": "
                + pair(a) + ", \"to\": " + pair(b) + "}]}";
        Path zonesFile = Files.writeString(dir.resolve("zones.json"), zones);
        Path out = dir.resolve("summary.csv");
        RoadFixture.Run s = RoadFixture.run("summary", projectFile.toString(), "--zones", zonesFile.toString(),
                "--out", out.toString());
        assertEquals(0, s.code(), s.err());
        List<String> rows = Files.readAllLines(out);
        assertTrue(rows.get(0).endsWith(",zone:zebra:s,line:y30:left_to_right,line:y30:right_to_left"), rows.get(0));
        String[] car = rows.get(1).split(",");
        String[] truck = rows.get(2).split(",");
        // Car 1 drives away (+y) and the truck towards the camera: one crossing each, in opposite directions.
        assertEquals(1, Integer.parseInt(car[13]) + Integer.parseInt(car[14]), rows.get(1));
        assertEquals(1, Integer.parseInt(truck[13]) + Integer.parseInt(truck[14]), rows.get(2));
        assertEquals(car[13], truck[14], "opposite directions");
        // 3 m of crossing at 13.9 m/s is 0.22 s, 5.5 frames; within 3 frames either way for the sliding contact.
        assertEquals(0.22, Double.parseDouble(car[12]), 0.12, rows.get(1));
        Path broken = Files.writeString(dir.resolve("broken.json"), zones.replace("\"to\"", "\"towards\""));
        RoadFixture.Run bad = RoadFixture.run("summary", projectFile.toString(), "--zones", broken.toString());
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("broken.json") && bad.err().contains("line 2"), bad.err());
    }

    private static PixelPoint toImage(Homography groundToImage, double x, double y) {
        WorldPoint p = groundToImage.toWorld(new PixelPoint(x, y));
        return new PixelPoint(p.x(), p.y());
    }

    private static String pair(PixelPoint p) {
        return "[" + p.x() + ", " + p.y() + "]";
    }

    private static double[] generatorHomography() throws Exception {
        double[] h = new double[9];
        for (String line : Files.readAllLines(CALIBRATION)) {
            String[] f = line.split(",", -1);
            if (f[0].equals("homography")) {
                h[3 * (f[1].charAt(1) - '1') + (f[1].charAt(2) - '1')] = Double.parseDouble(f[2]);
            }
        }
        return h;
    }

    /** Displacement over time of the bottom centres of the true boxes of car 1 and truck 3, in the exact camera. */
    private static double[] contactSpeeds() throws Exception {
        Homography imageToGround = new Homography(generatorHomography()).inverse();
        double[] speed = new double[2];
        int k = 0;
        for (int id : new int[] {1, 3}) {
            WorldPoint first = null;
            WorldPoint last = null;
            double t0 = 0;
            double t1 = 0;
            List<String> lines = Files.readAllLines(TRUTH);
            for (String line : lines.subList(1, lines.size())) {
                String[] f = line.split(",");
                if (Integer.parseInt(f[0]) != id || Double.parseDouble(f[8]) < 1) {
                    continue;
                }
                double x = Double.parseDouble(f[4]) + Double.parseDouble(f[6]) / 2;
                double y = Double.parseDouble(f[5]) + Double.parseDouble(f[7]);
                WorldPoint w = imageToGround.toWorld(new PixelPoint(x, y));
                if (first == null) {
                    first = w;
                    t0 = Double.parseDouble(f[3]);
                }
                last = w;
                t1 = Double.parseDouble(f[3]);
            }
            speed[k++] = first.distance(last) / (t1 - t0);
        }
        return speed;
    }

    @Test
    void badPointsAreBadInputAndLeaveTheProjectAlone() throws Exception {
        byte[] before = Files.readAllBytes(projectFile);
        Path three = Files.writeString(dir.resolve("three.csv"),
                "image_x,image_y,world_x_m,world_y_m\n1,1,0,0\n100,1,1,0\n100,100,1,1\n");
        RoadFixture.Run r = RoadFixture.run("calibrate", projectFile.toString(), "--points", three.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("three.csv") && r.err().contains("at least 4"), r.err());
        Path malformed = Files.writeString(dir.resolve("bad.csv"),
                "image_x,image_y,world_x_m,world_y_m\n1,1,0,0\n100,1,one,0\n");
        RoadFixture.Run m = RoadFixture.run("calibrate", projectFile.toString(), "--points", malformed.toString());
        assertEquals(2, m.code(), m.err());
        assertTrue(m.err().contains("bad.csv") && m.err().contains("line 3"), m.err());
        assertEquals(new String(before), Files.readString(projectFile), "the project is unchanged");
        RoadFixture.Run missing = RoadFixture.run("summary", dir.resolve("none.json").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("none.json"), missing.err());
    }
}
