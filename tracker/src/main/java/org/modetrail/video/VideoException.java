package org.modetrail.video;

import java.io.IOException;
import java.nio.file.Path;
import java.util.OptionalInt;

/**
 * A video could not be opened or a frame could not be read. The message names the file, the frame where one is
 * involved, what went wrong and what the user can do about it.
 */
public class VideoException extends IOException {
    private final Path file;
    private final OptionalInt frame;

    /** A problem with the file as a whole. */
    public VideoException(Path file, String problem) {
        this(file, OptionalInt.empty(), problem, null);
    }

    /** A problem with the file as a whole, caused by another exception. */
    public VideoException(Path file, String problem, Throwable cause) {
        this(file, OptionalInt.empty(), problem, cause);
    }

    /** A problem with one frame, which the message names (also when the number asked for was negative). */
    public VideoException(Path file, int frame, String problem) {
        this(file, OptionalInt.of(frame), problem, null);
    }

    private VideoException(Path file, OptionalInt frame, String problem, Throwable cause) {
        super(compose(file, frame, problem), cause);
        this.file = file;
        this.frame = frame;
    }

    private static String compose(Path file, OptionalInt frame, String problem) {
        StringBuilder sb = new StringBuilder();
        sb.append(file);
        frame.ifPresent(n -> sb.append(", frame ").append(n));
        return sb.append(": ").append(problem).toString();
    }

    /** The file involved. */
    public Path file() {
        return file;
    }

    /** The 0-based frame involved, if the problem concerns one frame. */
    public OptionalInt frame() {
        return frame;
    }
}
