package org.modetrail.demo;

/**
 * One box of a road user's body, in the user's own frame: {@code forward} along the direction of travel,
 * {@code lateral} to its right, {@code up} from the ground; metres from the footprint centre.
 *
 * <p>Parts are painted in {@code layer} order, then farthest first within a layer. Because the camera is above
 * every part, a part resting on top of another (a higher layer) is always seen in front of it.
 *
 * @param windowBottomM bottom of a glass band on the front and rear faces, NaN for none
 * @param windowTopM    top of that band
 */
record BoxPart(double rearM, double frontM, double leftM, double rightM, double bottomM, double topM, int layer,
               int sideColour, int topColour, double windowBottomM, double windowTopM) {

    static final int GLASS = Rgb.pack(46, 56, 70);

    BoxPart {
        if (!(frontM > rearM && rightM > leftM && topM > bottomM && bottomM >= 0)) {
            throw new IllegalArgumentException("box part must have positive extent and stand on or above the ground");
        }
        boolean hasWindow = !Double.isNaN(windowBottomM);
        if (hasWindow && !(windowBottomM >= bottomM && windowTopM <= topM && windowTopM > windowBottomM)) {
            throw new IllegalArgumentException("window band must lie within the part");
        }
    }

    static BoxPart solid(double rearM, double frontM, double halfWidthM, double bottomM, double topM, int layer,
                         int colour, int topColour) {
        return new BoxPart(rearM, frontM, -halfWidthM, halfWidthM, bottomM, topM, layer, colour, topColour,
                Double.NaN, Double.NaN);
    }

    BoxPart withWindow(double bottom, double top) {
        return new BoxPart(rearM, frontM, leftM, rightM, bottomM, topM, layer, sideColour, topColour, bottom, top);
    }

    boolean hasWindow() {
        return !Double.isNaN(windowBottomM);
    }
}
