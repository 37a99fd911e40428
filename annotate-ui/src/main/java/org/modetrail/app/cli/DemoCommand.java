package org.modetrail.app.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.modetrail.app.editor.EditorLauncher;

import picocli.CommandLine.Command;

/** {@code modetrail demo}: the editor on the bundled demo clip. */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Opens the editor on the bundled demo clip (clips/arena.mp4, a synthetic arena).")
public final class DemoCommand implements Callable<Integer> {

    @Override
    public Integer call() throws Exception {
        Path clip = demoClip();
        EditorLauncher.open(clip);
        EditorLauncher.awaitClose();
        return ExitCodes.OK;
    }

    /** The bundled demo clip, found from the installation folder the launcher names, or from the working folder. */
    public static Path demoClip() throws BadInputException {
        String home = System.getProperty("modetrail.home", ".");
        Path clip = Path.of(home, "clips", "arena.mp4");
        if (!Files.isRegularFile(clip)) {
            throw new BadInputException(clip + ": the demo clip is missing; run ./modetrail from the project folder "
                    + "or regenerate the clips with ./modetrail make-demo clips");
        }
        return clip;
    }
}
