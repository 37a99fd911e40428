package org.modetrail.overlay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.modetrail.picture.TruthProjects;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Writes overlays of both demo clips and some of their frames (decoded by ffmpeg) for a person to look at, into
 * the folder named by the system property {@code modetrail.lookDir}; skipped without it:
 * {@code mvn -pl tracker,export test -Dtest='*LookTest' -Dmodetrail.lookDir=/tmp/modetrail-pictures}.
 */
class OverlayLookTest {
    @Test
    void overlaysForViewing() throws Exception {
        String dir = System.getProperty("modetrail.lookDir");
        Assumptions.assumeTrue(dir != null && !dir.isBlank(), "no -Dmodetrail.lookDir");
        Probe.requireTools();
        Path look = Files.createDirectories(Path.of(dir));
        VideoOptions options = VideoOptions.defaults().withIndexCacheDir(look.resolve("index-cache"));
        Path road = look.resolve("road-overlay.mp4");
        try (VideoSource src = VideoSource.open(TruthProjects.ROAD, options)) {
            OverlayResult r = OverlayVideo.write(src, TruthProjects.road(0, 449), road,
                    OverlayStyle.forFrameHeight(540), OverlayEncoding.defaults(), 150, 250, null, null);
            assertEquals(100, r.framesWritten());
        }
        Probe.extractFrame(road, 60, look.resolve("road-overlay-frame60.png"));
        Path arena = look.resolve("arena-overlay.mp4");
        try (VideoSource src = VideoSource.open(TruthProjects.ARENA, options)) {
            OverlayVideo.write(src, TruthProjects.arena(OverlayVideoTest.CLASS_COLOUR, 0, 449), arena,
                    OverlayStyle.defaults(), OverlayEncoding.defaults(), 0, 50, null, null);
        }
        Probe.extractFrame(arena, 30, look.resolve("arena-overlay-frame30.png"));
        Probe.extractFrame(arena, 48, look.resolve("arena-overlay-frame48.png"));
    }
}
