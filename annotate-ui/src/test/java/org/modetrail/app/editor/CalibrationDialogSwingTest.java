package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.GraphicsEnvironment;
import java.awt.Point;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.JTextField;

import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.MouseButton;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.video.Frame;
import org.modetrail.video.VideoSource;

/**
 * The calibration screen in a real window on the road clip's frame 100: a robot clicks four surveyed points, their
 * ground positions are typed into the table's editor, and the fit fills the errors column. Also saves a picture of
 * the screen with all 30 points and the grid to target/screenshots/calibration-dialog.png (or
 * -Dmodetrail.screenshotDir), for looking at.
 */
class CalibrationDialogSwingTest {
    private Robot robot;
    private CalibrationDialog dialog;

    @BeforeAll
    static void needsADisplay() {
        boolean x11 = !System.getProperty("os.name", "").startsWith("Linux")
                || !System.getenv().getOrDefault("DISPLAY", "").isBlank();
        Assumptions.assumeTrue(!GraphicsEnvironment.isHeadless() && x11, "no display (run with DISPLAY set)");
    }

    @AfterEach
    void close() {
        if (dialog != null) {
            GuiActionRunner.execute(() -> dialog.dispose());
        }
        if (robot != null) {
            robot.cleanUp();
        }
    }

    static BufferedImage roadFrame() throws Exception {
        try (VideoSource v = VideoSource.open(Path.of("..", "clips", "road.mp4"))) {
            Frame f = v.frame(100);
            BufferedImage img = new BufferedImage(f.width(), f.height(), BufferedImage.TYPE_INT_RGB);
            img.setRGB(0, 0, f.width(), f.height(), f.rgb(), 0, f.width());
            return img;
        }
    }

    private void open(GroundCalibration existing, AtomicReference<GroundCalibration> stored) throws Exception {
        BufferedImage img = roadFrame();
        robot = BasicRobot.robotWithNewAwtHierarchy();
        dialog = GuiActionRunner.execute(() -> {
            CalibrationDialog d = new CalibrationDialog(null, img, existing, stored::set);
            d.setSize(1500, 820);
            d.setLocation(20, 20);
            d.setVisible(true);
            return d;
        });
        robot.waitForIdle();
        ScreenWait.untilStill(dialog, new java.awt.Point(20, 20));
    }

    @Test
    void fourClickedPointsWithTypedGroundPositionsAreFitted() throws Exception {
        AtomicReference<GroundCalibration> stored = new AtomicReference<>();
        open(null, stored);
        List<GroundPoint> road = CalibrationTableModelTest.roadPoints();
        // Four points spread over the road: the first, last and two in between.
        List<GroundPoint> four = List.of(road.get(0), road.get(9), road.get(20), road.get(29));
        CalibrationDialog.Canvas canvas = dialog.canvas();
        for (int i = 0; i < four.size(); i++) {
            GroundPoint p = four.get(i);
            ViewTransform t = GuiActionRunner.execute(canvas::transform);
            Point at = new Point((int) Math.round(t.toViewX(p.image().x())), (int) Math.round(t.toViewY(p.image().y())));
            int want = i + 1;
            // Under Xvfb an early click can land before the dialog is in place; the user would click again.
            for (int attempt = 0; attempt < 2 && GuiActionRunner.execute(() -> dialog.model().getRowCount()) < want;
                 attempt++) {
                robot.click(canvas, at, MouseButton.LEFT_BUTTON, 1);
                // Past the double-click interval, so each click is a click of its own.
                robot.waitForIdle();
                Thread.sleep(700);
            }
        }
        robot.waitForIdle();
        assertEquals(4, GuiActionRunner.execute(() -> dialog.model().getRowCount()));
        double scale = GuiActionRunner.execute(() -> canvas.transform().scale());
        for (int r = 0; r < 4; r++) {
            PixelPoint clicked = dialog.model().row(r).image();
            assertTrue(Math.hypot(clicked.x() - four.get(r).image().x(), clicked.y() - four.get(r).image().y())
                    <= 1 / scale + 0.01, "row " + r + " at " + clicked);
            type(r, CalibrationTableModel.GROUND_X, four.get(r).world().x());
            type(r, CalibrationTableModel.GROUND_Y, four.get(r).world().y());
        }
        robot.waitForIdle();
        assertTrue(GuiActionRunner.execute(() -> dialog.model().calibration().isPresent()),
                GuiActionRunner.execute(() -> dialog.messageArea().getText()));
        robot.click(robot.finder().findByName(dialog, "fit", true));
        robot.waitForIdle();
        for (int r = 0; r < 4; r++) {
            int row = r;
            Object px = GuiActionRunner.execute(() -> dialog.table().getValueAt(row, CalibrationTableModel.ERROR_PX));
            assertNotNull(px, "row " + r);
            // 4 points fit exactly: their errors are ~0.
            assertTrue((Double) px < 1e-3, "row " + r + ": " + px);
        }
        String msg = GuiActionRunner.execute(() -> dialog.messageArea().getText());
        assertTrue(msg.contains("Only 4 points are used"), msg);
        assertTrue(GuiActionRunner.execute(() -> dialog.canvas().grid().isPresent()));

        // Delete the selected point from the keyboard: back to 3, no fit, a message instead of an exception.
        GuiActionRunner.execute(() -> dialog.table().setRowSelectionInterval(1, 1));
        robot.focusAndWaitForFocusGain(dialog.table());
        robot.pressAndReleaseKeys(java.awt.event.KeyEvent.VK_DELETE);
        robot.waitForIdle();
        assertEquals(3, GuiActionRunner.execute(() -> dialog.model().getRowCount()));
        assertTrue(GuiActionRunner.execute(() -> dialog.messageArea().getText()).contains("at least 4"));

        robot.click(robot.finder().findByName(dialog, "fit", true));
        robot.waitForIdle();
        assertTrue(GuiActionRunner.execute(() -> dialog.messageArea().getText()).contains("at least 4"));
        assertTrue(stored.get() == null);
    }

    @Test
    void theWheelZoomsAboutTheCursorSoAPointGoesOnThePixelAndFFitsAgain() throws Exception {
        AtomicReference<GroundCalibration> stored = new AtomicReference<>();
        open(null, stored);
        CalibrationDialog.Canvas canvas = dialog.canvas();
        GroundPoint p = CalibrationTableModelTest.roadPoints().get(12);
        ViewTransform fitted = GuiActionRunner.execute(canvas::transform);
        Point at = new Point((int) Math.round(fitted.toViewX(p.image().x())),
                (int) Math.round(fitted.toViewY(p.image().y())));
        robot.moveMouse(canvas, at);
        robot.rotateMouseWheel(-8); // where the mouse is, eight notches towards the screen: 1.25^8 = 5.96x
        robot.waitForIdle();
        ViewTransform zoomed = GuiActionRunner.execute(canvas::transform);
        assertEquals(fitted.scale() * Math.pow(1.25, 8), zoomed.scale(), 1e-6 * zoomed.scale());
        // The picture's point under the cursor stayed under it (to within the cursor's whole pixel).
        assertEquals(fitted.toImageX(at.x), zoomed.toImageX(at.x), 1e-6);
        assertEquals(fitted.toImageY(at.y), zoomed.toImageY(at.y), 1e-6);
        // Zoomed, a click lands within a sixth of a frame pixel of the surveyed point, not within a pixel or two.
        Point on = new Point((int) Math.round(zoomed.toViewX(p.image().x())),
                (int) Math.round(zoomed.toViewY(p.image().y())));
        for (int attempt = 0; attempt < 2 && GuiActionRunner.execute(() -> dialog.model().getRowCount()) < 1;
             attempt++) {
            robot.click(canvas, on, MouseButton.LEFT_BUTTON, 1);
            robot.waitForIdle();
            Thread.sleep(700);
        }
        assertEquals(1, GuiActionRunner.execute(() -> dialog.model().getRowCount()));
        PixelPoint clicked = dialog.model().row(0).image();
        assertTrue(Math.hypot(clicked.x() - p.image().x(), clicked.y() - p.image().y()) <= 0.71 / zoomed.scale(),
                "clicked at " + clicked + " for " + p.image() + " at scale " + zoomed.scale());
        // A right-button drag pans by the drag.
        robot.pressMouse(canvas, new Point(300, 300), MouseButton.RIGHT_BUTTON);
        robot.moveMouse(canvas, new Point(340, 320));
        robot.releaseMouse(MouseButton.RIGHT_BUTTON);
        robot.waitForIdle();
        ViewTransform panned = GuiActionRunner.execute(canvas::transform);
        assertEquals(zoomed.offsetX() + 40, panned.offsetX(), 1e-6);
        assertEquals(zoomed.offsetY() + 20, panned.offsetY(), 1e-6);
        assertEquals(1, GuiActionRunner.execute(() -> dialog.model().getRowCount()), "panning adds no point");
        robot.focusAndWaitForFocusGain(canvas);
        robot.pressAndReleaseKeys(java.awt.event.KeyEvent.VK_F);
        robot.waitForIdle();
        assertEquals(fitted.scale(), GuiActionRunner.execute(canvas::transform).scale(), 1e-9);
    }

    /** Types a value into a table cell through the table's own editor, as the user does. */
    private void type(int row, int column, double value) {
        GuiActionRunner.execute(() -> {
            assertTrue(dialog.table().editCellAt(row, column));
            Component editor = dialog.table().getEditorComponent();
            ((JTextField) editor).setText(Double.toString(value));
            assertTrue(dialog.table().getCellEditor().stopCellEditing());
        });
    }

    @Test
    void screenshotWithTheThirtyPointsAndTheGrid() throws Exception {
        GroundCalibration c = org.modetrail.calibration.HomographyFit.fit(CalibrationTableModelTest.roadPoints());
        AtomicReference<GroundCalibration> stored = new AtomicReference<>();
        open(c, stored);
        assertEquals(30, GuiActionRunner.execute(() -> dialog.model().getRowCount()));
        assertTrue(GuiActionRunner.execute(() -> dialog.canvas().grid().isPresent()));
        robot.click(robot.finder().findByName(dialog, "store", true));
        robot.waitForIdle();
        assertNotNull(stored.get());
        assertTrue(stored.get().rmsPixels() < 0.01);
        BufferedImage shot = GuiActionRunner.execute(() -> {
            BufferedImage b = new BufferedImage(dialog.getRootPane().getWidth(), dialog.getRootPane().getHeight(),
                    BufferedImage.TYPE_INT_RGB);
            java.awt.Graphics2D g = b.createGraphics();
            dialog.getRootPane().paint(g);
            g.dispose();
            return b;
        });
        java.nio.file.Path shots = java.nio.file.Path.of(System.getProperty("modetrail.screenshotDir",
                "target/screenshots"));
        java.nio.file.Files.createDirectories(shots);
        ImageIO.write(shot, "png", shots.resolve("calibration-dialog.png").toFile());
    }
}
