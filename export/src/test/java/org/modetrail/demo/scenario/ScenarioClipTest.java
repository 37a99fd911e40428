package org.modetrail.demo.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.demo.ClipOptions;
import org.modetrail.demo.TruthCsv;

/** Clips are checked with Debian's ffprobe, which decodes them independently of how they were written. */
class ScenarioClipTest {

    private static final Path FFMPEG = Path.of("/usr/bin/ffmpeg");
    private static final Path FFPROBE = Path.of("/usr/bin/ffprobe");

    @TempDir
    Path dir;

    @Test
    void writesEveryFrameAndTheTruthOfBothObjects() throws Exception {
        requireFfmpeg();
        TrackingScenario s = TrackingScenarios.create(ScenarioKind.CROSSING,
                ScenarioConfig.defaults().withSize(320, 240).withTiming(25, 100));
        ClipOptions options = TrackingScenarios.clipOptions(s).withQuality(23, 4, "veryfast")
                .withFfmpeg(FFMPEG.toString());
        Path clip = dir.resolve("crossing.mp4");
        Path truth = TrackingScenarios.writeClip(s, clip, options);
        assertEquals(dir.resolve("crossing-truth.csv"), truth);
        assertEquals("100", ffprobe("-count_frames", "-select_streams", "v:0", "-show_entries",
                "stream=nb_read_frames", "-of", "csv=p=0", clip.toString()).get(0));
        List<String> lines = Files.readAllLines(truth);
        assertEquals(TruthCsv.IMAGE_HEADER, lines.get(0));
        assertEquals(1 + 2 * 100, lines.size(), "a row per object per frame");
        ScenarioBox b = s.truth(1, 0);
        assertEquals("2,distractor,0,0," + (int) b.x() + "," + (int) b.y() + "," + (int) b.width() + ","
                + (int) b.height() + ",1", lines.get(2));
        assertTrue(lines.get(1).startsWith("1,target,0,0,"), lines.get(1));
    }

    @Test
    void refusesOptionsThatDisagreeWithTheScenario() {
        TrackingScenario s = TrackingScenarios.create(ScenarioKind.TRANSLATION, 1);
        ClipOptions wrongLength = TrackingScenarios.clipOptions(s).withTiming(25, 150);
        assertThrows(IllegalArgumentException.class,
                () -> TrackingScenarios.writeClip(s, dir.resolve("x.mp4"), wrongLength));
        assertTrue(!Files.exists(dir.resolve("x.mp4")));
    }

    private static void requireFfmpeg() {
        boolean present = Files.isExecutable(FFMPEG) && Files.isExecutable(FFPROBE);
        if (!present && "1".equals(System.getenv("MODETRAIL_REQUIRE_REFDATA"))) {
            throw new AssertionError(FFMPEG + " or " + FFPROBE + " missing and MODETRAIL_REQUIRE_REFDATA=1");
        }
        Assumptions.assumeTrue(present, "ffmpeg and ffprobe are needed (apt-get install ffmpeg)");
    }

    private static List<String> ffprobe(String... args) throws Exception {
        List<String> command = new java.util.ArrayList<>(List.of(FFPROBE.toString(), "-v", "error"));
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "ffprobe finished");
        assertEquals(0, p.exitValue(), "ffprobe exit status");
        return out.lines().map(String::strip).filter(l -> !l.isEmpty()).toList();
    }
}
