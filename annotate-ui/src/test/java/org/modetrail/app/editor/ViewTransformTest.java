package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;

import org.junit.jupiter.api.Test;
import org.modetrail.model.Box;

/** The canvas's image-to-view mapping. Every expected number here was worked by hand from the definitions. */
class ViewTransformTest {
    private static final double EPS = 1e-9;
    private static final ViewTransform.Limits LIMITS = ViewTransform.Limits.DEFAULT;

    @Test
    void fitCentresTheWholeImageAsLargeAsItGoes() {
        // 640x480 in 1000x600: min(1000/640 = 1.5625, 600/480 = 1.25) = 1.25, so 800x600 shown, 100 spare each side.
        ViewTransform t = ViewTransform.fit(640, 480, 1000, 600, LIMITS);
        assertEquals(1.25, t.scale(), EPS);
        assertEquals(100, t.offsetX(), EPS);
        assertEquals(0, t.offsetY(), EPS);
        // 1920x1080 in 800x600: min(0.41667, 0.5556) = 800/1920; shown 800x450, 75 spare above and below.
        ViewTransform hd = ViewTransform.fit(1920, 1080, 800, 600, LIMITS);
        assertEquals(800.0 / 1920, hd.scale(), EPS);
        assertEquals(0, hd.offsetX(), EPS);
        assertEquals(75, hd.offsetY(), EPS);
    }

    @Test
    void fitStopsAtTheZoomLimits() {
        // A 4x4 image in 1000x1000 would want 250x; the limit is 32x: 128x128 shown, (1000 - 128) / 2 = 436 spare.
        ViewTransform t = ViewTransform.fit(4, 4, 1000, 1000, LIMITS);
        assertEquals(32, t.scale(), EPS);
        assertEquals(436, t.offsetX(), EPS);
    }

    @Test
    void imageAndViewPointsMapBothWays() {
        ViewTransform t = new ViewTransform(1.25, 100, 0);
        assertEquals(500, t.toViewX(320), EPS);  // 320 * 1.25 + 100
        assertEquals(300, t.toViewY(240), EPS);  // 240 * 1.25
        assertEquals(0, t.toImageX(100), EPS);
        assertEquals(160, t.toImageY(200), EPS); // 200 / 1.25
        Rectangle2D.Double r = t.toView(new Box(10, 20, 40, 8), new Rectangle2D.Double());
        assertEquals(new Rectangle2D.Double(112.5, 25, 50, 10), r);
        // View (300, 250) to (100, 0): image (0, 0) to (160, 200).
        assertEquals(new Box(0, 0, 160, 200), t.toImage(300, 250, 100, 0));
        Point2D p = t.toAffine().transform(new Point2D.Double(320, 240), null);
        assertEquals(500, p.getX(), EPS);
        assertEquals(300, p.getY(), EPS);
    }

    @Test
    void zoomKeepsThePointUnderTheCursor() {
        // Under view (300, 200) at 1.25x offset (100, 0) lies image ((300 - 100) / 1.25, 200 / 1.25) = (160, 160).
        // At 2.5x it must still be there: offset = (300 - 160 * 2.5, 200 - 160 * 2.5) = (-100, -200).
        ViewTransform t = new ViewTransform(1.25, 100, 0).zoomAbout(2, 300, 200, LIMITS);
        assertEquals(2.5, t.scale(), EPS);
        assertEquals(-100, t.offsetX(), EPS);
        assertEquals(-200, t.offsetY(), EPS);
        assertEquals(300, t.toViewX(160), EPS);
        assertEquals(200, t.toViewY(160), EPS);
        ViewTransform back = t.zoomAbout(0.5, 300, 200, LIMITS);
        assertEquals(new ViewTransform(1.25, 100, 0).offsetX(), back.offsetX(), EPS);
        assertEquals(0, back.offsetY(), EPS);
    }

    @Test
    void zoomStopsAtTheLimitsAndStillKeepsThePoint() {
        // 1.25 x 100 = 125 is past 32x: stops at 32. Image under (300, 200) is (160, 160): offset 300 - 5120.
        ViewTransform in = new ViewTransform(1.25, 100, 0).zoomAbout(100, 300, 200, LIMITS);
        assertEquals(32, in.scale(), EPS);
        assertEquals(300 - 160 * 32, in.offsetX(), EPS);
        ViewTransform out = ViewTransform.IDENTITY.zoomAbout(0.001, 0, 0, LIMITS);
        assertEquals(0.05, out.scale(), EPS);
        assertThrows(IllegalArgumentException.class, () -> ViewTransform.IDENTITY.zoomAbout(0, 0, 0, LIMITS));
    }

    @Test
    void panMovesTheImageByTheViewDelta() {
        ViewTransform t = new ViewTransform(1.25, 100, 0).panBy(10, -5);
        assertEquals(new ViewTransform(1.25, 110, -5), t);
    }

    @Test
    void clampingKeepsPartOfTheImageInView() {
        // 640x480 at 1x in an 800x600 view, keeping 64 px: x offset at least 64 - 640 = -576, y at most 600 - 64.
        ViewTransform lost = new ViewTransform(1, -1000, 700).clamped(640, 480, 800, 600, LIMITS);
        assertEquals(new ViewTransform(1, -576, 536), lost);
        // Already fine: the same transform comes back.
        ViewTransform fine = new ViewTransform(1, 30, 40);
        assertSame(fine, fine.clamped(640, 480, 800, 600, LIMITS));
        // At 0.05x the image is 32x24 on screen, less than 64: all of it stays in view, so x in [0, 768].
        ViewTransform tiny = new ViewTransform(0.05, -10, 590).clamped(640, 480, 800, 600, LIMITS);
        assertEquals(0, tiny.offsetX(), EPS);
        assertEquals(600 - 24, tiny.offsetY(), EPS);
    }

    @Test
    void badValuesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new ViewTransform(0, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new ViewTransform(1, Double.NaN, 0));
        assertThrows(IllegalArgumentException.class, () -> new ViewTransform.Limits(0, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> new ViewTransform.Limits(2, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> new ViewTransform.Limits(1, 2, 0));
        assertThrows(IllegalArgumentException.class, () -> ViewTransform.fit(0, 10, 100, 100, LIMITS));
    }
}
