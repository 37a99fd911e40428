package org.modetrail.demo;

/**
 * An ideal pinhole camera on a pole above flat ground: no lens distortion, square pixels, principal point at the
 * image centre.
 *
 * <p>World frame: the ground is {@code z = 0}, {@code y} runs along the road away from the pole, {@code x} across
 * it to the right, {@code z} up; metres. Camera frame: {@code x} right, {@code y} down, {@code z} along the optical
 * axis. Image coordinates are continuous with pixel column {@code i} spanning {@code [i, i+1)}: the centre of the
 * top-left pixel is (0.5, 0.5) and the principal point is {@code (width/2, height/2)}.
 *
 * @param widthPx  image width
 * @param heightPx image height
 * @param focalPx  focal length in pixels
 * @param xM       pole position across the road
 * @param yM       pole position along the road
 * @param heightM  camera height above the ground
 * @param tiltDeg  angle of the optical axis below the horizontal, 0..89
 * @param panDeg   angle of the optical axis from +y towards +x, as seen from above
 */
public record RoadCamera(int widthPx, int heightPx, double focalPx, double xM, double yM, double heightM,
                         double tiltDeg, double panDeg) {

    public RoadCamera {
        if (widthPx < 2 || heightPx < 2) {
            throw new IllegalArgumentException("image must be at least 2 x 2 pixels");
        }
        if (!(focalPx > 0) || Double.isInfinite(focalPx)) {
            throw new IllegalArgumentException("focal length must be positive, got " + focalPx);
        }
        if (!(heightM > 0)) {
            throw new IllegalArgumentException("camera must be above the ground, got height " + heightM);
        }
        if (!(tiltDeg > 0 && tiltDeg < 89)) {
            throw new IllegalArgumentException("tilt must be between 0 and 89 degrees down, got " + tiltDeg);
        }
        if (!(Math.abs(panDeg) <= 80)) {
            throw new IllegalArgumentException("pan must be within 80 degrees of the road axis, got " + panDeg);
        }
    }

    public double principalU() {
        return widthPx / 2.0;
    }

    public double principalV() {
        return heightPx / 2.0;
    }

    /**
     * World-to-camera rotation, row-major. Its rows are the camera's right, down and forward axes in world
     * coordinates: forward is the pan/tilt direction, right is horizontal, and down completes a right-handed frame.
     */
    public double[] rotation() {
        double t = Math.toRadians(tiltDeg);
        double p = Math.toRadians(panDeg);
        double ct = StrictMath.cos(t);
        double st = StrictMath.sin(t);
        double cp = StrictMath.cos(p);
        double sp = StrictMath.sin(p);
        return new double[] {
            cp, -sp, 0,
            -st * sp, -st * cp, -ct,
            ct * sp, ct * cp, -st};
    }

    /**
     * Projects a world point. Writes (u, v, depth) into {@code out}; depth is the distance in front of the camera
     * along its axis, and the point is behind the camera when it is not positive.
     */
    public void project(double[] rotation, double x, double y, double z, double[] out) {
        double dx = x - xM;
        double dy = y - yM;
        double dz = z - heightM;
        double cx = rotation[0] * dx + rotation[1] * dy + rotation[2] * dz;
        double cy = rotation[3] * dx + rotation[4] * dy + rotation[5] * dz;
        double cz = rotation[6] * dx + rotation[7] * dy + rotation[8] * dz;
        out[0] = principalU() + focalPx * cx / cz;
        out[1] = principalV() + focalPx * cy / cz;
        out[2] = cz;
    }

    /** (u, v) of a world point; for one-off use, as it recomputes the rotation. */
    public double[] project(double x, double y, double z) {
        double[] out = new double[3];
        project(rotation(), x, y, z, out);
        return new double[] {out[0], out[1]};
    }

    /**
     * The ground-plane homography {@code H = K [r1 r2 t]}: {@code (u, v, 1) ~ H (x, y, 1)} for points with
     * {@code z = 0}. Row-major, scaled so that {@code H[8] = 1}.
     */
    public double[] homography() {
        double[] r = rotation();
        // t = -R C with the camera centre C = (xM, yM, heightM).
        double t0 = -(r[0] * xM + r[1] * yM + r[2] * heightM);
        double t1 = -(r[3] * xM + r[4] * yM + r[5] * heightM);
        double t2 = -(r[6] * xM + r[7] * yM + r[8] * heightM);
        double f = focalPx;
        double u0 = principalU();
        double v0 = principalV();
        double[] h = {
            f * r[0] + u0 * r[6], f * r[1] + u0 * r[7], f * t0 + u0 * t2,
            f * r[3] + v0 * r[6], f * r[4] + v0 * r[7], f * t1 + v0 * t2,
            r[6], r[7], t2};
        double s = h[8];
        for (int k = 0; k < 9; k++) {
            h[k] /= s;
        }
        return h;
    }

    /** The inverse homography, image to ground, row-major (any scale). */
    public double[] groundFromImage() {
        double[] h = homography();
        double a = h[0], b = h[1], c = h[2], d = h[3], e = h[4], f = h[5], g = h[6], k = h[7], l = h[8];
        return new double[] {
            e * l - f * k, c * k - b * l, b * f - c * e,
            f * g - d * l, a * l - c * g, c * d - a * f,
            d * k - e * g, b * g - a * k, a * e - b * d};
    }
}
