package org.modetrail.overlay;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.modetrail.picture.TruthProjects;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/** Writes a road overlay and two of its frames to /tmp/modetrail-pictures for a person to look at. */
class OverlayLookTest {
    @Test
    void roadOverlayForViewing() throws Exception {
        Probe.requireTools();
        Path look = Files.createDirectories(Path.of(System.getProperty("java.io.tmpdir"), "modetrail-pictures"));
        Path out = look.resolve("road-overlay.mp4");
        VideoOptions options = VideoOptions.defaults().withIndexCacheDir(look.resolve("index-cache"));
        try (VideoSource src = VideoSource.open(TruthProjects.ROAD, options)) {
            OverlayResult r = OverlayVideo.write(src, TruthProjects.road(0, 449), out,
                    OverlayStyle.forFrameHeight(540), OverlayEncoding.defaults(), 150, 250, null, null);
            assertEquals(100, r.framesWritten());
        }
        Probe.extractFrame(out, 60, look.resolve("road-overlay-frame60.png"));
    }
}
