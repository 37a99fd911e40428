package org.modetrail.demo.scenario;

/**
 * A soft band of shade sweeping across the whole picture, as the shadow of a building edge or a passing cloud: the
 * light is multiplied by {@code 1 - depth} inside the band, with smoothstep edges {@code 2 * soft} wide. The band
 * lies across the direction {@code angle}; its centre moves along that direction at {@code speed} px per frame.
 *
 * @param angle     direction the band moves in, radians from +x towards +y
 * @param halfWidth half the band's width to the middle of its edges, px
 * @param soft      half the width of each soft edge, px
 * @param depth     how much light the band takes, 0..0.8; 0 is no band
 * @param start     position of the band's centre at frame 0, px along {@code angle} from the image origin
 * @param speed     px per frame
 */
record ShadowBand(double angle, double halfWidth, double soft, double depth, double start, double speed) {

    static final ShadowBand NONE = new ShadowBand(0, 1, 1, 0, 0, 0);

    ShadowBand {
        if (!(depth >= 0 && depth <= 0.8) || !(halfWidth > 0) || !(soft > 0) || !(soft <= halfWidth)) {
            throw new IllegalArgumentException("band depth must be 0..0.8 and 0 < soft <= half width, got " + depth
                    + ", " + soft + ", " + halfWidth);
        }
    }

    boolean isNone() {
        return depth == 0;
    }

    double centre(int frame) {
        return start + speed * frame;
    }

    /** Light factor at signed distance {@code d} from the band's centre line. */
    double factor(double d) {
        double x = (halfWidth + soft - Math.abs(d)) / (2 * soft);
        if (x <= 0) {
            return 1;
        }
        if (x >= 1) {
            return 1 - depth;
        }
        return 1 - depth * x * x * (3 - 2 * x);
    }
}
