package org.modetrail.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.PointError;
import org.modetrail.model.WorldPoint;

class HomographyFitTest {

    /**
     * Heckbert, "Fundamentals of Texture Mapping and Image Warping" (MSc thesis, UC Berkeley, 1989), section 2.2.3:
     * the projective map of the unit square (0,0), (1,0), (1,1), (0,1) onto the quadrilateral (x0,y0)..(x3,y3) in
     * closed form (formulas written here from memory; the test also checks that the map sends each corner to its
     * quadrilateral corner, which guards against a slip in them):
     * sx = x0 - x1 + x2 - x3, sy = y0 - y1 + y2 - y3, dx1 = x1 - x2, dx2 = x3 - x2, dy1 = y1 - y2, dy2 = y3 - y2,
     * g = (sx dy2 - dx2 sy) / (dx1 dy2 - dx2 dy1), h = (dx1 sy - sx dy1) / (dx1 dy2 - dx2 dy1),
     * a = x1 - x0 + g x1, b = x3 - x0 + h x3, c = x0, d = y1 - y0 + g y1, e = y3 - y0 + h y3, f = y0,
     * and (x, y) = ((a u + b v + c) / (g u + h v + 1), (d u + e v + f) / (g u + h v + 1)).
     */
    static double[] heckbertSquareToQuad(double[] q) {
        double x0 = q[0], y0 = q[1], x1 = q[2], y1 = q[3], x2 = q[4], y2 = q[5], x3 = q[6], y3 = q[7];
        double sx = x0 - x1 + x2 - x3;
        double sy = y0 - y1 + y2 - y3;
        double dx1 = x1 - x2, dx2 = x3 - x2, dy1 = y1 - y2, dy2 = y3 - y2;
        double den = dx1 * dy2 - dx2 * dy1;
        double g = (sx * dy2 - dx2 * sy) / den;
        double h = (dx1 * sy - sx * dy1) / den;
        return new double[] {
            x1 - x0 + g * x1, x3 - x0 + h * x3, x0,
            y1 - y0 + g * y1, y3 - y0 + h * y3, y0,
            g, h, 1};
    }

    @Test
    void matchesHeckbertsClosedFormSquareToQuadrilateral() {
        // A ground square 1 m a side seen as a trapezoid-like quadrilateral (pixels), corners in Heckbert's order.
        double[] quad = {310, 460, 650, 430, 560, 210, 380, 225};
        double[] m = heckbertSquareToQuad(quad);
        double[][] square = {{0, 0}, {1, 0}, {1, 1}, {0, 1}};
        for (int k = 0; k < 4; k++) {
            double[] p = Scenes.apply(m, square[k][0], square[k][1]);
            assertEquals(quad[2 * k], p[0], 1e-9, "Heckbert's map sends corner " + k + " to its quad corner");
            assertEquals(quad[2 * k + 1], p[1], 1e-9);
        }
        for (int grid : new int[] {2, 5}) {
            List<GroundPoint> points = new ArrayList<>();
            for (int i = 0; i < grid; i++) {
                for (int j = 0; j < grid; j++) {
                    double uu = i / (grid - 1.0);
                    double vv = j / (grid - 1.0);
                    double[] p = Scenes.apply(m, uu, vv);
                    points.add(new GroundPoint(new PixelPoint(p[0], p[1]), new WorldPoint(uu, vv)));
                }
            }
            GroundCalibration c = HomographyFit.fit(points);
            double[] g2i = c.imageToWorld().inverse().entries();
            for (int k = 0; k < 9; k++) {
                // Heckbert's matrix has h33 = 1; ours is scaled to largest entry 1.
                assertEquals(m[k], g2i[k] / g2i[8], 1e-9 * Math.max(1, Math.abs(m[k])), "entry " + k + ", "
                        + grid + "x" + grid + " points");
            }
            assertTrue(c.rmsPixels() < 1e-8, "exact points fit exactly: " + c.rmsPixels());
            assertEquals(grid == 2, c.warnings().stream().anyMatch(w -> w.contains("Only 4 points")));
        }
    }

    @Test
    void ransacWithThirtyPercentOutliersKeepsExactlyTheInliers() {
        Random r = new Random(7);
        List<GroundPoint> points = new ArrayList<>(Scenes.road(20, 0.3, 11));
        boolean[] outlier = new boolean[20];
        for (int i = 0; i < 20; i += 3) { // 7 of 20 (35 %), off by 15 to 60 px in a random direction
            outlier[i] = true;
            GroundPoint p = points.get(i);
            double a = 2 * Math.PI * r.nextDouble();
            double d = 15 + 45 * r.nextDouble();
            points.set(i, new GroundPoint(new PixelPoint(p.image().x() + d * Math.cos(a),
                    p.image().y() + d * Math.sin(a)), p.world()));
        }
        GroundCalibration c = HomographyFit.fit(points);
        for (int i = 0; i < 20; i++) {
            assertEquals(!outlier[i], c.errors().get(i).inlier(), "point " + (i + 1));
        }
        assertTrue(c.rmsPixels() < 0.6, "inliers have 0.3 px noise per axis: RMS " + c.rmsPixels());
        for (int i = 0; i < 20; i++) {
            PointError e = c.errors().get(i);
            assertTrue(outlier[i] ? e.pixels() > 10 : e.pixels() < 1.5, "point " + (i + 1) + ": " + e);
        }
        assertTrue(c.warnings().stream().anyMatch(w -> w.startsWith("7 of 20 points") && w.contains("point 1 (")),
                c.warnings().toString());
        // The same seed gives the same fit.
        assertEquals(c, HomographyFit.fit(points));
    }

    @Test
    void metreErrorsAreOnTheGroundAndPixelErrorsInTheImage() {
        List<GroundPoint> points = new ArrayList<>();
        double[][] ground = {{0, 12}, {14, 12}, {14, 60}, {0, 60}, {7, 30}, {3, 45}};
        for (double[] g : ground) {
            points.add(Scenes.exact(Scenes.GROUND_TO_IMAGE, g[0], g[1]));
        }
        // Point 6's ground position typed 0.2 m off along x: the other 5 fix the map (4 + 1 check point), so point 6
        // is 0.2 m off on the ground; in the image by |d(u,v)/dx| * 0.2 from the known H (finite difference).
        points.set(5, new GroundPoint(points.get(5).image(), new WorldPoint(3.2, 45)));
        GroundCalibration c = HomographyFit.fit(points, CalibrationConfig.defaults().withThresholdPx(1));
        double[] a = Scenes.apply(Scenes.GROUND_TO_IMAGE, 3, 45);
        double[] b = Scenes.apply(Scenes.GROUND_TO_IMAGE, 3.2, 45);
        double px = Math.hypot(b[0] - a[0], b[1] - a[1]);
        assertTrue(px > 1, "the slip must be larger than the threshold for this test: " + px);
        PointError e = c.errors().get(5);
        assertFalse(e.inlier());
        assertEquals(0.2, e.metres(), 1e-6);
        assertEquals(px, e.pixels(), 1e-6);
        assertTrue(c.rmsMetres() < 1e-9 && c.rmsPixels() < 1e-7, c.toString());
    }

    @Test
    void onePointAstrayIsFoundFromSixPointsButNotFromFive() {
        List<GroundPoint> points = new ArrayList<>();
        double[][] ground = {{0, 12}, {14, 12}, {14, 60}, {0, 60}, {7, 30}, {3, 45}};
        for (double[] g : ground) {
            points.add(Scenes.exact(Scenes.GROUND_TO_IMAGE, g[0], g[1]));
        }
        GroundPoint p = points.get(4);
        points.set(4, new GroundPoint(new PixelPoint(p.image().x() + 12, p.image().y()), p.world()));
        GroundCalibration six = HomographyFit.fit(points);
        for (int i = 0; i < 6; i++) {
            assertEquals(i != 4, six.errors().get(i).inlier(), "point " + (i + 1));
        }
        assertEquals(12, six.errors().get(4).pixels(), 1e-6, "the 5 exact points fix the map, so point 5 is 12 px off");
        assertTrue(six.warnings().stream().anyMatch(w -> w.startsWith("1 of 6 points") && w.contains("point 5 (12")),
                six.warnings().toString());
        // With 5 points any 4 fit exactly, so the one astray cannot be told from the others: one point is left out
        // (which one depends on the draw) and the warning says the fit is unchecked.
        GroundCalibration five = HomographyFit.fit(points.subList(0, 5));
        assertEquals(1, five.errors().stream().filter(e -> !e.inlier()).count(), five.errors().toString());
        assertTrue(five.warnings().stream().anyMatch(w -> w.contains("Only 4 points") && w.contains("cannot tell")),
                five.warnings().toString());
    }

    @Test
    void badInputIsRefusedWithWhatToDo() {
        List<GroundPoint> four = List.of(Scenes.exact(Scenes.GROUND_TO_IMAGE, 0, 12),
                Scenes.exact(Scenes.GROUND_TO_IMAGE, 14, 12), Scenes.exact(Scenes.GROUND_TO_IMAGE, 14, 40),
                Scenes.exact(Scenes.GROUND_TO_IMAGE, 0, 40));
        String few = assertThrows(IllegalArgumentException.class, () -> HomographyFit.fit(four.subList(0, 3)))
                .getMessage();
        assertTrue(few.contains("at least 4") && few.contains("got 3"), few);

        List<GroundPoint> dup = new ArrayList<>(four);
        dup.add(four.get(2));
        String d = assertThrows(IllegalArgumentException.class, () -> HomographyFit.fit(dup)).getMessage();
        assertTrue(d.contains("points 3 and 5"), d);

        List<GroundPoint> line = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            line.add(Scenes.exact(Scenes.GROUND_TO_IMAGE, 3, 12 + 5 * i));
        }
        String l = assertThrows(IllegalArgumentException.class, () -> HomographyFit.fit(line)).getMessage();
        assertTrue(l.contains("all lie on one line") && l.contains("add points"), l);

        List<GroundPoint> almost = new ArrayList<>(line);
        almost.add(Scenes.exact(Scenes.GROUND_TO_IMAGE, 10, 20));
        String a = assertThrows(IllegalArgumentException.class, () -> HomographyFit.fit(almost)).getMessage();
        assertTrue(a.contains("all but one"), a);

        // Image and ground positions that belong to no common plane: any 4 fit exactly, but no more agree.
        Random r = new Random(3);
        List<GroundPoint> junk = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            junk.add(new GroundPoint(new PixelPoint(960 * r.nextDouble(), 540 * r.nextDouble()),
                    new WorldPoint(14 * r.nextDouble(), 60 * r.nextDouble())));
        }
        String j = assertThrows(IllegalArgumentException.class, () -> HomographyFit.fit(junk)).getMessage();
        assertTrue(j.contains("only 4 of the 8") && j.contains("look wrong"), j);

        assertThrows(IllegalArgumentException.class, () -> new CalibrationConfig(0, 10, 1, 0.1, 2, 0.5, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new CalibrationConfig(3, 0, 1, 0.1, 2, 0.5, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new CalibrationConfig(3, 10, 1, 1, 2, 0.5, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new WorldPoint(Double.NaN, 1), "non-finite");
    }

    @Test
    void nearlyCollinearPointsAndLargeErrorsWarn() {
        // A strip 0.5 m wide and 40 m long: spread ratio on the ground about 0.5 / 40 * sqrt(3)... well under 0.1.
        List<GroundPoint> strip = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            strip.add(Scenes.exact(Scenes.GROUND_TO_IMAGE, 5 + 0.5 * (i % 2), 15 + 5 * i));
        }
        GroundCalibration c = HomographyFit.fit(strip);
        assertTrue(c.warnings().stream().anyMatch(w -> w.contains("nearly on one line on the ground")),
                c.warnings().toString());
        assertTrue(HomographyFit.spreadRatio(new double[] {0, 1, 0, 1}, new double[] {0, 0, 1, 1}) > 0.999,
                "a square is spread equally");

        GroundCalibration noisy = HomographyFit.fit(Scenes.road(30, 1.6, 5),
                CalibrationConfig.defaults().withThresholdPx(8));
        assertTrue(noisy.rmsPixels() > 2, "1.6 px per axis is about 2.3 px of distance: " + noisy.rmsPixels());
        assertTrue(noisy.warnings().stream().anyMatch(w -> w.contains("RMS error of") && w.contains("px")),
                noisy.warnings().toString());
        GroundCalibration good = HomographyFit.fit(Scenes.road(30, 0.2, 5));
        assertEquals(List.of(), good.warnings());
    }
}
