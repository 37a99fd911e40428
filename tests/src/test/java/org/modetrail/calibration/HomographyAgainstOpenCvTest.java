package org.modetrail.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.DoubleBuffer;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.bytedeco.javacpp.indexer.DoubleIndexer;
import org.bytedeco.javacpp.indexer.UByteIndexer;
import org.bytedeco.opencv.global.opencv_calib3d;
import org.bytedeco.opencv.global.opencv_core;
import org.bytedeco.opencv.opencv_core.Mat;
import org.junit.jupiter.api.Test;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.WorldPoint;

/**
 * {@link HomographyFit} against OpenCV's {@code findHomography} (OpenCV 4.14 through JavaCPP's presets) on the same
 * points: the road clip's 30 surveyed ground points with Gaussian image noise, and with outliers. OpenCV is given
 * ground points as source and image points as destination, so that both minimise the same error, the distance in
 * the image between a point and its ground point mapped into the image (OpenCV's documentation calls it the
 * back-projection error; after its linear estimate it refines with Levenberg-Marquardt). The two fits are then
 * compared as maps, over the calibrated area, not entry by entry.
 */
class HomographyAgainstOpenCvTest {
    /**
     * Both minimise the same cost from nearby starts; they differ only in where their iterations stop. Measured:
     * at most 6e-5 px and 3e-6 m between the two maps over the road (printed by the tests); the tolerances leave a
     * factor of more than 15.
     */
    static final double MAP_TOLERANCE_PX = 1e-3;
    static final double MAP_TOLERANCE_M = 1e-3;

    static Mat points(List<double[]> xy) {
        Mat m = new Mat(xy.size(), 1, opencv_core.CV_64FC2);
        DoubleBuffer b = m.createBuffer();
        for (double[] p : xy) {
            b.put(p[0]).put(p[1]);
        }
        return m;
    }

    static double[] entries(Mat h) {
        DoubleIndexer idx = h.createIndexer();
        double[] out = new double[9];
        for (int k = 0; k < 9; k++) {
            out[k] = idx.get(k / 3, k % 3);
        }
        return out;
    }

    static double[] apply(double[] h, double x, double y) {
        double w = h[6] * x + h[7] * y + h[8];
        return new double[] {(h[0] * x + h[1] * y + h[2]) / w, (h[3] * x + h[4] * y + h[5]) / w};
    }

    /** The road points with image noise, and points {@code outliers} moved by 20 to 60 px. */
    static List<GroundPoint> noisy(double noisePx, boolean[] outliers, long seed) throws Exception {
        Random r = new Random(seed);
        List<GroundPoint> out = new ArrayList<>();
        List<RoadReference.Point> ref = RoadReference.points();
        for (int i = 0; i < ref.size(); i++) {
            RoadReference.Point p = ref.get(i);
            double u = p.u() + noisePx * r.nextGaussian();
            double v = p.v() + noisePx * r.nextGaussian();
            if (outliers != null && outliers[i]) {
                double a = 2 * Math.PI * r.nextDouble();
                double d = 20 + 40 * r.nextDouble();
                u += d * Math.cos(a);
                v += d * Math.sin(a);
            }
            out.add(new GroundPoint(new PixelPoint(u, v), new WorldPoint(p.x(), p.y())));
        }
        return out;
    }

    /** Largest distance between the two ground-to-image maps (px) and image-to-ground maps (m) over the road. */
    static double[] mapDifference(double[] oursG2i, double[] cvG2i, double[] oursI2g, double[] cvI2g) {
        double px = 0;
        double m = 0;
        for (double x = 0; x <= 14; x += 1) {
            for (double y = 12; y <= 66; y += 2) {
                double[] a = apply(oursG2i, x, y);
                double[] b = apply(cvG2i, x, y);
                px = Math.max(px, Math.hypot(a[0] - b[0], a[1] - b[1]));
                double[] ga = apply(oursI2g, a[0], a[1]);
                double[] gb = apply(cvI2g, a[0], a[1]);
                m = Math.max(m, Math.hypot(ga[0] - gb[0], ga[1] - gb[1]));
            }
        }
        return new double[] {px, m};
    }

    static double[] invert(double[] h) {
        return new org.modetrail.model.Homography(h).inverse().entries();
    }

    @Test
    void leastSquaresFitAgreesWithOpenCv() throws Exception {
        for (double noise : new double[] {0, 0.5, 1.5}) {
            List<GroundPoint> pts = noisy(noise, null, 4);
            List<double[]> world = new ArrayList<>();
            List<double[]> image = new ArrayList<>();
            for (GroundPoint p : pts) {
                world.add(new double[] {p.world().x(), p.world().y()});
                image.add(new double[] {p.image().x(), p.image().y()});
            }
            double[] cv;
            try (Mat src = points(world); Mat dst = points(image); Mat h = opencv_calib3d.findHomography(src, dst)) {
                cv = entries(h);
            }
            GroundCalibration ours = HomographyFit.fit(pts, CalibrationConfig.defaults().withThresholdPx(10));
            assertTrue(ours.errors().stream().allMatch(e -> e.inlier()), "no outliers at " + noise + " px");
            double[] oursI2g = ours.imageToWorld().entries();
            double[] d = mapDifference(invert(oursI2g), cv, oursI2g, invert(cv));
            System.out.printf("noise %.1f px: maps differ by at most %.2e px, %.2e m; our RMS %.3f px%n", noise, d[0],
                    d[1], ours.rmsPixels());
            assertEquals(0, d[0], MAP_TOLERANCE_PX, "ground to image, noise " + noise);
            assertEquals(0, d[1], MAP_TOLERANCE_M, "image to ground, noise " + noise);
            if (noise > 0) {
                // Same cost, same minimum: OpenCV's RMS on the points equals ours.
                double sum = 0;
                for (GroundPoint p : pts) {
                    double[] q = apply(cv, p.world().x(), p.world().y());
                    sum += Math.pow(q[0] - p.image().x(), 2) + Math.pow(q[1] - p.image().y(), 2);
                }
                assertEquals(Math.sqrt(sum / pts.size()), ours.rmsPixels(), 1e-6);
            }
        }
    }

    @Test
    void ransacKeepsTheSameInliersAsOpenCv() throws Exception {
        boolean[] outliers = new boolean[30];
        for (int i = 1; i < 30; i += 3) {
            outliers[i] = true; // 10 of 30 (33 %)
        }
        List<GroundPoint> pts = noisy(0.5, outliers, 8);
        List<double[]> world = new ArrayList<>();
        List<double[]> image = new ArrayList<>();
        for (GroundPoint p : pts) {
            world.add(new double[] {p.world().x(), p.world().y()});
            image.add(new double[] {p.image().x(), p.image().y()});
        }
        boolean[] cvInlier = new boolean[30];
        double[] cv;
        try (Mat src = points(world); Mat dst = points(image); Mat mask = new Mat();
             Mat h = opencv_calib3d.findHomography(src, dst, opencv_calib3d.RANSAC, 3, mask, 2000, 0.995)) {
            cv = entries(h);
            UByteIndexer idx = mask.createIndexer();
            for (int i = 0; i < 30; i++) {
                cvInlier[i] = idx.get(i) != 0;
            }
        }
        GroundCalibration ours = HomographyFit.fit(pts);
        for (int i = 0; i < 30; i++) {
            assertEquals(!outliers[i], ours.errors().get(i).inlier(), "ours, point " + (i + 1));
            assertEquals(!outliers[i], cvInlier[i], "OpenCV, point " + (i + 1));
        }
        // OpenCV's RANSAC result itself is not the least-squares fit of its inliers (measured: RMS 0.52 px on the
        // inliers against our 0.46 px; its final refinement stops early), so the maps are compared after a plain
        // least-squares findHomography on OpenCV's inliers, and our RMS must not exceed that of OpenCV's RANSAC map.
        double sum = 0;
        List<double[]> inWorld = new ArrayList<>();
        List<double[]> inImage = new ArrayList<>();
        for (int i = 0; i < 30; i++) {
            if (cvInlier[i]) {
                GroundPoint p = pts.get(i);
                double[] q = apply(cv, p.world().x(), p.world().y());
                sum += Math.pow(q[0] - p.image().x(), 2) + Math.pow(q[1] - p.image().y(), 2);
                inWorld.add(world.get(i));
                inImage.add(image.get(i));
            }
        }
        double cvRms = Math.sqrt(sum / inWorld.size());
        assertTrue(ours.rmsPixels() <= cvRms + 1e-9, ours.rmsPixels() + " px vs OpenCV's " + cvRms + " px");
        double[] refit;
        try (Mat src = points(inWorld); Mat dst = points(inImage); Mat h = opencv_calib3d.findHomography(src, dst)) {
            refit = entries(h);
        }
        double[] oursI2g = ours.imageToWorld().entries();
        double[] d = mapDifference(invert(oursI2g), refit, oursI2g, invert(refit));
        System.out.printf("RANSAC, 10 of 30 outliers: same inliers; RMS on inliers ours %.4f px, OpenCV RANSAC %.4f px;"
                + " maps (ours, OpenCV least squares on its inliers) differ by at most %.2e px, %.2e m%n",
                ours.rmsPixels(), cvRms, d[0], d[1]);
        assertEquals(0, d[0], MAP_TOLERANCE_PX);
        assertEquals(0, d[1], MAP_TOLERANCE_M);
    }
}
