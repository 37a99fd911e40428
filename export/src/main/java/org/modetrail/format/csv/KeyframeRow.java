package org.modetrail.format.csv;

import org.modetrail.model.Box;

/**
 * One row of a keyframes file.
 *
 * @param line      the 1-based line it came from, for later messages
 * @param trackId   the track, 1 or more
 * @param frame     0-based frame
 * @param box       the box, top-left and size in pixels
 * @param className the class, or null when the file has no class column
 */
public record KeyframeRow(int line, int trackId, int frame, Box box, String className) {
}
