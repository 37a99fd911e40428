package org.modetrail.tracking;

import org.modetrail.model.Box;
import org.modetrail.video.Frame;

/**
 * Undoes global changes of lighting before colours are binned, so a target model made in one light still fits in
 * another: each channel is scaled by the ratio of its frame-wide mean at the start to its mean now. This is the
 * diagonal (von Kries) model of illuminant change with the grey-world estimate of the illuminant (Buchsbaum, "A
 * spatial processor model for object colour perception", J. Franklin Inst. 310, 1980): with a fixed camera most of
 * the frame is background, so the frame mean follows the light, not the moving objects.
 *
 * <p>The means are taken on a sparse grid (every 32nd pixel each way: 300 samples at 640x480, each a cache miss on a fresh frame), smoothed over frames, and the gains are
 * bounded; the per-channel lookup tables are rebuilt only when a gain moves by more than one percent. All
 * buffers are made once.
 */
final class IlluminationCompensation {
    private static final int GRID = 32;
    private static final double SMOOTHING = 0.3;
    private static final double MIN_GAIN = 0.4;
    private static final double MAX_GAIN = 2.5;
    private static final double REBUILD = 0.01;

    private final double[] reference = new double[3];
    private final double[] now = new double[3];
    private final double[] gain = {1, 1, 1};
    private final double[] tableGain = {1, 1, 1};
    final int[] red = new int[256];
    final int[] green = new int[256];
    final int[] blue = new int[256];
    /**
     * A brightness gain on top of the frame-wide one, for light that changes only around the object (a shadow it
     * walks into); set by the tracker, 1 for none.
     */
    private double localGain = 1;
    private boolean identity = true;
    /** Counts table rebuilds, so users of the tables know when theirs are stale. */
    private int version;

    IlluminationCompensation() {
        rebuild();
    }

    /** Takes the start frame's light as the reference. */
    void reset(Frame frame, Box object) {
        mean(frame, object, reference);
        gain[0] = gain[1] = gain[2] = 1;
        localGain = 1;
        rebuild();
    }

    /** Measures this frame's light and updates the gains. */
    void update(Frame frame, Box object) {
        mean(frame, object, now);
        boolean stale = false;
        for (int c = 0; c < 3; c++) {
            double g = now[c] > 1 ? reference[c] / now[c] : 1;
            g = Math.max(MIN_GAIN, Math.min(MAX_GAIN, g));
            gain[c] += SMOOTHING * (g - gain[c]);
            stale |= Math.abs(gain[c] - tableGain[c]) > REBUILD * tableGain[c];
        }
        if (stale) {
            rebuild();
        }
    }

    /** The brightness gain applied on top of the frame-wide gains. */
    double localGain() {
        return localGain;
    }

    /** Sets the local brightness gain (bounded like the frame-wide gains) and rebuilds the tables if it moved. */
    void setLocalGain(double g) {
        double bounded = Math.max(MIN_GAIN, Math.min(MAX_GAIN, g));
        if (bounded != localGain) {
            localGain = bounded;
            writeTables();
        }
    }

    /** Whether the tables are (near enough) the identity, so binning can skip them. */
    boolean isIdentity() {
        return identity;
    }

    /** The compensated packed pixel. */
    int apply(int rgb) {
        return 0xFF000000 | red[rgb >>> 16 & 0xFF] | green[rgb >>> 8 & 0xFF] | blue[rgb & 0xFF];
    }

    int version() {
        return version;
    }

    /** The compensated value of channel {@code c} (0 red, 1 green, 2 blue). */
    int channel(int c, int v) {
        return Math.min(255, (int) Math.round(v * tableGain[c] * localGain));
    }

    private void rebuild() {
        System.arraycopy(gain, 0, tableGain, 0, 3);
        writeTables();
    }

    /** The tables for the frame-wide gains they were last built with and the present local gain. */
    private void writeTables() {
        version++;
        identity = true;
        for (int c = 0; c < 3; c++) {
            identity &= Math.abs(tableGain[c] * localGain - 1) <= REBUILD;
        }
        for (int v = 0; v < 256; v++) {
            red[v] = Math.min(255, (int) Math.round(v * tableGain[0] * localGain)) << 16;
            green[v] = Math.min(255, (int) Math.round(v * tableGain[1] * localGain)) << 8;
            blue[v] = Math.min(255, (int) Math.round(v * tableGain[2] * localGain));
        }
    }

    private static void mean(Frame frame, Box object, double[] out) {
        int[] rgb = frame.rgb();
        double ex0 = object.centreX() - object.width() * 0.625;
        double ex1 = object.centreX() + object.width() * 0.625;
        double ey0 = object.centreY() - object.height() * 0.625;
        double ey1 = object.centreY() + object.height() * 0.625;
        long r = 0;
        long g = 0;
        long b = 0;
        int n = 0;
        for (int y = GRID / 2; y < frame.height(); y += GRID) {
            int row = y * frame.width();
            boolean rowCrossesObject = y + 0.5 >= ey0 && y + 0.5 < ey1;
            for (int x = GRID / 2; x < frame.width(); x += GRID) {
                if (rowCrossesObject && x + 0.5 >= ex0 && x + 0.5 < ex1) {
                    continue;
                }
                int p = rgb[row + x];
                r += p >>> 16 & 0xFF;
                g += p >>> 8 & 0xFF;
                b += p & 0xFF;
                n++;
            }
        }
        n = Math.max(1, n);
        out[0] = (double) r / n;
        out[1] = (double) g / n;
        out[2] = (double) b / n;
    }
}
