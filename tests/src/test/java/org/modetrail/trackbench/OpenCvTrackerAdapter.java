package org.modetrail.trackbench;

import static org.bytedeco.opencv.global.opencv_core.CV_8UC3;
import static org.bytedeco.opencv.global.opencv_core.CV_8UC4;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.IntBuffer;

import org.bytedeco.opencv.global.opencv_imgproc;
import org.bytedeco.opencv.opencv_core.Mat;
import org.bytedeco.opencv.opencv_core.Rect;
import org.bytedeco.opencv.opencv_video.Tracker;
import org.modetrail.model.Box;

/**
 * An OpenCV single-object tracker ({@code cv::Tracker}: {@code init(Mat, Rect)}, {@code update(Mat, Rect)} returning
 * false when it reports failure) behind {@link BoxTracker}, on 8-bit BGR frames as OpenCV's tracking samples feed
 * it. Packed {@code 0xFFRRGGBB} ints are little-endian B, G, R, A bytes, so the pixels are copied as they are into an
 * 8UC4 Mat and turned into BGR with {@code cvtColor} in {@link #load} (not timed).
 *
 * <p>Honest failure: a frame on which {@code update} returns false gets no box (null); the tracker is called again on
 * the next frame, since OpenCV's trackers may find the object again. A start box OpenCV refuses (an exception from
 * {@code init}, e.g. a box too small for its features) makes a run with no box on any frame.
 */
abstract class OpenCvTrackerAdapter implements BoxTracker {
    private Mat bgra;
    private IntBuffer pixels;
    private Mat bgr;
    private int width;
    private int height;
    private Tracker tracker;
    private final Rect found = new Rect();
    private boolean refused;

    /** A new tracker with the library's default parameters. */
    abstract Tracker create();

    @Override
    public void load(int[] rgb, int width, int height) {
        if (bgra == null || width != this.width || height != this.height) {
            freeFrames();
            this.width = width;
            this.height = height;
            bgra = new Mat(height, width, CV_8UC4);
            pixels = bgra.<ByteBuffer>createBuffer().order(ByteOrder.LITTLE_ENDIAN).asIntBuffer();
            bgr = new Mat(height, width, CV_8UC3);
        }
        pixels.clear();
        pixels.put(rgb, 0, width * height);
        opencv_imgproc.cvtColor(bgra, bgr, opencv_imgproc.COLOR_BGRA2BGR);
    }

    @Override
    public void start(Box box) {
        closeTracker();
        int x0 = Math.max(0, (int) Math.round(box.x()));
        int y0 = Math.max(0, (int) Math.round(box.y()));
        int x1 = Math.min(width, (int) Math.round(box.right()));
        int y1 = Math.min(height, (int) Math.round(box.bottom()));
        refused = x1 - x0 < 2 || y1 - y0 < 2;
        if (refused) {
            return;
        }
        tracker = create();
        try (Rect r = new Rect(x0, y0, x1 - x0, y1 - y0)) {
            tracker.init(bgr, r);
        } catch (RuntimeException e) {
            refused = true;
        }
    }

    @Override
    public boolean working() {
        return !refused;
    }

    @Override
    public Box track() {
        if (refused) {
            return null;
        }
        boolean ok;
        try {
            ok = tracker.update(bgr, found);
        } catch (RuntimeException e) {
            ok = false; // cv::Exception inside update: the tracker could not place the box on this frame
        }
        if (!ok || found.width() <= 0 || found.height() <= 0) {
            return null;
        }
        return new Box(found.x(), found.y(), found.width(), found.height());
    }

    private void closeTracker() {
        if (tracker != null) {
            tracker.close();
            tracker = null;
        }
    }

    private void freeFrames() {
        if (bgra != null) {
            bgra.close();
            bgr.close();
        }
    }

    @Override
    public void close() {
        closeTracker();
        freeFrames();
        found.close();
    }
}
