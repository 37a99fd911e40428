package org.modetrail.video;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Frame-exact access on clips whose frames show their own numbers: whatever order frames are asked for, frame n
 * shows n. The checks against FFmpeg's own tools and real footage are in the tests module.
 */
class FfmpegVideoSourceTest {
    private static final int FRAMES = 120;

    @TempDir
    static Path dir;

    static Path mp4WithBFrames;
    static Path mkvWithBFrames;
    static Path aviNoBFrames;

    @BeforeAll
    static void writeClips() throws Exception {
        mp4WithBFrames = NumberedClips.write(dir.resolve("b.mp4"), "mp4", FRAMES, 25, 2);
        mkvWithBFrames = NumberedClips.write(dir.resolve("b.mkv"), "matroska", FRAMES, 50, 2);
        aviNoBFrames = NumberedClips.write(dir.resolve("i.avi"), "avi", FRAMES, 12, 0);
    }

    static Stream<Path> clips() {
        return Stream.of(mp4WithBFrames, mkvWithBFrames, aviNoBFrames);
    }

    private static VideoOptions options() {
        return VideoOptions.defaults().withIndexCacheDir(null).withCacheBudgetMegabytes(8);
    }

    @ParameterizedTest
    @MethodSource("clips")
    void theIndexCountsEveryFrameOnce(Path clip) throws Exception {
        try (VideoSource v = VideoSource.open(clip, options())) {
            assertEquals(FRAMES, v.frameCount());
            assertEquals(25.0, v.info().meanFrameRate(), 0.01);
            assertEquals(NumberedClips.WIDTH, v.info().width());
            assertTrue(v.index().isKeyframe(0));
        }
    }

    @ParameterizedTest
    @MethodSource("clips")
    void frameNShowsNInAnyOrder(Path clip) throws Exception {
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < FRAMES; i++) {
            order.add(i);
        }
        Collections.shuffle(order, new Random(42));
        try (VideoSource v = VideoSource.open(clip, options())) {
            for (int n : order) {
                Frame f = v.frame(n);
                assertEquals(n, f.index());
                assertEquals(n, NumberedClips.numberOf(f), "pixels of frame " + n);
                assertEquals(n / 25.0, f.timeSeconds(), 1e-6);
            }
        }
    }

    @Test
    void steppingBackwardsFromTheEndShowsEveryFrame() throws Exception {
        try (VideoSource v = VideoSource.open(mp4WithBFrames, options())) {
            for (int n = FRAMES - 1; n >= 0; n--) {
                assertEquals(n, NumberedClips.numberOf(v.frame(n)));
            }
        }
    }

    @ParameterizedTest
    @MethodSource("clips")
    void sequentialReadingGivesTheSamePixelsAsRandomAccess(Path clip) throws Exception {
        try (VideoSource seq = VideoSource.open(clip, options());
             VideoSource random = VideoSource.open(clip, options())) {
            List<Integer> seen = new ArrayList<>();
            seq.read(37, 101, f -> {
                seen.add(f.index());
                assertArrayEquals(random.frame(f.index()).rgb(), f.rgb(), "frame " + f.index());
                return true;
            });
            assertEquals(64, seen.size());
            assertEquals(37, seen.get(0));
            assertEquals(100, seen.get(63));
        }
    }

    @ParameterizedTest
    @MethodSource("clips")
    void framesIntoTheCallersArrayMatchFramesFromTheCacheAndAreNotKept(Path clip) throws Exception {
        // A viewer's walk: forward steps, a jump, back steps over held pictures and past them, one array reused.
        int[] walk = {10, 11, 12, 13, 90, 89, 88, 87, 86, 85, 84, 83, 82, 81, 80, 79, 50, 51, 119, 0};
        try (FfmpegVideoSource viewer = (FfmpegVideoSource) VideoSource.open(clip, options());
             VideoSource reference = VideoSource.open(clip, options())) {
            int[] into = new int[NumberedClips.WIDTH * viewer.info().height()];
            for (int n : walk) {
                Frame f = viewer.frame(n, into);
                assertTrue(f.rgb() == into, "frame " + n + " is written into the caller's array");
                assertEquals(n, f.index());
                assertEquals(n, NumberedClips.numberOf(f), "pixels of frame " + n);
                assertArrayEquals(reference.frame(n).rgb(), into, "frame " + n + " against the cached path");
            }
            assertEquals(0, viewer.cachedFrames(), "the viewer's frames are its own, not the cache's");
            viewer.frame(5);
            assertEquals(5, NumberedClips.numberOf(viewer.frame(5, into)), "a cached frame is copied out");
        }
    }

    @Test
    void anArraySmallerThanAFrameIsRefused() throws Exception {
        try (VideoSource v = VideoSource.open(mp4WithBFrames, options())) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> v.frame(3, new int[10]));
            assertTrue(e.getMessage().contains("10"), e.getMessage());
        }
    }

    @Test
    void aSinkCanStopReadingEarly() throws Exception {
        try (VideoSource v = VideoSource.open(mp4WithBFrames, options())) {
            int[] count = {0};
            v.read(0, FRAMES, f -> ++count[0] < 5);
            assertEquals(5, count[0]);
            assertEquals(5, NumberedClips.numberOf(v.frame(5)), "random access after an early stop");
        }
    }

    @Test
    void pixelsArePackedOpaqueRgb() throws Exception {
        try (VideoSource v = VideoSource.open(mp4WithBFrames, options())) {
            Frame f = v.frame(3);
            for (int p : f.rgb()) {
                assertEquals(0xFF, p >>> 24);
            }
        }
    }

    @Test
    void aFrameOutOfRangeNamesTheFileTheFrameAndTheRange() throws Exception {
        try (VideoSource v = VideoSource.open(mp4WithBFrames, options())) {
            VideoException e = assertThrows(VideoException.class, () -> v.frame(FRAMES));
            assertTrue(e.getMessage().contains("b.mp4"), e.getMessage());
            assertTrue(e.getMessage().contains("frame " + FRAMES), e.getMessage());
            assertTrue(e.getMessage().contains("0 to " + (FRAMES - 1)), e.getMessage());
            assertEquals(FRAMES, e.frame().getAsInt());
            assertThrows(VideoException.class, () -> v.frame(-1));
            assertEquals(7, NumberedClips.numberOf(v.frame(7)), "the source still works after an error");
        }
    }

    @Test
    void theIndexIsCachedOnDiskAndReusedOnReopen() throws Exception {
        Path cacheDir = dir.resolve("index-cache");
        VideoOptions cached = options().withIndexCacheDir(cacheDir);
        FrameIndex first;
        try (VideoSource v = VideoSource.open(mkvWithBFrames, cached)) {
            first = v.index();
        }
        try (Stream<Path> files = Files.list(cacheDir)) {
            assertEquals(1, files.filter(p -> p.toString().endsWith(".idx")).count());
        }
        try (VideoSource v = VideoSource.open(mkvWithBFrames, cached)) {
            assertEquals(first.frameCount(), v.index().frameCount());
            for (int i = 0; i < first.frameCount(); i++) {
                assertEquals(first.pts(i), v.index().pts(i));
                assertEquals(first.isKeyframe(i), v.index().isKeyframe(i));
            }
        }
    }

    @Test
    void aDamagedCacheFileIsIgnored() throws Exception {
        Path cacheDir = dir.resolve("damaged-cache");
        VideoOptions cached = options().withIndexCacheDir(cacheDir);
        try (VideoSource v = VideoSource.open(aviNoBFrames, cached)) {
            v.frameCount();
        }
        try (Stream<Path> files = Files.list(cacheDir)) {
            for (Path p : files.toList()) {
                Files.write(p, new byte[] {1, 2, 3, 4, 5, 6, 7, 8, 9});
            }
        }
        try (VideoSource v = VideoSource.open(aviNoBFrames, cached)) {
            assertEquals(FRAMES, v.frameCount());
            assertEquals(60, NumberedClips.numberOf(v.frame(60)));
        }
    }

    @Test
    void aFileThatIsNotVideoIsRefusedWithItsName() throws Exception {
        Path text = Files.writeString(dir.resolve("notes.mp4"), "these are notes, not video\n".repeat(50));
        VideoException e = assertThrows(VideoException.class, () -> VideoSource.open(text, options()));
        assertTrue(e.getMessage().startsWith(text.toString()), e.getMessage());
    }

    @Test
    void aFileCutShortBeforeItsFirstWholeKeyframeIsRefusedWithItsName() throws Exception {
        // The demo clip keeps its index at the start: its first 20 kB promise 450 frames but hold no whole keyframe.
        byte[] bytes = Files.readAllBytes(Path.of("..", "clips", "arena.mp4"));
        Path cut = Files.write(dir.resolve("cut.mp4"), java.util.Arrays.copyOf(bytes, 20_000));
        VideoException e = assertThrows(VideoException.class, () -> VideoSource.open(cut, options()));
        assertTrue(e.getMessage().contains("cut.mp4") && e.getMessage().contains("cut short"), e.getMessage());
    }

    @Test
    void aMissingFileIsRefusedWithItsName() {
        Path missing = dir.resolve("nowhere.mp4");
        VideoException e = assertThrows(VideoException.class, () -> VideoSource.open(missing, options()));
        assertTrue(e.getMessage().contains("nowhere.mp4") && e.getMessage().contains("no such file"),
                e.getMessage());
    }
}
