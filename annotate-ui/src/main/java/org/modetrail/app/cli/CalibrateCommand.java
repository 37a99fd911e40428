package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.modetrail.calibration.HomographyFit;
import org.modetrail.format.csv.CalibrationPointsCsv;
import org.modetrail.format.csv.CsvFormatException;
import org.modetrail.model.ContactPoint;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.PointError;
import org.modetrail.model.Project;
import org.modetrail.summary.MeasurementCaution;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code modetrail calibrate PROJECT.json --points POINTS.csv}: fits the ground plane's homography to point pairs,
 * prints each point's reprojection error and stores the calibration in the project (saved atomically, the old
 * version kept as .bak).
 */
@Command(name = "calibrate", mixinStandardHelpOptions = true,
        description = {"Calibrates the ground plane from four or more image points with their ground coordinates "
                + "in metres (from a site plan or measured marks), prints each point's reprojection error, and "
                + "stores the calibration in the project.",
            "POINTS.csv has the header image_x,image_y,world_x_m,world_y_m: pixels from the frame's top-left "
                + "corner, metres in any fixed ground frame."})
public final class CalibrateCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "PROJECT.json", description = "the project to calibrate")
    Path projectFile;

    @Option(names = "--points", required = true, paramLabel = "POINTS.csv", description = "the point pairs")
    Path points;

    @Option(names = "--contact", paramLabel = "CLASS=FX,FY",
            description = "where objects of CLASS touch the ground, as fractions of their box's width and height "
                    + "from its top-left corner (default 0.5,1, the bottom centre; 0.5,0.5 for animals or particles "
                    + "seen from straight above); may be repeated")
    java.util.List<String> contacts = new java.util.ArrayList<>();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter out = spec.commandLine().getOut();
        Project project = ProjectOpening.read(projectFile, err);
        List<GroundPoint> pairs;
        try {
            pairs = CalibrationPointsCsv.read(points, project.video().width(), project.video().height());
        } catch (CsvFormatException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        GroundCalibration c;
        try {
            c = HomographyFit.fit(pairs);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(points + ": " + e.getMessage(), e);
        }
        out.println("point  image_x  image_y  world_x_m  world_y_m  error_px  error_m  used");
        for (int i = 0; i < pairs.size(); i++) {
            GroundPoint p = pairs.get(i);
            PointError e = c.errors().get(i);
            out.printf(Locale.ROOT, "%5d %8.2f %8.2f %10.3f %10.3f %9.3f %8.4f  %s%n", i + 1, p.image().x(),
                    p.image().y(), p.world().x(), p.world().y(), e.pixels(), e.metres(), e.inlier() ? "yes" : "no");
        }
        long inliers = c.errors().stream().filter(PointError::inlier).count();
        out.printf(Locale.ROOT, "rms error over %d of %d points: %.3f px, %.4f m%n", inliers, pairs.size(),
                c.rmsPixels(), c.rmsMetres());
        for (String w : c.warnings()) {
            out.println("warning: " + w);
        }
        Project calibrated = withContacts(project.withSite(project.site().withCalibration(c)), out);
        ProjectWriting.write(calibrated, projectFile);
        out.println("calibration stored in " + projectFile);
        out.println("Caution: " + MeasurementCaution.TEXT);
        return ExitCodes.OK;
    }

    /** The project with the --contact points set on their classes. */
    private Project withContacts(Project p, PrintWriter out) throws BadInputException {
        Project result = p;
        for (String spec : contacts) {
            int eq = spec.lastIndexOf('=');
            String[] xy = eq < 0 ? new String[0] : spec.substring(eq + 1).split(",");
            if (eq <= 0 || xy.length != 2) {
                throw new BadInputException("--contact " + spec + ": write it CLASS=FX,FY, like car=0.5,1");
            }
            String name = spec.substring(0, eq).strip();
            ObjectClass k = result.objectClass(name).orElse(null);
            if (k == null) {
                throw new BadInputException("--contact " + spec + ": the project has no class '" + name
                        + "'; its classes are " + result.classes().stream().map(ObjectClass::name).toList());
            }
            ContactPoint point;
            try {
                point = new ContactPoint(Double.parseDouble(xy[0].strip()), Double.parseDouble(xy[1].strip()));
            } catch (IllegalArgumentException e) {
                throw new BadInputException("--contact " + spec + ": " + e.getMessage(), e);
            }
            List<ObjectClass> classes = new java.util.ArrayList<>(result.classes());
            classes.set(classes.indexOf(k), k.withContact(point));
            result = new Project(result.video(), classes, result.tracks(), result.site());
            out.printf(Locale.ROOT, "class %s touches the ground at %.3f, %.3f of its box%n", name,
                    point.alongWidth(), point.alongHeight());
        }
        return result;
    }
}
