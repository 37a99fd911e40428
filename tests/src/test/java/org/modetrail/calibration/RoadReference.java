package org.modetrail.calibration;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The committed road clip's reference files, read for the tests: clips/road-calibration.csv (its {@code point} rows:
 * ground points and their image positions from the generator's exact camera) and clips/road-truth.csv (one row per
 * road user per frame: box, ground position of the footprint centre, speed). Both are written by the project's
 * generator, org.modetrail.demo (see clips/README.md).
 */
final class RoadReference {
    /** One {@code point} row: image (u, v) px, ground (x, y) m. */
    record Point(String name, double u, double v, double x, double y) {
    }

    /** One truth row. */
    record Truth(int track, String cls, int frame, double timeS, double x, double y, double width, double height,
                 double visible, double worldX, double worldY, double speed) {
    }

    private RoadReference() {
    }

    static Path clips() {
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isRegularFile(p.resolve("clips").resolve("road-truth.csv"))) {
                return p.resolve("clips");
            }
        }
        throw new IllegalStateException("clips/road-truth.csv not found above " + Path.of("").toAbsolutePath());
    }

    static List<Point> points() throws IOException {
        List<Point> out = new ArrayList<>();
        for (String line : Files.readAllLines(clips().resolve("road-calibration.csv"))) {
            String[] f = line.split(",", -1);
            if (f[0].equals("point")) {
                out.add(new Point(f[1], Double.parseDouble(f[3]), Double.parseDouble(f[4]), Double.parseDouble(f[5]),
                        Double.parseDouble(f[6])));
            }
        }
        return out;
    }

    /** The generator's ground-to-image homography, row-major, h33 = 1. */
    static double[] homography() throws IOException {
        double[] h = new double[9];
        for (String line : Files.readAllLines(clips().resolve("road-calibration.csv"))) {
            String[] f = line.split(",", -1);
            if (f[0].equals("homography")) {
                int k = 3 * (f[1].charAt(1) - '1') + (f[1].charAt(2) - '1');
                h[k] = Double.parseDouble(f[2]);
            }
        }
        return h;
    }

    static List<Truth> truth() throws IOException {
        List<Truth> out = new ArrayList<>();
        List<String> lines = Files.readAllLines(clips().resolve("road-truth.csv"));
        if (!lines.get(0).equals("track_id,class,frame,time_s,x,y,width,height,visible,world_x_m,world_y_m,speed_m_s")) {
            throw new IllegalStateException("unexpected header " + lines.get(0));
        }
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",", -1);
            out.add(new Truth(Integer.parseInt(f[0]), f[1], Integer.parseInt(f[2]), Double.parseDouble(f[3]),
                    Double.parseDouble(f[4]), Double.parseDouble(f[5]), Double.parseDouble(f[6]),
                    Double.parseDouble(f[7]), Double.parseDouble(f[8]), Double.parseDouble(f[9]),
                    Double.parseDouble(f[10]), Double.parseDouble(f[11])));
        }
        return out;
    }
}
