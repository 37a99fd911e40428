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
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Presence;
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
                        // Old files say nothing of uncertainty: their boxes read with it not known (NaN).
                        0, new FrameAnnotation(0, Presence.VISIBLE, new Box(1, 2, 30, 20), BoxSource.KEYFRAME, 1),
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
        assertTrue(Files.readString(file).contains("\"schema\": 3,"));
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
        assertEquals(file + ": written by a newer Modetrail (schema 7); this version reads schema 3 and older: "
                + "update Modetrail", e.getMessage());
    }

    private static final String SCHEMA_2 = """
            {"format": "modetrail-project", "schema": 2,
             "video": {"path": "clip.mp4", "width": 320, "height": 240, "frames": 50, "fingerprint": ""},
             "classes": [{"name": "car", "colour": "#D62728"}],
             "tracks": [{"id": 3, "class": "car", "frames": [
               [0, "k", "v", 1, 2, 30, 20, 1],
               [1, "t", "v", 1.5, 2.25, 30, 20, 0.8]
             ]}]}
            """;

    @Test
    void schemaTwoReadsWithTheUncertaintyNotKnownAndKeepsLineNumbers() throws Exception {
        Path file = dir.resolve("two.json");
        Files.writeString(file, SCHEMA_2);
        Project p = ProjectFile.read(file);
        assertTrue(Double.isNaN(p.track(3).orElseThrow().at(0).orElseThrow().uncertaintyPx()));
        assertTrue(Double.isNaN(p.track(3).orElseThrow().at(1).orElseThrow().uncertaintyPx()));
        // A ninth value is schema 3's: a schema-2 file with one is damaged, and the error says where.
        Files.writeString(file, SCHEMA_2.replace("0.8]", "0.8, 2.5]"));
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals(6, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("too many values"), e.getMessage());
    }

    @Test
    void schemaThreeKeepsTheUncertaintyAndRefusesANegativeOne() throws Exception {
        Path file = dir.resolve("three.json");
        Files.writeString(file, SCHEMA_2.replace("\"schema\": 2", "\"schema\": 3").replace("0.8]", "0.8, 2.5]"));
        assertEquals(2.5, ProjectFile.read(file).track(3).orElseThrow().at(1).orElseThrow().uncertaintyPx());
        Files.writeString(file, SCHEMA_2.replace("\"schema\": 2", "\"schema\": 3").replace("0.8]", "0.8, -1]"));
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertEquals(6, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("track 3 frame 1: uncertainty -1.0 px should be 0 or more"),
                e.getMessage());
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
