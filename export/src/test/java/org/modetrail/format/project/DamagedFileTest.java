package org.modetrail.format.project;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DamagedFileTest {
    @TempDir
    Path dir;

    /** A valid file written by hand so that lines and columns are known. */
    static final String VALID = String.join("\n",
            "{",
            "  \"format\": \"modetrail-project\",",
            "  \"schema\": 2,",
            "  \"video\": {\"path\": \"a.mp4\", \"width\": 64, \"height\": 48, \"frames\": 10, \"fingerprint\": \"\"},",
            "  \"classes\": [",
            "    {\"name\": \"ant\", \"colour\": \"#00FF00\"}",
            "  ],",
            "  \"tracks\": [",
            "    {\"id\": 1, \"class\": \"ant\", \"note\": \"\", \"frames\": [",
            "      [0,\"k\",\"v\",1,2,3,4,1],",
            "      [1,\"t\",\"v\",1.5,2,3,4,0.5],",
            "      [2,\"k\",\"h\",1]",
            "    ]}",
            "  ]",
            "}", "");

    private ProjectFileException failsOn(String content) throws Exception {
        Path file = dir.resolve("p.json");
        Files.writeString(file, content, StandardCharsets.UTF_8);
        byte[] before = Files.readAllBytes(file);
        ProjectFileException e = assertThrows(ProjectFileException.class, () -> ProjectFile.read(file));
        assertArrayEquals(before, Files.readAllBytes(file), "the file must be left as it was");
        assertEquals(List.of("p.json"), Arrays.stream(dir.toFile().list()).toList(), "nothing else is written");
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        assertEquals(file, e.file());
        return e;
    }

    @Test
    void theValidFileReads() throws Exception {
        Path file = dir.resolve("p.json");
        Files.writeString(file, VALID);
        assertEquals(3, ProjectFile.read(file).tracks().get(0).frames().size());
    }

    @Test
    void truncatedAnywhereSaysWhereItEnds() throws Exception {
        byte[] all = VALID.getBytes(StandardCharsets.UTF_8);
        // Cut in the header, inside a string, inside a number, between frames, and before the last brace.
        int[] cuts = {1, 20, 40, 95, VALID.indexOf("1.5") + 2, VALID.indexOf("[2,"), VALID.lastIndexOf('}')};
        for (int cut : cuts) {
            ProjectFileException e = failsOn(new String(Arrays.copyOf(all, cut), StandardCharsets.UTF_8));
            assertTrue(e.line() >= 1 && e.column() >= 1, "cut at " + cut + ": " + e.getMessage());
            String before = VALID.substring(0, cut);
            int lastLine = (int) before.chars().filter(c -> c == '\n').count() + 1;
            assertEquals(lastLine, e.line(), "cut at " + cut + ": " + e.getMessage());
        }
    }

    @Test
    void truncationMessageSaysWhatToDo() throws Exception {
        ProjectFileException e = failsOn(VALID.substring(0, VALID.indexOf("[2,")));
        assertTrue(e.getMessage().contains("ends in the middle of the project"), e.getMessage());
        assertTrue(e.getMessage().contains("backup (.bak)"), e.getMessage());
    }

    @Test
    void garbageIsRefusedAtItsPlace() throws Exception {
        ProjectFileException e = failsOn(VALID.replace("[1,\"t\"", "[1,§\"t\""));
        assertEquals(11, e.line());
        // Columns count UTF-8 bytes, and Jackson reports the place just after the bad character (2 bytes).
        assertEquals(12, e.column());
        assertTrue(e.getMessage().contains("not valid JSON"), e.getMessage());
        ProjectFileException binary = failsOn("\u0000\u0001PK\u0003\u0004 binary");
        assertEquals(1, binary.line());
    }

    @Test
    void wrongTypesNameTheFieldAndPlace() throws Exception {
        ProjectFileException e = failsOn(VALID.replace("\"width\": 64", "\"width\": \"64\""));
        assertEquals(4, e.line());
        assertEquals(39, e.column());
        assertTrue(e.getMessage().contains("the video's \"width\" should be a whole number, found a string"),
                e.getMessage());
        ProjectFileException frames = failsOn(VALID.replace("\"frames\": [\n", "\"frames\": {\n"));
        assertTrue(frames.getMessage().contains("track 1: \"frames\" should be a list"), frames.getMessage());
        assertEquals(9, frames.line());
    }

    @Test
    void unknownClassNamesTheTrack() throws Exception {
        ProjectFileException e = failsOn(VALID.replace("\"class\": \"ant\"", "\"class\": \"bee\""));
        assertTrue(e.getMessage().contains("line 9 column 24: track 1 has class \"bee\", which \"classes\" does "
                + "not list"), e.getMessage());
    }

    @Test
    void duplicateTrackIdIsRefused() throws Exception {
        String twice = VALID.replace("\n  ]\n}", ",\n    {\"id\": 1, \"class\": \"ant\", \"frames\": []}\n  ]\n}");
        ProjectFileException e = failsOn(twice);
        assertTrue(e.getMessage().contains("track id 1 is used twice (first at line 9)"), e.getMessage());
        assertEquals(14, e.line());
        assertEquals(5, e.column());
    }

    @Test
    void frameBeyondTheVideoNamesTrackAndFrame() throws Exception {
        ProjectFileException e = failsOn(VALID.replace("[2,\"k\",\"h\",1]", "[10,\"k\",\"h\",1]"));
        assertTrue(e.getMessage().endsWith("line 12 column 7: track 1 frame 10 is beyond the video, which has "
                + "frames 0 to 9"), e.getMessage());
    }

    @Test
    void negativeBoxNamesTrackAndFrame() throws Exception {
        ProjectFileException e = failsOn(VALID.replace("1.5,2,3,4", "1.5,2,-3,4"));
        assertTrue(e.getMessage().contains("line 11 column 7: track 1 frame 1: the box has a negative size"),
                e.getMessage());
    }

    @Test
    void unknownLettersAreExplained() throws Exception {
        ProjectFileException source = failsOn(VALID.replace("[1,\"t\"", "[1,\"x\""));
        assertTrue(source.getMessage().contains("line 11 column 10: track 1 frame 1: unknown source \"x\"; it is "
                + "k (keyframe), t (tracked) or i (interpolated)"), source.getMessage());
        ProjectFileException presence = failsOn(VALID.replace("\"k\",\"h\"", "\"k\",\"q\""));
        assertTrue(presence.getMessage().contains("track 1 frame 2: unknown presence \"q\""), presence.getMessage());
    }

    @Test
    void duplicateFrameAndExtraValuesAreRefused() throws Exception {
        ProjectFileException dup = failsOn(VALID.replace("[2,\"k\",\"h\",1]", "[1,\"k\",\"h\",1]"));
        assertTrue(dup.getMessage().contains("track 1 frame 1 is listed twice"), dup.getMessage());
        ProjectFileException extra = failsOn(VALID.replace("[2,\"k\",\"h\",1]", "[2,\"k\",\"h\",1,5]"));
        assertTrue(extra.getMessage().contains("too many values; a mark has 4"), extra.getMessage());
    }

    @Test
    void unknownFieldsAndTrailingContentAreRefused() throws Exception {
        ProjectFileException field = failsOn(VALID.replace("\"note\": \"\"", "\"notes\": \"\""));
        assertTrue(field.getMessage().contains("unknown field \"notes\" in track 1"), field.getMessage());
        ProjectFileException trailing = failsOn(VALID + "{}");
        assertTrue(trailing.getMessage().contains("more after the end"), trailing.getMessage());
        ProjectFileException missing = failsOn(VALID.replace("\"schema\": 2,", ""));
        assertTrue(missing.getMessage().contains("no \"schema\" field"), missing.getMessage());
    }

    @Test
    void badColourIsExplained() throws Exception {
        ProjectFileException e = failsOn(VALID.replace("#00FF00", "green"));
        assertTrue(e.getMessage().contains("line 6 column 31: colour \"green\" should be written #RRGGBB"),
                e.getMessage());
    }

    @Test
    void missingFileIsAProjectFileException() {
        ProjectFileException e = assertThrows(ProjectFileException.class,
                () -> ProjectFile.read(dir.resolve("none.json")));
        assertTrue(e.getMessage().endsWith("none.json: there is no such file"), e.getMessage());
    }
}
