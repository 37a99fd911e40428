package org.modetrail.format.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.model.Box;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Project;
import org.modetrail.model.Track;
import org.modetrail.model.VideoRef;

class SchemaVersionTest {
    /** The development layout (docs/project-file.md, "Schema 0"): boxes as objects, no presence, no fingerprint. */
    static final String SCHEMA_0 = """
            {"format": "modetrail-project", "schema": 0,
             "video": {"path": "clip.mp4", "width": 320, "height": 240, "frames": 50},
             "classes": [{"name": "car", "colour": "#D62728"}],
             "tracks": [{"id": 3, "class": "car", "note": "old", "frames": [
               [0, "k", {"x": 1, "y": 2, "w": 30, "h": 20}, 1],
               [1, "t", {"x": 1.5, "y": 2.25, "w": 30, "h": 20}, 0.8],
               [2, "i", {"x": 2, "y": 2.5, "w": 30, "h": 20}, 0]
             ]}]}
            """;

    @TempDir
    Path dir;

    @Test
    void schemaZeroIsUpgraded() throws Exception {
        Path file = dir.resolve("old.json");
        Files.writeString(file, SCHEMA_0);
        Project p = ProjectFile.read(file);
        Project expected = new Project(new VideoRef("clip.mp4", 320, 240, 50, ""),
                List.of(new ObjectClass("car", 0xD62728)),
                List.of(new Track(3, "car", "old", Map.of(
                        0, FrameAnnotation.keyframe(0, new Box(1, 2, 30, 20)),
                        1, FrameAnnotation.tracked(1, new Box(1.5, 2.25, 30, 20), 0.8),
                        2, FrameAnnotation.interpolated(2, new Box(2, 2.5, 30, 20))))));
        assertEquals(expected, p);
        assertEquals(SCHEMA_0, Files.readString(file), "reading an old file must not rewrite it");
    }

    @Test
    void upgradedProjectIsSavedInTheCurrentSchema() throws Exception {
        Path file = dir.resolve("old.json");
        Files.writeString(file, SCHEMA_0);
        Project p = ProjectFile.read(file);
        ProjectFile.write(p, file);
        assertTrue(Files.readString(file).contains("\"schema\": 2,"));
        assertEquals(SCHEMA_0, Files.readString(ProjectFile.backupFile(file)), "the old file is kept as .bak");
        assertEquals(p, ProjectFile.read(file));
    }

    @Test
    void damagedSchemaZeroNamesTheTrackAndEntry() throws Exception {
        Path file = dir.resolve("old.json");
        Files.writeString(file, SCHEMA_0.replace("{\"x\": 1.5, \"y\": 2.25,", "{\"x\": 1.5,"));
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertTrue(e.getMessage().contains("upgrading from schema 0: track 3, frame entry 2: the box has no number "
                + "\"y\""), e.getMessage());
    }

    @Test
    void newerSchemaIsRefusedWithAClearMessage() throws Exception {
        Path file = dir.resolve("new.json");
        Files.writeString(file, "{\"format\": \"modetrail-project\", \"schema\": 7, \"video\": {\"new\": true}}");
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals(file + ": written by a newer Modetrail (schema 7); this version reads schema 2 and older: "
                + "update Modetrail", e.getMessage());
    }

    @Test
    void otherJsonIsNotTakenForAProject() throws Exception {
        Path file = dir.resolve("other.json");
        Files.writeString(file, "{\"name\": \"x\",\n \"format\": \"something-else\", \"schema\": 1}");
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertTrue(e.getMessage().contains("not a Modetrail project file"), e.getMessage());
        assertEquals(2, e.line());
    }
}
