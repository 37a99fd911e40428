package org.modetrail.picture;

import java.util.Arrays;

/**
 * One track's positions over time, for a trajectory plot: in image pixels (x right, y down) or in ground metres.
 * A NaN coordinate is a gap (the object hidden, absent or not annotated there): the line breaks at it.
 *
 * @param trackId the track's id, shown nowhere but kept for the caller's matching
 * @param label   the legend's text, e.g. "3 animal"
 * @param colour  packed 0xRRGGBB
 * @param timeS   time of each point in seconds
 * @param x       x of each point (pixels or metres)
 * @param y       y of each point (pixels or metres)
 */
public record PlotSeries(int trackId, String label, int colour, double[] timeS, double[] x, double[] y) {

    public PlotSeries {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("series of track " + trackId + " needs a label");
        }
        if (timeS == null || x == null || y == null) {
            throw new IllegalArgumentException("series '" + label + "' needs times, x and y");
        }
        if (timeS.length != x.length || x.length != y.length) {
            throw new IllegalArgumentException("series '" + label + "' has " + timeS.length + " times, " + x.length
                    + " x and " + y.length + " y values; they must be as many");
        }
        for (int i = 0; i < x.length; i++) {
            if (Double.isInfinite(x[i]) || Double.isInfinite(y[i]) || !Double.isFinite(timeS[i])) {
                throw new IllegalArgumentException("series '" + label + "' point " + i
                        + ": times must be finite and coordinates finite or NaN (a gap)");
            }
        }
        colour &= 0xFFFFFF;
        timeS = timeS.clone();
        x = x.clone();
        y = y.clone();
    }

    public int size() {
        return x.length;
    }

    /** Points where both coordinates are known. */
    public int knownPoints() {
        int n = 0;
        for (int i = 0; i < x.length; i++) {
            if (!Double.isNaN(x[i]) && !Double.isNaN(y[i])) {
                n++;
            }
        }
        return n;
    }

    @Override
    public double[] timeS() {
        return timeS.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    double xAt(int i) {
        return x[i];
    }

    double yAt(int i) {
        return y[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PlotSeries s && s.trackId == trackId && s.label.equals(label) && s.colour == colour
                && Arrays.equals(s.timeS, timeS) && Arrays.equals(s.x, x) && Arrays.equals(s.y, y);
    }

    @Override
    public int hashCode() {
        return (trackId * 31 + label.hashCode()) * 31 + Arrays.hashCode(x);
    }

    @Override
    public String toString() {
        return "PlotSeries[" + trackId + " '" + label + "', " + x.length + " points]";
    }
}
