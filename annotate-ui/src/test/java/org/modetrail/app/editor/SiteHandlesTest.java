package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.modetrail.model.CountingLine;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Site;
import org.modetrail.model.Zone;

/**
 * Hit testing and frame-keeping of zones and lines, worked by hand at 2x zoom with the frame at view (10, 20): image
 * (x, y) is view (2x + 10, 2y + 20). Tolerance 7 view pixels.
 */
class SiteHandlesTest {
    private static final ViewTransform T = new ViewTransform(2, 10, 20);
    private static final SiteHandles H = SiteHandles.defaults();
    /** A big square zone 0..100, a small one 40..60 inside it, and a line along image y = 50 from x 0 to 100. */
    private static final Site SITE = new Site(null,
            List.of(square("field", 0, 100), square("burrow", 40, 60)),
            List.of(new CountingLine("gate", new PixelPoint(0, 50), new PixelPoint(100, 50))));

    private static Zone square(String name, double lo, double hi) {
        return new Zone(name, List.of(new PixelPoint(lo, lo), new PixelPoint(hi, lo), new PixelPoint(hi, hi),
                new PixelPoint(lo, hi)));
    }

    private static PixelPoint p(double x, double y) {
        return new PixelPoint(x, y);
    }

    @Test
    void theDistanceToASegmentIsToItsNearestPointEndsIncluded() {
        // Segment view (10, 120)-(210, 120): 5 above its middle, and 3-4-5 beyond its right end.
        assertEquals(5, SiteHandles.distanceToSegment(110, 115, T, p(0, 50), p(100, 50)), 1e-9);
        assertEquals(5, SiteHandles.distanceToSegment(213, 124, T, p(0, 50), p(100, 50)), 1e-9);
    }

    @Test
    void lineBeforeZoneOutlineAndTheSelectedItemsCornerBeforeEither() {
        // View (10, 120) is the line's first end and on the field's left edge.
        assertEquals(new SiteHandles.Hit(SiteItem.line("gate"), -1), H.hit(SITE, null, T, 12, 121));
        // The field's top edge, 4 view px below it.
        assertEquals(new SiteHandles.Hit(SiteItem.zone("field"), -1), H.hit(SITE, null, T, 100, 24));
        // With the field selected, its corner (0, 0) at view (10, 20) comes first.
        assertEquals(new SiteHandles.Hit(SiteItem.zone("field"), 0), H.hit(SITE, SiteItem.zone("field"), T, 13, 24));
        // Inside the field, away from every outline and the line: nothing (free for drawing boxes).
        assertNull(H.hit(SITE, null, T, 60, 60));
        assertNull(H.hit(SITE, null, T, 110, 112), "8 view px from the line is out of reach");
    }

    @Test
    void aClickInsideNestedZonesFindsTheSmallest() {
        assertEquals(SiteItem.zone("burrow"), SiteHandles.zoneAt(SITE, 45, 45));
        assertEquals(SiteItem.zone("field"), SiteHandles.zoneAt(SITE, 20, 80));
        assertNull(SiteHandles.zoneAt(SITE, 120, 20));
    }

    @Test
    void aMovedPointStopsAtTheFrameEdge() {
        SiteHandles.Moved m = SiteHandles.movePoint(List.of(p(10, 10), p(50, 50)), 1, 700, -80, 640, 480);
        assertEquals(List.of(p(10, 10), p(640, 0)), m.points());
        assertTrue(m.clamped());
        SiteHandles.Moved inside = SiteHandles.movePoint(List.of(p(10, 10), p(50, 50)), 0, 5, 5, 640, 480);
        assertEquals(List.of(p(15, 15), p(50, 50)), inside.points());
        assertFalse(inside.clamped());
    }

    @Test
    void aMovedShapeKeepsItsShapeAndStopsWhenItsFirstPointReachesAnEdge() {
        List<PixelPoint> tri = List.of(p(100, 100), p(200, 100), p(150, 300));
        SiteHandles.Moved m = SiteHandles.moveAll(tri, -150, 400, 640, 480);
        // Left by 100 at most (x 100 -> 0), down by 180 at most (y 300 -> 480).
        assertEquals(List.of(p(0, 280), p(100, 280), p(50, 480)), m.points());
        assertTrue(m.clamped());
        assertEquals(p(640, 0), SiteHandles.inFrame(700, -3, 640, 480));
    }
}
