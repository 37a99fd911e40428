package org.modetrail.demo.scenario;

/**
 * Where a body of the scenario family is in every frame: centre, semi-axes in pixels (they change for non-rigid
 * bodies and with distance), heading, depth (bodies are painted in increasing depth, so the larger is in front) and
 * whether it is there at all. Computed once when the scenario is made; the arrays are owned once given.
 */
final class BodyTrack {

    private final double[] cx;
    private final double[] cy;
    private final double[] a;
    private final double[] b;
    private final double[] heading;
    private final double[] depth;
    private final boolean[] shown;

    BodyTrack(double[] cx, double[] cy, double[] a, double[] b, double[] heading, double[] depth, boolean[] shown) {
        int n = cx.length;
        if (n == 0 || cy.length != n || a.length != n || b.length != n || heading.length != n || depth.length != n
                || shown.length != n) {
            throw new IllegalArgumentException("body track needs one value of everything per frame");
        }
        for (int f = 0; f < n; f++) {
            if (!(a[f] > 0 && b[f] > 0) || !Double.isFinite(cx[f]) || !Double.isFinite(cy[f])
                    || !Double.isFinite(heading[f])) {
                throw new IllegalArgumentException("frame " + f + ": semi-axes must be positive and the place finite");
            }
        }
        this.cx = cx;
        this.cy = cy;
        this.a = a;
        this.b = b;
        this.heading = heading;
        this.depth = depth;
        this.shown = shown;
    }

    /** Always shown, depth the bottom of the body's box (lower in the image is nearer the camera). */
    static BodyTrack of(double[] cx, double[] cy, double[] a, double[] b, double[] heading) {
        int n = cx.length;
        double[] depth = new double[n];
        boolean[] shown = new boolean[n];
        for (int f = 0; f < n; f++) {
            shown[f] = true;
            double c = Math.abs(StrictMath.cos(heading[f]));
            double s = Math.abs(StrictMath.sin(heading[f]));
            depth[f] = cy[f] + a[f] * s + b[f] * c;
        }
        return new BodyTrack(cx, cy, a, b, heading, depth, shown);
    }

    int frames() {
        return cx.length;
    }

    boolean shown(int frame) {
        return shown[frame];
    }

    double depth(int frame) {
        return depth[frame];
    }

    double cx(int frame) {
        return cx[frame];
    }

    double cy(int frame) {
        return cy[frame];
    }

    /** Semi-length in pixels. */
    double a(int frame) {
        return a[frame];
    }

    double b(int frame) {
        return b[frame];
    }

    double heading(int frame) {
        return heading[frame];
    }

    Pose pose(int frame) {
        return Pose.of(cx[frame], cy[frame], a[frame], b[frame], heading[frame]);
    }

    /**
     * The pose at time {@code t} in frames, linear between the frames either side (heading the short way round),
     * held at the ends of the clip and across a frame where the body is not shown. At a whole {@code t} it is
     * exactly {@link #pose(int)}, so the sharp sample of a blurred body is the truth's body.
     */
    Pose at(double t) {
        int n = cx.length;
        if (t <= 0) {
            return pose(0);
        }
        if (t >= n - 1) {
            return pose(n - 1);
        }
        int f0 = (int) Math.floor(t);
        int f1 = f0 + 1;
        double w = t - f0;
        if (w == 0) {
            return pose(f0);
        }
        if (shown[f0] != shown[f1]) {
            return pose(w < 0.5 ? f0 : f1);
        }
        double h = heading[f0] + Routes.wrap(heading[f1] - heading[f0]) * w;
        return Pose.of(cx[f0] + (cx[f1] - cx[f0]) * w, cy[f0] + (cy[f1] - cy[f0]) * w, a[f0] + (a[f1] - a[f0]) * w,
                b[f0] + (b[f1] - b[f0]) * w, h);
    }

    /** Largest semi-length and semi-width over the clip: the resolution a body's pattern needs. */
    double maxA() {
        double m = 0;
        for (double v : a) {
            m = Math.max(m, v);
        }
        return m;
    }

    double maxB() {
        double m = 0;
        for (double v : b) {
            m = Math.max(m, v);
        }
        return m;
    }
}
