package org.modetrail.model;

/**
 * A counting line drawn on the video, from {@code from} to {@code to} in image pixels. A track crosses it when its
 * ground contact point passes from one side of the segment to the other between two frames; the crossing is
 * "left to right" when it goes from the left of the direction from → to to its right (as seen on the image, y
 * down), "right to left" otherwise.
 */
public record CountingLine(String name, PixelPoint from, PixelPoint to) {
    public CountingLine {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a counting line needs a name");
        }
        name = name.strip();
        if (from == null || to == null || from.equals(to)) {
            throw new IllegalArgumentException("counting line '" + name + "' needs two different end points");
        }
    }
}
