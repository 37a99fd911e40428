package org.modetrail.model;

/**
 * The outcome of an edit: the new project and the span of one track whose tracked frames must be computed again
 * (between the keyframes around the change); {@code retrack} is false when nothing needs tracking (a class
 * change, a deletion).
 *
 * @param project the project after the edit
 * @param trackId the track the span belongs to
 * @param from    first frame of the span, inclusive
 * @param to      last frame of the span, inclusive
 * @param retrack whether the span must be tracked again
 */
public record Edit(Project project, int trackId, int from, int to, boolean retrack) {
}
