package org.modetrail.calibration;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToDoubleFunction;

import org.modetrail.model.Box;
import org.modetrail.model.ContactPoint;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.Homography;
import org.modetrail.model.PointError;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.WorldPoint;

/**
 * A track's path on the ground: per visible frame, the box's contact point mapped through the image-to-ground
 * homography, smoothed, with speed, heading and their uncertainties.
 *
 * <p><b>Runs.</b> Only frames where the track is visible and its contact point maps to the ground (in front of the
 * horizon) count. Consecutive such frames form a run; a hidden or absent frame, or a missing one, ends it, and no
 * fit reaches across two runs.
 *
 * <p><b>Smoothing and speed</b> ({@link SavitzkyGolay}, Savitzky and Golay 1964), on each frame's actual time, with
 * the order and window of {@link TrajectoryConfig} (default quadratic, 0.5 s). Each sample's window is the run's
 * samples within half the window of it; near a run's ends, where that would be cut short, the window is shifted to
 * span the full window length inside the run and the polynomial is evaluated off-centre. A run shorter than the
 * window is fitted whole. A window with fewer than order + 2 samples gives no speed: smoothed = raw, speed, heading
 * and speed sigma NaN. Velocity is the fitted polynomials' first derivative in x and y; speed its length; heading
 * atan2(vy, vx) in degrees, 0 along +x, 90 along +y, in [0, 360).
 *
 * <p><b>Uncertainty</b> (first-order propagation: the law of propagation of uncertainty, JCGM 100:2008 (GUM) eq. 10,
 * equation number from memory). An image error of sigma_px in each image axis, independent, maps to the ground
 * through the homography's Jacobian J at the contact point (for (x, y) = (a/w, b/w): dx/du = (h11 - x h31)/w, dx/dv =
 * (h12 - x h32)/w, dy/du = (h21 - y h31)/w, dy/dv = (h22 - y h32)/w), giving the covariance sigma_px^2 J J^T. The
 * reported position sigma is the RMS of its two axis sigmas, sigma_px ||J||_F / sqrt 2. sigma_px is, per frame,
 * the calibration's RMS image error (or one given by the caller) and the box's own uncertainty
 * ({@link FrameAnnotation#uncertaintyPx()}: the tracking's, of the box's edges, so it holds the contact point's share
 * of the box's size error too), independent and so combined in quadrature; a box whose uncertainty is not known
 * has the calibration's alone. The speed sigma carries the position errors along the
 * direction of motion d (variance sigma_px^2 |J^T d|^2 at sample j) through the derivative weights c_j as
 * independent errors: sigma_v = sqrt(sum c_j^2 sigma_d,j^2) (= sigma_p sqrt(sum c_j^2) when they are equal and the
 * errors isotropic); to first order that is the sigma of |v|. The tracker's box jitter is added to it, estimated per run from the
 * scatter of the raw positions about the smoothed ones ({@link #addTrackingJitter}); where a box's own uncertainty
 * is known this partly counts the same random jitter twice, which errs on the side of a wider interval. Errors are
 * taken as independent from frame to frame, which they are not quite: a calibration error shifts neighbouring
 * positions alike and scales speeds by a common factor that no smoothing averages away (not in the sigma), and a
 * tracker's drift is an error that changes slowly, whose effect on the speed is its rate of change rather than its
 * size (the sigma may then be too large or too small). The position sigma is that of the raw position, since
 * smoothing does not reduce a shared calibration error. How often the stated intervals hold on tracked boxes is
 * measured in tests/…/cli/RoadSpeedCoverageTest.
 */
public final class GroundTrajectory {

    private GroundTrajectory() {
    }

    /** Frame times {@code frame / fps}, for a video of constant frame rate. */
    public static IntToDoubleFunction constantRate(double fps) {
        if (!(fps > 0) || !Double.isFinite(fps)) {
            throw new IllegalArgumentException("the frame rate must be positive, got " + fps);
        }
        return frame -> frame / fps;
    }

    /** Frame times from a table, {@code timeOfFrame[frame]} seconds (as read from the video's timestamps). */
    public static IntToDoubleFunction table(double[] timeOfFrame) {
        double[] t = timeOfFrame.clone();
        return frame -> {
            if (frame < 0 || frame >= t.length) {
                throw new IllegalArgumentException("frame " + frame + " has no time: the table has frames 0 to "
                        + (t.length - 1));
            }
            return t[frame];
        };
    }

    /** The track's ground path with the project's calibration and the track's class's contact point. */
    public static List<GroundSample> of(Project project, Track track, IntToDoubleFunction timeOfFrame,
                                        TrajectoryConfig config) {
        GroundCalibration c = project.site().calibration();
        if (c == null) {
            throw new IllegalArgumentException("the project's ground is not calibrated; calibrate it first with"
                    + " ground points (calibrate --points POINTS.csv)");
        }
        return of(track, project.contactPoint(track.className()), c, timeOfFrame, config);
    }

    /** The ground path with the calibration's homography, its RMS image error as sigma_px, and its horizon side. */
    public static List<GroundSample> of(Track track, ContactPoint contact, GroundCalibration calibration,
                                        IntToDoubleFunction timeOfFrame, TrajectoryConfig config) {
        return compute(track, contact, calibration.imageToWorld(), calibration.rmsPixels(), timeOfFrame, config,
                groundSide(calibration));
    }

    /**
     * The ground path with a bare homography.
     *
     * @param pixelSigma standard deviation of the contact point's image position per axis, pixels (0 or more), from
     *                   the calibration; each box's own uncertainty is added to it in quadrature
     */
    public static List<GroundSample> of(Track track, ContactPoint contact, Homography imageToWorld, double pixelSigma,
                                        IntToDoubleFunction timeOfFrame, TrajectoryConfig config) {
        return compute(track, contact, imageToWorld, pixelSigma, timeOfFrame, config, 0);
    }

    /** Sign of the homogeneous w of the calibration's inlier image points: the ground's side of the horizon. */
    private static int groundSide(GroundCalibration c) {
        double[] h = c.imageToWorld().entries();
        List<GroundPoint> points = c.points();
        List<PointError> errors = c.errors();
        for (int i = 0; i < points.size(); i++) {
            if (errors.get(i).inlier()) {
                double w = h[6] * points.get(i).image().x() + h[7] * points.get(i).image().y() + h[8];
                return w > 0 ? 1 : -1;
            }
        }
        return 0;
    }

    private static List<GroundSample> compute(Track track, ContactPoint contact, Homography imageToWorld,
                                              double pixelSigma, IntToDoubleFunction timeOfFrame,
                                              TrajectoryConfig config, int side) {
        if (track == null || contact == null || imageToWorld == null || timeOfFrame == null || config == null) {
            throw new IllegalArgumentException("track, contact point, homography, frame times and settings are"
                    + " required");
        }
        if (!(pixelSigma >= 0) || !Double.isFinite(pixelSigma)) {
            throw new IllegalArgumentException("the image sigma must be 0 or more pixels, got " + pixelSigma);
        }
        double[] h = imageToWorld.entries();
        int cap = track.frames().size();
        int[] frame = new int[cap];
        double[] t = new double[cap];
        double[] x = new double[cap];
        double[] y = new double[cap];
        double[] sigma = new double[cap];
        double[] j11s = new double[cap];
        double[] j12s = new double[cap];
        double[] j21s = new double[cap];
        double[] j22s = new double[cap];
        int n = 0;
        for (FrameAnnotation a : track.frames().values()) {
            if (!a.isVisible()) {
                continue;
            }
            Box b = a.box();
            double u = b.x() + contact.alongWidth() * b.width();
            double v = b.y() + contact.alongHeight() * b.height();
            double w = h[6] * u + h[7] * v + h[8];
            double px = (h[0] * u + h[1] * v + h[2]) / w;
            double py = (h[3] * u + h[4] * v + h[5]) / w;
            if (!Double.isFinite(px) || !Double.isFinite(py) || (side != 0 && w * side <= 0)) {
                continue; // on or beyond the horizon: not on the ground
            }
            double time = timeOfFrame.applyAsDouble(a.frame());
            if (!Double.isFinite(time)) {
                throw new IllegalArgumentException("frame " + a.frame() + " has no finite time: " + time);
            }
            if (n > 0 && frame[n - 1] == a.frame() - 1 && !(time > t[n - 1])) {
                throw new IllegalArgumentException("frame times must increase: frame " + a.frame() + " at " + time
                        + " s, frame " + frame[n - 1] + " at " + t[n - 1] + " s");
            }
            double j11 = (h[0] - px * h[6]) / w;
            double j12 = (h[1] - px * h[7]) / w;
            double j21 = (h[3] - py * h[6]) / w;
            double j22 = (h[4] - py * h[7]) / w;
            // The calibration's error and the box's own (its edges, so the contact point's) are independent.
            double imageSigma = a.hasUncertainty() ? Math.hypot(pixelSigma, a.uncertaintyPx()) : pixelSigma;
            frame[n] = a.frame();
            t[n] = time;
            x[n] = px;
            y[n] = py;
            sigma[n] = imageSigma * Math.sqrt((j11 * j11 + j12 * j12 + j21 * j21 + j22 * j22) / 2);
            j11s[n] = imageSigma * j11;
            j12s[n] = imageSigma * j12;
            j21s[n] = imageSigma * j21;
            j22s[n] = imageSigma * j22;
            n++;
        }

        double[] sx = new double[n];
        double[] sy = new double[n];
        double[] speed = new double[n];
        double[] heading = new double[n];
        double[] speedSigma = new double[n];
        double[] value = new double[n];
        double[] slope = new double[n];
        double[] slopeSquares = new double[n];
        int[] windowSamples = new int[n];
        SavitzkyGolay sg = new SavitzkyGolay(config.order());
        double half = config.windowS() / 2;
        int start = 0;
        while (start < n) {
            int end = start + 1;
            while (end < n && frame[end] == frame[end - 1] + 1) {
                end++;
            }
            for (int i = start; i < end; i++) {
                int lo;
                int hi; // exclusive
                if (t[end - 1] - t[start] <= config.windowS()) {
                    lo = start;
                    hi = end;
                } else if (t[i] - half < t[start]) {
                    lo = start;
                    hi = lo;
                    while (hi < end && t[hi] <= t[start] + config.windowS()) {
                        hi++;
                    }
                } else if (t[i] + half > t[end - 1]) {
                    hi = end;
                    lo = hi - 1;
                    while (lo > start && t[lo - 1] >= t[end - 1] - config.windowS()) {
                        lo--;
                    }
                } else {
                    lo = i;
                    while (lo > start && t[lo - 1] >= t[i] - half) {
                        lo--;
                    }
                    hi = i + 1;
                    while (hi < end && t[hi] <= t[i] + half) {
                        hi++;
                    }
                }
                if (hi - lo < config.minSamples() || !sg.weights(t, lo, hi, t[i], value, slope)) {
                    sx[i] = x[i];
                    sy[i] = y[i];
                    speed[i] = Double.NaN;
                    heading[i] = Double.NaN;
                    speedSigma[i] = Double.NaN;
                    continue;
                }
                double ax = 0;
                double ay = 0;
                double vx = 0;
                double vy = 0;
                for (int j = lo; j < hi; j++) {
                    double c0 = value[j - lo];
                    double c1 = slope[j - lo];
                    ax += c0 * x[j];
                    ay += c0 * y[j];
                    vx += c1 * x[j];
                    vy += c1 * y[j];
                }
                sx[i] = ax;
                sy[i] = ay;
                speed[i] = Math.hypot(vx, vy);
                double squares = 0;
                for (int j = lo; j < hi; j++) {
                    squares += slope[j - lo] * slope[j - lo];
                }
                slopeSquares[i] = squares;
                windowSamples[i] = hi - lo;
                double var = 0;
                if (speed[i] > 0) {
                    double dx = vx / speed[i];
                    double dy = vy / speed[i];
                    for (int j = lo; j < hi; j++) {
                        double c1 = slope[j - lo];
                        double ex = j11s[j] * dx + j21s[j] * dy;
                        double ey = j12s[j] * dx + j22s[j] * dy;
                        var += c1 * c1 * (ex * ex + ey * ey);
                    }
                } else {
                    for (int j = lo; j < hi; j++) {
                        var += slope[j - lo] * slope[j - lo] * sigma[j] * sigma[j];
                    }
                }
                if (speed[i] > 0) {
                    double deg = Math.toDegrees(Math.atan2(vy, vx));
                    double hd = deg < 0 ? deg + 360 : deg;
                    heading[i] = hd >= 360 ? hd - 360 : hd;
                } else {
                    heading[i] = Double.NaN;
                }
                speedSigma[i] = Math.sqrt(var);
            }
            addTrackingJitter(start, end, x, y, sx, sy, slopeSquares, windowSamples, sigma, speedSigma, config);
            start = end;
        }

        List<GroundSample> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(new GroundSample(frame[i], t[i], new WorldPoint(x[i], y[i]), new WorldPoint(sx[i], sy[i]),
                    speed[i], heading[i], sigma[i], speedSigma[i]));
        }
        return out;
    }

    /**
     * Adds the tracker's box jitter to the position and speed sigmas of one run: the scatter of the raw positions about the
     * smoothed ones estimates the per-axis noise of a position (the mean squared residual divided by 1 - (order + 1)
     * / N, the share of a window's freedom the fit does not use, for windows of N samples; the usual residual
     * variance correction of least squares, here with the mean window size), taken as independent from frame to
     * frame and carried through the derivative weights like the calibration's share. Real motion the polynomial
     * does not follow also shows up as residual, so this errs on the side of a larger sigma.
     */
    private static void addTrackingJitter(int start, int end, double[] x, double[] y, double[] sx, double[] sy,
                                          double[] slopeSquares, int[] windowSamples, double[] positionSigma,
                                          double[] speedSigma, TrajectoryConfig config) {
        int m = 0;
        double sum = 0;
        double window = 0;
        for (int i = start; i < end; i++) {
            if (!Double.isNaN(speedSigma[i])) {
                double rx = x[i] - sx[i];
                double ry = y[i] - sy[i];
                sum += rx * rx + ry * ry;
                window += windowSamples[i];
                m++;
            }
        }
        if (m == 0) {
            return;
        }
        double kept = 1 - (config.order() + 1.0) / (window / m);
        double perAxisVariance = sum / (2.0 * m) / Math.max(kept, 1e-3);
        for (int i = start; i < end; i++) {
            positionSigma[i] = Math.sqrt(positionSigma[i] * positionSigma[i] + perAxisVariance);
            if (!Double.isNaN(speedSigma[i])) {
                speedSigma[i] = Math.sqrt(speedSigma[i] * speedSigma[i] + perAxisVariance * slopeSquares[i]);
            }
        }
    }
}
