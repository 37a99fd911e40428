package org.modetrail.demo;

/**
 * Ground truth of one object in one frame.
 *
 * <p>The box is in image coordinates where pixel column {@code i} spans {@code [i, i+1)}, so a box covering pixel
 * columns 10..19 has {@code x = 10, width = 10}. It is the box of the object's whole rendered body inside the image,
 * including parts hidden behind other objects (the amodal box), clipped to the image.
 *
 * @param trackId     1-based identity, stable over the clip
 * @param objectClass what the object is, e.g. {@code animal} or {@code car}
 * @param frame       0-based frame number
 * @param timeS       {@code frame / fps}
 * @param visible     fraction of the body's in-image pixels not hidden by other objects, 0..1
 * @param worldXM     road only: world x of the object's reference point in metres, NaN for the arena
 * @param worldYM     road only: world y of the reference point in metres, NaN for the arena
 * @param speedMS     road only: ground speed in m/s, NaN for the arena
 */
public record TruthRow(int trackId, String objectClass, int frame, double timeS,
                       double x, double y, double width, double height, double visible,
                       double worldXM, double worldYM, double speedMS) {

    public TruthRow {
        if (trackId < 1) {
            throw new IllegalArgumentException("track id must be 1 or more, got " + trackId);
        }
        if (objectClass == null || objectClass.isBlank() || objectClass.contains(",")) {
            throw new IllegalArgumentException("object class must be a non-blank word without commas");
        }
        if (frame < 0) {
            throw new IllegalArgumentException("frame must not be negative, got " + frame);
        }
        if (!(width > 0) || !(height > 0)) {
            throw new IllegalArgumentException("box must have positive size, got " + width + " x " + height);
        }
        if (!(visible >= 0 && visible <= 1)) {
            throw new IllegalArgumentException("visible fraction must be in 0..1, got " + visible);
        }
    }

    /** Row of the arena scenario, which has no world coordinates. */
    static TruthRow image(int trackId, String objectClass, int frame, double timeS, Coverage box, double visible) {
        return new TruthRow(trackId, objectClass, frame, timeS, box.x(), box.y(), box.width(), box.height(), visible,
                Double.NaN, Double.NaN, Double.NaN);
    }

    public boolean hasWorld() {
        return !Double.isNaN(worldXM);
    }
}
