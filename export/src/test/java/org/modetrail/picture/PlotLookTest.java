package org.modetrail.picture;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.modetrail.model.Project;

/**
 * Writes the plots for a person to look at into the folder named by the system property
 * {@code modetrail.lookDir}; skipped without it. Checks only that they were written.
 */
class PlotLookTest {
    @Test
    void writeForViewing() throws Exception {
        String look = System.getProperty("modetrail.lookDir");
        Assumptions.assumeTrue(look != null && !look.isBlank(), "no -Dmodetrail.lookDir");
        Path dir = Files.createDirectories(Path.of(look));
        Project arena = TruthProjects.arena(0xD55E00, 0, 449);
        List<PlotSeries> image = ProjectSeries.imagePlane(arena, n -> n / 25.0, TrajectoryPoint.CONTACT,
                ColourBy.TRACK);
        Plots.writeImageTrajectoryPng(image, 640, 480, PlotOptions.defaults(), dir.resolve("arena-image.png"));
        Plots.writeImageTrajectorySvg(image, 640, 480, PlotOptions.defaults(), dir.resolve("arena-image.svg"));
        Plots.writeGroundTrajectoryPng(TruthProjects.roadGround(), PlotOptions.defaults(),
                dir.resolve("road-ground.png"));
        Plots.writeSpeedPng(TruthProjects.roadSpeeds(true), PlotOptions.defaults(), dir.resolve("road-speed.png"));
        Plots.writeSpeedPng(List.of(), PlotOptions.defaults(), dir.resolve("empty-speed.png"));
        Plots.writeGroundTrajectorySvg(TruthProjects.roadGround(), PlotOptions.defaults(),
                dir.resolve("road-ground.svg"));
        Plots.writeSpeedSvg(TruthProjects.roadSpeeds(true), PlotOptions.defaults(), dir.resolve("road-speed.svg"));
        assertTrue(Files.size(dir.resolve("arena-image.png")) > 1000);
    }
}
