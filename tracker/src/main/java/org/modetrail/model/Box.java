package org.modetrail.model;

/**
 * An axis-aligned bounding box in pixel coordinates: (x, y) is the top-left corner, x to the right and y down,
 * with pixel column i spanning [i, i + 1), so the centre of the top-left pixel is (0.5, 0.5).
 */
public record Box(double x, double y, double width, double height) {

    public Box {
        if (!(width >= 0) || !(height >= 0) || !Double.isFinite(x) || !Double.isFinite(y)
                || !Double.isFinite(width) || !Double.isFinite(height)) {
            throw new IllegalArgumentException("a box needs finite coordinates and a size of 0 or more, got "
                    + x + ", " + y + ", " + width + "x" + height);
        }
    }

    /** The box of the given size centred on (cx, cy). */
    public static Box centredAt(double cx, double cy, double width, double height) {
        return new Box(cx - width / 2, cy - height / 2, width, height);
    }

    public double centreX() {
        return x + width / 2;
    }

    public double centreY() {
        return y + height / 2;
    }

    public double area() {
        return width * height;
    }

    public double right() {
        return x + width;
    }

    public double bottom() {
        return y + height;
    }

    /** Area of the intersection with another box. */
    public double intersection(Box o) {
        double w = Math.min(right(), o.right()) - Math.max(x, o.x);
        double h = Math.min(bottom(), o.bottom()) - Math.max(y, o.y);
        return w > 0 && h > 0 ? w * h : 0;
    }

    /** Intersection over union (Jaccard index); 0 when both are empty. */
    public double iou(Box o) {
        double inter = intersection(o);
        double union = area() + o.area() - inter;
        return union > 0 ? inter / union : 0;
    }

    /** Distance between the two centres in pixels. */
    public double centreDistance(Box o) {
        return Math.hypot(centreX() - o.centreX(), centreY() - o.centreY());
    }

    public Box movedTo(double cx, double cy) {
        return centredAt(cx, cy, width, height);
    }

    public Box resized(double newWidth, double newHeight) {
        return centredAt(centreX(), centreY(), newWidth, newHeight);
    }
}
