package org.modetrail.tracking;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.FloatBuffer;
import java.util.Random;

import org.bytedeco.javacpp.FloatPointer;
import org.bytedeco.javacpp.IntPointer;
import org.bytedeco.javacpp.PointerPointer;
import org.bytedeco.opencv.global.opencv_core;
import org.bytedeco.opencv.global.opencv_imgproc;
import org.bytedeco.opencv.opencv_core.Mat;
import org.bytedeco.opencv.opencv_core.Rect;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.testsupport.RefData;
import org.modetrail.trackbench.StandInClip;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * {@link BhattacharyyaCoefficient} against OpenCV's {@code compareHist(H1, H2, HISTCMP_BHATTACHARYYA)} (OpenCV
 * 4.14 through JavaCPP's presets). OpenCV returns a distance, d = sqrt(1 - sum sqrt(H1 H2) / sqrt(sum H1 sum H2))
 * (its documentation writes the denominator as sqrt(mean(H1) mean(H2) N^2), the same thing); for histograms that sum
 * to 1 that is sqrt(1 - rho), so rho = 1 - d^2 is compared with ours, and d with our distance.
 *
 * <p>Along the way, RgbBinning's histogram of a box is compared bin for bin with OpenCV's calcHist over the same box
 * (16 uniform bins of [0, 256) per channel, dimensions R, G, B so the flat index matches ours).
 */
class BhattacharyyaAgainstOpenCvTest {
    /**
     * Float histograms scaled to sum 1 sum to 1 only within float rounding (measured: rho differs from 1 - d^2 by up
     * to about 1e-9 for that reason), and OpenCV divides by those sums: rho is compared at 1e-6, and, with OpenCV's
     * division by sqrt(sum H1 sum H2) undone, at 1e-9, which checks the sum itself to rounding level.
     */
    static final double RHO_TOLERANCE = 1e-6;
    static final double EXACT_TOLERANCE = 1e-9;
    static final double DISTANCE_TOLERANCE = 1e-5;

    static Mat histMat(float[] h) {
        Mat m = new Mat(h.length, 1, opencv_core.CV_32FC1);
        FloatBuffer fb = m.createBuffer();
        fb.put(h);
        return m;
    }

    /** Checks one pair and returns |rho - rho_opencv|. */
    static double agree(float[] p, float[] q) {
        double d;
        try (Mat a = histMat(p); Mat b = histMat(q)) {
            d = opencv_imgproc.compareHist(a, b, opencv_imgproc.HISTCMP_BHATTACHARYYA);
        }
        double rho = BhattacharyyaCoefficient.of(p, q);
        assertEquals(1 - d * d, rho, RHO_TOLERANCE);
        assertEquals((1 - d * d) * Math.sqrt(sum(p) * sum(q)), rho, EXACT_TOLERANCE);
        assertEquals(d, BhattacharyyaCoefficient.distance(rho), DISTANCE_TOLERANCE);
        // overBins over the bins where p is non-zero is the same sum (the other terms are zero).
        int[] bins = new int[p.length];
        int count = 0;
        for (int u = 0; u < p.length; u++) {
            if (p[u] != 0) {
                bins[count++] = u;
            }
        }
        assertEquals(rho, BhattacharyyaCoefficient.overBins(p, q, bins, count), 1e-12);
        return Math.abs(rho - (1 - d * d));
    }

    static double sum(float[] h) {
        double s = 0;
        for (float v : h) {
            s += v;
        }
        return s;
    }

    @Test
    void randomHistogramsAgree() {
        Random random = new Random(20240611);
        double worst = 0;
        for (int trial = 0; trial < 200; trial++) {
            int n = trial % 2 == 0 ? 4096 : 64;
            float[] p = new float[n];
            float[] q = new float[n];
            // Sparse like real colour histograms: most bins empty, a few hundred filled; some trials nearly equal.
            for (int u = 0; u < n; u++) {
                p[u] = random.nextInt(10) < 7 ? 0 : random.nextFloat();
                q[u] = trial % 5 == 0 ? p[u] * (0.9f + 0.2f * random.nextFloat())
                        : (random.nextInt(10) < 7 ? 0 : random.nextFloat());
            }
            worst = Math.max(worst, agree(Histograms.normalised(p), Histograms.normalised(q)));
        }
        // Identical and disjoint histograms: the ends of the scale.
        float[] one = new float[16];
        float[] other = new float[16];
        one[3] = 1;
        other[4] = 1;
        assertEquals(1, BhattacharyyaCoefficient.of(one, one), 1e-12);
        assertEquals(0, BhattacharyyaCoefficient.of(one, other), 0);
        agree(one, other);
        System.out.printf("Bhattacharyya vs OpenCV compareHist, 202 random pairs: max |rho - (1 - d^2)| = %.2e%n",
                worst);
    }

    @Test
    void standInFrameHistogramsAgreeWithCalcHistAndCompareHist() {
        StandInClip clip = StandInClip.basic();
        int[] rgb = new int[clip.width() * clip.height()];
        clip.render(0, rgb);
        int[] later = new int[rgb.length];
        clip.render(10, later);
        Box box = snapped(clip.truth(0).box());
        float[] p = checkedAgainstCalcHist(rgb, clip.width(), clip.height(), box);
        float[] q = checkedAgainstCalcHist(later, clip.width(), clip.height(), snapped(clip.truth(10).box()));
        float[] bg = checkedAgainstCalcHist(later, clip.width(), clip.height(), new Box(5, 5, 40, 40));
        double same = agree(Histograms.normalised(p), Histograms.normalised(q));
        double apart = agree(Histograms.normalised(p), Histograms.normalised(bg));
        // The object against itself ten frames on is far closer than against background (the box's corners are
        // background too, about 21% of it): the coefficient must separate them, or the pairs compared nothing useful.
        double rhoSame = BhattacharyyaCoefficient.of(Histograms.normalised(p), Histograms.normalised(q));
        double rhoApart = BhattacharyyaCoefficient.of(Histograms.normalised(p), Histograms.normalised(bg));
        assertTrue(rhoSame > 0.9 && rhoApart < 0.6, "rho object/object " + rhoSame + ", object/background " + rhoApart);
        System.out.printf("stand-in frame: rho %.4f (object, object) %.4f (object, background); |drho| %.2e, %.2e%n",
                rhoSame, rhoApart, same, apart);
    }

    @Test
    void realFootageHistogramsAgree() throws Exception {
        // vtest.avi (Debian opencv-doc): a pedestrian box and boxes of the street, frames 0 and 30.
        java.nio.file.Path vtest = RefData.vtest();
        java.nio.file.Path cache = java.nio.file.Files.createTempDirectory("modetrail-bhatt");
        try (VideoSource src = VideoSource.open(vtest, VideoOptions.defaults().withIndexCacheDir(cache))) {
            Frame f0 = src.frame(0);
            Frame f30 = src.frame(30);
            Box[] boxes = {new Box(100, 200, 60, 120), new Box(400, 300, 80, 160), new Box(600, 50, 100, 100)};
            double worst = 0;
            for (Box a : boxes) {
                float[] p = Histograms.normalised(checkedAgainstCalcHist(f0.rgb(), f0.width(), f0.height(), a));
                for (Box b : boxes) {
                    float[] q = Histograms.normalised(checkedAgainstCalcHist(f30.rgb(), f30.width(), f30.height(), b));
                    worst = Math.max(worst, agree(p, q));
                }
            }
            System.out.printf("vtest.avi histograms (9 pairs): max |rho - (1 - d^2)| = %.2e%n", worst);
        }
    }

    static Box snapped(Box b) {
        return new Box(Math.floor(b.x()), Math.floor(b.y()), Math.round(b.width()), Math.round(b.height()));
    }

    /** Our counts for the box, asserted equal to OpenCV calcHist's; returns ours. */
    static float[] checkedAgainstCalcHist(int[] rgb, int width, int height, Box box) {
        float[] ours = Histograms.counts(rgb, width, box, RgbBinning.COMANICIU);
        try (Mat image = new Mat(height, width, opencv_core.CV_8UC4);
                Rect r = new Rect((int) box.x(), (int) box.y(), (int) box.width(), (int) box.height());
                IntPointer channels = new IntPointer(2, 1, 0);
                IntPointer sizes = new IntPointer(16, 16, 16);
                FloatPointer range = new FloatPointer(0f, 256f);
                PointerPointer<FloatPointer> ranges = new PointerPointer<>(range, range, range);
                Mat hist = new Mat(); Mat noMask = new Mat()) {
            image.<ByteBuffer>createBuffer().order(ByteOrder.LITTLE_ENDIAN).asIntBuffer().put(rgb, 0, width * height);
            try (Mat roi = image.apply(r)) {
                // Channels 2, 1, 0 of B, G, R, A bytes: dimensions R, G, B, so bin (r, g, b) is at r*256 + g*16 + b.
                opencv_imgproc.calcHist(roi, 1, channels, noMask, hist, 3, sizes, ranges, true, false);
            }
            float[] theirs = new float[4096];
            FloatBuffer fb = hist.createBuffer();
            fb.get(theirs);
            assertArrayEquals(theirs, ours, 0f, "RgbBinning histogram vs OpenCV calcHist for " + box);
        }
        return ours;
    }
}
