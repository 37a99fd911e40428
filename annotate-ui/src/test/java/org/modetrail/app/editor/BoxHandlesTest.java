package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.modetrail.app.editor.BoxHandles.Adjusted;
import org.modetrail.app.editor.BoxHandles.Grip;
import org.modetrail.model.Box;

/**
 * Grips and edits of a box. Every expected number here was worked by hand: the box (100, 100) 200x100 seen at 1x
 * spans view x 100..300 and y 100..200; grips reach 6 view pixels; the frame is 640x480.
 */
class BoxHandlesTest {
    private static final BoxHandles H = BoxHandles.defaults();
    private static final Box B = new Box(100, 100, 200, 100);
    private static final ViewTransform ONE = ViewTransform.IDENTITY;

    @Test
    void gripsAtCornersEdgesAndInside() {
        assertEquals(Grip.INSIDE, H.hit(B, ONE, 200, 150));
        assertEquals(Grip.NORTH_WEST, H.hit(B, ONE, 100, 100));
        assertEquals(Grip.NORTH_WEST, H.hit(B, ONE, 96, 96));     // 4 px outside both edges
        assertEquals(Grip.NORTH_EAST, H.hit(B, ONE, 300, 94));    // exactly 6 px above
        assertEquals(Grip.SOUTH_EAST, H.hit(B, ONE, 305, 205));
        assertEquals(Grip.SOUTH_WEST, H.hit(B, ONE, 104, 196));
        assertEquals(Grip.NORTH, H.hit(B, ONE, 200, 103));
        assertEquals(Grip.NORTH, H.hit(B, ONE, 130, 99));         // anywhere along the edge
        assertEquals(Grip.SOUTH, H.hit(B, ONE, 200, 197));
        assertEquals(Grip.EAST, H.hit(B, ONE, 298, 150));
        assertEquals(Grip.WEST, H.hit(B, ONE, 95, 150));
        assertEquals(Grip.NONE, H.hit(B, ONE, 93, 150));          // 7 px outside
        assertEquals(Grip.NONE, H.hit(B, ONE, 200, 93));
        assertEquals(Grip.NONE, H.hit(B, ONE, 500, 400));
        assertTrue(Grip.EAST.resizes());
        assertFalse(Grip.INSIDE.resizes());
    }

    @Test
    void toleranceIsInViewPixels() {
        // At 2x, image box (50, 50) 100x50 is drawn over the same view pixels as B at 1x.
        ViewTransform two = new ViewTransform(2, 0, 0);
        Box b = new Box(50, 50, 100, 50);
        assertEquals(Grip.INSIDE, H.hit(b, two, 200, 150));
        assertEquals(Grip.WEST, H.hit(b, two, 95, 150));          // 5 view px = 2.5 image px outside
        assertEquals(Grip.NONE, H.hit(b, two, 93, 150));
    }

    @Test
    void aSmallBoxCanStillBeMovedFromItsMiddle() {
        // 8x8 at 1x: grips reach only 8 / 4 = 2 px inwards, so 102 < x < 106 moves it.
        Box small = new Box(100, 100, 8, 8);
        assertEquals(Grip.INSIDE, H.hit(small, ONE, 104, 104));
        assertEquals(Grip.WEST, H.hit(small, ONE, 101, 104));
        assertEquals(Grip.WEST, H.hit(small, ONE, 95, 104));
        assertEquals(Grip.NORTH_WEST, H.hit(small, ONE, 95, 95));
        assertEquals(Grip.SOUTH_EAST, H.hit(small, ONE, 107, 107));
    }

    @Test
    void movingStopsAtTheFrameEdges() {
        assertEquals(new Adjusted(new Box(150, 120, 200, 100), false), H.move(B, 50, 20, 640, 480));
        assertEquals(new Adjusted(new Box(440, 100, 200, 100), true), H.move(B, 400, 0, 640, 480));
        assertEquals(new Adjusted(new Box(0, 0, 200, 100), true), H.move(B, -150, -150, 640, 480));
        assertEquals(new Adjusted(new Box(100, 380, 200, 100), true), H.move(B, 0, 1000, 640, 480));
    }

    @Test
    void aBoxWiderThanTheFrameKeepsCoveringIt() {
        Box wide = new Box(-10, 0, 700, 100);
        assertEquals(new Adjusted(new Box(-5, 0, 700, 100), false), H.move(wide, 5, 0, 640, 480));
        assertEquals(new Adjusted(new Box(0, 0, 700, 100), true), H.move(wide, 20, 0, 640, 480));
        assertEquals(new Adjusted(new Box(-60, 0, 700, 100), true), H.move(wide, -80, 0, 640, 480));
    }

    @Test
    void resizingMovesTheGrippedEdges() {
        assertEquals(new Adjusted(new Box(100, 100, 240, 130), false),
                H.resize(B, Grip.SOUTH_EAST, 40, 30, 640, 480));
        assertEquals(new Adjusted(new Box(70, 100, 230, 100), false), H.resize(B, Grip.WEST, -30, 99, 640, 480));
        assertEquals(new Adjusted(new Box(100, 90, 200, 110), false), H.resize(B, Grip.NORTH, 77, -10, 640, 480));
        assertEquals(new Adjusted(new Box(120, 100, 180, 100), false),
                H.resize(B, Grip.SOUTH_WEST, 20, 0, 640, 480));
        assertEquals(new Adjusted(new Box(130, 100, 200, 100), false), H.resize(B, Grip.INSIDE, 30, 0, 640, 480));
        assertEquals(new Adjusted(B, false), H.resize(B, Grip.NONE, 30, 0, 640, 480));
    }

    @Test
    void resizingKeepsTheMinimumSizeWithoutCrossingOver() {
        // The left edge dragged 250 px right would pass the right edge (300): it stops at 300 - 2.
        assertEquals(new Adjusted(new Box(298, 100, 2, 100), false),
                H.resize(B, Grip.NORTH_WEST, 250, 0, 640, 480));
        assertEquals(new Adjusted(new Box(100, 100, 200, 2), false), H.resize(B, Grip.SOUTH, 0, -500, 640, 480));
    }

    @Test
    void resizingStopsAtTheFrameEdges() {
        assertEquals(new Adjusted(new Box(100, 100, 540, 100), true), H.resize(B, Grip.EAST, 400, 0, 640, 480));
        assertEquals(new Adjusted(new Box(100, 0, 200, 200), true), H.resize(B, Grip.NORTH, 0, -150, 640, 480));
        // An imported box reaching past the left edge is brought inside by any edit.
        assertEquals(new Adjusted(new Box(0, 10, 90, 50), true),
                H.resize(new Box(-20, 10, 100, 50), Grip.EAST, 10, 0, 640, 480));
    }

    @Test
    void aDrawnBoxIsCutToTheFrame() {
        assertEquals(new Adjusted(B, false), H.inFrame(B, 640, 480));
        assertEquals(new Adjusted(new Box(600, 400, 40, 80), true), H.inFrame(new Box(600, 400, 100, 100), 640, 480));
        Adjusted outside = H.inFrame(new Box(700, 0, 10, 10), 640, 480);
        assertNull(outside.box());
        assertTrue(outside.clamped());
    }

    @Test
    void sizeRules() {
        assertTrue(H.bigEnough(new Box(0, 0, 2, 2)));
        assertFalse(H.bigEnough(new Box(0, 0, 1.9, 5)));
        assertFalse(H.bigEnough(null));
        assertThrows(IllegalArgumentException.class, () -> new BoxHandles(0, 2));
        assertThrows(IllegalArgumentException.class, () -> new BoxHandles(6, -1));
    }
}
