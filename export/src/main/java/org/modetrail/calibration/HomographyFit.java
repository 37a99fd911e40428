package org.modetrail.calibration;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.ddogleg.fitting.modelset.ModelMatcher;
import org.ejml.data.DMatrixRMaj;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.Homography;
import org.modetrail.model.PointError;

import boofcv.abst.geo.Estimate1ofEpipolar;
import boofcv.abst.geo.RefineEpipolar;
import boofcv.factory.geo.ConfigHomography;
import boofcv.factory.geo.ConfigRansac;
import boofcv.factory.geo.EpipolarError;
import boofcv.factory.geo.FactoryMultiView;
import boofcv.factory.geo.FactoryMultiViewRobust;
import boofcv.struct.geo.AssociatedPair;
import georegression.struct.homography.Homography2D_F64;

/**
 * Fits the ground plane's image-to-world homography to the user's point pairs, robustly.
 *
 * <p>Method (Hartley and Zisserman, Multiple View Geometry in Computer Vision, 2nd ed., 2003; algorithm numbers
 * from memory): the normalised direct linear transform, algorithm 4.2 (points translated to their centroid and
 * scaled to mean distance sqrt 2, DLT, denormalised), run inside RANSAC, algorithm 4.6 (random minimal samples of 4
 * pairs, support counted by a distance threshold, the largest consensus set kept), then re-estimated on the
 * inliers: a normalised DLT over all of them, refined by Levenberg-Marquardt on the transfer error in the image
 * (the refinement step of algorithm 4.6). The DLT, RANSAC and refinement are BoofCV's
 * ({@code FactoryMultiView.homographyDLT(true)}, {@code FactoryMultiViewRobust.homographyRansac},
 * {@code FactoryMultiView.homographyRefine(.., EpipolarError.SIMPLE)}).
 *
 * <p>One error is used throughout, for the threshold, the refinement and the inlier flags: the distance in pixels
 * between the point the user clicked and its ground point mapped into the image. To get that error from BoofCV the
 * fit is made in the direction ground to image (BoofCV measures the error on the second point of each pair, and its
 * RANSAC threshold is that distance, not its square: checked on a 5 x 5 grid with one point moved 1.5 or 2.5 px
 * under a 2 px threshold) and inverted at the end. After the refinement every point is re-classified by that error and the inliers refitted,
 * until the inlier set no longer changes (at most {@value #MAX_ROUNDS} rounds).
 *
 * <p>Each point also gets its error in metres: the distance on the ground between the ground point the user gave and
 * the clicked image point mapped to the ground.
 */
public final class HomographyFit {
    /** Rounds of refit and re-classification after RANSAC. */
    static final int MAX_ROUNDS = 5;
    /**
     * Below this ratio of singular values (smallest over largest, of the centred points) the points are taken as
     * lying exactly on one line, so no homography is defined: rounding-level, not a judgement of quality.
     */
    static final double DEGENERATE_RATIO = 1e-6;
    /** Two points closer than this fraction of the points' extent count as the same point. */
    static final double DUPLICATE_FRACTION = 1e-9;
    /** The test for "all but one point on one line" costs n^3; above this many points it is skipped. */
    static final int MAX_POINTS_FOR_LINE_TEST = 400;
    /** Levenberg-Marquardt settings of the refinement: convergence tolerance, iterations. */
    static final double REFINE_TOLERANCE = 1e-12;
    static final int REFINE_ITERATIONS = 200;

    private HomographyFit() {
    }

    /** The fit with {@link CalibrationConfig#defaults()}. */
    public static GroundCalibration fit(List<GroundPoint> points) {
        return fit(points, CalibrationConfig.defaults());
    }

    /**
     * @param points the user's pairs, at least 4, no two alike, not all on one line (in the image or on the ground)
     * @throws IllegalArgumentException for bad input, or when fewer than 4 points agree on one plane within the
     *                                  threshold; the message says what to do
     */
    public static GroundCalibration fit(List<GroundPoint> points, CalibrationConfig config) {
        if (config == null) {
            throw new IllegalArgumentException("no calibration settings given");
        }
        if (points == null || points.size() < 4) {
            int n = points == null ? 0 : points.size();
            throw new IllegalArgumentException("the ground calibration needs at least 4 point pairs, got " + n
                    + "; add points whose ground position you know, spread over the area objects move in");
        }
        int n = points.size();
        double[] u = new double[n];
        double[] v = new double[n];
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            GroundPoint p = points.get(i);
            if (p == null) {
                throw new IllegalArgumentException("calibration point " + (i + 1) + " is missing");
            }
            u[i] = p.image().x();
            v[i] = p.image().y();
            x[i] = p.world().x();
            y[i] = p.world().y();
        }
        checkDistinct(u, v, "image", "pixel");
        checkDistinct(x, y, "ground", "ground position");
        double imageRatio = spreadRatio(u, v);
        double worldRatio = spreadRatio(x, y);
        checkSpread(u, v, imageRatio, "in the image");
        checkSpread(x, y, worldRatio, "on the ground");

        List<AssociatedPair> pairs = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            pairs.add(new AssociatedPair(x[i], y[i], u[i], v[i]));
        }
        boolean[] inlier = ransac(pairs, config);
        double[] g2i = new double[9];
        double[] errPx = new double[n];
        int inliers = count(inlier);
        for (int round = 0; round < MAX_ROUNDS; round++) {
            requireInliers(inliers, n, config);
            fitInliers(pairs, inlier, g2i);
            pixelErrors(g2i, u, v, x, y, errPx);
            boolean changed = false;
            int count = 0;
            for (int i = 0; i < n; i++) {
                boolean in = errPx[i] <= config.thresholdPx();
                changed |= in != inlier[i];
                inlier[i] = in;
                count += in ? 1 : 0;
            }
            inliers = count;
            if (!changed) {
                break;
            }
        }
        requireInliers(inliers, n, config);

        Homography groundToImage = new Homography(g2i);
        Homography imageToWorld = groundToImage.inverse();
        double[] i2w = imageToWorld.entries();
        double[] errM = new double[n];
        pixelErrors(i2w, x, y, u, v, errM);

        List<PointError> errors = new ArrayList<>(n);
        double sumPx = 0;
        double sumM = 0;
        for (int i = 0; i < n; i++) {
            errors.add(new PointError(errPx[i], errM[i], inlier[i]));
            if (inlier[i]) {
                sumPx += errPx[i] * errPx[i];
                sumM += errM[i] * errM[i];
            }
        }
        double rmsPx = Math.sqrt(sumPx / inliers);
        double rmsM = Math.sqrt(sumM / inliers);
        List<String> warnings = warnings(config, errPx, inlier, inliers, imageRatio, worldRatio, rmsPx, rmsM);
        return new GroundCalibration(points, imageToWorld, errors, rmsPx, rmsM, warnings);
    }

    /** RANSAC (algorithm 4.6) over normalised-DLT minimal samples; the consensus set as flags. */
    private static boolean[] ransac(List<AssociatedPair> pairs, CalibrationConfig config) {
        int n = pairs.size();
        boolean[] inlier = new boolean[n];
        if (n == 4) {
            java.util.Arrays.fill(inlier, true);
            return inlier;
        }
        ConfigRansac rc = new ConfigRansac(config.iterations(), config.thresholdPx());
        rc.randSeed = config.seed();
        ModelMatcher<Homography2D_F64, AssociatedPair> ransac =
                FactoryMultiViewRobust.homographyRansac(new ConfigHomography(true), rc);
        if (!ransac.process(pairs)) {
            throw new IllegalArgumentException("no 4 of the " + n + " calibration points agree on one ground plane"
                    + " within " + fmt(config.thresholdPx()) + " px; check that each image point and its ground"
                    + " point belong together, or raise the threshold");
        }
        int size = ransac.getMatchSet().size();
        for (int k = 0; k < size; k++) {
            inlier[ransac.getInputIndex(k)] = true;
        }
        return inlier;
    }

    /** Normalised DLT (algorithm 4.2) on the inliers, then refined on the image transfer error; ground to image. */
    private static void fitInliers(List<AssociatedPair> pairs, boolean[] inlier, double[] out) {
        List<AssociatedPair> used = new ArrayList<>();
        for (int i = 0; i < pairs.size(); i++) {
            if (inlier[i]) {
                used.add(pairs.get(i));
            }
        }
        Estimate1ofEpipolar dlt = FactoryMultiView.homographyDLT(true);
        DMatrixRMaj initial = new DMatrixRMaj(3, 3);
        if (!dlt.process(used, initial)) {
            throw new IllegalArgumentException("the calibration points do not define a ground plane (the linear fit"
                    + " failed); spread the points over the ground, with no 3 of any 4 on one line");
        }
        DMatrixRMaj refined = new DMatrixRMaj(3, 3);
        RefineEpipolar refine = FactoryMultiView.homographyRefine(REFINE_TOLERANCE, REFINE_ITERATIONS,
                EpipolarError.SIMPLE);
        DMatrixRMaj best = initial;
        if (refine.fitModel(used, initial, refined) && finite(refined.data)
                && transferCost(refined.data, used) <= transferCost(initial.data, used)) {
            best = refined;
        }
        System.arraycopy(best.data, 0, out, 0, 9);
        if (!finite(out)) {
            throw new IllegalArgumentException("the calibration points do not define a ground plane; spread them"
                    + " over the ground, with no 3 of any 4 on one line");
        }
    }

    private static double transferCost(double[] h, List<AssociatedPair> used) {
        double sum = 0;
        for (AssociatedPair p : used) {
            double w = h[6] * p.p1.x + h[7] * p.p1.y + h[8];
            double du = (h[0] * p.p1.x + h[1] * p.p1.y + h[2]) / w - p.p2.x;
            double dv = (h[3] * p.p1.x + h[4] * p.p1.y + h[5]) / w - p.p2.y;
            sum += du * du + dv * dv;
        }
        return Double.isNaN(sum) ? Double.POSITIVE_INFINITY : sum;
    }

    /**
     * out[i] = distance between (ax[i], ay[i]) and the map {@code h} of (bx[i], by[i]); infinite where the point
     * maps to the line at infinity.
     */
    static void pixelErrors(double[] h, double[] ax, double[] ay, double[] bx, double[] by, double[] out) {
        for (int i = 0; i < ax.length; i++) {
            double px = h[0] * bx[i] + h[1] * by[i] + h[2];
            double py = h[3] * bx[i] + h[4] * by[i] + h[5];
            double w = h[6] * bx[i] + h[7] * by[i] + h[8];
            double e = Math.hypot(px / w - ax[i], py / w - ay[i]);
            out[i] = Double.isFinite(e) ? e : Double.POSITIVE_INFINITY;
        }
    }

    private static void requireInliers(int inliers, int n, CalibrationConfig config) {
        if (inliers < 4) {
            throw new IllegalArgumentException("only " + inliers + " of the " + n + " calibration points agree on one"
                    + " ground plane within " + fmt(config.thresholdPx()) + " px, and a fit needs 4; check the points"
                    + " (image and ground positions swapped, wrong units, typing errors) or raise the threshold");
        }
        if (!(inliers > config.minInlierShare() * n)) {
            throw new IllegalArgumentException("only " + inliers + " of the " + n + " calibration points agree on one"
                    + " ground plane within " + fmt(config.thresholdPx()) + " px, not more than "
                    + Math.round(100 * config.minInlierShare()) + " %; the points as a whole look wrong: check that"
                    + " image and ground columns are not swapped, that ground positions are in metres and all from"
                    + " one plan, and that the image points are from this video");
        }
    }

    private static List<String> warnings(CalibrationConfig c, double[] errPx, boolean[] inlier, int inliers,
                                         double imageRatio, double worldRatio, double rmsPx, double rmsM) {
        List<String> w = new ArrayList<>();
        int n = inlier.length;
        if (imageRatio < c.collinearWarnRatio()) {
            w.add("The points lie nearly on one line in the image (spread ratio " + fmt(imageRatio) + ", below "
                    + fmt(c.collinearWarnRatio()) + "): distances across that line will be unreliable. Add points"
                    + " away from it.");
        }
        if (worldRatio < c.collinearWarnRatio()) {
            w.add("The points lie nearly on one line on the ground (spread ratio " + fmt(worldRatio) + ", below "
                    + fmt(c.collinearWarnRatio()) + "): distances across that line will be unreliable. Add points"
                    + " away from it.");
        }
        if (inliers == 4) {
            w.add("Only 4 points are used, so the fit passes through them exactly and their errors say nothing about"
                    + " its accuracy" + (n > 4 ? "; and since any 4 points fit exactly, it cannot tell which of the "
                    + n + " points are wrong" : "") + ". Add more points to check it.");
        }
        if (rmsPx > c.warnRmsPx()) {
            w.add("The points fit with an RMS error of " + fmt(rmsPx) + " px in the image, above "
                    + fmt(c.warnRmsPx()) + " px. Check the points with the largest errors.");
        }
        if (rmsM > c.warnRmsM()) {
            w.add("The points fit with an RMS error of " + fmt(rmsM) + " m on the ground, above " + fmt(c.warnRmsM())
                    + " m. Check the points with the largest errors, or add points near the far ones.");
        }
        if (inliers < n) {
            StringBuilder list = new StringBuilder();
            for (int i = 0; i < n; i++) {
                if (!inlier[i]) {
                    list.append(list.length() == 0 ? "" : ", ").append(i + 1).append(" (").append(fmt(errPx[i]))
                            .append(" px)");
                }
            }
            w.add((n - inliers) + " of " + n + " points are more than " + fmt(c.thresholdPx()) + " px off the fit and"
                    + " were left out: point " + list + ". Check them, or remove them.");
        }
        return w;
    }

    /**
     * Smallest over largest singular value of the n x 2 matrix of centred points: 0 when they lie on one line, 1
     * when they are spread equally in every direction.
     */
    static double spreadRatio(double[] a, double[] b) {
        int n = a.length;
        double ma = 0;
        double mb = 0;
        for (int i = 0; i < n; i++) {
            ma += a[i];
            mb += b[i];
        }
        ma /= n;
        mb /= n;
        double saa = 0;
        double sab = 0;
        double sbb = 0;
        for (int i = 0; i < n; i++) {
            double da = a[i] - ma;
            double db = b[i] - mb;
            saa += da * da;
            sab += da * db;
            sbb += db * db;
        }
        double mean = (saa + sbb) / 2;
        double diff = Math.sqrt(((saa - sbb) / 2) * ((saa - sbb) / 2) + sab * sab);
        double big = mean + diff;
        double small = Math.max(0, mean - diff);
        return big > 0 ? Math.sqrt(small / big) : 0;
    }

    private static double extent(double[] a, double[] b) {
        double minA = Double.POSITIVE_INFINITY;
        double maxA = Double.NEGATIVE_INFINITY;
        double minB = Double.POSITIVE_INFINITY;
        double maxB = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < a.length; i++) {
            minA = Math.min(minA, a[i]);
            maxA = Math.max(maxA, a[i]);
            minB = Math.min(minB, b[i]);
            maxB = Math.max(maxB, b[i]);
        }
        return Math.max(maxA - minA, maxB - minB);
    }

    private static void checkDistinct(double[] a, double[] b, String where, String what) {
        double tol = DUPLICATE_FRACTION * Math.max(1, extent(a, b));
        for (int i = 0; i < a.length; i++) {
            for (int j = i + 1; j < a.length; j++) {
                if (Math.abs(a[i] - a[j]) <= tol && Math.abs(b[i] - b[j]) <= tol) {
                    throw new IllegalArgumentException("calibration points " + (i + 1) + " and " + (j + 1)
                            + " have the same " + what + " (" + fmt(a[i]) + ", " + fmt(b[i]) + "); each point must"
                            + " be a different place " + (where.equals("image") ? "in the image" : "on the ground")
                            + ": remove the repeated one or correct it");
                }
            }
        }
    }

    private static void checkSpread(double[] a, double[] b, double ratio, String where) {
        String advice = "; a ground plane needs points spread over an area, at least 4 of them with no 3 on one line:"
                + " add points away from that line";
        if (ratio < DEGENERATE_RATIO) {
            throw new IllegalArgumentException("the calibration points all lie on one line " + where + advice);
        }
        int n = a.length;
        if (n > MAX_POINTS_FOR_LINE_TEST) {
            return;
        }
        double tol = DEGENERATE_RATIO * extent(a, b);
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double dx = a[j] - a[i];
                double dy = b[j] - b[i];
                double len = Math.hypot(dx, dy);
                int off = 0;
                for (int k = 0; k < n && off < 2; k++) {
                    double d = Math.abs(dx * (b[k] - b[i]) - dy * (a[k] - a[i])) / len;
                    if (d > tol) {
                        off++;
                    }
                }
                if (off < 2) {
                    throw new IllegalArgumentException("all but one of the calibration points lie on one line "
                            + where + " (the line through points " + (i + 1) + " and " + (j + 1) + ")" + advice);
                }
            }
        }
    }

    private static int count(boolean[] flags) {
        int c = 0;
        for (boolean f : flags) {
            c += f ? 1 : 0;
        }
        return c;
    }

    private static boolean finite(double[] a) {
        for (double d : a) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.3g", v);
    }
}
