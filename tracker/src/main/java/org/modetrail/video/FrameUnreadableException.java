package org.modetrail.video;

import java.nio.file.Path;

/**
 * The frame exists in the file's index but the decoder produced no picture for it (a damaged or missing packet).
 * The rest of the file stays readable.
 */
public class FrameUnreadableException extends VideoException {
    public FrameUnreadableException(Path file, int frame, String problem) {
        super(file, frame, problem);
    }
}
