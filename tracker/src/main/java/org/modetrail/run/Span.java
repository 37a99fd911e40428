package org.modetrail.run;

/**
 * Frames {@code from..to} (inclusive) of one track to be tracked again, as an edit names them.
 *
 * @param trackId the track
 * @param from    first frame, inclusive
 * @param to      last frame, inclusive
 */
public record Span(int trackId, int from, int to) {
    public Span {
        if (from > to || from < 0) {
            throw new IllegalArgumentException("span " + from + " to " + to + " of track " + trackId + " is empty");
        }
    }
}
