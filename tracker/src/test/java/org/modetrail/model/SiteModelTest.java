package org.modetrail.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class SiteModelTest {
    /**
     * The unit square to the quadrilateral (0,0) (2,0) (3,3) (0,1) by the closed form of Heckbert ("Fundamentals
     * of texture mapping and image warping", 1989, section 2.2.3, the projective square-to-quadrilateral case;
     * the formula is from memory, so the test checks what matters: each corner lands on its quad corner and the
     * inverse brings it back).
     */
    @Test
    void aHomographyMapsCornersAndItsInverseMapsThemBack() {
        double[] m = solveSquareToQuad(new double[] {0, 2, 3, 0}, new double[] {0, 0, 3, 1});
        Homography h = new Homography(m);
        double[][] square = {{0, 0}, {1, 0}, {1, 1}, {0, 1}};
        double[][] quad = {{0, 0}, {2, 0}, {3, 3}, {0, 1}};
        for (int i = 0; i < 4; i++) {
            WorldPoint w = h.toWorld(new PixelPoint(square[i][0], square[i][1]));
            assertEquals(quad[i][0], w.x(), 1e-12, "corner " + i + " x");
            assertEquals(quad[i][1], w.y(), 1e-12, "corner " + i + " y");
            PixelPoint back = h.toImage(w);
            assertEquals(square[i][0], back.x(), 1e-12);
            assertEquals(square[i][1], back.y(), 1e-12);
        }
        // Scale does not matter: the same map times -7 maps every point the same way.
        double[] scaled = m.clone();
        for (int i = 0; i < 9; i++) {
            scaled[i] *= -7;
        }
        WorldPoint p = new Homography(scaled).toWorld(new PixelPoint(0.3, 0.8));
        assertEquals(h.toWorld(new PixelPoint(0.3, 0.8)).x(), p.x(), 1e-12);
        assertEquals(h.toWorld(new PixelPoint(0.3, 0.8)).y(), p.y(), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> new Homography(new double[9]));
        assertThrows(IllegalArgumentException.class, () -> new Homography(new double[] {1, 2, 3, 2, 4, 6, 0, 0, 0})
                .inverse());
    }

    /** Heckbert's closed form for the square-to-quadrilateral map, section 2.2.3 (projective case). */
    private static double[] solveSquareToQuad(double[] x, double[] y) {
        double sx = x[0] - x[1] + x[2] - x[3];
        double sy = y[0] - y[1] + y[2] - y[3];
        double dx1 = x[1] - x[2];
        double dx2 = x[3] - x[2];
        double dy1 = y[1] - y[2];
        double dy2 = y[3] - y[2];
        double det = dx1 * dy2 - dx2 * dy1;
        double g = (sx * dy2 - dx2 * sy) / det;
        double h = (dx1 * sy - sx * dy1) / det;
        double a = x[1] - x[0] + g * x[1];
        double b = x[3] - x[0] + h * x[3];
        double c = x[0];
        double d = y[1] - y[0] + g * y[1];
        double e = y[3] - y[0] + h * y[3];
        double f = y[0];
        return new double[] {a, b, c, d, e, f, g, h, 1};
    }

    @Test
    void aZoneContainsItsInsideOnly() {
        Zone l = new Zone("ell", List.of(new PixelPoint(0, 0), new PixelPoint(10, 0), new PixelPoint(10, 4),
                new PixelPoint(4, 4), new PixelPoint(4, 10), new PixelPoint(0, 10)));
        assertTrue(l.contains(new PixelPoint(2, 8)));
        assertTrue(l.contains(new PixelPoint(8, 2)));
        assertFalse(l.contains(new PixelPoint(8, 8)), "the notch of the L is outside");
        assertFalse(l.contains(new PixelPoint(-1, 5)));
        assertThrows(IllegalArgumentException.class, () -> new Zone("two", List.of(new PixelPoint(0, 0),
                new PixelPoint(1, 1))));
    }

    @Test
    void contactPointsAndTheSiteCheckTheirInput() {
        Box b = new Box(10, 20, 30, 40);
        assertEquals(new PixelPoint(25, 60), ContactPoint.BOTTOM_CENTRE.on(b));
        assertEquals(new PixelPoint(25, 40), ContactPoint.CENTRE.on(b));
        assertThrows(IllegalArgumentException.class, () -> new ContactPoint(1.5, 1));
        Zone z = new Zone("a", List.of(new PixelPoint(0, 0), new PixelPoint(1, 0), new PixelPoint(0, 1)));
        assertThrows(IllegalArgumentException.class, () -> Site.NONE.withZones(List.of(z, z)));
        assertThrows(IllegalArgumentException.class, () -> new CountingLine("x", new PixelPoint(1, 1),
                new PixelPoint(1, 1)));
        assertEquals(ContactPoint.BOTTOM_CENTRE, new ObjectClass("car", 0xFF0000).contact());
    }
}
