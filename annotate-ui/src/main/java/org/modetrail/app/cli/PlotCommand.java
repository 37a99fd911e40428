package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.IntToDoubleFunction;

import org.modetrail.model.Project;
import org.modetrail.picture.ColourBy;
import org.modetrail.picture.PlotFormat;
import org.modetrail.picture.ProjectPlots;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code modetrail plot PROJECT.json --out DIR [--format png|svg|both] [--colour class|track]}. */
@Command(name = "plot", mixinStandardHelpOptions = true,
        description = {"Draws each track's path on the image (pixels, y down) and, when the ground is calibrated, "
                + "its path on the ground (metres) and its speed over time with one standard uncertainty: "
                + "trajectory-image, trajectory-ground and speed, as PNG and SVG files in DIR."})
public final class PlotCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "PROJECT.json", description = "the project to plot")
    Path projectFile;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "the folder for the pictures")
    Path out;

    @Option(names = "--format", defaultValue = "both", paramLabel = "png|svg|both",
            description = "picture format; default ${DEFAULT-VALUE}")
    String format;

    @Option(names = "--colour", defaultValue = "class", paramLabel = "class|track",
            description = "colour by class, or one colour per track; default ${DEFAULT-VALUE}")
    String colour;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter stdout = spec.commandLine().getOut();
        List<PlotFormat> formats = switch (format.toLowerCase(java.util.Locale.ROOT)) {
            case "png" -> List.of(PlotFormat.PNG);
            case "svg" -> List.of(PlotFormat.SVG);
            case "both" -> List.of(PlotFormat.PNG, PlotFormat.SVG);
            default -> throw new BadInputException("--format is png, svg or both, not '" + format + "'");
        };
        ColourBy by = switch (colour.toLowerCase(java.util.Locale.ROOT)) {
            case "class" -> ColourBy.CLASS;
            case "track" -> ColourBy.TRACK;
            default -> throw new BadInputException("--colour is class or track, not '" + colour + "'");
        };
        Project project = ProjectOpening.read(projectFile, err);
        IntToDoubleFunction time;
        try (VideoSource video = ProjectOpening.openVideo(project, projectFile)) {
            double[] t = ProjectOpening.frameTimes(video);
            time = n -> t[n];
        }
        String name = projectFile.getFileName().toString().replaceFirst("\\.json$", "");
        List<Path> written = ProjectPlots.all(project, formats, by).write(project, time, name, out, "");
        for (Path p : written) {
            stdout.println("wrote " + p);
        }
        if (project.site().calibration() == null) {
            stdout.println("(no ground calibration: image paths only; run `modetrail calibrate` for ground paths "
                    + "and speeds)");
        }
        return ExitCodes.OK;
    }
}
