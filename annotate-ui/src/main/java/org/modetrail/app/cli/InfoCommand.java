package org.modetrail.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code modetrail info VIDEO}: what the video is, counted from its frame index rather than its header. */
@Command(name = "info", mixinStandardHelpOptions = true,
        description = {"Prints a video's size, frame count, duration, frame rate, keyframes and codec.",
                "Counts come from a scan of the file's packets, not from its header; the scan is cached, so the "
                        + "second call on a file is immediate."})
public final class InfoCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "VIDEO", description = "a video file, or a folder of numbered images")
    Path video;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        try (VideoSource source = VideoSource.open(video)) {
            print(source.info(), spec.commandLine().getOut());
        }
        return ExitCodes.OK;
    }

    static void print(VideoInfo info, PrintWriter out) {
        out.printf(Locale.ROOT, "width: %d%n", info.width());
        out.printf(Locale.ROOT, "height: %d%n", info.height());
        out.printf(Locale.ROOT, "frames: %d%n", info.frameCount());
        out.printf(Locale.ROOT, "duration_s: %.6f%n", info.durationSeconds());
        out.printf(Locale.ROOT, "mean_fps: %.6f%n", info.meanFrameRate());
        out.printf(Locale.ROOT, "variable_frame_rate: %s%n", info.variableFrameRate() ? "yes" : "no");
        out.printf(Locale.ROOT, "keyframes: %d%n", info.keyframeCount());
        out.printf(Locale.ROOT, "codec: %s%n", info.codec());
        out.printf(Locale.ROOT, "container: %s%n", info.container());
        out.flush();
    }
}
