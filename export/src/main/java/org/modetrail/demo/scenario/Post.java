package org.modetrail.demo.scenario;

/**
 * An opaque vertical bar over the full frame height, in front of every object: the occluder of
 * {@link ScenarioKind#OCCLUSION}. It covers pixel column {@code i} when the column's centre {@code i + 0.5} lies in
 * {@code [left, right)}.
 *
 * @param left   left edge in image coordinates
 * @param right  right edge
 * @param colour packed {@code 0x00RRGGBB}, shaded as a round pillar lit from the front
 */
record Post(double left, double right, int colour) {

    Post {
        if (!(right > left)) {
            throw new IllegalArgumentException("post must have positive width, got " + left + ".." + right);
        }
    }

    boolean coversColumn(int i) {
        double c = i + 0.5;
        return c >= left && c < right;
    }
}
