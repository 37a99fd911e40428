package org.modetrail.reference;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.modetrail.testsupport.Ffmpeg;
import org.modetrail.testsupport.Pixels;
import org.modetrail.testsupport.RefData;
import org.modetrail.testsupport.ReferenceClips;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * The on-disk frame-index cache: entries appear in the given folder, a second open uses the entry instead of
 * writing a new one, a changed modification time or size makes a new entry, and a damaged entry never gives a
 * wrong index (checked against ffprobe each time, see {@link TimestampsAgainstFfprobeTest}).
 */
class FrameIndexCacheTest {
    @TempDir
    Path dir;
    Path cacheDir;
    Path video;

    @BeforeEach
    void setUp() throws Exception {
        RefData.requireFfmpegTools();
        cacheDir = dir.resolve("cache");
        video = ReferenceClips.MP4_H264_MOOV_AT_END.copyTo(dir);
    }

    private VideoOptions options() {
        return VideoOptions.defaults().withIndexCacheDir(cacheDir);
    }

    private List<Path> entries() throws Exception {
        if (!Files.isDirectory(cacheDir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(cacheDir)) {
            return s.sorted().toList();
        }
    }

    @Test
    void secondOpenUsesTheCachedIndex() throws Exception {
        assertEquals(List.of(), entries());
        try (VideoSource src = VideoSource.open(video, options())) {
            TimestampsAgainstFfprobeTest.assertIndexEqualsFfprobe(video, src);
        }
        List<Path> after = entries();
        assertEquals(1, after.size(), "one cache entry after the first open: " + after);
        Path entry = after.get(0);
        BasicFileAttributes before = Files.readAttributes(entry, BasicFileAttributes.class);
        // Make a rewrite visible even on a file system with coarse timestamps.
        Files.setLastModifiedTime(entry, FileTime.fromMillis(before.lastModifiedTime().toMillis() - 60_000));
        FileTime planted = Files.getLastModifiedTime(entry);
        try (VideoSource src = VideoSource.open(video, options())) {
            TimestampsAgainstFfprobeTest.assertIndexEqualsFfprobe(video, src);
        }
        assertEquals(after, entries(), "the second open must not add entries");
        BasicFileAttributes now = Files.readAttributes(entry, BasicFileAttributes.class);
        assertEquals(planted, now.lastModifiedTime(), "the entry was rewritten, so it was not used");
        assertEquals(before.fileKey(), now.fileKey(), "the entry was replaced, so it was not used");
    }

    @Test
    void touchingTheVideoMakesANewEntry() throws Exception {
        try (VideoSource src = VideoSource.open(video, options())) {
            src.frameCount();
        }
        assertEquals(1, entries().size());
        Files.setLastModifiedTime(video, FileTime.fromMillis(Files.getLastModifiedTime(video).toMillis() + 10_000));
        try (VideoSource src = VideoSource.open(video, options())) {
            TimestampsAgainstFfprobeTest.assertIndexEqualsFfprobe(video, src);
        }
        assertEquals(2, entries().size(), "a new modification time must key a new entry: " + entries());
    }

    /** A 16-byte ISO BMFF 'free' box appended: a valid MP4 of another size, with the old modification time. */
    @Test
    void changingTheSizeMakesANewEntry() throws Exception {
        try (VideoSource src = VideoSource.open(video, options())) {
            src.frameCount();
        }
        assertEquals(1, entries().size());
        FileTime mtime = Files.getLastModifiedTime(video);
        Files.write(video, new byte[] {0, 0, 0, 16, 'f', 'r', 'e', 'e', 0, 0, 0, 0, 0, 0, 0, 0},
                StandardOpenOption.APPEND);
        Files.setLastModifiedTime(video, mtime);
        try (VideoSource src = VideoSource.open(video, options())) {
            TimestampsAgainstFfprobeTest.assertIndexEqualsFfprobe(video, src);
        }
        assertEquals(2, entries().size(), "a new size must key a new entry: " + entries());
    }

    @Test
    void noCacheFolderWritesNothing() throws Exception {
        try (VideoSource src = VideoSource.open(video, VideoOptions.defaults().withIndexCacheDir(null))) {
            TimestampsAgainstFfprobeTest.assertIndexEqualsFfprobe(video, src);
        }
        assertEquals(List.of(), entries());
    }

    /**
     * Damaged entries of several kinds, each tried on its own: garbage, emptied, cut in half, and single bits
     * flipped at 24 places spread over the entry and every 4th byte of its first 96 (bit rot). After each, the index must
     * equal ffprobe's and a frame must equal ffmpeg's.
     */
    @Test
    void aDamagedEntryIsNeverTrusted() throws Exception {
        try (VideoSource src = VideoSource.open(video, options())) {
            src.frameCount();
        }
        Path entry = entries().get(0);
        byte[] good = Files.readAllBytes(entry);
        TimestampsAgainstFfprobeTest.ProbeReference probe = TimestampsAgainstFfprobeTest.ProbeReference.of(video);
        int probeFrame = 137;
        Map<Integer, int[]> ref = Ffmpeg.selectFrames(video, ReferenceClips.WIDTH, ReferenceClips.HEIGHT,
                List.of(probeFrame));

        List<String> kinds = new ArrayList<>();
        List<byte[]> damaged = new ArrayList<>();
        byte[] garbage = new byte[good.length];
        new java.util.Random(1).nextBytes(garbage);
        kinds.add("garbage");
        damaged.add(garbage);
        kinds.add("empty");
        damaged.add(new byte[0]);
        kinds.add("cut in half");
        damaged.add(java.util.Arrays.copyOf(good, good.length / 2));
        for (int k = 0; k < 24; k++) {
            int at = (int) ((long) k * (good.length - 1) / 23);
            byte[] b = good.clone();
            b[at] ^= 0x01;
            kinds.add("bit 0 flipped at byte " + at + " of " + good.length);
            damaged.add(b);
        }
        // Every 4th byte of the first 96, where a format keeps its header: sizes, names, counts.
        for (int at = 2; at < Math.min(96, good.length); at += 4) {
            byte[] b = good.clone();
            b[at] ^= 0x01;
            kinds.add("bit 0 flipped at header byte " + at);
            damaged.add(b);
        }
        List<String> failures = new ArrayList<>();
        for (int i = 0; i < kinds.size(); i++) {
            Files.write(entry, damaged.get(i));
            try (VideoSource src = VideoSource.open(video, options())) {
                TimestampsAgainstFfprobeTest.assertIndexEqualsFfprobe(probe, video, src);
                Pixels.Diff d = Pixels.diff(src.frame(probeFrame), ref.get(probeFrame));
                assertEquals(0, d.differingPixels(), "frame " + probeFrame + " vs ffmpeg: " + d);
            } catch (AssertionError | Exception e) {
                failures.add(kinds.get(i) + ": " + e.toString().lines().findFirst().orElse(""));
            }
        }
        assertTrue(failures.isEmpty(), failures.size() + " of " + kinds.size()
                + " damaged cache entries were trusted:\n" + String.join("\n", failures));
    }
}
