package org.modetrail.run;

import org.modetrail.model.Box;

/** The box a fraction {@code t} of the way from one box to another, corner and size alike (common practice). */
public final class LinearInterpolation {
    private LinearInterpolation() {
    }

    public static Box between(Box a, Box b, double t) {
        if (!(t >= 0 && t <= 1)) {
            throw new IllegalArgumentException("t must be in [0, 1], got " + t);
        }
        return new Box(a.x() + t * (b.x() - a.x()), a.y() + t * (b.y() - a.y()),
                a.width() + t * (b.width() - a.width()), a.height() + t * (b.height() - a.height()));
    }
}
