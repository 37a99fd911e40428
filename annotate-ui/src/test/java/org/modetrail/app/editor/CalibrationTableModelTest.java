package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.PointError;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;
import org.modetrail.model.WorldPoint;

/** The calibration screen's table model, without a window: points in, the fit's errors out. */
class CalibrationTableModelTest {

    /** The 30 surveyed points of the road clip (its generator's exact camera). */
    static List<GroundPoint> roadPoints() throws IOException {
        List<GroundPoint> out = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of("..", "clips", "road-calibration.csv"))) {
            String[] f = line.split(",", -1);
            if (f[0].equals("point")) {
                out.add(new GroundPoint(new PixelPoint(Double.parseDouble(f[3]), Double.parseDouble(f[4])),
                        new WorldPoint(Double.parseDouble(f[5]), Double.parseDouble(f[6]))));
            }
        }
        return out;
    }

    @Test
    void theRoadsSurveyedPointsFitWithinAHundredthOfAPixel() throws IOException {
        List<GroundPoint> road = roadPoints();
        assertEquals(30, road.size());
        CalibrationTableModel m = new CalibrationTableModel();
        for (GroundPoint p : road) {
            int r = m.add(p.image());
            assertEquals(CalibrationTableModel.Row.class, m.row(r).getClass());
            m.setValueAt(Double.toString(p.world().x()), r, CalibrationTableModel.GROUND_X);
            m.setValueAt(p.world().y(), r, CalibrationTableModel.GROUND_Y);
        }
        GroundCalibration c = m.calibration().orElseThrow(() -> new AssertionError(m.message()));
        assertTrue(c.rmsPixels() < 0.01, "rms " + c.rmsPixels());
        assertEquals(30, c.points().size());
        for (int r = 0; r < 30; r++) {
            Double px = (Double) m.getValueAt(r, CalibrationTableModel.ERROR_PX);
            assertNotNull(px, "row " + r);
            assertTrue(px < 0.05, "row " + r + ": " + px + " px");
            assertTrue((Double) m.getValueAt(r, CalibrationTableModel.ERROR_M) < 0.01);
            assertEquals(Boolean.TRUE, m.getValueAt(r, CalibrationTableModel.USED));
        }
        assertTrue(m.message().contains("30 of 30"), m.message());
        // The surveyed points map to their ground positions through the fitted homography.
        WorldPoint w = c.imageToWorld().toWorld(road.get(7).image());
        assertTrue(w.distance(road.get(7).world()) < 0.01, w + " vs " + road.get(7).world());

        GroundGrid grid = GroundGrid.of(c);
        assertFalse(grid.segments().isEmpty());
        assertTrue(List.of(1.0, 2.0, 5.0, 10.0).contains(grid.spacing()), "spacing " + grid.spacing());
    }

    @Test
    void threePointsGiveTheFitsMessageNotAnException() {
        CalibrationTableModel m = new CalibrationTableModel();
        double[][] pts = {{100, 400, 0, 0}, {800, 420, 10, 0}, {500, 100, 5, 30}};
        for (double[] p : pts) {
            int r = m.add(new PixelPoint(p[0], p[1]));
            m.setGround(r, p[2], p[3]);
        }
        assertTrue(m.fit().isEmpty());
        assertTrue(m.message().contains("at least 4"), m.message());
        assertNull(m.getValueAt(0, CalibrationTableModel.ERROR_PX));
    }

    @Test
    void collinearPointsAreRefusedWithAMessage() {
        CalibrationTableModel m = new CalibrationTableModel();
        for (int i = 0; i < 5; i++) {
            int r = m.add(new PixelPoint(100 + 50 * i, 200 + 30 * i));
            m.setGround(r, 2.0 * i, 0.0);
        }
        assertTrue(m.calibration().isEmpty());
        assertTrue(m.message().startsWith("No fit: "), m.message());
        assertTrue(m.message().contains("line"), m.message());
    }

    @Test
    void anIncompleteRowIsLeftOutAndAMoveStalesTheFitUntilRelease() throws IOException {
        List<GroundPoint> road = roadPoints().subList(0, 6);
        CalibrationTableModel m = new CalibrationTableModel();
        for (GroundPoint p : road) {
            m.setGround(m.add(p.image()), p.world().x(), p.world().y());
        }
        int extra = m.add(new PixelPoint(10, 10));
        GroundCalibration c = m.calibration().orElseThrow(() -> new AssertionError(m.message()));
        assertEquals(6, c.points().size());
        assertNull(m.error(extra));
        assertNotNull(m.error(5));
        m.move(0, new PixelPoint(road.get(0).image().x() + 3, road.get(0).image().y()), false);
        assertTrue(m.calibration().isEmpty());
        m.move(0, road.get(0).image(), true);
        assertTrue(m.calibration().isPresent());
        m.remove(extra);
        assertEquals(6, m.getRowCount());
    }

    @Test
    void loadingAStoredCalibrationShowsItsPointsAndStoringIsAnEditWithNoTracking() throws IOException {
        GroundCalibration c = org.modetrail.calibration.HomographyFit.fit(roadPoints());
        CalibrationTableModel m = new CalibrationTableModel();
        m.load(c);
        assertEquals(30, m.getRowCount());
        assertEquals(c.points().get(3).world().y(), (Double) m.getValueAt(3, CalibrationTableModel.GROUND_Y));
        assertTrue(m.calibration().isPresent());

        Project p = Project.of(new VideoRef("road.mp4", 960, 540, 200, "abc"));
        var edit = CalibrationDialog.storeEdit(p, c);
        assertFalse(edit.retrack());
        assertEquals(c, edit.project().site().groundCalibration().orElseThrow());
        assertTrue(p.site().groundCalibration().isEmpty());
        PointError e = c.errors().get(0);
        assertTrue(e.inlier());
    }
}
