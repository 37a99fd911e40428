package org.modetrail.app.cli;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.Callable;

import javax.imageio.ImageIO;

import org.modetrail.video.Frame;
import org.modetrail.video.VideoSource;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code modetrail frame VIDEO N --out FILE.png}: one frame, exactly the N-th in presentation order. */
@Command(name = "frame", mixinStandardHelpOptions = true,
        description = "Writes frame N (0-based, in presentation order) of a video as a PNG image.")
public final class FrameCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "VIDEO", description = "a video file, or a folder of numbered images")
    Path video;

    @Parameters(index = "1", paramLabel = "N", description = "the frame number, from 0")
    int frameNumber;

    @Option(names = "--out", required = true, paramLabel = "FILE.png", description = "where to write the PNG")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        try (VideoSource source = VideoSource.open(video)) {
            Frame frame = source.frame(frameNumber);
            writePng(frame, out);
            spec.commandLine().getOut().printf("frame %d (%.6f s) of %s written to %s%n", frame.index(),
                    frame.timeSeconds(), video, out);
        }
        return ExitCodes.OK;
    }

    /** Writes atomically: a half-written image never replaces a good one. */
    static void writePng(Frame frame, Path out) throws IOException, BadInputException {
        Path dir = out.toAbsolutePath().getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new BadInputException(out + ": the folder does not exist; create it or choose another --out");
        }
        BufferedImage image = new BufferedImage(frame.width(), frame.height(), BufferedImage.TYPE_INT_RGB);
        image.setRGB(0, 0, frame.width(), frame.height(), frame.rgb(), 0, frame.width());
        Path tmp = Files.createTempFile(dir, ".frame", ".png.tmp");
        try {
            if (!ImageIO.write(image, "png", tmp.toFile())) {
                throw new IOException("no PNG writer in this Java runtime");
            }
            Files.move(tmp, out, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
