package org.modetrail.app.editor;

import org.modetrail.model.Box;

/**
 * Where a pointer is on a box drawn in the view, and what dragging there does to the box. Pure geometry, no Swing.
 *
 * <p>A box has eight grips: its four corners, reached within {@code tolerance} view pixels of them, and its four
 * edges, reached anywhere along them within {@code tolerance} view pixels (the view marks each edge's grip at its
 * middle). A pointer inside the box and away from its outline moves it. On a box small on
 * screen the grips reach inwards only a quarter of its width or height, so the middle still moves it.
 *
 * <p>Edited boxes are kept fully inside the frame: a box moved past an edge stops at it, an edge dragged past the
 * frame's edge stops there, and a box drawn across the edge is cut to the frame. (Boxes imported from elsewhere may
 * reach past the frame; the model allows it, but an edit here brings them inside.) A resized box keeps at least
 * {@code minSize} image pixels a side; its edges do not cross over.
 *
 * @param tolerance how near the outline (view pixels) a grip is reached, above 0
 * @param minSize   the smallest width and height of a box (image pixels), above 0
 */
public record BoxHandles(double tolerance, double minSize) {

    /** What part of a box is under the pointer. */
    public enum Grip {
        /** Not on the box. */
        NONE(false, false, false, false),
        /** Inside, away from the outline: moves the box. */
        INSIDE(false, false, false, false),
        NORTH(false, true, false, false),
        SOUTH(false, false, false, true),
        EAST(false, false, true, false),
        WEST(true, false, false, false),
        NORTH_EAST(false, true, true, false),
        NORTH_WEST(true, true, false, false),
        SOUTH_EAST(false, false, true, true),
        SOUTH_WEST(true, false, false, true);

        private final boolean left, top, right, bottom;

        Grip(boolean left, boolean top, boolean right, boolean bottom) {
            this.left = left;
            this.top = top;
            this.right = right;
            this.bottom = bottom;
        }

        /** Whether dragging this grip resizes the box (one of the eight handles). */
        public boolean resizes() {
            return left || top || right || bottom;
        }
    }

    /** A box after an edit, and whether the frame's edge stopped it. */
    public record Adjusted(Box box, boolean clamped) {
    }

    /** Grips within 6 view pixels; boxes at least 2 image pixels a side. */
    public static BoxHandles defaults() {
        return new BoxHandles(6, 2);
    }

    public BoxHandles {
        if (!(tolerance > 0) || !Double.isFinite(tolerance)) {
            throw new IllegalArgumentException("grip tolerance must be above 0 view pixels, got " + tolerance);
        }
        if (!(minSize > 0) || !Double.isFinite(minSize)) {
            throw new IllegalArgumentException("minimum box size must be above 0 image pixels, got " + minSize);
        }
    }

    /** The grip of box {@code b} (image coordinates, shown through {@code t}) under view point (vx, vy). */
    public Grip hit(Box b, ViewTransform t, double vx, double vy) {
        double left = t.toViewX(b.x()), right = t.toViewX(b.right());
        double top = t.toViewY(b.y()), bottom = t.toViewY(b.bottom());
        double inX = Math.min(tolerance, (right - left) / 4);
        double inY = Math.min(tolerance, (bottom - top) / 4);
        if (vx < left - tolerance || vx > right + tolerance || vy < top - tolerance || vy > bottom + tolerance) {
            return Grip.NONE;
        }
        boolean nearLeft = vx <= left + inX;
        boolean nearRight = !nearLeft && vx >= right - inX;
        boolean nearTop = vy <= top + inY;
        boolean nearBottom = !nearTop && vy >= bottom - inY;
        if (nearTop && nearLeft) {
            return Grip.NORTH_WEST;
        }
        if (nearTop && nearRight) {
            return Grip.NORTH_EAST;
        }
        if (nearBottom && nearLeft) {
            return Grip.SOUTH_WEST;
        }
        if (nearBottom && nearRight) {
            return Grip.SOUTH_EAST;
        }
        if (nearTop) {
            return Grip.NORTH;
        }
        if (nearBottom) {
            return Grip.SOUTH;
        }
        if (nearLeft) {
            return Grip.WEST;
        }
        if (nearRight) {
            return Grip.EAST;
        }
        return Grip.INSIDE;
    }

    /** Box {@code b} moved by (dx, dy) image pixels, stopped at the frame's edges (frame width x height). */
    public Adjusted move(Box b, double dx, double dy, int frameWidth, int frameHeight) {
        double x = b.x() + dx, y = b.y() + dy;
        double cx = clampStart(x, b.width(), frameWidth);
        double cy = clampStart(y, b.height(), frameHeight);
        return new Adjusted(new Box(cx, cy, b.width(), b.height()), cx != x || cy != y);
    }

    /** Where a span of {@code size} starting at {@code start} is kept inside [0, limit]. */
    private static double clampStart(double start, double size, int limit) {
        if (size >= limit) {
            return Math.max(limit - size, Math.min(0, start)); // wider than the frame: covers it
        }
        return Math.max(0, Math.min(limit - size, start));
    }

    /**
     * Box {@code b} with the edges of {@code grip} moved by (dx, dy) image pixels: each moved edge stops at the
     * frame's edge and at {@code minSize} from the opposite edge. {@link Grip#INSIDE} moves the box; {@link
     * Grip#NONE} leaves it as it is (inside the frame).
     */
    public Adjusted resize(Box b, Grip grip, double dx, double dy, int frameWidth, int frameHeight) {
        if (grip == Grip.INSIDE) {
            return move(b, dx, dy, frameWidth, frameHeight);
        }
        double l = b.x(), t = b.y(), r = b.right(), btm = b.bottom();
        boolean clamped = false;
        if (grip.left) {
            double want = l + dx;
            l = Math.max(0, Math.min(r - minSize, want));
            clamped |= want < 0;
        }
        if (grip.right) {
            double want = r + dx;
            r = Math.min(frameWidth, Math.max(l + minSize, want));
            clamped |= want > frameWidth;
        }
        if (grip.top) {
            double want = t + dy;
            t = Math.max(0, Math.min(btm - minSize, want));
            clamped |= want < 0;
        }
        if (grip.bottom) {
            double want = btm + dy;
            btm = Math.min(frameHeight, Math.max(t + minSize, want));
            clamped |= want > frameHeight;
        }
        Adjusted inside = inFrame(new Box(l, t, r - l, btm - t), frameWidth, frameHeight);
        return new Adjusted(inside.box(), clamped || inside.clamped());
    }

    /** The part of {@code b} inside the frame, and whether anything was cut; null box when nothing is left. */
    public Adjusted inFrame(Box b, int frameWidth, int frameHeight) {
        double l = Math.max(0, b.x()), t = Math.max(0, b.y());
        double r = Math.min(frameWidth, b.right()), btm = Math.min(frameHeight, b.bottom());
        boolean cut = l != b.x() || t != b.y() || r != b.right() || btm != b.bottom();
        if (!cut) {
            return new Adjusted(b, false);
        }
        return new Adjusted(r > l && btm > t ? new Box(l, t, r - l, btm - t) : null, true);
    }

    /** Whether a box is big enough to keep (at least {@code minSize} image pixels a side). */
    public boolean bigEnough(Box b) {
        return b != null && b.width() >= minSize && b.height() >= minSize;
    }
}
