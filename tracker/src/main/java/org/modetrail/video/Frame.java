package org.modetrail.video;

import java.util.Arrays;

/**
 * One decoded video frame in the single pixel layout the rest of Modetrail works on: packed RGB, one {@code int}
 * per pixel as {@code 0xFFRRGGBB} (Java's default ARGB with opaque alpha, as {@code BufferedImage.getRGB} gives),
 * row-major from the top-left, {@code rgb[y * width + x]}.
 *
 * <p>Frames handed out by {@link VideoSource#frame(int)} are owned by the decoded-frame cache and shared: treat the
 * pixel array as read-only. Frames passed to a {@link FrameSink} during sequential reading reuse one buffer from
 * call to call; {@link #copy()} what you keep.
 *
 * @param index       0-based position in presentation order
 * @param timeSeconds presentation time in seconds from the first frame of the file
 * @param width       width in pixels
 * @param height      height in pixels
 * @param rgb         packed pixels, {@code width * height} entries
 */
public record Frame(int index, double timeSeconds, int width, int height, int[] rgb) {

    public Frame {
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("frame size must be positive, got " + width + "x" + height);
        }
        if (rgb == null || rgb.length < width * height) {
            throw new IllegalArgumentException("pixel array holds fewer than " + width + "x" + height + " pixels");
        }
    }

    /** The packed 0xFFRRGGBB value at (x, y). */
    public int rgbAt(int x, int y) {
        return rgb[y * width + x];
    }

    /** A deep copy whose pixels belong to the caller. */
    public Frame copy() {
        return new Frame(index, timeSeconds, width, height, Arrays.copyOf(rgb, width * height));
    }

    /** Bytes held by the pixel array, as counted against a cache's memory budget. */
    public long sizeInBytes() {
        return (long) rgb.length * Integer.BYTES;
    }

    @Override
    public String toString() {
        return "Frame[" + index + " at " + timeSeconds + " s, " + width + "x" + height + "]";
    }
}
