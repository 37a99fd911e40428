package org.modetrail.demo.scenario;

/**
 * Ground truth of one object in one frame: the axis-aligned box of every pixel its body covers (the amodal box,
 * including pixels hidden behind a post or another object), and how much of the body is seen.
 *
 * <p>Image coordinates: pixel column {@code i} spans {@code [i, i+1)}, so a body covering columns 10..19 has
 * {@code x = 10, width = 10}. Boxes of rendered bodies are therefore whole numbers; the type keeps doubles so that
 * tracker output can be compared in the same units.
 *
 * @param x       left edge
 * @param y       top edge
 * @param width   width, not negative
 * @param height  height, not negative
 * @param visible fraction of the body's pixels not hidden by an occluder or another object, 0..1
 */
public record ScenarioBox(double x, double y, double width, double height, double visible) {

    public ScenarioBox {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("box corner must be finite, got " + x + ", " + y);
        }
        if (!(width >= 0) || !(height >= 0) || !Double.isFinite(width) || !Double.isFinite(height)) {
            throw new IllegalArgumentException("box size must be finite and not negative, got " + width + " x "
                    + height);
        }
        if (!(visible >= 0 && visible <= 1)) {
            throw new IllegalArgumentException("visible fraction must be in 0..1, got " + visible);
        }
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

    /** Intersection over union of the two boxes (visibility is ignored); 0 when both are empty. */
    public double iou(ScenarioBox other) {
        double w = Math.min(x + width, other.x + other.width) - Math.max(x, other.x);
        double h = Math.min(y + height, other.y + other.height) - Math.max(y, other.y);
        if (w <= 0 || h <= 0) {
            return 0;
        }
        double inter = w * h;
        return inter / (area() + other.area() - inter);
    }
}
