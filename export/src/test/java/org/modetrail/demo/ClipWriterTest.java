package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Clips are checked with Debian's ffprobe, which decodes them independently of how they were made. */
class ClipWriterTest {

    private static final int FRAMES = 40;

    @TempDir
    Path dir;

    private static ClipOptions small() {
        // GOP 20 so the short clip has two key frames; 3 B-frames as in the committed clips.
        return ClipOptions.defaults(160, 120, FRAMES).withGop(20, 3).withQuality(23, 4, "veryfast")
                .withFfmpeg(ReferenceTools.FFMPEG.toString());
    }

    @Test
    void h264ClipHasEveryFrameAndBFrames() throws Exception {
        ReferenceTools.requireFfmpeg();
        Path clip = dir.resolve("arena.mp4");
        Path truth = dir.resolve("arena-truth.csv");
        DemoClips.Written written = DemoClips.writeArena(clip, truth, small(), 5);
        ReferenceTools.Probe probe = ReferenceTools.probe(clip);
        assertEquals(FRAMES, probe.countedFrames());
        List<String> types = probe.pictureTypes();
        assertEquals(FRAMES, types.size());
        assertTrue(types.contains("B"), "B-frames present: " + types);
        assertEquals("I", types.get(0));
        assertEquals("h264", probe.codec());
        // Three animals in every frame, plus the header.
        assertEquals(3 * FRAMES, written.truthRows());
        assertEquals(3 * FRAMES + 1, Files.readAllLines(truth).size());
        assertNoLeftovers();
    }

    @Test
    void withoutBFramesThereAreNone() throws Exception {
        ReferenceTools.requireFfmpeg();
        Path clip = dir.resolve("road.mkv");
        DemoClips.writeRoad(clip, null, null, small().withGop(10, 0), 1);
        ReferenceTools.Probe probe = ReferenceTools.probe(clip);
        List<String> types = probe.pictureTypes();
        assertEquals(FRAMES, probe.countedFrames());
        assertFalse(types.contains("B"), "no B-frames: " + types);
        // GOP 10 over 40 frames: at least four key frames (x264 may add more at scene cuts).
        assertTrue(types.stream().filter("I"::equals).count() >= 4, "key frames: " + types);
    }

    @Test
    void aviWithMpeg4Part2AndWithMjpeg() throws Exception {
        ReferenceTools.requireFfmpeg();
        Path mpeg4 = dir.resolve("arena-mpeg4.avi");
        DemoClips.writeArena(mpeg4, null, small().withCodec(VideoCodec.MPEG4), 1);
        ReferenceTools.Probe probe = ReferenceTools.probe(mpeg4);
        assertEquals("mpeg4", probe.codec());
        assertEquals(FRAMES, probe.countedFrames());
        assertTrue(probe.pictureTypes().contains("B"), "B-frames: " + probe.pictureTypes());

        Path mjpeg = dir.resolve("arena-mjpeg.avi");
        DemoClips.writeArena(mjpeg, null, small().withCodec(VideoCodec.MJPEG), 1);
        probe = ReferenceTools.probe(mjpeg);
        assertEquals("mjpeg", probe.codec());
        assertEquals(FRAMES, probe.countedFrames());
        assertTrue(probe.pictureTypes().stream().allMatch("I"::equals), "MJPEG is all key frames");
    }

    @Test
    void encoderFailureNamesTheClipAndQuotesItsErrorOutput() throws Exception {
        // Stand-ins for an ffmpeg that fails: one refuses at once, one reads every frame and then fails.
        for (String body : List.of("echo 'Unknown encoder simulated' >&2; exit 1",
                                   "cat > /dev/null; echo 'Conversion failed simulated' >&2; exit 1")) {
            Path fake = dir.resolve("fake-ffmpeg");
            Files.writeString(fake, "#!/bin/sh\n" + body + "\n");
            assertTrue(fake.toFile().setExecutable(true));
            Path clip = dir.resolve("bad.mp4");
            ClipOptions options = small().withFfmpeg(fake.toString());
            ClipWriteException e = assertThrows(ClipWriteException.class,
                    () -> DemoClips.writeArena(clip, null, options, 1));
            assertTrue(e.getMessage().contains(clip.toAbsolutePath().toString()), e.getMessage());
            assertTrue(e.getMessage().contains("simulated"), "error output quoted: " + e.getMessage());
            assertFalse(Files.exists(clip));
            assertNoLeftovers();
        }
    }

    @Test
    void missingFfmpegSaysHowToInstallIt() {
        Path clip = dir.resolve("none.mp4");
        ClipOptions options = small().withFfmpeg(dir.resolve("no-such-ffmpeg").toString());
        ClipWriteException e = assertThrows(ClipWriteException.class, () -> ClipWriter.open(clip, options));
        assertTrue(e.getMessage().contains("apt-get install ffmpeg"), e.getMessage());
        assertTrue(e.getMessage().contains(clip.toAbsolutePath().toString()), e.getMessage());
    }

    @Test
    void codecMustSuitTheContainer() {
        ClipOptions mjpeg = small().withCodec(VideoCodec.MJPEG);
        assertThrows(IllegalArgumentException.class, () -> ClipWriter.open(dir.resolve("x.mp4"), mjpeg));
        assertThrows(IllegalArgumentException.class, () -> ClipWriter.open(dir.resolve("x.avi"), small()));
        assertThrows(IllegalArgumentException.class, () -> ClipWriter.open(dir.resolve("x.webm"), small()));
    }

    @Test
    void sceneAndOptionsMustAgree() {
        ArenaScene scene = new ArenaScene(ArenaConfig.defaults().withSize(160, 120).withTiming(25, 10));
        assertThrows(IllegalArgumentException.class,
                () -> DemoClips.write(scene, dir.resolve("a.mp4"), null, small()));
    }

    private void assertNoLeftovers() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            List<Path> partial = files.filter(p -> p.getFileName().toString().endsWith(".part")).toList();
            assertTrue(partial.isEmpty(), "temporary files left: " + partial);
        }
    }
}
