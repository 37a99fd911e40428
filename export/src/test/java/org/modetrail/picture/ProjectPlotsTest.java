package org.modetrail.picture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Project;

/** The plot set the plot command and the editor share: names known before writing, ground plots only calibrated. */
class ProjectPlotsTest {
    @TempDir
    Path dir;

    @Test
    void theFilesWrittenAreTheFilesNamedBefore() throws Exception {
        Project arena = TruthProjects.arena(0xE69F00, 0, 49);
        ProjectPlots plots = ProjectPlots.all(arena, List.of(PlotFormat.PNG), ColourBy.TRACK);
        assertEquals(List.of(dir.resolve("a-trajectory-image.png")), plots.files(dir, "a-"), "no calibration");
        List<Path> written = plots.write(arena, n -> n / 25.0, "arena", dir, "a-");
        assertEquals(plots.files(dir, "a-"), written);
        BufferedImage png = ImageIO.read(written.get(0).toFile());
        assertEquals(PlotOptions.DEFAULT_WIDTH, png.getWidth());
        try (var listing = Files.list(dir)) {
            assertEquals(1, listing.count(), "nothing else written");
        }
    }

    @Test
    void groundPlotsAreRefusedWithoutACalibrationAndNamedWithOne() throws Exception {
        Project arena = TruthProjects.arena(0xE69F00, 0, 9);
        ProjectPlots ground = new ProjectPlots(List.of(PlotFormat.SVG, PlotFormat.PNG), ColourBy.CLASS, true);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ground.write(arena, n -> n / 25.0, "arena", dir, ""));
        assertTrue(e.getMessage().contains("calibration"), e.getMessage());
        assertEquals(List.of("trajectory-image.svg", "trajectory-ground.svg", "speed.svg", "trajectory-image.png",
                "trajectory-ground.png", "speed.png"),
                ground.files(dir, "").stream().map(p -> p.getFileName().toString()).toList());
        assertThrows(IllegalArgumentException.class,
                () -> new ProjectPlots(List.of(PlotFormat.PNG, PlotFormat.PNG), ColourBy.CLASS, false));
    }
}
