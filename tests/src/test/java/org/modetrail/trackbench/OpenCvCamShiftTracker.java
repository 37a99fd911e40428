package org.modetrail.trackbench;

import static org.bytedeco.opencv.global.opencv_core.CV_8UC1;
import static org.bytedeco.opencv.global.opencv_core.CV_8UC4;
import static org.bytedeco.opencv.global.opencv_core.NORM_MINMAX;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.IntBuffer;

import org.bytedeco.javacpp.FloatPointer;
import org.bytedeco.javacpp.IntPointer;
import org.bytedeco.javacpp.PointerPointer;
import org.bytedeco.opencv.global.opencv_core;
import org.bytedeco.opencv.global.opencv_imgproc;
import org.bytedeco.opencv.global.opencv_video;
import org.bytedeco.opencv.opencv_core.Mat;
import org.bytedeco.opencv.opencv_core.Point;
import org.bytedeco.opencv.opencv_core.Rect;
import org.bytedeco.opencv.opencv_core.RotatedRect;
import org.bytedeco.opencv.opencv_core.Scalar;
import org.bytedeco.opencv.opencv_core.Size;
import org.bytedeco.opencv.opencv_core.TermCriteria;
import org.modetrail.model.Box;

/**
 * Reference tracker: OpenCV's CamShift (Bradski 1998) through JavaCPP's presets, set up the way OpenCV's camshift
 * sample sets it up (samples/cpp/camshiftdemo.cpp, from memory), except in colour: a 16x16x16 BGR histogram
 * ({@code calcHist}) of the ellipse inscribed in the start box, scaled to 0..255 with NORM_MINMAX, back-projected
 * ({@code calcBackProject}) and fed to {@code CamShift} with TermCriteria(EPS | COUNT, 10, 1) as in the sample.
 * Our addition, to match Modetrail's wide search: only a search region three times the window, centred on it, is
 * back-projected and searched. The box reported is the bounding rectangle of CamShift's rotated rectangle.
 *
 * <p>Buffers are made once per frame size: the frame (packed ints are little-endian B, G, R, A bytes, so the pixels
 * are copied as they are into an 8UC4 Mat and channels 0..2 are BGR), the back-projection, the mask and the
 * histogram. Per frame only ROI headers and the returned RotatedRect are made (and freed at once).
 */
public final class OpenCvCamShiftTracker implements BoxTracker {
    private static final int BINS = 16;
    /** Search region side over window side. */
    private static final int SEARCH_SCALE = 3;

    private final IntPointer channels = new IntPointer(0, 1, 2);
    private final IntPointer histSize = new IntPointer(BINS, BINS, BINS);
    private final FloatPointer range = new FloatPointer(0f, 256f);
    private final PointerPointer<FloatPointer> ranges = new PointerPointer<>(range, range, range);
    private final TermCriteria criteria = new TermCriteria(TermCriteria.EPS | TermCriteria.COUNT, 10, 1);
    private final Mat hist = new Mat();
    private final Mat noMask = new Mat();
    private Mat frame;
    private IntBuffer framePixels;
    private Mat backProjection;
    private Mat mask;
    private int width;
    private int height;
    private Rect window;
    private Box last;

    @Override
    public String name() {
        return "OpenCV CamShift";
    }

    @Override
    public void load(int[] rgb, int width, int height) {
        if (frame == null || width != this.width || height != this.height) {
            freeFrameBuffers();
            this.width = width;
            this.height = height;
            frame = new Mat(height, width, CV_8UC4);
            framePixels = frame.<ByteBuffer>createBuffer().order(ByteOrder.LITTLE_ENDIAN).asIntBuffer();
            backProjection = new Mat(height, width, CV_8UC1);
            mask = new Mat(height, width, CV_8UC1);
        }
        framePixels.clear();
        framePixels.put(rgb, 0, width * height);
    }

    @Override
    public void start(Box box) {
        window = clip(new Rect((int) Math.round(box.x()), (int) Math.round(box.y()),
                Math.max(1, (int) Math.round(box.width())), Math.max(1, (int) Math.round(box.height()))));
        mask.put(new Scalar(0.0));
        try (Point centre = new Point(window.x() + window.width() / 2, window.y() + window.height() / 2);
                Size axes = new Size(window.width() / 2, window.height() / 2);
                Scalar white = new Scalar(255.0)) {
            opencv_imgproc.ellipse(mask, centre, axes, 0, 0, 360, white, opencv_imgproc.FILLED, opencv_imgproc.LINE_8,
                    0);
        }
        opencv_imgproc.calcHist(frame, 1, channels, mask, hist, 3, histSize, ranges, true, false);
        opencv_core.normalize(hist, hist, 0, 255, NORM_MINMAX, -1, noMask);
        last = box;
    }

    @Override
    public Box track() {
        int sw = window.width() * SEARCH_SCALE;
        int sh = window.height() * SEARCH_SCALE;
        Rect region = clip(new Rect(window.x() + window.width() / 2 - sw / 2,
                window.y() + window.height() / 2 - sh / 2, sw, sh));
        if (region.width() <= 0 || region.height() <= 0) {
            return last;
        }
        try (Mat image = frame.apply(region); Mat prob = backProjection.apply(region);
                Rect local = new Rect(window.x() - region.x(), window.y() - region.y(), window.width(),
                        window.height())) {
            // The ROI header has the size and type asked for, so calcBackProject writes into our buffer.
            opencv_imgproc.calcBackProject(image, 1, channels, hist, prob, ranges, 1, true);
            try (RotatedRect found = opencv_video.CamShift(prob, local, criteria); Rect bounds = found.boundingRect()) {
                if (local.width() * local.height() > 1) {
                    window.x(local.x() + region.x()).y(local.y() + region.y()).width(local.width())
                            .height(local.height());
                    last = new Box(bounds.x() + region.x(), bounds.y() + region.y(), bounds.width(),
                            bounds.height());
                }
                // else: CamShift found no mass (window collapsed); keep the last window and box, as the sample
                // keeps looking around the last place.
            }
        }
        return last;
    }

    private Rect clip(Rect r) {
        int x0 = Math.max(0, r.x());
        int y0 = Math.max(0, r.y());
        int x1 = Math.min(width, r.x() + r.width());
        int y1 = Math.min(height, r.y() + r.height());
        r.x(x0).y(y0).width(Math.max(0, x1 - x0)).height(Math.max(0, y1 - y0));
        return r;
    }

    private void freeFrameBuffers() {
        if (frame != null) {
            frame.close();
            backProjection.close();
            mask.close();
        }
    }

    @Override
    public void close() {
        freeFrameBuffers();
        hist.close();
        noMask.close();
        criteria.close();
    }
}
