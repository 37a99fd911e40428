package org.modetrail.picture;

/** Which point of a track's box stands for the track in a trajectory. */
public enum TrajectoryPoint {
    /**
     * The ground contact point of the track's class (bottom centre unless the class says otherwise): the point that
     * positions in metres are computed from, so image-plane and ground-plane plots show the same point.
     */
    CONTACT,
    /** The centre of the box. */
    CENTRE
}
