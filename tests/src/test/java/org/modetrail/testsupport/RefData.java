package org.modetrail.testsupport;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Assumptions;

/**
 * Where the reference tools and data live. The references are outside the project on purpose: Debian's FFmpeg
 * command-line tools (package ffmpeg, here 5.1) and the sample clip vtest.avi from Debian's opencv-doc package.
 * When one is missing the test is skipped, unless the environment variable {@value #REQUIRE_ENV} is 1 (CI sets
 * it), in which case the test fails and says how to get it.
 */
public final class RefData {
    public static final String REQUIRE_ENV = "MODETRAIL_REQUIRE_REFDATA";
    public static final String VTEST_ENV = "MODETRAIL_VTEST";
    private static final String VTEST_IN_PACKAGE = "usr/share/doc/opencv-doc/examples/data/vtest.avi";

    private RefData() {
    }

    /** FFmpeg's command-line tool found on PATH. */
    public static Path ffmpeg() {
        return tool("ffmpeg");
    }

    /** FFmpeg's probing tool found on PATH. */
    public static Path ffprobe() {
        return tool("ffprobe");
    }

    /** Both tools, for tests that need both. */
    public static void requireFfmpegTools() {
        ffmpeg();
        ffprobe();
    }

    /** OpenCV's sample clip vtest.avi (real footage of people walking). */
    public static Path vtest() {
        List<Path> candidates = vtestCandidates();
        for (Path p : candidates) {
            if (Files.isRegularFile(p)) {
                return p.toAbsolutePath();
            }
        }
        missing("vtest.avi not found (looked at " + candidates + ")",
                "get it with `apt-get download opencv-doc && dpkg -x opencv-doc_*.deb tests/target/refdata/opencv-doc`"
                        + " or point " + VTEST_ENV + " at it");
        throw new AssertionError("unreachable");
    }

    /** vtest.avi where {@link #vtest()} looks for it, or empty; for programs (benchmarks), which do not skip. */
    public static java.util.Optional<Path> vtestIfPresent() {
        return vtestCandidates().stream().filter(Files::isRegularFile).map(Path::toAbsolutePath).findFirst();
    }

    private static List<Path> vtestCandidates() {
        List<Path> candidates = new ArrayList<>();
        String env = System.getenv(VTEST_ENV);
        if (env != null && !env.isBlank()) {
            candidates.add(Path.of(env));
        }
        candidates.add(Path.of("/").resolve(VTEST_IN_PACKAGE));
        // Relative to the tests module (where surefire runs) and to the repository root.
        candidates.add(Path.of("target/refdata/opencv-doc").resolve(VTEST_IN_PACKAGE));
        candidates.add(Path.of("tests/target/refdata/opencv-doc").resolve(VTEST_IN_PACKAGE));
        return candidates;
    }

    private static Path tool(String name) {
        String path = System.getenv("PATH");
        if (path != null) {
            for (String dir : path.split(File.pathSeparator)) {
                if (dir.isEmpty()) {
                    continue;
                }
                Path p = Path.of(dir, name);
                if (Files.isRegularFile(p) && Files.isExecutable(p)) {
                    return p;
                }
            }
        }
        missing(name + " not found on PATH", "install it with `apt-get install ffmpeg`");
        throw new AssertionError("unreachable");
    }

    private static void missing(String what, String how) {
        String message = what + "; " + how;
        if ("1".equals(System.getenv(REQUIRE_ENV))) {
            fail(message + " (" + REQUIRE_ENV + "=1 makes missing reference data an error)");
        }
        Assumptions.abort(message);
    }
}
