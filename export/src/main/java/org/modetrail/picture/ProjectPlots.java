package org.modetrail.picture;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;

import org.modetrail.calibration.GroundSample;
import org.modetrail.calibration.TrajectoryConfig;
import org.modetrail.model.Project;
import org.modetrail.summary.GroundPaths;

/**
 * A project's set of plots, as the {@code plot} command and the editor's export screen write them: the paths on the
 * image always, and, when the ground is calibrated, the paths on the ground and the speed over time. The files are
 * named {@code PREFIX + trajectory-image}, {@code trajectory-ground} and {@code speed}, with the format's extension,
 * so the names are known before anything is written.
 *
 * @param formats one or more picture formats, each plot written once in each
 * @param colour  where each track's colour comes from
 * @param ground  whether to draw the ground paths and the speed; needs a calibrated project
 */
public record ProjectPlots(List<PlotFormat> formats, ColourBy colour, boolean ground) {
    public static final String IMAGE = "trajectory-image";
    public static final String GROUND = "trajectory-ground";
    public static final String SPEED = "speed";

    public ProjectPlots {
        formats = List.copyOf(formats);
        if (formats.isEmpty() || formats.stream().distinct().count() != formats.size()) {
            throw new IllegalArgumentException("plots need one or more different picture formats, got " + formats);
        }
        if (colour == null) {
            throw new IllegalArgumentException("plots need a colour rule (by class or by track)");
        }
    }

    /** The plots the {@code plot} command draws for {@code project}: the ground ones whenever it is calibrated. */
    public static ProjectPlots all(Project project, List<PlotFormat> formats, ColourBy colour) {
        return new ProjectPlots(formats, colour, project.site().calibration() != null);
    }

    /** The files {@link #write} makes in {@code folder}, in the order it writes them. */
    public List<Path> files(Path folder, String prefix) {
        List<Path> out = new ArrayList<>();
        for (PlotFormat f : formats) {
            String ext = "." + f.extension();
            out.add(folder.resolve(prefix + IMAGE + ext));
            if (ground) {
                out.add(folder.resolve(prefix + GROUND + ext));
                out.add(folder.resolve(prefix + SPEED + ext));
            }
        }
        return out;
    }

    /**
     * Writes the plots into {@code folder} (made when missing), each file replaced atomically.
     *
     * @param frameTime the time of each frame in seconds
     * @param name      what the titles call the project
     * @return the files written, as {@link #files} names them
     * @throws IllegalArgumentException when the ground plots are asked for and the project has no calibration
     */
    public List<Path> write(Project project, IntToDoubleFunction frameTime, String name, Path folder, String prefix)
            throws IOException {
        if (ground && project.site().calibration() == null) {
            throw new IllegalArgumentException("ground paths and speeds need a ground calibration");
        }
        Files.createDirectories(folder);
        Map<Integer, List<GroundSample>> samples = ground
                ? GroundPaths.samples(project, frameTime, TrajectoryConfig.defaults()) : Map.of();
        List<Path> files = files(folder, prefix);
        int i = 0;
        for (PlotFormat f : formats) {
            Plots.writeImageTrajectory(ProjectSeries.imagePlane(project, frameTime, TrajectoryPoint.CONTACT, colour),
                    project.video().width(), project.video().height(),
                    PlotOptions.defaults().withTitle(name + ": paths on the image"), f, files.get(i++));
            if (ground) {
                Plots.writeGroundTrajectory(ProjectSeries.groundPlane(project, samples, colour),
                        PlotOptions.defaults().withTitle(name + ": paths on the ground"), f, files.get(i++));
                Plots.writeSpeed(ProjectSeries.speeds(project, samples, colour),
                        PlotOptions.defaults().withTitle(name + ": speed (band: one standard uncertainty)"), f,
                        files.get(i++));
            }
        }
        return files;
    }
}
