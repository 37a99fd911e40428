package org.modetrail.app.editor;

import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;

import org.modetrail.model.Box;

/**
 * How the frame canvas shows a frame: image point (ix, iy) is drawn at view point
 * (ix * scale + offsetX, iy * scale + offsetY), in the model's pixel convention (pixel column i spans [i, i + 1)).
 * Immutable; every zoom or pan gives a new transform. Pure geometry, no Swing.
 *
 * @param scale   view pixels per image pixel, within the limits it was made with
 * @param offsetX view x of the image's left edge
 * @param offsetY view y of the image's top edge
 */
public record ViewTransform(double scale, double offsetX, double offsetY) {

    /**
     * How far the view may zoom and how much of the image must stay on screen.
     *
     * @param minScale    the smallest zoom (view pixels per image pixel), above 0
     * @param maxScale    the largest zoom, at least {@code minScale}
     * @param keepVisible view pixels of the image that stay in view on each axis after a pan or zoom (the whole
     *                    image where it is smaller than that on screen), 1 or more
     */
    public record Limits(double minScale, double maxScale, double keepVisible) {
        /** 0.05x to 32x, keeping at least 64 view pixels of the image on screen. */
        public static final Limits DEFAULT = new Limits(0.05, 32, 64);

        public Limits {
            if (!(minScale > 0) || !(maxScale >= minScale) || !Double.isFinite(maxScale)) {
                throw new IllegalArgumentException("zoom limits need 0 < min <= max, got " + minScale + " to "
                        + maxScale);
            }
            if (!(keepVisible >= 1) || !Double.isFinite(keepVisible)) {
                throw new IllegalArgumentException("keepVisible must be 1 view pixel or more, got " + keepVisible);
            }
        }

        /** {@code s} brought within [minScale, maxScale]. */
        public double clampScale(double s) {
            return Math.max(minScale, Math.min(maxScale, s));
        }
    }

    /** Actual pixels, image at the view's origin. */
    public static final ViewTransform IDENTITY = new ViewTransform(1, 0, 0);

    public ViewTransform {
        if (!(scale > 0) || !Double.isFinite(scale) || !Double.isFinite(offsetX) || !Double.isFinite(offsetY)) {
            throw new IllegalArgumentException("a view transform needs a finite scale above 0 and finite offsets, got "
                    + scale + ", " + offsetX + ", " + offsetY);
        }
    }

    /**
     * The whole image as large as fits in the view, keeping its aspect ratio, centred (within the limits: a tiny
     * image stops at the largest zoom, a huge one at the smallest).
     */
    public static ViewTransform fit(int imageWidth, int imageHeight, int viewWidth, int viewHeight, Limits limits) {
        if (imageWidth <= 0 || imageHeight <= 0) {
            throw new IllegalArgumentException("image size must be positive, got " + imageWidth + "x" + imageHeight);
        }
        if (viewWidth <= 0 || viewHeight <= 0) {
            return new ViewTransform(limits.clampScale(1), 0, 0);
        }
        double s = limits.clampScale(Math.min(viewWidth / (double) imageWidth, viewHeight / (double) imageHeight));
        return new ViewTransform(s, (viewWidth - imageWidth * s) / 2, (viewHeight - imageHeight * s) / 2);
    }

    public double toViewX(double imageX) {
        return imageX * scale + offsetX;
    }

    public double toViewY(double imageY) {
        return imageY * scale + offsetY;
    }

    public double toImageX(double viewX) {
        return (viewX - offsetX) / scale;
    }

    public double toImageY(double viewY) {
        return (viewY - offsetY) / scale;
    }

    /** A box's rectangle in view coordinates, written into {@code out} (so painting allocates nothing). */
    public Rectangle2D.Double toView(Box b, Rectangle2D.Double out) {
        out.setRect(toViewX(b.x()), toViewY(b.y()), b.width() * scale, b.height() * scale);
        return out;
    }

    /** The view rectangle spanned by two view points, in image coordinates, in either order. */
    public Box toImage(double viewX0, double viewY0, double viewX1, double viewY1) {
        double x0 = toImageX(Math.min(viewX0, viewX1));
        double y0 = toImageY(Math.min(viewY0, viewY1));
        return new Box(x0, y0, Math.abs(viewX1 - viewX0) / scale, Math.abs(viewY1 - viewY0) / scale);
    }

    /**
     * Zoomed by {@code factor} about the view point (viewX, viewY): the image point under it stays under it. The
     * new scale is kept within the limits, so a factor past them zooms only as far as they allow.
     */
    public ViewTransform zoomAbout(double factor, double viewX, double viewY, Limits limits) {
        if (!(factor > 0) || !Double.isFinite(factor)) {
            throw new IllegalArgumentException("zoom factor must be finite and above 0, got " + factor);
        }
        double s = limits.clampScale(scale * factor);
        double ix = toImageX(viewX);
        double iy = toImageY(viewY);
        return new ViewTransform(s, viewX - ix * s, viewY - iy * s);
    }

    /** Panned by a view delta: the image moves (dx, dy) view pixels. */
    public ViewTransform panBy(double dx, double dy) {
        return new ViewTransform(scale, offsetX + dx, offsetY + dy);
    }

    /**
     * This transform with its offsets moved just enough that at least {@code limits.keepVisible()} view pixels of
     * the image (or all of it, where it is smaller on screen) stay inside the view on each axis; the scale is
     * brought within the limits too (about the view's centre). Unchanged when that already holds.
     */
    public ViewTransform clamped(int imageWidth, int imageHeight, int viewWidth, int viewHeight, Limits limits) {
        ViewTransform t = this;
        if (limits.clampScale(scale) != scale) {
            t = zoomAbout(limits.clampScale(scale) / scale, viewWidth / 2.0, viewHeight / 2.0, limits);
        }
        double ox = clampOffset(t.offsetX, imageWidth * t.scale, viewWidth, limits.keepVisible());
        double oy = clampOffset(t.offsetY, imageHeight * t.scale, viewHeight, limits.keepVisible());
        return ox == t.offsetX && oy == t.offsetY ? t : new ViewTransform(t.scale, ox, oy);
    }

    /** The offset of an image extent {@code size} (view pixels) on a view axis of {@code view} pixels. */
    private static double clampOffset(double offset, double size, int view, double keep) {
        double k = Math.min(keep, Math.min(size, Math.max(view, 0)));
        double lowest = k - size;   // the image's far edge k pixels inside the view's near edge
        double highest = view - k;  // the image's near edge k pixels inside the view's far edge
        return Math.max(lowest, Math.min(highest, offset));
    }

    /** The same mapping for Java2D (image to view). */
    public AffineTransform toAffine() {
        return new AffineTransform(scale, 0, 0, scale, offsetX, offsetY);
    }
}
