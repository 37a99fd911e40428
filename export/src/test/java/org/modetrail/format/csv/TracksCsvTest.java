package org.modetrail.format.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

class TracksCsvTest {
    @TempDir
    Path dir;

    @Test
    void rowsAreSortedByTrackThenFrameWithADotWhateverTheLocale() throws Exception {
        Track two = new Track(2, "car", "", Map.of(
                3, FrameAnnotation.tracked(3, new Box(1.25, 2, 3, 4), 0.75),
                1, FrameAnnotation.keyframe(1, new Box(0, 0, 3, 4)),
                2, FrameAnnotation.markedBy(2, Presence.HIDDEN)));
        Track one = new Track(1, "car", "", Map.of(0, FrameAnnotation.interpolated(0, new Box(5, 5, 5, 5))));
        Project p = new Project(new VideoRef("v.mp4", 100, 100, 10, ""), List.of(new ObjectClass("car", 0)),
                List.of(two, one));
        Locale saved = Locale.getDefault();
        Locale.setDefault(Locale.GERMANY); // decimal comma: must not leak into the file
        try {
            TracksCsv.write(p, f -> f * 0.04, dir.resolve("t.csv"));
        } finally {
            Locale.setDefault(saved);
        }
        List<String> lines = Files.readAllLines(dir.resolve("t.csv"));
        // The keyframe carries the user's placement uncertainty; the others none, so their cells are empty.
        assertEquals(List.of(TracksCsv.HEADER + "," + TracksCsv.UNCERTAINTY_COLUMN,
                "1,car,0,0.000000,5.000,5.000,5.000,5.000,interpolated,0.0000,",
                "2,car,1,0.040000,0.000,0.000,3.000,4.000,keyframe,1.0000,1.000",
                "2,car,3,0.120000,1.250,2.000,3.000,4.000,tracked,0.7500,"), lines, "hidden frame 2 has no row");
        try (var files = Files.list(dir)) {
            assertFalse(files.anyMatch(f -> f.getFileName().toString().endsWith(".tmp")), "no temporary left");
        }
    }
}
