package org.modetrail.tracking;

/** How the tracker follows changes of the object's size. */
public enum ScaleMethod {
    /** The box keeps the size it was started with. */
    FIXED,
    /**
     * Comaniciu, Ramesh and Meer's rule: localise with the window at its size and 10% smaller and larger, keep the
     * best and smooth (PAMI 2003, section 5). Known to shrink the window on its own.
     */
    TEN_PERCENT,
    /**
     * Width and height from the second moments of the colour-likelihood map ({@link MomentScaleEstimator}), a new size
     * taken only if the target's similarity at it holds.
     */
    MOMENTS,
    /**
     * As {@link #MOMENTS}, and a new size is taken only if the centre-surround response of the likelihood does not
     * fall there either ({@link CentreSurroundScale}): a box does not widen over a look-alike neighbour.
     */
    CHECKED_MOMENTS,
    /**
     * Width and height by a local search for the strongest centre-surround response of the colour-likelihood map
     * ({@link CentreSurroundScale}, after Collins 2003).
     */
    CENTRE_SURROUND
}
