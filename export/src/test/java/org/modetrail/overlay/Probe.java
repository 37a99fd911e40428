package org.modetrail.overlay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/** FFmpeg's own tools (Debian's /usr/bin/ffprobe and ffmpeg), the outside reference for the overlay videos. */
final class Probe {
    static final Path FFMPEG = Path.of("/usr/bin/ffmpeg");
    static final Path FFPROBE = Path.of("/usr/bin/ffprobe");

    private Probe() {
    }

    static void requireTools() {
        if (Files.isExecutable(FFMPEG) && Files.isExecutable(FFPROBE)) {
            return;
        }
        String message = FFMPEG + " or " + FFPROBE + " is missing (apt-get install ffmpeg)";
        if ("1".equals(System.getenv("MODETRAIL_REQUIRE_REFDATA"))) {
            fail(message + " and MODETRAIL_REQUIRE_REFDATA=1 requires it");
        }
        Assumptions.abort(message);
    }

    /** ffprobe's view of the first video stream, frames counted by decoding ({@code -count_frames}). */
    static Map<String, String> stream(Path video) throws IOException, InterruptedException {
        List<String> lines = run(List.of(FFPROBE.toString(), "-v", "error", "-count_frames", "-select_streams", "v:0",
                "-show_entries", "stream=codec_name,width,height,r_frame_rate,avg_frame_rate,nb_read_frames,pix_fmt",
                "-of", "default=noprint_wrappers=1", video.toString()));
        Map<String, String> m = new HashMap<>();
        for (String line : lines) {
            int eq = line.indexOf('=');
            if (eq > 0) {
                m.put(line.substring(0, eq), line.substring(eq + 1));
            }
        }
        return m;
    }

    /** Frame {@code n} decoded by ffmpeg, written as PNG to {@code png}. */
    static void extractFrame(Path video, int n, Path png) throws IOException, InterruptedException {
        run(List.of(FFMPEG.toString(), "-v", "error", "-y", "-i", video.toString(), "-vf", "select=eq(n\\," + n + ")",
                "-frames:v", "1", png.toString()));
    }

    private static List<String> run(List<String> command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("timed out: " + command);
        }
        assertEquals(0, p.exitValue(), "exit status of " + command);
        List<String> lines = new ArrayList<>();
        out.lines().map(String::strip).filter(s -> !s.isEmpty()).forEach(lines::add);
        return lines;
    }
}
