package org.modetrail.demo;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.List;

/**
 * The road camera's calibration reference as one CSV table. Each row is a {@code camera} parameter
 * ({@code name,value}), a {@code homography} entry ({@code h11..h33}, ground to image, {@code h33 = 1}), or a
 * ground {@code point} ({@code name,u_px,v_px,x_m,y_m}); unused cells are empty.
 */
public final class CalibrationCsv {

    public static final String HEADER = "record,name,value,u_px,v_px,x_m,y_m";

    private CalibrationCsv() {
    }

    public static void write(Path target, RoadCamera camera, List<CalibrationPoint> points) throws IOException {
        AtomicFiles.writeText(target, out -> write(out, camera, points));
    }

    static void write(Writer out, RoadCamera camera, List<CalibrationPoint> points) throws IOException {
        out.write(HEADER + "\n");
        parameter(out, "width_px", camera.widthPx());
        parameter(out, "height_px", camera.heightPx());
        parameter(out, "focal_px", camera.focalPx());
        parameter(out, "principal_u_px", camera.principalU());
        parameter(out, "principal_v_px", camera.principalV());
        parameter(out, "position_x_m", camera.xM());
        parameter(out, "position_y_m", camera.yM());
        parameter(out, "height_m", camera.heightM());
        parameter(out, "tilt_deg", camera.tiltDeg());
        parameter(out, "pan_deg", camera.panDeg());
        double[] h = camera.homography();
        for (int k = 0; k < 9; k++) {
            out.write("homography,h" + (k / 3 + 1) + (k % 3 + 1) + "," + TruthCsv.number(h[k], 12) + ",,,,\n");
        }
        for (CalibrationPoint p : points) {
            out.write("point," + p.name() + ",," + TruthCsv.number(p.uPx(), 6) + "," + TruthCsv.number(p.vPx(), 6)
                    + "," + TruthCsv.number(p.xM(), 6) + "," + TruthCsv.number(p.yM(), 6) + "\n");
        }
    }

    private static void parameter(Writer out, String name, double value) throws IOException {
        out.write("camera," + name + "," + TruthCsv.number(value, 9) + ",,,,\n");
    }
}
