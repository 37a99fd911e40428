package org.modetrail.summary;

/**
 * The caution printed with every output in metres or metres per second (summaries, exports): these are
 * measurements from video with a stated uncertainty, not certified values.
 */
public final class MeasurementCaution {
    public static final String TEXT = "Positions, distances and speeds are measurements from video, with the "
            + "uncertainty stated beside them (from the calibration's reprojection error and the tracking). They "
            + "depend on the calibration points, the camera and the ground being a plane. Speeds, headways or "
            + "conflicts used for road-safety, design or enforcement decisions need local codes and licensed "
            + "engineering practice; treat these figures as inputs to that judgement, not as its result.";

    private MeasurementCaution() {
    }
}
