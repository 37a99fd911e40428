package org.modetrail.format.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;

class ProjectFileRoundTripTest {
    @TempDir
    Path dir;

    @Test
    void everyKindOfAnnotationSurvivesWriteAndRead() throws Exception {
        Project p = SampleProjects.small();
        Path file = dir.resolve("arena.json");
        ProjectFile.write(p, file);
        assertEquals(p, ProjectFile.read(file));
    }

    @Test
    void layoutIsTheDocumentedOne() throws Exception {
        Path file = dir.resolve("arena.json");
        ProjectFile.write(SampleProjects.small(), file);
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        // docs/project-file.md shows this layout; the two must agree.
        assertEquals("{", lines.get(0));
        assertEquals("  \"format\": \"modetrail-project\",", lines.get(1));
        assertEquals("  \"schema\": 3,", lines.get(2));
        assertEquals("  \"video\": {\"path\": \"clips/arena.mp4\", \"width\": 640, \"height\": 480, \"frames\": 300,"
                + " \"fingerprint\": \"sha256:0f1e2d\"},", lines.get(3));
        assertTrue(lines.contains("    {\"name\": \"mouse\", \"colour\": \"#1F77B4\", \"contact\": [0.5,1]},"),
                lines.toString());
        assertTrue(lines.contains("      [0,\"k\",\"v\",10,20,30,40,1,1],"), lines.toString());
        assertTrue(lines.contains("      [1,\"t\",\"v\",11.25,20.5,30.125,40.0625,0.9137254901960784,2.375],"));
        assertTrue(lines.contains("      [2,\"i\",\"v\",12.333333333333334,21.1,30.2,40.1,0,4.5],"));
        assertTrue(lines.contains("      [3,\"k\",\"h\",1],"));
        assertTrue(lines.contains("      [4,\"k\",\"a\",1],"));
        assertTrue(lines.contains("      [299,\"k\",\"v\",-3.5,-0.0,0,1.0E-7,1,1]"), lines.toString());
        assertTrue(lines.contains("      [8,\"t\",\"v\",601,401,39.75,79.5,0]"), "an unknown uncertainty is left out");
    }

    @Test
    void numbersUseADotWhateverTheLocale() throws Exception {
        Locale before = Locale.getDefault();
        Path file = dir.resolve("arena.json");
        try {
            Locale.setDefault(Locale.GERMANY); // writes 11,25 with String.format("%f")
            ProjectFile.write(SampleProjects.small(), file);
            assertEquals(SampleProjects.small(), ProjectFile.read(file));
        } finally {
            Locale.setDefault(before);
        }
        assertTrue(Files.readString(file).contains("11.25,20.5"));
    }

    @Test
    void absoluteVideoPathIsStoredRelativeAndResolvedBack() throws Exception {
        Path video = dir.resolve("media/clip one.mp4").toAbsolutePath();
        Project p = Project.of(new VideoRef(video.toString(), 64, 48, 10, ""));
        Path file = dir.resolve("projects/p.json");
        ProjectFile.write(p, file);
        Project read = ProjectFile.read(file);
        assertEquals("../media/clip one.mp4", read.video().path());
        assertEquals(video, ProjectFile.videoPath(read, file));
    }

    @Test
    void readingDoesNotTouchTheFile() throws Exception {
        Path file = dir.resolve("arena.json");
        ProjectFile.write(SampleProjects.small(), file);
        byte[] before = Files.readAllBytes(file);
        var modified = Files.getLastModifiedTime(file);
        ProjectFile.read(file);
        assertEquals(modified, Files.getLastModifiedTime(file));
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(file)));
        assertFalse(Files.exists(ProjectFile.backupFile(file)), "a first save has nothing to back up");
    }

    /** Not a benchmark (DEVELOPERS.md): prints the size and a rough time, and checks the size stays compact. */
    @Test
    void longProjectStaysCompact() throws Exception {
        Project p = SampleProjects.large(3, 10_000, 0);
        Path file = dir.resolve("long.json");
        long t0 = System.nanoTime();
        ProjectFile.write(p, file);
        long t1 = System.nanoTime();
        Project read = ProjectFile.read(file);
        long t2 = System.nanoTime();
        assertEquals(p, read);
        long size = Files.size(file);
        System.out.printf(Locale.ROOT, "3 tracks x 10000 frames: %d bytes (%.1f per frame), write %d ms, read %d ms%n",
                size, size / 30_000.0, (t1 - t0) / 1_000_000, (t2 - t1) / 1_000_000);
        // Tracked frames carry four full-precision doubles and a score: about 90 bytes each.
        assertTrue(size < 30_000 * 100, "file has " + size + " bytes");
    }
}
