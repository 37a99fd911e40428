package org.modetrail.overlay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.geom.Rectangle2D;

import org.junit.jupiter.api.Test;

/** Where tags go, worked by hand for 40 x 10 tags with a gap of 2 on a 200 x 100 picture. */
class TagPlacementTest {
    private final TagPlacement tags = new TagPlacement();

    @Test
    void aTagSitsAboveTheBoxsTopLeftCorner() {
        // x = floor(50 - 2) = 48, y = floor(40 - 2 - 10) = 28.
        assertEquals(new Rectangle2D.Double(48, 28, 40, 10), tags.place(50, 40, 70, 2, 40, 10, 200, 100));
    }

    @Test
    void aSecondBoxAtTheSamePlaceGetsItsTagBelowThenInsideThenHigher() {
        Rectangle2D first = tags.place(50, 40, 70, 2, 40, 10, 200, 100);
        Rectangle2D below = tags.place(50, 40, 70, 2, 40, 10, 200, 100);
        Rectangle2D inside = tags.place(50, 40, 70, 2, 40, 10, 200, 100);
        Rectangle2D higher = tags.place(50, 40, 70, 2, 40, 10, 200, 100);
        assertEquals(28, first.getY());
        assertEquals(72, below.getY(), "ceil(70 + 2)");
        assertEquals(42, inside.getY(), "ceil(40 + 2)");
        assertEquals(17, higher.getY(), "28 - 10 - 1");
    }

    @Test
    void aTagStaysInsideThePicture() {
        // A box at the top-right corner: the tag cannot go above it nor past the right edge.
        Rectangle2D t = tags.place(190, 0, 30, 2, 40, 10, 200, 100);
        assertEquals(160, t.getX(), "200 - 40");
        assertEquals(32, t.getY(), "below the box: ceil(30 + 2)");
    }

    @Test
    void aReservedNoteIsKeptClear() {
        tags.reserve(new Rectangle2D.Double(0, 20, 200, 15));
        assertEquals(72, tags.place(50, 40, 70, 2, 40, 10, 200, 100).getY());
    }

    @Test
    void whenEveryPlaceIsTakenTheTagStillGoesAboveTheBox() {
        tags.reserve(new Rectangle2D.Double(0, 0, 200, 100));
        assertEquals(28, tags.place(50, 40, 70, 2, 40, 10, 200, 100).getY());
        tags.clear();
        assertEquals(28, tags.place(50, 40, 70, 2, 40, 10, 200, 100).getY());
    }
}
