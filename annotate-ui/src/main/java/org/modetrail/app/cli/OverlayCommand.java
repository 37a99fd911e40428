package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.modetrail.model.Project;
import org.modetrail.overlay.OverlayEncoding;
import org.modetrail.overlay.OverlayResult;
import org.modetrail.overlay.OverlayStyle;
import org.modetrail.overlay.OverlayVideo;
import org.modetrail.run.RunProgress;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code modetrail overlay PROJECT.json --out FILE.mp4 [--from N] [--to N] [--trail FRAMES]}. */
@Command(name = "overlay", mixinStandardHelpOptions = true,
        description = {"Writes the project's video with every box drawn over it (keyframes thick, tracked boxes "
                + "plain, interpolated boxes dashed), each track's id and class, and a fading trail of where it "
                + "touched the ground, as MP4 (H.264 where the bundled FFmpeg has it, MPEG-4 otherwise). The file "
                + "appears only once complete."})
public final class OverlayCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "PROJECT.json", description = "the project to draw")
    Path projectFile;

    @Option(names = "--out", required = true, paramLabel = "FILE.mp4", description = "the video to write")
    Path out;

    @Option(names = "--from", defaultValue = "0", paramLabel = "N", description = "first frame; default 0")
    int from;

    @Option(names = "--to", defaultValue = "-1", paramLabel = "N",
            description = "last frame (inclusive); default the video's last")
    int to;

    @Option(names = "--trail", defaultValue = "25", paramLabel = "FRAMES",
            description = "frames of trail behind each object; default ${DEFAULT-VALUE}")
    int trail;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        Project project = ProjectOpening.read(projectFile, err);
        int last = to < 0 ? project.video().frameCount() - 1 : to;
        if (from < 0 || last >= project.video().frameCount() || from > last) {
            throw new BadInputException("--from " + from + " --to " + last + ": the video has frames 0 to "
                    + (project.video().frameCount() - 1));
        }
        OverlayStyle style;
        try {
            style = OverlayStyle.forFrameHeight(project.video().height()).withTrailLength(trail);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--trail: " + e.getMessage(), e);
        }
        try (VideoSource video = ProjectOpening.openVideo(project, projectFile)) {
            RunProgress progress = ProgressLine.forTerminal(err, "overlay");
            OverlayResult r;
            try {
                r = OverlayVideo.write(video, project, out, style, OverlayEncoding.defaults(), from, last + 1,
                        (done, total) -> progress.frames(done, total), () -> false);
            } finally {
                ProgressLine.finish(progress, err);
            }
            spec.commandLine().getOut().printf(Locale.ROOT, "%d frames (%d to %d) written to %s: %s, %dx%d, %.3f "
                    + "frames/s, %.1f MB%s%n", r.framesWritten(), from, last, r.file(), r.encoder(), r.width(),
                    r.height(), r.frameRate(), r.bytes() / 1e6, r.repeatedFrames() > 0 ? ", " + r.repeatedFrames()
                    + " unreadable frames shown as the one before" : "");
        }
        return ExitCodes.OK;
    }
}
