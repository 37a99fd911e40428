package org.modetrail.trackbench;

import boofcv.abst.tracker.TrackerObjectQuad;
import boofcv.struct.image.ImageBase;
import georegression.struct.shapes.Quadrilateral_F64;
import org.modetrail.model.Box;

/**
 * A BoofCV {@link TrackerObjectQuad} behind {@link BoxTracker}: the start box becomes the quadrilateral, the box
 * reported is the axis-aligned bounds of the quadrilateral it returns. Honest failure: a frame on which
 * {@code process} returns false gets no box (null), and the tracker is called again on the next frame (TLD, for one,
 * may find the object again); a start {@code initialize} refuses makes a run with no box.
 *
 * @param <T> the image type the tracker takes; {@link #image()} holds the frame last loaded
 */
abstract class BoofQuadAdapter<T extends ImageBase<T>> implements BoxTracker {
    private final TrackerObjectQuad<T> tracker;
    private final Quadrilateral_F64 quad = new Quadrilateral_F64();
    private boolean refused;

    BoofQuadAdapter(TrackerObjectQuad<T> tracker) {
        this.tracker = tracker;
    }

    /** The frame last loaded, in the tracker's image type. */
    abstract T image();

    @Override
    public void start(Box box) {
        quad.a.setTo(box.x(), box.y());
        quad.b.setTo(box.right(), box.y());
        quad.c.setTo(box.right(), box.bottom());
        quad.d.setTo(box.x(), box.bottom());
        try {
            refused = !tracker.initialize(image(), quad);
        } catch (RuntimeException e) {
            refused = true; // BoofCV refuses some boxes (too small for its template) with an exception
        }
    }

    @Override
    public boolean working() {
        return !refused;
    }

    @Override
    public Box track() {
        if (refused || !tracker.process(image(), quad)) {
            return null;
        }
        double x0 = Math.min(Math.min(quad.a.x, quad.b.x), Math.min(quad.c.x, quad.d.x));
        double x1 = Math.max(Math.max(quad.a.x, quad.b.x), Math.max(quad.c.x, quad.d.x));
        double y0 = Math.min(Math.min(quad.a.y, quad.b.y), Math.min(quad.c.y, quad.d.y));
        double y1 = Math.max(Math.max(quad.a.y, quad.b.y), Math.max(quad.c.y, quad.d.y));
        if (!(x1 > x0) || !(y1 > y0) || !Double.isFinite(x0) || !Double.isFinite(y0)) {
            return null;
        }
        return new Box(x0, y0, x1 - x0, y1 - y0);
    }
}
