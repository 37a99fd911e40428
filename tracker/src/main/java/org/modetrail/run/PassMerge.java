package org.modetrail.run;

/**
 * How a frame between two keyframes takes its box when both the forward and the backward pass found the object.
 * Which is the default was chosen by the simulated annotator's effort (see DEVELOPERS.md, "Choosing how passes
 * merge").
 */
public enum PassMerge {
    /** The box of the pass more similar to its target model on that frame. */
    MORE_SIMILAR,
    /**
     * Where the two boxes agree (IoU at least {@link SpanFill#AGREEMENT}), their average weighted by each pass's
     * similarity and by nearness to the pass's own keyframe (a pass is surest near where it started); where they
     * disagree (on two different objects, say) the more similar one, as {@link #MORE_SIMILAR}.
     */
    BLEND
}
