package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/**
 * Access to Debian's ffmpeg and ffprobe, the outside reference the clip tests check against. Without them the tests
 * are skipped, unless {@code MODETRAIL_REQUIRE_REFDATA=1} demands them (CI), in which case they fail.
 */
final class ReferenceTools {

    static final Path FFMPEG = Path.of("/usr/bin/ffmpeg");
    static final Path FFPROBE = Path.of("/usr/bin/ffprobe");

    private ReferenceTools() {
    }

    static void requireFfmpeg() {
        boolean present = Files.isExecutable(FFMPEG) && Files.isExecutable(FFPROBE);
        if (present) {
            return;
        }
        String message = FFMPEG + " or " + FFPROBE + " is missing (apt-get install ffmpeg)";
        if ("1".equals(System.getenv("MODETRAIL_REQUIRE_REFDATA"))) {
            fail(message + " and MODETRAIL_REQUIRE_REFDATA=1 requires it");
        }
        Assumptions.abort(message);
    }

    /** Runs ffprobe with the given arguments and returns its standard output lines. */
    static List<String> ffprobe(String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(FFPROBE.toString(), "-v", "error"));
        command.addAll(List.of(args));
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(60, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("ffprobe timed out");
        }
        assertEquals(0, p.exitValue(), "ffprobe exit status for " + command);
        return out.lines().map(String::strip).filter(s -> !s.isEmpty()).toList();
    }

    /** What ffprobe found in a clip's first video stream. */
    record Probe(String codec, int countedFrames, List<String> pictureTypes) {
    }

    /**
     * One decoding pass of ffprobe: the codec, the number of frames counted by decoding ({@code -count_frames},
     * not the header's claim) and every frame's picture type (I, P or B) in presentation order.
     */
    static Probe probe(Path clip) throws IOException, InterruptedException {
        List<String> out = ffprobe("-count_frames", "-select_streams", "v:0",
                "-show_entries", "stream=codec_name,nb_read_frames:frame=pict_type", "-of", "compact", clip.toString());
        List<String> types = new ArrayList<>();
        String codec = null;
        int counted = -1;
        for (String line : out) {
            if (line.startsWith("frame|pict_type=")) {
                // The first frame may carry side data after another bar.
                String type = line.substring("frame|pict_type=".length());
                int bar = type.indexOf('|');
                types.add(bar < 0 ? type : type.substring(0, bar));
            } else if (line.startsWith("stream|")) {
                for (String field : line.substring("stream|".length()).split("\\|")) {
                    if (field.startsWith("codec_name=")) {
                        codec = field.substring("codec_name=".length());
                    } else if (field.startsWith("nb_read_frames=")) {
                        counted = Integer.parseInt(field.substring("nb_read_frames=".length()));
                    }
                }
            }
        }
        return new Probe(codec, counted, types);
    }
}
