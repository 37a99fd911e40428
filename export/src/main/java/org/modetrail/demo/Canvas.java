package org.modetrail.demo;

import java.util.Arrays;

/**
 * A frame being painted, plus the bookkeeping ground truth needs: which object owns each pixel (for the visible
 * fraction) and the extent of everything an object painted (for its box). Objects are painted back to front, so the
 * last object to paint a pixel is the one seen there.
 *
 * <p>All buffers are allocated once; painting a frame allocates nothing per pixel.
 */
final class Canvas {

    private final int width;
    private final int height;
    private final int[] owner;
    private final int[] stamp;
    private int[] rgb;
    private int currentStamp;
    private int currentOwner;
    private int minX;
    private int minY;
    private int maxX;
    private int maxY;
    private int painted;

    Canvas(int width, int height) {
        this.width = width;
        this.height = height;
        this.owner = new int[width * height];
        this.stamp = new int[width * height];
    }

    int width() {
        return width;
    }

    int height() {
        return height;
    }

    /** Starts a frame in {@code target} from a copy of the static background. */
    void beginFrame(int[] target, int[] background) {
        if (target.length != width * height || background.length != width * height) {
            throw new IllegalArgumentException("frame buffer must hold " + width + " x " + height + " pixels");
        }
        rgb = target;
        System.arraycopy(background, 0, target, 0, background.length);
        Arrays.fill(owner, 0);
    }

    /** Starts an object; objects are numbered from 0 and must be painted back to front. */
    void beginObject(int objectIndex) {
        currentOwner = objectIndex + 1;
        // A fresh stamp value marks "already counted for this object" without clearing a buffer per object.
        currentStamp++;
        if (currentStamp == 0) {
            Arrays.fill(stamp, 0);
            currentStamp = 1;
        }
        minX = Integer.MAX_VALUE;
        minY = Integer.MAX_VALUE;
        maxX = Integer.MIN_VALUE;
        maxY = Integer.MIN_VALUE;
        painted = 0;
    }

    /** What the current object painted since {@link #beginObject}. */
    Coverage endObject() {
        return painted == 0 ? new Coverage(0, 0, -1, -1, 0) : new Coverage(minX, minY, maxX, maxY, painted);
    }

    /** Paints a pixel of the current object; the caller keeps (x, y) inside the image. */
    void paint(int x, int y, int colour) {
        int i = y * width + x;
        rgb[i] = colour;
        owner[i] = currentOwner;
        if (stamp[i] != currentStamp) {
            stamp[i] = currentStamp;
            painted++;
            if (x < minX) {
                minX = x;
            }
            if (x > maxX) {
                maxX = x;
            }
            if (y < minY) {
                minY = y;
            }
            if (y > maxY) {
                maxY = y;
            }
        }
    }

    /** Pixels each object still owns after all painting: index 0 is object 0. */
    int[] ownedPixels(int objectCount) {
        int[] counts = new int[objectCount + 1];
        for (int o : owner) {
            if (o <= objectCount) {
                counts[o]++;
            }
        }
        return Arrays.copyOfRange(counts, 1, counts.length);
    }

    /**
     * Fills a convex polygon given in continuous image coordinates (pixel {@code i} spans {@code [i, i+1)}). A pixel
     * belongs to the polygon when its centre does, with half-open spans so that faces sharing an edge do not both
     * claim it.
     *
     * @param owned true to paint as the current object, false to paint background (markings, shadows)
     * @param shade for background painting: factor applied to the existing pixel when colour is negative
     */
    void fillConvex(double[] xs, double[] ys, int n, int colour, boolean owned, double shade) {
        double top = Double.POSITIVE_INFINITY;
        double bottom = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < n; k++) {
            top = Math.min(top, ys[k]);
            bottom = Math.max(bottom, ys[k]);
        }
        int j0 = Math.max(0, (int) Math.ceil(top - 0.5));
        int j1 = Math.min(height - 1, (int) Math.ceil(bottom - 0.5) - 1);
        for (int j = j0; j <= j1; j++) {
            double yc = j + 0.5;
            double left = Double.POSITIVE_INFINITY;
            double right = Double.NEGATIVE_INFINITY;
            for (int k = 0; k < n; k++) {
                int m = k + 1 == n ? 0 : k + 1;
                double ya = ys[k];
                double yb = ys[m];
                if ((ya <= yc && yb > yc) || (yb <= yc && ya > yc)) {
                    double x = xs[k] + (yc - ya) * (xs[m] - xs[k]) / (yb - ya);
                    left = Math.min(left, x);
                    right = Math.max(right, x);
                }
            }
            if (!(left < right)) {
                continue;
            }
            int i0 = Math.max(0, (int) Math.ceil(left - 0.5));
            int i1 = Math.min(width - 1, (int) Math.ceil(right - 0.5) - 1);
            for (int i = i0; i <= i1; i++) {
                if (owned) {
                    paint(i, j, colour);
                } else if (colour >= 0) {
                    rgb[j * width + i] = colour;
                } else {
                    rgb[j * width + i] = Rgb.scale(rgb[j * width + i], shade);
                }
            }
        }
    }

    /**
     * Adds zero-mean sensor noise: a brightness offset per pixel plus a weaker one per channel, each a function of
     * (seed, frame, pixel) only, so any frame renders the same whenever it is rendered.
     */
    void addSensorNoise(long seed, int frame, int amplitude) {
        if (amplitude == 0) {
            return;
        }
        int span = 2 * amplitude + 1;
        int chromaSpan = amplitude / 2 * 2 + 1;
        int chromaHalf = amplitude / 2;
        for (int i = 0; i < rgb.length; i++) {
            long h = NoiseHash.hash(seed, frame, i);
            int luma = (int) ((h >>> 40) % span) - amplitude;
            int c = rgb[i];
            int r = ((c >>> 16) & 0xFF) + luma + (int) ((h & 0xFF) % chromaSpan) - chromaHalf;
            int g = ((c >>> 8) & 0xFF) + luma + (int) (((h >>> 8) & 0xFF) % chromaSpan) - chromaHalf;
            int b = (c & 0xFF) + luma + (int) (((h >>> 16) & 0xFF) % chromaSpan) - chromaHalf;
            rgb[i] = Rgb.pack(r, g, b);
        }
    }
}
