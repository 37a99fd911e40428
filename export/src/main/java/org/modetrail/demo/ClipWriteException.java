package org.modetrail.demo;

import java.io.IOException;
import java.nio.file.Path;

/** Writing a clip failed; the message names the clip and, when ffmpeg ran, ends with the tail of its error output. */
public final class ClipWriteException extends IOException {

    private static final long serialVersionUID = 1L;

    private final transient Path clip;

    public ClipWriteException(Path clip, String message, Throwable cause) {
        super("cannot write clip " + clip + ": " + message, cause);
        this.clip = clip;
    }

    public Path clip() {
        return clip;
    }
}
