package org.modetrail.app.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.modetrail.demo.DemoClips;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code modetrail make-demo DIR}: the demo clips and their ground truth, made anew by our own generator. */
@Command(name = "make-demo", mixinStandardHelpOptions = true,
        description = {"Writes the synthetic demo clips (arena and road) with exact ground truth into DIR.",
                "Needs FFmpeg's command-line tool for H.264 encoding (apt-get install ffmpeg)."})
public final class MakeDemoCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "DIR", description = "the folder to write into (made if missing)")
    Path dir;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        Files.createDirectories(dir);
        DemoClips.writeAll(dir);
        try (var files = Files.list(dir)) {
            for (Path p : files.sorted().toList()) {
                spec.commandLine().getOut().printf("%s  %,d bytes%n", p, Files.size(p));
            }
        }
        return ExitCodes.OK;
    }
}
