package org.modetrail.demo;

/**
 * The pixels one object painted in one frame: their bounding box (inclusive pixel indices) and how many there were.
 */
record Coverage(int minX, int minY, int maxX, int maxY, int pixels) {

    boolean isEmpty() {
        return pixels == 0;
    }

    double x() {
        return minX;
    }

    double y() {
        return minY;
    }

    /** Pixel-edge width: a single painted column is 1 wide. */
    double width() {
        return maxX - minX + 1;
    }

    double height() {
        return maxY - minY + 1;
    }
}
