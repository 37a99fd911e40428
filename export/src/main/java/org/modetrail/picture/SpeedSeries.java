package org.modetrail.picture;

import java.util.Arrays;

/**
 * One track's speed over time, for a speed plot. A NaN speed is a gap. {@code sigma}, when given, is the standard
 * uncertainty of each speed (same units): the plot shades speed ± sigma, cut at 0 below; a NaN sigma leaves that
 * point unshaded.
 *
 * @param trackId the track's id
 * @param label   the legend's text
 * @param colour  packed 0xRRGGBB
 * @param timeS   time of each point in seconds
 * @param speed   speed in metres per second (NaN for a gap)
 * @param sigma   standard uncertainty of each speed in m/s, or null for none
 */
public record SpeedSeries(int trackId, String label, int colour, double[] timeS, double[] speed, double[] sigma) {

    public SpeedSeries {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("speed series of track " + trackId + " needs a label");
        }
        if (timeS == null || speed == null) {
            throw new IllegalArgumentException("speed series '" + label + "' needs times and speeds");
        }
        if (timeS.length != speed.length || (sigma != null && sigma.length != speed.length)) {
            throw new IllegalArgumentException("speed series '" + label + "' has " + timeS.length + " times, "
                    + speed.length + " speeds" + (sigma == null ? "" : " and " + sigma.length + " sigmas")
                    + "; they must be as many");
        }
        for (int i = 0; i < speed.length; i++) {
            if (!Double.isFinite(timeS[i]) || Double.isInfinite(speed[i])
                    || (sigma != null && (Double.isInfinite(sigma[i]) || sigma[i] < 0))) {
                throw new IllegalArgumentException("speed series '" + label + "' point " + i
                        + ": times must be finite, speeds finite or NaN, sigmas 0 or more or NaN");
            }
        }
        colour &= 0xFFFFFF;
        timeS = timeS.clone();
        speed = speed.clone();
        sigma = sigma == null ? null : sigma.clone();
    }

    /** A series without uncertainty. */
    public SpeedSeries(int trackId, String label, int colour, double[] timeS, double[] speed) {
        this(trackId, label, colour, timeS, speed, null);
    }

    public int size() {
        return speed.length;
    }

    public boolean hasSigma() {
        return sigma != null;
    }

    @Override
    public double[] timeS() {
        return timeS.clone();
    }

    @Override
    public double[] speed() {
        return speed.clone();
    }

    @Override
    public double[] sigma() {
        return sigma == null ? null : sigma.clone();
    }

    double timeAt(int i) {
        return timeS[i];
    }

    double speedAt(int i) {
        return speed[i];
    }

    double sigmaAt(int i) {
        return sigma == null ? Double.NaN : sigma[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SpeedSeries s && s.trackId == trackId && s.label.equals(label) && s.colour == colour
                && Arrays.equals(s.timeS, timeS) && Arrays.equals(s.speed, speed) && Arrays.equals(s.sigma, sigma);
    }

    @Override
    public int hashCode() {
        return (trackId * 31 + label.hashCode()) * 31 + Arrays.hashCode(speed);
    }

    @Override
    public String toString() {
        return "SpeedSeries[" + trackId + " '" + label + "', " + speed.length + " points"
                + (sigma == null ? "" : ", with sigma") + "]";
    }
}
