package org.modetrail.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;

/** Export then import through the format names the command line uses. */
class TracksFormatTest {
    @TempDir
    Path dir;

    @Test
    void namesAreTheCommandLineOnes() {
        assertEquals(TracksFormat.COCO, TracksFormat.named(" Coco "));
        assertEquals("mot", TracksFormat.MOT.commandName());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> TracksFormat.named("xml"));
        assertTrue(e.getMessage().contains("csv, coco and mot"), e.getMessage());
    }

    @Test
    void everyFormatGivesTheTracksBack() throws Exception {
        Project p = TrackSamples.small();
        for (TracksFormat format : TracksFormat.values()) {
            Path out = dir.resolve("tracks." + format.commandName());
            format.write(p, f -> f / 25.0, out);
            Project back = format.read(out, p.video(), new ObjectClass("mouse", 0), ImportLimits.DEFAULT);
            if (format == TracksFormat.MOT) {
                // MOTChallenge lines carry no class and no source (Milan et al. 2016): compare ids, frames, boxes.
                assertEquals(p.tracks().size(), back.tracks().size());
                assertTrue(back.tracks().stream().allMatch(t -> t.className().equals("mouse")));
            } else {
                TrackSamples.assertSameTracks(p, back);
            }
        }
    }
}
