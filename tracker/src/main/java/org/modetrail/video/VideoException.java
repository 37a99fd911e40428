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
    private final int frame;

    public VideoException(Path file, String problem) {
        this(file, -1, problem, null);
    }

    public VideoException(Path file, int frame, String problem) {
        this(file, frame, problem, null);
    }

    public VideoException(Path file, int frame, String problem, Throwable cause) {
        super(compose(file, frame, problem), cause);
        this.file = file;
        this.frame = frame;
    }

    private static String compose(Path file, int frame, String problem) {
        StringBuilder sb = new StringBuilder();
        sb.append(file);
        if (frame >= 0) {
            sb.append(", frame ").append(frame);
        }
        return sb.append(": ").append(problem).toString();
    }

    /** The file involved. */
    public Path file() {
        return file;
    }

    /** The 0-based frame involved, if the problem concerns one frame. */
    public OptionalInt frame() {
        return frame >= 0 ? OptionalInt.of(frame) : OptionalInt.empty();
    }
}
