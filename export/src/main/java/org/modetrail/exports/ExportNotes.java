package org.modetrail.exports;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.modetrail.calibration.TrajectoryConfig;
import org.modetrail.format.TracksFormat;
import org.modetrail.format.csv.TracksCsv;
import org.modetrail.format.project.AtomicWrite;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.PointError;
import org.modetrail.model.Project;
import org.modetrail.summary.MeasurementCaution;

/**
 * The side file written beside every export, FILE.about.json: the software and version, the video, the units of
 * each column, the rule that turns frames into times, the ground calibration's reprojection error and warnings,
 * how speeds were smoothed and what their uncertainty covers, and the caution on using the figures. A side file
 * rather than comment lines, so the data file stays plain for every CSV and JSON reader.
 */
public final class ExportNotes {
    public static final String FRAME_TO_TIME = "frame is the 0-based index in presentation order; time_s is that "
            + "frame's presentation timestamp (pts times the stream's time base) minus the first frame's, in "
            + "seconds, so variable-frame-rate files get their real times";

    private ExportNotes() {
    }

    /** Where the notes of {@code export} go: the export's name with ".about.json" added. */
    public static Path fileFor(Path export) {
        return export.resolveSibling(export.getFileName() + ".about.json");
    }

    static void write(Path about, Path export, Project project, Path videoFile, TracksFormat format, String software,
                      boolean groundColumns, TrajectoryConfig trajectory) throws IOException {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = mapper.createObjectNode();
        root.put("file", export.getFileName().toString());
        root.put("format", format.commandName());
        root.put("software", software);
        root.put("video", videoFile.toAbsolutePath().normalize().toString());
        root.put("video_size_px", project.video().width() + "x" + project.video().height());
        root.put("video_frames", project.video().frameCount());
        root.put("frame_to_time", FRAME_TO_TIME);
        ObjectNode units = root.putObject("units");
        columnUnits(format, groundColumns).forEach(units::put);
        GroundCalibration c = project.site().calibration();
        if (c == null) {
            root.putNull("calibration");
        } else {
            ObjectNode cal = root.putObject("calibration");
            cal.put("points", c.points().size());
            cal.put("inliers", c.errors().stream().filter(PointError::inlier).count());
            cal.put("reprojection_rms_px", c.rmsPixels());
            cal.put("ground_rms_m", c.rmsMetres());
            ArrayNode warnings = cal.putArray("warnings");
            c.warnings().forEach(warnings::add);
        }
        if (groundColumns) {
            ObjectNode speed = root.putObject("speed");
            speed.put("method", "Savitzky-Golay polynomial of order " + trajectory.order() + " over "
                    + trajectory.windowS() + " s windows of consecutive frames, its first derivative");
            speed.put("uncertainty", "one standard uncertainty (about a 68% interval; speed ± 1.96 sigma is about "
                    + "95%): each box's own uncertainty (uncertainty_px: the keyframe's placement, the disagreement "
                    + "of the forward and backward tracking passes, a similarity below the usual, a jump of the box's "
                    + "size, and for interpolated boxes the distance from the nearest box the tracker saw) combined "
                    + "with the calibration's reprojection RMS, carried through the homography's Jacobian and the "
                    + "smoothing's derivative weights, plus the boxes' scatter about the smoothed path; errors are "
                    + "taken as independent between frames. A calibration error shared by neighbouring positions "
                    + "is not in it.");
            speed.put("contact_point", "each class's ground contact point on the box (bottom centre unless the "
                    + "project says otherwise); the box's bottom centre is not a fixed point of a long vehicle");
        }
        root.put("caution", MeasurementCaution.TEXT);
        byte[] bytes = mapper.writeValueAsBytes(root);
        AtomicWrite.replace(about, out -> out.write(bytes));
    }

    private static Map<String, String> columnUnits(TracksFormat format, boolean ground) {
        Map<String, String> u = new LinkedHashMap<>();
        switch (format) {
            case CSV -> {
                u.put("track_id", "track number, from 1");
                u.put("frame", "frame index, from 0");
                u.put("time_s", "seconds");
                u.put("x, y", "pixels, top-left corner of the box from the frame's top-left, y down");
                u.put("width, height", "pixels");
                u.put("source", "keyframe (set by a person), tracked, interpolated");
                u.put("score", "similarity 0 to 1 (Bhattacharyya coefficient of colour histograms); 1 for keyframes");
                u.put(TracksCsv.UNCERTAINTY_COLUMN, "pixels, one standard uncertainty per axis of the box's edges; "
                        + "empty where not known");
                if (ground) {
                    for (String col : TracksCsv.GROUND_COLUMNS.split(",")) {
                        u.put(col, switch (col) {
                            case "world_x_m", "world_y_m" -> "metres on the ground plane, in the frame of the "
                                    + "calibration points";
                            case "speed_m_s", "speed_sigma_m_s" -> "metres per second";
                            case "position_sigma_m" -> "metres, per axis";
                            default -> "degrees, 0 along +x of the ground frame, 90 along +y";
                        });
                    }
                }
            }
            case COCO -> {
                u.put("bbox", "[x, y, width, height] in pixels from the image's top-left corner");
                u.put("area", "square pixels");
                u.put("frame_index", "frame index, from 0");
                u.put("modetrail_time_s", "seconds");
            }
            case MOT -> {
                u.put("frame", "frame number, from 1 (MOTChallenge convention)");
                u.put("id", "track number, from 1");
                u.put("bb_left, bb_top, bb_width, bb_height", "pixels");
                u.put("conf", "similarity 0 to 1");
                u.put("x, y, z", "-1 (no 3D position)");
            }
        }
        return u;
    }
}
