package org.modetrail.format.project;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Project;

class AtomicWriteTest {
    @TempDir
    Path dir;

    /** Fails once {@code limit} bytes have passed, like a disk that fills up half-way. */
    private static final class FailingStream extends FilterOutputStream {
        private long left;

        FailingStream(OutputStream out, long limit) {
            super(out);
            left = limit;
        }

        @Override
        public void write(int b) throws IOException {
            write(new byte[] {(byte) b}, 0, 1);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            if (len > left) {
                out.write(b, off, (int) left);
                throw new IOException("No space left on device (test)");
            }
            left -= len;
            out.write(b, off, len);
        }
    }

    @Test
    void writeThatFailsHalfWayLeavesTheOldFile() throws Exception {
        Path file = dir.resolve("p.json");
        ProjectFile.write(SampleProjects.small(), file);
        byte[] before = Files.readAllBytes(file);
        Project bigger = SampleProjects.large(2, 5_000, 1);
        IOException e = assertThrows(IOException.class,
                () -> ProjectFile.write(bigger, file, true, out -> new FailingStream(out, 200_000)));
        assertTrue(e.getMessage().contains("No space left"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(List.of("p.json"), Arrays.stream(dir.toFile().list()).toList(),
                "no temporary file and no backup are left behind");
    }

    @Test
    void previousVersionIsKeptAsBackup() throws Exception {
        Path file = dir.resolve("p.json");
        ProjectFile.write(SampleProjects.small(), file);
        byte[] first = Files.readAllBytes(file);
        Project second = SampleProjects.small().withoutTrack(2);
        ProjectFile.write(second, file);
        assertArrayEquals(first, Files.readAllBytes(ProjectFile.backupFile(file)));
        assertEquals(second, ProjectFile.read(file));
        ProjectFile.write(SampleProjects.small(), file);
        assertEquals(second, ProjectFile.read(ProjectFile.backupFile(file)), "the backup is the version before");
        assertEquals(List.of("p.json", "p.json.bak"), Arrays.stream(dir.toFile().list()).sorted().toList());
    }

    @Test
    void aSaveRemovesTheTemporaryFilesOfAKilledEarlierSaveButNotOthers() throws Exception {
        Path file = dir.resolve("p.json");
        long old = System.currentTimeMillis() - AtomicWrite.LEFTOVER_AGE.toMillis() - 60_000;
        Path killed = touch(".p.json.4417230598812.part", old);
        Path killedBackup = touch(".p.json.bak.90813.part", old);
        Path inFlight = touch(".p.json.5521.part", System.currentTimeMillis());
        Path otherFiles = touch(".p.json.recovery.7710.part", old);
        Path userFile = touch("notes.part", old);
        ProjectFile.write(SampleProjects.small(), file);
        assertFalse(Files.exists(killed));
        assertFalse(Files.exists(killedBackup));
        assertTrue(Files.exists(inFlight), "a recent temporary file may be a save in progress");
        assertTrue(Files.exists(otherFiles), "the recovery file's temporaries are its own writer's business");
        assertTrue(Files.exists(userFile));
    }

    private Path touch(String name, long modifiedMillis) throws IOException {
        Path p = Files.writeString(dir.resolve(name), "{\"partial");
        Files.setLastModifiedTime(p, java.nio.file.attribute.FileTime.fromMillis(modifiedMillis));
        return p;
    }

    /**
     * The strong check: a child JVM saves versions 1, 2, 3, … of a large project in a loop and is killed with
     * SIGKILL at some moment; the file must then be one complete version, never a partial one.
     */
    @Test
    void killedWriterLeavesACompleteVersion() throws Exception {
        Path file = dir.resolve("long.json");
        ProjectFile.write(AtomicWriteChild.version(0), file);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        for (int round = 0; round < 3; round++) {
            Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                    AtomicWriteChild.class.getName(), file.toString())
                    .redirectErrorStream(true).start();
            BufferedReader lines = new BufferedReader(new InputStreamReader(child.getInputStream(),
                    StandardCharsets.UTF_8));
            // Wait for a few complete saves, then kill it during a later one (a different point each round).
            for (int seen = 0; seen < 1 + round; ) {
                String line = lines.readLine();
                assertTrue(line != null, "the child ended early");
                if (line.startsWith("saved ")) {
                    seen++;
                }
            }
            Thread.sleep(7L * round);
            child.destroyForcibly(); // SIGKILL on POSIX: no shutdown hooks, no finally blocks
            assertTrue(child.waitFor(10, TimeUnit.SECONDS));
            Project read = ProjectFile.read(file);
            String note = read.tracks().get(0).note();
            int version = Integer.parseInt(note.substring("version ".length()));
            assertEquals(AtomicWriteChild.version(version), read, "round " + round + ": version " + version);
            Project backup = ProjectFile.read(ProjectFile.backupFile(file));
            assertTrue(backup.tracks().get(0).note().startsWith("version "), "the backup is complete too");
        }
        // A kill during a save may leave its temporary file (hidden, .part); it never replaces the project.
        try (var names = Files.list(dir)) {
            System.out.println("after the kills: " + names.map(p -> p.getFileName().toString()).sorted().toList());
        }
    }
}
