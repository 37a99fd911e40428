package org.modetrail.model;

/**
 * A kind of object the project annotates (animal, car, pedestrian) and the colour it is drawn in.
 *
 * @param name   unique within the project, not blank
 * @param colour packed 0xRRGGBB
 */
public record ObjectClass(String name, int colour) {
    public ObjectClass {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a class needs a name");
        }
        name = name.strip();
        colour &= 0xFFFFFF;
    }
}
