package org.modetrail.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.modetrail.app.bench.BenchReport;
import org.modetrail.app.bench.BenchRun;
import org.modetrail.app.bench.BenchSettings;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code modetrail bench}: speed of the video layer against bare JavaCV and the ffmpeg tool, all measured in one
 * run so that the ratios hold on any machine. Missed targets are reported, not failed: the exit code says whether
 * the bench ran.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = {"Measures sequential decoding, opening (index build and cached reopen) and random access "
                + "of the video layer, each against a reference measured in the same run, and prints a table of "
                + "figures, ratios and targets.",
                "Without --clip it generates a synthetic 1080p H.264 clip with ffmpeg in a temp folder."},
        footer = {"", "Exit codes: 0 ran (missed targets are in the table), 1 failed, 2 bad input."})
public final class BenchCommand implements Callable<Integer> {
    @Option(names = "--frames", paramLabel = "N", description = "frames of the generated clip (default: ${DEFAULT-VALUE})")
    int frames = BenchSettings.DEFAULT_FRAMES;

    @Option(names = "--gop", paramLabel = "N", description = "keyframe interval of the generated clip (default: ${DEFAULT-VALUE})")
    int gop = BenchSettings.DEFAULT_GOP;

    @Option(names = "--clip", paramLabel = "FILE", description = "measure this video instead of generating one")
    Path clip;

    @Option(names = "--repeats", paramLabel = "N",
            description = "passes of each sequential and opening measurement (default: ${DEFAULT-VALUE})")
    int repeats = BenchSettings.DEFAULT_REPEATS;

    @Option(names = "--samples", paramLabel = "N",
            description = "random frames for the random-access measurement (default: ${DEFAULT-VALUE})")
    int samples = BenchSettings.DEFAULT_SAMPLES;

    @Option(names = "--threads", paramLabel = "N",
            description = "decoder threads for every decoder measured, 0 for automatic (default: ${DEFAULT-VALUE})")
    int threads = 0;

    @Option(names = "--seed", paramLabel = "N", description = "seed of the random frames (default: ${DEFAULT-VALUE})")
    long seed = BenchSettings.DEFAULT_SEED;

    @Option(names = "--work", paramLabel = "DIR",
            description = "folder for the clip and index cache (default: a temp folder)")
    Path work;

    @Option(names = "--keep", description = "keep the generated clip and index cache afterwards")
    boolean keep;

    @Option(names = "--json", paramLabel = "FILE", description = "also write the figures to this file as JSON")
    Path json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        BenchSettings settings = settings();
        if (json != null) {
            Path dir = json.toAbsolutePath().getParent();
            if (dir == null || !Files.isDirectory(dir)) {
                throw new BadInputException(json + ": the folder does not exist; create it or choose another --json");
            }
        }
        BenchReport report;
        try {
            report = new BenchRun(settings, spec.commandLine().getErr()).run();
        } catch (BenchRun.BadBenchInput e) {
            throw new BadInputException(e.getMessage(), e);
        }
        PrintWriter out = spec.commandLine().getOut();
        report.print(out);
        if (json != null) {
            writeJson(report);
            out.println("Figures written to " + json);
            out.flush();
        }
        return ExitCodes.OK;
    }

    private BenchSettings settings() throws BadInputException {
        try {
            return new BenchSettings(frames, gop, clip, repeats, samples, threads, seed, work, keep, json);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

    private void writeJson(BenchReport report) throws IOException {
        Path tmp = Files.createTempFile(json.toAbsolutePath().getParent(), ".bench", ".json.tmp");
        try {
            Files.writeString(tmp, report.toJson());
            Files.move(tmp, json, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                    java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
