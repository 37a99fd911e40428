package org.modetrail.summary;

/**
 * Which way a track crossed a counting line, as seen on the image (y down) looking along the line from its first
 * end point to its second: from its left side to its right, or back.
 */
public enum CrossingDirection {
    LEFT_TO_RIGHT,
    RIGHT_TO_LEFT;

    public String label() {
        return this == LEFT_TO_RIGHT ? "left-to-right" : "right-to-left";
    }
}
