package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.modetrail.app.Version;
import org.modetrail.exports.ProjectExport;
import org.modetrail.format.ExportCancelledException;
import org.modetrail.format.TracksFormat;
import org.modetrail.model.Project;
import org.modetrail.run.RunProgress;
import org.modetrail.summary.MeasurementCaution;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code modetrail export PROJECT.json --format csv|coco|mot --out FILE [--frames DIR]}. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = {"Writes a project's tracks as CSV (the track command's columns, plus ground position, speed "
                + "and their uncertainties when the ground is calibrated), COCO-style JSON or MOTChallenge text, "
                + "with FILE.about.json beside it (units, the frame-to-time rule, software version, the "
                + "calibration's error)."})
public final class ExportCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "PROJECT.json", description = "the project to export")
    Path projectFile;

    @Option(names = "--format", required = true, paramLabel = "csv|coco|mot", description = "the file format")
    String format;

    @Option(names = "--out", required = true, paramLabel = "FILE", description = "where to write it")
    Path out;

    @Option(names = "--frames", paramLabel = "DIR",
            description = "COCO only: also write each annotated frame as a PNG file into DIR")
    Path frames;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter stdout = spec.commandLine().getOut();
        TracksFormat f;
        try {
            f = TracksFormat.named(format);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--format: " + e.getMessage(), e);
        }
        if (frames != null && f != TracksFormat.COCO) {
            throw new BadInputException("--frames goes with --format coco only (image files for image-only tools)");
        }
        Project project = ProjectOpening.read(projectFile, err);
        try (VideoSource video = ProjectOpening.openVideo(project, projectFile)) {
            RunProgress progress = ProgressLine.forTerminal(err, "frames");
            ProjectExport.Result r;
            try {
                r = ProjectExport.write(project, video, f, out, frames, "Modetrail " + Version.text(),
                        (done, total) -> {
                            progress.frames(done, total);
                            return true;
                        });
            } catch (ExportCancelledException e) {
                throw new BadInputException(e.getMessage(), e);
            } finally {
                ProgressLine.finish(progress, err);
            }
            stdout.println(f.commandName() + " written to " + r.file() + ", notes in " + r.notes());
            if (r.coco() != null) {
                stdout.println(r.coco().images() + " images, " + r.coco().annotations() + " annotations"
                        + (r.coco().clippedBoxes() > 0 ? ", " + r.coco().clippedBoxes() + " boxes clipped to the frame"
                        : "") + (r.coco().droppedBoxes() > 0 ? ", " + r.coco().droppedBoxes()
                        + " boxes wholly outside the frame left out" : "")
                        + (r.coco().imageFiles() > 0 ? ", " + r.coco().imageFiles() + " frame images in " + frames
                        : ""));
            }
            if (r.groundColumns()) {
                stdout.println("Caution: " + MeasurementCaution.TEXT);
            }
        }
        return ExitCodes.OK;
    }
}
