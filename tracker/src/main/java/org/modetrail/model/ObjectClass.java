package org.modetrail.model;

/**
 * A kind of object the project annotates (animal, car, pedestrian), the colour it is drawn in, and where its box
 * touches the ground (for positions in metres).
 *
 * @param name    unique within the project, not blank
 * @param colour  packed 0xRRGGBB
 * @param contact the ground contact point on the box; bottom centre when not given
 */
public record ObjectClass(String name, int colour, ContactPoint contact) {
    public ObjectClass {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a class needs a name");
        }
        name = name.strip();
        colour &= 0xFFFFFF;
        if (contact == null) {
            contact = ContactPoint.BOTTOM_CENTRE;
        }
    }

    public ObjectClass(String name, int colour) {
        this(name, colour, ContactPoint.BOTTOM_CENTRE);
    }

    public ObjectClass withContact(ContactPoint c) {
        return new ObjectClass(name, colour, c);
    }
}
