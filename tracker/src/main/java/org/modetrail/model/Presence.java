package org.modetrail.model;

/** Whether the object can be seen on a frame; hidden and absent are explicit marks, not missing data. */
public enum Presence {
    /** In view: the annotation has a box. */
    VISIBLE,
    /** In the scene but covered (behind a post, under another animal). */
    HIDDEN,
    /** Not in the scene (left the field of view, not yet arrived). */
    ABSENT
}
