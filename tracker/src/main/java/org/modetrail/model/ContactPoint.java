package org.modetrail.model;

/**
 * Where on its box an object touches the ground, as fractions of the box's width and height from its top-left
 * corner: (0.5, 1) is the bottom centre, the usual choice for vehicles and people seen from above the ground;
 * (0.5, 0.5), the centre, suits animals or particles seen from straight above.
 */
public record ContactPoint(double alongWidth, double alongHeight) {
    public static final ContactPoint BOTTOM_CENTRE = new ContactPoint(0.5, 1);
    public static final ContactPoint CENTRE = new ContactPoint(0.5, 0.5);

    public ContactPoint {
        if (!(alongWidth >= 0 && alongWidth <= 1) || !(alongHeight >= 0 && alongHeight <= 1)) {
            throw new IllegalArgumentException("a contact point is given as fractions 0 to 1 of the box, got "
                    + alongWidth + ", " + alongHeight);
        }
    }

    /** The contact point of {@code box} in image pixels. */
    public PixelPoint on(Box box) {
        return new PixelPoint(box.x() + alongWidth * box.width(), box.y() + alongHeight * box.height());
    }
}
