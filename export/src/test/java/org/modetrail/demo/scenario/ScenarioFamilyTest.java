package org.modetrail.demo.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.modetrail.demo.TruthCsv;

/** The family's contract with the benchmark: seeds, names, clip shape, determinism, encoding quality, the writer. */
class ScenarioFamilyTest {

    private static final Path FFMPEG = Path.of("/usr/bin/ffmpeg");
    private static final Path FFPROBE = Path.of("/usr/bin/ffprobe");

    @TempDir
    Path dir;

    @ParameterizedTest
    @EnumSource(FamilyKind.class)
    void tuningAndReportSeedsAreDisjointAndEnough(FamilyKind kind) {
        long[] tuning = ScenarioFamily.tuningSeeds(kind);
        long[] report = ScenarioFamily.reportSeeds(kind);
        assertTrue(tuning.length >= 12 && report.length >= 20, tuning.length + " tuning, " + report.length
                + " report seeds");
        Set<Long> all = new HashSet<>();
        Arrays.stream(tuning).forEach(all::add);
        Arrays.stream(report).forEach(all::add);
        assertEquals(tuning.length + report.length, all.size(), "no seed is both, none repeats");
    }

    @Test
    void slugsAreLowerCaseWithHyphensAndReadBack() {
        for (FamilyKind k : FamilyKind.values()) {
            assertTrue(k.slug().matches("[a-z]+(-[a-z]+)*"), k.slug());
            assertEquals(k, FamilyKind.ofSlug(k.slug()));
        }
        assertThrows(IllegalArgumentException.class, () -> FamilyKind.ofSlug("SMALL_ERRATIC"));
    }

    @ParameterizedTest
    @EnumSource(FamilyKind.class)
    void crfIsDrawnPerSeedWithinEighteenToThirtyFour(FamilyKind kind) {
        Set<Integer> seen = new HashSet<>();
        for (long[] seeds : List.of(ScenarioFamily.tuningSeeds(kind), ScenarioFamily.reportSeeds(kind))) {
            for (long seed : seeds) {
                int crf = ScenarioFamily.crf(kind, seed);
                assertTrue(crf >= 18 && crf <= 34, kind + " seed " + seed + " crf " + crf);
                assertEquals(crf, ScenarioFamily.crf(kind, seed));
                assertEquals(crf, ScenarioFamily.create(kind, seed, FamilyRendering.BARE).plan().crf());
                seen.add(crf);
            }
        }
        assertTrue(seen.size() >= 5, kind + ": qualities drawn " + seen);
    }

    @ParameterizedTest
    @EnumSource(FamilyKind.class)
    void clipsHaveTheKindsShapeAndStartWithTheTargetInView(FamilyKind kind) {
        Set<String> sizes = new HashSet<>();
        Set<Integer> lengths = new HashSet<>();
        for (long seed : ScenarioFamily.tuningSeeds(kind)) {
            TrackingScenario s = ScenarioFamily.create(kind, seed);
            assertEquals(kind.slug() + "-" + seed, s.name());
            assertEquals(kind.nearest(), s.kind());
            assertEquals(25, s.fps());
            int most = kind == FamilyKind.FAST_LARGE ? 250 : 400;
            assertTrue(s.frameCount() >= 150 && s.frameCount() <= most, s.name() + " frames " + s.frameCount());
            lengths.add(s.frameCount());
            sizes.add(s.width() + "x" + s.height());
            assertTrue(s.objectCount() >= 2, s.name() + " objects "
                    + s.objectCount());
            assertTrue(s.truth(0, 0).visible() >= 0.8, s.name() + ": target seen at frame 0, "
                    + s.truth(0, 0).visible());
        }
        if (kind == FamilyKind.FAST_LARGE) {
            assertTrue(Set.of("1280x720", "1920x1080").containsAll(sizes) && sizes.size() == 2, "sizes " + sizes);
        } else {
            assertEquals(Set.of("640x480"), sizes);
        }
        assertTrue(lengths.size() >= 8, kind + ": clip lengths vary, " + lengths);
        for (long seed : ScenarioFamily.reportSeeds(kind)) {
            // The benchmark starts a tracker on frame 0 of report clips too.
            TrackingScenario s = ScenarioFamily.create(kind, seed);
            assertTrue(s.truth(0, 0).visible() >= 0.8 && s.objectCount() >= 2, s.name() + ": target seen at frame 0, "
                    + s.truth(0, 0).visible() + ", objects " + s.objectCount());
        }
    }

    @ParameterizedTest
    @EnumSource(FamilyKind.class)
    void sameSeedSameClipInAnyOrder(FamilyKind kind) {
        TrackingScenario forwards = ScenarioFamily.create(kind, 1001);
        TrackingScenario backwards = ScenarioFamily.create(kind, 1001);
        int n = forwards.width() * forwards.height();
        int[] frames = {0, 37, 101, forwards.frameCount() - 1};
        int[][] pixels = new int[frames.length][n];
        for (int k = 0; k < frames.length; k++) {
            forwards.render(frames[k], pixels[k]);
        }
        int[] again = new int[n];
        for (int k = frames.length - 1; k >= 0; k--) {
            Arrays.fill(again, 0x12345678);
            backwards.render(frames[k], again);
            assertArrayEquals(pixels[k], again, kind + " frame " + frames[k]);
        }
        for (int f = 0; f < forwards.frameCount(); f++) {
            for (int o = 0; o < forwards.objectCount(); o++) {
                assertEquals(forwards.truth(o, f), backwards.truth(o, f), kind + " truth " + o + " at " + f);
            }
        }
    }

    @ParameterizedTest
    @EnumSource(FamilyKind.class)
    void otherSeedOtherClip(FamilyKind kind) {
        TrackingScenario one = ScenarioFamily.create(kind, 1);
        TrackingScenario two = ScenarioFamily.create(kind, 2);
        assertNotEquals(one.truth(0, 0), two.truth(0, 0), kind + ": the target starts elsewhere");
        if (one.width() == two.width()) {
            int[] a = new int[one.width() * one.height()];
            int[] b = new int[a.length];
            one.render(20, a);
            two.render(20, b);
            int differ = Pixels.count(Pixels.differ(a, b));
            assertTrue(differ > a.length / 2, kind + ": floor, noise and bodies differ almost everywhere, " + differ);
        }
    }

    @Test
    void theWriterEncodesAtTheSeedsQualityAndWritesTheTruth() throws Exception {
        boolean present = Files.isExecutable(FFMPEG) && Files.isExecutable(FFPROBE);
        if (!present && "1".equals(System.getenv("MODETRAIL_REQUIRE_REFDATA"))) {
            throw new AssertionError(FFMPEG + " or " + FFPROBE + " missing and MODETRAIL_REQUIRE_REFDATA=1");
        }
        Assumptions.assumeTrue(present, "ffmpeg and ffprobe are needed (apt-get install ffmpeg)");
        FamilyKind kind = FamilyKind.SMALL_ERRATIC;
        long seed = 1;
        TrackingScenario s = ScenarioFamily.create(kind, seed);
        Path clip = ScenarioFamily.write(dir, kind, seed);
        assertEquals(dir.resolve("small-erratic-1.mp4"), clip);
        Process p = new ProcessBuilder(FFPROBE.toString(), "-v", "error", "-count_frames", "-select_streams", "v:0",
                "-show_entries", "stream=nb_read_frames,width,height", "-of", "csv=p=0", clip.toString())
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals("640,480," + s.frameCount(), out, "ffprobe's count of decoded frames");
        // libx264 records its settings, crf among them, in a user-data SEI message at the start of the stream.
        String bytes = new String(Files.readAllBytes(clip), StandardCharsets.ISO_8859_1);
        assertTrue(bytes.contains("crf=" + ScenarioFamily.crf(kind, seed) + ".0"), "encoded at the seed's crf");
        List<String> lines = Files.readAllLines(TrackingScenarios.truthPath(clip));
        assertEquals(TruthCsv.IMAGE_HEADER, lines.get(0));
        int rows = 0;
        for (int f = 0; f < s.frameCount(); f++) {
            for (int k = 0; k < s.objectCount(); k++) {
                rows += s.truth(k, f).width() > 0 ? 1 : 0;
            }
        }
        assertEquals(1 + rows, lines.size(), "a row per object in view per frame");
    }
}
