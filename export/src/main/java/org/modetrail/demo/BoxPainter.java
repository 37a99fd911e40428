package org.modetrail.demo;

/**
 * Paints {@link BoxPart}s through the road camera. A box is convex, so its visible faces (those facing the camera)
 * never overlap one another and can be filled in any order. Working buffers are reused between boxes.
 */
final class BoxPainter {

    /** Points closer than this along the optical axis are treated as behind the camera. */
    private static final double NEAR_M = 0.5;
    private static final double TOP_LIGHT = 1.0;
    private static final double SIDE_LIGHT = 0.82;
    private static final double END_LIGHT = 0.68;

    private final RoadCamera camera;
    private final double[] rotation;
    private final double[] corners = new double[16];
    private final double[] point = new double[3];
    private final double[] xs = new double[4];
    private final double[] ys = new double[4];

    BoxPainter(RoadCamera camera) {
        this.camera = camera;
        this.rotation = camera.rotation();
    }

    /** Depth along the optical axis of a world point. */
    double depth(double x, double y, double z) {
        camera.project(rotation, x, y, z, point);
        return point[2];
    }

    /**
     * Paints one part of an object at footprint centre (cx, cy) heading (dx, dy). Returns false, painting nothing,
     * when any corner is too near or behind the camera.
     */
    boolean paint(Canvas canvas, BoxPart part, double cx, double cy, double dx, double dy) {
        // Corner index: (forward bit * 2 + lateral bit) * 2 + up bit.
        for (int k = 0; k < 8; k++) {
            double f = (k & 4) == 0 ? part.rearM() : part.frontM();
            double l = (k & 2) == 0 ? part.leftM() : part.rightM();
            double z = (k & 1) == 0 ? part.bottomM() : part.topM();
            camera.project(rotation, cx + f * dx + l * dy, cy + f * dy - l * dx, z, point);
            if (point[2] < NEAR_M) {
                return false;
            }
            corners[2 * k] = point[0];
            corners[2 * k + 1] = point[1];
        }
        // The camera's position in the part's own frame decides which faces it sees.
        double ox = camera.xM() - cx;
        double oy = camera.yM() - cy;
        double camForward = ox * dx + oy * dy;
        double camLateral = ox * dy - oy * dx;
        int side = part.sideColour();
        face(canvas, 1, 3, 7, 5, Rgb.scale(part.topColour(), TOP_LIGHT));
        if (camForward > part.frontM()) {
            face(canvas, 4, 6, 7, 5, Rgb.scale(side, END_LIGHT));
            window(canvas, part, part.frontM(), cx, cy, dx, dy);
        }
        if (camForward < part.rearM()) {
            face(canvas, 0, 2, 3, 1, Rgb.scale(side, END_LIGHT));
            window(canvas, part, part.rearM(), cx, cy, dx, dy);
        }
        if (camLateral > part.rightM()) {
            face(canvas, 2, 6, 7, 3, Rgb.scale(side, SIDE_LIGHT));
        }
        if (camLateral < part.leftM()) {
            face(canvas, 0, 4, 5, 1, Rgb.scale(side, SIDE_LIGHT));
        }
        return true;
    }

    /** Darkens the ground under and beside a footprint: shadows belong to no object. */
    void shadow(Canvas canvas, double cx, double cy, double dx, double dy, double length, double width) {
        // Sun to the left and behind the camera: shadows fall a little to +x and +y.
        double sx = cx + 0.35;
        double sy = cy + 0.25;
        double hl = length / 2 + 0.15;
        double hw = width / 2 + 0.15;
        double[][] offsets = {{-hl, -hw}, {hl, -hw}, {hl, hw}, {-hl, hw}};
        for (int k = 0; k < 4; k++) {
            double f = offsets[k][0];
            double l = offsets[k][1];
            camera.project(rotation, sx + f * dx + l * dy, sy + f * dy - l * dx, 0, point);
            if (point[2] < NEAR_M) {
                return;
            }
            xs[k] = point[0];
            ys[k] = point[1];
        }
        canvas.fillConvex(xs, ys, 4, -1, false, 0.62);
    }

    private void face(Canvas canvas, int a, int b, int c, int d, int colour) {
        xs[0] = corners[2 * a];
        ys[0] = corners[2 * a + 1];
        xs[1] = corners[2 * b];
        ys[1] = corners[2 * b + 1];
        xs[2] = corners[2 * c];
        ys[2] = corners[2 * c + 1];
        xs[3] = corners[2 * d];
        ys[3] = corners[2 * d + 1];
        canvas.fillConvex(xs, ys, 4, colour, true, 1);
    }

    /** A glass band on an end face, inset from the sides; it lies within the face, so it is seen when the face is. */
    private void window(Canvas canvas, BoxPart part, double forward, double cx, double cy, double dx, double dy) {
        if (!part.hasWindow()) {
            return;
        }
        double inset = 0.08 * (part.rightM() - part.leftM());
        double l0 = part.leftM() + inset;
        double l1 = part.rightM() - inset;
        double[][] quad = {{l0, part.windowBottomM()}, {l1, part.windowBottomM()},
                           {l1, part.windowTopM()}, {l0, part.windowTopM()}};
        for (int k = 0; k < 4; k++) {
            double l = quad[k][0];
            camera.project(rotation, cx + forward * dx + l * dy, cy + forward * dy - l * dx, quad[k][1], point);
            xs[k] = point[0];
            ys[k] = point[1];
        }
        canvas.fillConvex(xs, ys, 4, BoxPart.GLASS, true, 1);
    }
}
