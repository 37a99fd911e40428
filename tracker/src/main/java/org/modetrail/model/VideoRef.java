package org.modetrail.model;

/**
 * The video a project annotates, with enough about it to notice when the file was moved or replaced.
 *
 * @param path        the video's path relative to the project file's folder (or absolute when on another drive)
 * @param width       frame width in pixels
 * @param height      frame height in pixels
 * @param frameCount  frames in presentation order, from the frame index
 * @param fingerprint a content fingerprint of the file (how it is computed is the project file's business)
 */
public record VideoRef(String path, int width, int height, int frameCount, String fingerprint) {
    public VideoRef {
        if (path == null || path.isBlank()) {
            throw new IllegalArgumentException("the video's path is required");
        }
        if (width <= 0 || height <= 0 || frameCount <= 0) {
            throw new IllegalArgumentException("video size and frame count must be positive, got " + width + "x"
                    + height + ", " + frameCount + " frames");
        }
        fingerprint = fingerprint == null ? "" : fingerprint;
    }
}
