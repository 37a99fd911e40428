package org.modetrail.tracking;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.FloatBuffer;
import java.util.Random;

import org.bytedeco.javacpp.FloatPointer;
import org.bytedeco.javacpp.IntPointer;
import org.bytedeco.javacpp.PointerPointer;
import org.bytedeco.opencv.global.opencv_core;
import org.bytedeco.opencv.global.opencv_imgproc;
import org.bytedeco.opencv.global.opencv_video;
import org.bytedeco.opencv.opencv_core.Mat;
import org.bytedeco.opencv.opencv_core.Rect;
import org.bytedeco.opencv.opencv_core.TermCriteria;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;
import org.modetrail.trackbench.StandInClip;

/**
 * {@link FlatMeanShift#seek} against OpenCV's {@code meanShift(probImage, window, criteria)} (OpenCV 4.14,
 * video module) on the same CV_32FC1 weight image, with the same flat rectangular window.
 *
 * <p>How OpenCV's differs, from its camshift.cpp (read from memory, and borne out by the figures below): the window
 * is an integer Rect that moves by whole pixels (the rounded shift), it stops when the rounded shift is zero
 * (with epsilon 1), it is clamped inside the image, and its centroid is in pixel indices (pixel i at i, not
 * i + 0.5). So OpenCV's converged window has centre (x + w/2 + 0.5, y + h/2 + 0.5) in our convention, and lands
 * within half a pixel per axis of the fixed point; ours iterates to the fixed point itself. The windows below stay
 * away from the borders, where the clamping differs on purpose (ours lets the outside count as zero weight).
 */
class FlatMeanShiftAgainstOpenCvTest {
    /** Per axis: OpenCV's rounding to whole pixels (0.5) plus where the iteration stops inside that (0.5). */
    static final double AGREE_PX = 1.0;

    /** OpenCV's converged window centre in Modetrail's convention (pixel i spans [i, i + 1)). */
    static double[] openCvCentre(float[] weights, int width, int height, Box start) {
        try (Mat prob = new Mat(height, width, opencv_core.CV_32FC1);
                Rect window = new Rect((int) start.x(), (int) start.y(), (int) start.width(), (int) start.height());
                TermCriteria criteria = new TermCriteria(TermCriteria.COUNT | TermCriteria.EPS, 100, 1)) {
            FloatBuffer fb = prob.createBuffer();
            fb.put(weights);
            opencv_video.meanShift(prob, window, criteria);
            assertEquals((int) start.width(), window.width(), "meanShift keeps the window size");
            return new double[] {window.x() + window.width() / 2.0 + 0.5, window.y() + window.height() / 2.0 + 0.5};
        }
    }

    static double[] ours(float[] weights, int width, int height, Box start) {
        Box b = FlatMeanShift.seek(weights, width, height, start, 100, 1e-3);
        assertEquals(start.width(), b.width(), 0);
        return new double[] {b.centreX(), b.centreY()};
    }

    /** A Gaussian blob centred on (cx, cy) (our convention) over a faint ramp, so the mode is not on a pixel grid. */
    static float[] blob(int width, int height, double cx, double cy, double sigma) {
        float[] w = new float[width * height];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                double dx = x + 0.5 - cx;
                double dy = y + 0.5 - cy;
                w[y * width + x] = (float) Math.exp(-(dx * dx + dy * dy) / (2 * sigma * sigma));
            }
        }
        return w;
    }

    @Test
    void gaussianBlobSameModeFromManyStarts() {
        int width = 240;
        int height = 180;
        double cx = 131.3;
        double cy = 77.7;
        // Sigma 6 against windows at least 24 px (two sigma each side), like an object-sized window on an
        // object-sized blob. With a window only ~1 sigma each side OpenCV's rounded steps stall early: measured
        // 1.7 px short of the mode with sigma 11 and a 35x24 window, where each step covers only ~40% of the
        // remaining distance and OpenCV stops once a step rounds to zero. That is its stopping rule, not another mode.
        float[] w = blob(width, height, cx, cy, 6);
        Random random = new Random(7);
        double worst = 0;
        for (int trial = 0; trial < 40; trial++) {
            int bw = 30 + random.nextInt(20);
            int bh = 24 + random.nextInt(20);
            // Starts up to 18 px off the blob, so the blob is always partly in the window (both must find it).
            double sx = cx + random.nextInt(37) - 18;
            double sy = cy + random.nextInt(37) - 18;
            Box start = new Box(Math.round(sx - bw / 2.0), Math.round(sy - bh / 2.0), bw, bh);
            double[] ours = ours(w, width, height, start);
            double[] cv = openCvCentre(w, width, height, start);
            // The analytic mode: a symmetric blob is the fixed point of a window centred on it, up to the window
            // covering whole pixels: a window centred on a fractional point takes one more row on one side, which
            // pulls the fixed point (by up to 0.4 px measured with sigma 11; half a pixel is the most one row can do).
            assertEquals(cx, ours[0], 0.5, "our mean shift reaches the blob's centre from " + start);
            assertEquals(cy, ours[1], 0.5, "our mean shift reaches the blob's centre from " + start);
            assertEquals(ours[0], cv[0], AGREE_PX, "x against OpenCV from " + start);
            assertEquals(ours[1], cv[1], AGREE_PX, "y against OpenCV from " + start);
            worst = Math.max(worst, Math.max(Math.abs(ours[0] - cv[0]), Math.abs(ours[1] - cv[1])));
        }
        System.out.printf("FlatMeanShift vs OpenCV meanShift, Gaussian blob, 40 starts: max |d centre| = %.3f px%n",
                worst);
    }

    @Test
    void twoBlobsTheNearerModeWins() {
        // Two modes 60 px apart; each start nearer one must end on that one, for both.
        int width = 240;
        int height = 140;
        float[] a = blob(width, height, 70.2, 70.4, 9);
        float[] b = blob(width, height, 130.6, 69.1, 9);
        float[] w = new float[a.length];
        for (int i = 0; i < w.length; i++) {
            w[i] = a[i] + 0.7f * b[i];
        }
        for (int sx : new int[] {55, 80, 120, 145}) {
            Box start = new Box(sx - 16, 54, 32, 32);
            double[] ours = ours(w, width, height, start);
            double[] cv = openCvCentre(w, width, height, start);
            double expected = sx < 100 ? 70.2 : 130.6;
            assertEquals(expected, ours[0], 1.0, "our mode from x " + sx);
            assertEquals(ours[0], cv[0], AGREE_PX, "x against OpenCV from x " + sx);
            assertEquals(ours[1], cv[1], AGREE_PX, "y against OpenCV from x " + sx);
        }
    }

    @Test
    void backProjectionOfAFrameSameWindow() {
        // A likelihood image as the tracker's wide search sees one: the object's colour histogram (frame 0 of the
        // stand-in clip, truth box) back-projected by OpenCV's calcBackProject onto frame 8, where the object has
        // moved; both searches start from the frame-0 box.
        StandInClip clip = StandInClip.basic();
        int width = clip.width();
        int height = clip.height();
        int[] f0 = new int[width * height];
        int[] f8 = new int[width * height];
        clip.render(0, f0);
        clip.render(8, f8);
        Box truth0 = BhattacharyyaAgainstOpenCvTest.snapped(clip.truth(0).box());
        float[] hist = Histograms.normalised(Histograms.counts(f0, width, truth0, RgbBinning.COMANICIU));
        float[] weights = backProject(f8, width, height, hist);
        double[] ours = ours(weights, width, height, truth0);
        double[] cv = openCvCentre(weights, width, height, truth0);
        Box truth8 = clip.truth(8).box();
        double moved = truth8.centreDistance(clip.truth(0).box());
        assertTrue(moved > 8, "the object moved " + moved + " px, so the search has work to do");
        assertEquals(truth8.centreX(), ours[0], 2.0, "our window finds the object");
        assertEquals(truth8.centreY(), ours[1], 2.0, "our window finds the object");
        assertEquals(ours[0], cv[0], AGREE_PX);
        assertEquals(ours[1], cv[1], AGREE_PX);
        System.out.printf("FlatMeanShift vs OpenCV meanShift, back-projection: ours (%.2f, %.2f), OpenCV (%.2f, %.2f),"
                + " truth (%.2f, %.2f)%n", ours[0], ours[1], cv[0], cv[1], truth8.centreX(), truth8.centreY());
    }

    /** OpenCV's calcBackProject of {@code hist} (R, G, B order, 16 bins each) onto the frame, as floats. */
    static float[] backProject(int[] rgb, int width, int height, float[] hist) {
        float[] out = new float[width * height];
        int[] sizes = {16, 16, 16};
        try (Mat image = new Mat(height, width, opencv_core.CV_8UC4);
                Mat h = new Mat(3, sizes, opencv_core.CV_32FC1);
                Mat dst = new Mat();
                Mat dstF = new Mat();
                IntPointer channels = new IntPointer(2, 1, 0);
                FloatPointer range = new FloatPointer(0f, 256f);
                PointerPointer<FloatPointer> ranges = new PointerPointer<>(range, range, range)) {
            image.<java.nio.ByteBuffer>createBuffer().order(java.nio.ByteOrder.LITTLE_ENDIAN).asIntBuffer()
                    .put(rgb, 0, width * height);
            ((FloatBuffer) h.createBuffer()).put(hist);
            // Scale 1000: with an 8-bit image the back-projection is 8-bit too; probabilities of ~0.05 would round
            // to 0 otherwise (the sample scales its histogram to 0..255 for the same reason).
            opencv_imgproc.calcBackProject(image, 1, channels, h, dst, ranges, 1000, true);
            dst.convertTo(dstF, opencv_core.CV_32F);
            ((FloatBuffer) dstF.createBuffer()).get(out);
        }
        return out;
    }
}
