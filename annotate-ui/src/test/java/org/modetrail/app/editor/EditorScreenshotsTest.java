package org.modetrail.app.editor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.GraphicsEnvironment;
import java.awt.event.InputEvent;
import java.awt.event.MouseEvent;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.UUID;
import java.util.prefs.Preferences;

import javax.imageio.ImageIO;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.SwingUtilities;

import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.modetrail.app.Main;
import org.modetrail.model.CountingLine;
import org.modetrail.model.Edit;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Project;
import org.modetrail.model.SiteEdits;
import org.modetrail.model.Zone;

/**
 * Screenshots of the editor's main screen, its key list and its export screen, in the light and the dark theme, on the arena demo
 * tracked by the track command: written to target/screenshots (or -Dmodetrail.screenshotDir) for people to look
 * at, and checked here only for what a screenshot can show without judging taste: the picture has the window's
 * size and the theme's background.
 */
class EditorScreenshotsTest {
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"light", "dark"})
    void mainScreenAndKeys(String theme) throws Exception {
        boolean x11 = !System.getenv().getOrDefault("DISPLAY", "").isBlank();
        Assumptions.assumeTrue(!GraphicsEnvironment.isHeadless() && x11, "no display (CI runs this under Xvfb)");
        Path dir = Files.createTempDirectory("modetrail-shots");
        Path clip = Files.copy(Path.of("..", "clips", "arena.mp4"), dir.resolve("arena.mp4"));
        Path project = dir.resolve("arena.modetrail.json");
        int code = Main.commandLine().execute("track", clip.toString(), "--keyframes",
                Path.of("..", "clips", "arena-keys.csv").toString(), "--out", dir.resolve("t.csv").toString(),
                "--project", project.toString());
        assertEquals(0, code);
        Path out = Path.of(System.getProperty("modetrail.screenshotDir", "target/screenshots"));
        Files.createDirectories(out);
        Preferences node = Preferences.userRoot().node("org/modetrail/editor-shots-" + UUID.randomUUID());
        boolean dark = theme.equals("dark");
        EditorWindow w = GuiActionRunner.execute(() -> {
            Themes.apply(dark);
            EditorWindow win = new EditorWindow(new EditorPreferences(node), () -> { });
            win.setSize(1360, 860);
            win.setVisible(true);
            win.open(project);
            return win;
        });
        try {
            long end = System.nanoTime() + Duration.ofSeconds(60).toNanos();
            while (GuiActionRunner.execute(() -> w.session() == null || w.frameCount() == 0)) {
                assertTrue(System.nanoTime() < end, "the project did not open");
                Thread.sleep(20);
            }
            // Frame 222, where two animals cross (the track command's quality line points there), track 3 selected.
            GuiActionRunner.execute(() -> {
                w.showFrame(222);
                w.selectTrackForTest(3);
            });
            Thread.sleep(1500);
            BufferedImage main = GuiActionRunner.execute(() -> paint(w.getRootPane()));
            ImageIO.write(main, "png", out.resolve("editor-" + theme + ".png").toFile());
            assertEquals(w.getRootPane().getWidth(), main.getWidth());
            Color corner = new Color(main.getRGB(main.getWidth() - 3, main.getHeight() - 3));
            int lightness = (corner.getRed() + corner.getGreen() + corner.getBlue()) / 3;
            assertTrue(dark ? lightness < 128 : lightness > 128, theme + " theme, corner " + corner);
            BufferedImage zones = zonesAndLines(w);
            ImageIO.write(zones, "png", out.resolve("editor-zones-" + theme + ".png").toFile());
            // The selected line's white bar shows at its middle, (300, 240) on the image, whatever the theme.
            Color onLine = GuiActionRunner.execute(() -> {
                FrameView v = (FrameView) find(w.getRootPane(), "frameView");
                java.awt.Point at = SwingUtilities.convertPoint(v, (int) Math.round(v.transform().toViewX(300)),
                        (int) Math.round(v.transform().toViewY(200)), w.getRootPane());
                return new Color(zones.getRGB(at.x, at.y));
            });
            assertTrue(onLine.getRed() > 230 && onLine.getGreen() > 230 && onLine.getBlue() > 230,
                    "the counting line is drawn white, got " + onLine);
            JDialog keys = GuiActionRunner.execute(() -> ShortcutHelp.show(w, w.commands()));
            Thread.sleep(500);
            BufferedImage help = GuiActionRunner.execute(() -> paint(keys.getRootPane()));
            ImageIO.write(help, "png", out.resolve("editor-keys-" + theme + ".png").toFile());
            GuiActionRunner.execute(keys::dispose);
            exportScreen(w, dir, theme, out);
        } finally {
            GuiActionRunner.execute(() -> {
                try {
                    if (w.session() != null) {
                        w.session().close();
                    }
                } catch (java.io.IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
                w.dispose();
                Themes.apply(false);
            });
            node.removeNode();
        }
    }

    /**
     * Two zones and two counting lines over the arena (one zone reaching onto the dark floor outside it, one line
     * crossing the rim), the line "gate" selected, and a third zone half drawn with the pointer beside it.
     */
    private static BufferedImage zonesAndLines(EditorWindow w) throws InterruptedException {
        GuiActionRunner.execute(() -> {
            Project p = w.session().project();
            p = SiteEdits.addZone(p, new Zone("nest", List.of(pt(80, 60), pt(230, 40), pt(260, 170), pt(120, 200))))
                    .project();
            p = SiteEdits.addZone(p, new Zone("feeder", List.of(pt(400, 330), pt(560, 300), pt(590, 420),
                    pt(430, 450)))).project();
            p = SiteEdits.addLine(p, new CountingLine("gate", pt(300, 100), pt(300, 380))).project();
            p = SiteEdits.addLine(p, new CountingLine("exit", pt(480, 60), pt(620, 200))).project();
            w.session().apply(new Edit(p, 0, 0, 0, false));
        });
        Thread.sleep(300);
        GuiActionRunner.execute(() -> {
            w.selectSiteForTest(SiteItem.line("gate"));
            FrameView v = (FrameView) find(w.getRootPane(), "frameView");
            v.startZoneTool();
            ViewTransform t = v.transform();
            double[][] corners = {{60, 300}, {200, 330}, {180, 440}};
            for (double[] c : corners) {
                int x = (int) Math.round(t.toViewX(c[0])), y = (int) Math.round(t.toViewY(c[1]));
                for (int id : new int[] {MouseEvent.MOUSE_PRESSED, MouseEvent.MOUSE_RELEASED}) {
                    v.dispatchEvent(new MouseEvent(v, id, System.currentTimeMillis(),
                            id == MouseEvent.MOUSE_PRESSED ? InputEvent.BUTTON1_DOWN_MASK : 0, x, y, 1, false,
                            MouseEvent.BUTTON1));
                }
            }
            v.dispatchEvent(new MouseEvent(v, MouseEvent.MOUSE_MOVED, System.currentTimeMillis(), 0,
                    (int) Math.round(t.toViewX(70)), (int) Math.round(t.toViewY(430)), 0, false, MouseEvent.NOBUTTON));
            // The selection is dropped by the tool: select the line again, so both show in one picture.
            v.setSelectedSite(SiteItem.line("gate"));
        });
        Thread.sleep(500);
        return GuiActionRunner.execute(() -> paint(w.getRootPane()));
    }

    /**
     * The export screen twice: after writing the tracks CSV, the summary and the plots of the uncalibrated project
     * (rows done, the ground plots off with the reason), then with a calibration stored (the caution shown).
     */
    private static void exportScreen(EditorWindow w, Path dir, String theme, Path out) throws Exception {
        ExportDialog d = GuiActionRunner.execute(() -> {
            w.showExport();
            ExportDialog e = w.exportDialog();
            e.setLocation(20, 20);
            for (ExportItem i : List.of(ExportItem.SUMMARY, ExportItem.PLOTS)) {
                ((javax.swing.AbstractButton) find(e, "export." + i.name())).doClick();
            }
            ((javax.swing.AbstractButton) find(e, "exportStart")).doClick();
            return e;
        });
        long end = System.nanoTime() + Duration.ofSeconds(60).toNanos();
        while (GuiActionRunner.execute(() -> d.state(ExportItem.PLOTS) == null || !d.state(ExportItem.PLOTS).finished())) {
            assertTrue(System.nanoTime() < end, "the exports did not finish");
            Thread.sleep(20);
        }
        Thread.sleep(300);
        BufferedImage done = GuiActionRunner.execute(() -> paint(d.getRootPane()));
        ImageIO.write(done, "png", out.resolve("editor-export-" + theme + ".png").toFile());
        assertEquals(ExportJobState.Stage.DONE, GuiActionRunner.execute(() -> d.state(ExportItem.CSV).stage()));
        GuiActionRunner.execute(() -> {
            w.session().apply(CalibrationDialog.storeEdit(w.session().project(),
                    ExportTestProjects.arenaCalibration()));
            ((javax.swing.AbstractButton) find(d, "export.OVERLAY")).doClick();
            d.refresh();
        });
        Thread.sleep(300);
        BufferedImage calibrated = GuiActionRunner.execute(() -> paint(d.getRootPane()));
        ImageIO.write(calibrated, "png", out.resolve("editor-export-calibrated-" + theme + ".png").toFile());
        assertTrue(GuiActionRunner.execute(() -> find(d, "exportCaution").isVisible()), "the caution with speeds");
        GuiActionRunner.execute(d::dispose);
    }

    private static PixelPoint pt(double x, double y) {
        return new PixelPoint(x, y);
    }

    private static java.awt.Component find(java.awt.Container c, String name) {
        for (java.awt.Component k : c.getComponents()) {
            if (name.equals(k.getName())) {
                return k;
            }
            if (k instanceof java.awt.Container inner) {
                java.awt.Component found = find(inner, name);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private static BufferedImage paint(JComponent c) {
        BufferedImage img = new BufferedImage(c.getWidth(), c.getHeight(), BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = img.createGraphics();
        c.paint(g);
        g.dispose();
        return img;
    }
}
