package org.modetrail.reference;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.modetrail.testsupport.Damage;
import org.modetrail.testsupport.Ffmpeg;
import org.modetrail.testsupport.Ffprobe;
import org.modetrail.testsupport.Pixels;
import org.modetrail.testsupport.RefData;
import org.modetrail.testsupport.ReferenceClips;
import org.modetrail.video.Frame;
import org.modetrail.video.FrameIndex;
import org.modetrail.video.FrameSink;
import org.modetrail.video.FrameUnreadableException;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * Bad input: each case's expected behaviour is the (a VideoException whose message names the file, and the
 * frame where one is involved; damage confined to the frames it hits, which raise FrameUnreadableException or give
 * damaged pixels; frames away from it still equal ffmpeg's frames of the intact clip; the JVM survives and later
 * calls work). Which frames damage can reach is worked out from ffprobe's packet positions in the intact clip.
 */
class BadInputTest {
    @TempDir
    Path dir;

    private VideoOptions options() {
        return VideoOptions.defaults().withIndexCacheDir(dir.resolve("index-cache"));
    }

    @Test
    void missingFile() {
        Path missing = dir.resolve("no-such-clip.mp4");
        VideoException e = assertThrows(VideoException.class, () -> VideoSource.open(missing, options()));
        assertEquals(missing, e.file());
        assertTrue(e.getMessage().contains(missing.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("no such file"), e.getMessage());
    }

    /** Plain text, once as notes.txt and once named like a video. */
    @ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"notes.txt", "clip.mp4", "clip.avi"})
    void textFileIsNotAVideo(String name) throws Exception {
        Path text = dir.resolve(name);
        StringBuilder sb = new StringBuilder();
        for (int i = 1; i <= 300; i++) {
            sb.append("Line ").append(i).append(" of some notes about the experiment, nothing to see here.\n");
        }
        Files.writeString(text, sb, StandardCharsets.UTF_8);
        VideoException e = assertThrows(VideoException.class, () -> {
            try (VideoSource src = VideoSource.open(text, options())) {
                fail("a text file opened as a video: " + src.info());
            }
        });
        assertEquals(text, e.file());
        assertTrue(e.getMessage().contains(text.toString()), e.getMessage());
    }

    /** MP4 cut in half with the moov box at the end: the file has no index, FFmpeg cannot read it at all. */
    @Test
    void mp4CutInHalfWithMoovAtEnd() throws Exception {
        RefData.requireFfmpegTools();
        Path original = ReferenceClips.MP4_H264_MOOV_AT_END.path();
        Path cut = Damage.truncate(original, dir.resolve("half.mp4"), Files.size(original) / 2);
        // Reference: ffprobe fails on it too.
        Ffmpeg.Result probe = Ffmpeg.exec(List.of(RefData.ffprobe().toString(), "-v", "error", cut.toString()));
        assertNotEquals(0, probe.exitCode(), "ffprobe reads the half mp4, so the case is not what it should be");
        VideoException e = assertThrows(VideoException.class, () -> VideoSource.open(cut, options()));
        assertEquals(cut, e.file());
        assertTrue(e.getMessage().contains(cut.toString()), e.getMessage());
        assertTrue(e.getMessage().matches("(?s).*(truncated|complete|damaged).*"),
                "the message should say the file is incomplete: " + e.getMessage());
    }

    /** MP4 with the moov box first (faststart) cut in half: the index is there, half the media is not. */
    @Test
    void mp4CutInHalfWithFaststart() throws Exception {
        RefData.requireFfmpegTools();
        Path original = ReferenceClips.MP4_H264_FASTSTART.path();
        long keep = Files.size(original) / 2;
        Path cut = Damage.truncate(original, dir.resolve("half-faststart.mp4"), keep);
        checkAroundDamage(original, cut, Damage.zoneHit(original, keep, Long.MAX_VALUE));
    }

    @Test
    void aviCutShort() throws Exception {
        RefData.requireFfmpegTools();
        Path original = ReferenceClips.AVI_MPEG4.path();
        long keep = Files.size(original) * 6 / 10;
        Path cut = Damage.truncate(original, dir.resolve("short.avi"), keep);
        checkAroundDamage(original, cut, Damage.zoneHit(original, keep, Long.MAX_VALUE));
    }

    /** 8 KiB of pseudo-random bytes written over the middle of the file. */
    @ParameterizedTest(name = "{0}")
    @EnumSource(value = ReferenceClips.class, names = {"TS_H264", "AVI_MPEG4", "MP4_H264_FASTSTART", "AVI_MJPEG"})
    void corruptedInTheMiddle(ReferenceClips clip) throws Exception {
        RefData.requireFfmpegTools();
        Path original = clip.path();
        long at = Files.size(original) / 2;
        int length = 8192;
        Path damaged = Damage.overwrite(original, dir.resolve("damaged." + clip.extension()), at, length, 42);
        checkAroundDamage(original, damaged, Damage.zoneHit(original, at, at + length));
    }

    /**
     * Opens a damaged copy and checks: open works; every frame outside {@code zone} (intact clip's presentation
     * numbers) is in the damaged file's index with the same timestamp and the same pixels as ffmpeg's frame of the
     * intact clip; frames in the zone give a frame or a FrameUnreadableException naming file and frame; the source
     * keeps working afterwards; sequential reading reports every frame once, as read or as unreadable.
     */
    private void checkAroundDamage(Path original, Path damaged, int[] zone) throws Exception {
        // Intact frames are matched to the damaged file's frames through their packets' byte positions, not their
        // timestamps: FFmpeg's AVI demuxer numbers the chunks after a lost one one lower (ffprobe shows the same).
        List<Ffprobe.ProbePacket> intact = Ffprobe.packetsInPresentationOrder(original);
        Map<Long, Long> damagedPtsAtPos = new java.util.HashMap<>();
        Map<Long, Long> damagedPosOfPts = new java.util.HashMap<>();
        for (Ffprobe.ProbePacket p : Ffprobe.packets(damaged)) {
            damagedPtsAtPos.put(p.pos(), p.ptsOrDts());
            damagedPosOfPts.put(p.ptsOrDts(), p.pos());
        }
        Map<Long, Integer> intactAtPos = new java.util.HashMap<>();
        for (int o = 0; o < intact.size(); o++) {
            intactAtPos.put(intact.get(o).pos(), o);
        }
        List<Integer> far = new ArrayList<>();
        for (int o = 0; o < intact.size(); o++) {
            boolean inZone = o >= zone[0] && o < zone[1];
            boolean edge = o == zone[0] - 1 || o == zone[1];
            if (!inZone && (o % 9 == 0 || edge || o == intact.size() - 1)) {
                far.add(o);
            }
        }
        Map<Integer, int[]> ref = Ffmpeg.selectFrames(original, ReferenceClips.WIDTH, ReferenceClips.HEIGHT, far);
        Map<String, Integer> outcomes = new TreeMap<>();
        try (VideoSource src = VideoSource.open(damaged, options())) {
            FrameIndex index = src.index();
            List<String> failures = new ArrayList<>();
            Map<Integer, Integer> damagedFrameOf = new java.util.HashMap<>();
            // Away from the damage: the same frames as the intact clip, requested last to first.
            for (int k = far.size() - 1; k >= 0; k--) {
                int o = far.get(k);
                Long pts = damagedPtsAtPos.get(intact.get(o).pos());
                int n = pts == null ? -1 : index.frameWithPts(pts);
                if (n < 0) {
                    failures.add("intact frame " + o + " (packet at byte " + intact.get(o).pos()
                            + ") is missing from the damaged file's index");
                    continue;
                }
                damagedFrameOf.put(o, n);
                try {
                    Pixels.Diff d = Pixels.diff(src.frame(n), ref.get(o));
                    if (d.differingPixels() != 0) {
                        failures.add("frame " + n + " (intact " + o + ") vs ffmpeg on the intact clip: " + d);
                    }
                } catch (VideoException e) {
                    failures.add("frame " + n + " (intact " + o + ", away from the damage): " + e.getMessage());
                }
            }
            // Near the damage: a picture or a precise FrameUnreadableException, nothing else.
            for (int n = 0; n < index.frameCount(); n++) {
                Long pos = damagedPosOfPts.get(index.pts(n));
                Integer o = pos == null ? null : intactAtPos.get(pos);
                if (o != null && (o < zone[0] || o >= zone[1])) {
                    continue;
                }
                try {
                    Frame f = src.frame(n);
                    assertEquals(n, f.index());
                    outcomes.merge("picture", 1, Integer::sum);
                } catch (FrameUnreadableException e) {
                    outcomes.merge("unreadable", 1, Integer::sum);
                    assertEquals(damaged, e.file());
                    assertEquals(n, e.frame().orElse(-1));
                    assertTrue(e.getMessage().contains(damaged.toString()) && e.getMessage().contains("frame " + n),
                            e.getMessage());
                }
            }
            // Still working after all that.
            int o0 = far.get(0);
            if (damagedFrameOf.containsKey(o0)) {
                assertEquals(0, Pixels.diff(src.frame(damagedFrameOf.get(o0)), ref.get(o0)).differingPixels(),
                        "frame of intact " + o0 + " after the damaged ones");
            }
            // Sequential reading over everything: each frame once, read or unreadable.
            List<Integer> seen = new ArrayList<>();
            List<Integer> unreadable = new ArrayList<>();
            src.read(0, index.frameCount(), new FrameSink() {
                @Override
                public boolean accept(Frame f) {
                    seen.add(f.index());
                    return true;
                }

                @Override
                public void unreadable(int i, String reason) {
                    unreadable.add(i);
                    seen.add(i);
                }
            });
            List<Integer> all = new ArrayList<>();
            for (int n = 0; n < index.frameCount(); n++) {
                all.add(n);
            }
            assertEquals(all, seen, "read() must account for every frame once, in order");
            for (int u : unreadable) {
                assertTrue(java.util.Arrays.stream(src.unreadableFrames()).anyMatch(x -> x == u),
                        "frame " + u + " reported unreadable by read() but not by unreadableFrames()");
            }
            System.out.printf("[measure] %s: intact %d frames, damaged index %d, ffprobe on damaged %d; zone %d..%d;"
                    + " near-damage outcomes %s; read() unreadable %d%n", damaged.getFileName(), intact.size(),
                    index.frameCount(), Ffprobe.frames(damaged).size(), zone[0], zone[1] - 1, outcomes,
                    unreadable.size());
            assertTrue(failures.isEmpty(), damaged + ":\n" + String.join("\n", failures));
        }
    }

    @ParameterizedTest(name = "{0}")
    @EnumSource(value = ReferenceClips.class, names = {"MP4_H264_BFRAMES_GOP250", "AVI_MJPEG"})
    void frameOutOfRange(ReferenceClips clip) throws Exception {
        RefData.requireFfmpegTools();
        Path file = clip.path();
        int count = Ffprobe.frames(file).size();
        try (VideoSource src = VideoSource.open(file, options())) {
            for (int n : new int[] {-1, count, Integer.MIN_VALUE}) {
                VideoException e = assertThrows(VideoException.class, () -> src.frame(n), "frame(" + n + ")");
                assertFalse(e instanceof FrameUnreadableException, "out of range is not damage: " + e);
                assertOutOfRangeMessage(e, file, n, count);
            }
            VideoException e = assertThrows(VideoException.class, () -> src.read(-1, 3, f -> true));
            assertTrue(e.getMessage().contains(file.toString()) && e.getMessage().contains("0.." + count),
                    e.getMessage());
            e = assertThrows(VideoException.class, () -> src.read(0, count + 1, f -> true));
            assertTrue(e.getMessage().contains(file.toString()) && e.getMessage().contains("0.." + count),
                    e.getMessage());
            assertEquals(0, src.frame(count - 1).index() - (count - 1), "the source still works");
        }
    }

    private static void assertOutOfRangeMessage(VideoException e, Path file, int n, int count) {
        String m = e.getMessage();
        assertEquals(file, e.file());
        assertTrue(m.contains(file.toString()), "message should name the file: " + m);
        assertTrue(m.contains("frame " + n), "message should name the frame " + n + ": " + m);
        assertTrue(m.contains("0 to " + (count - 1)), "message should give the valid range: " + m);
    }

    @Test
    void imageFolderWithAnImageOfAnotherSize() throws Exception {
        RefData.requireFfmpegTools();
        Path folder = Files.createDirectory(dir.resolve("images"));
        Ffmpeg.ffmpeg("-f", "lavfi", "-i", "testsrc2=size=320x240:rate=25", "-frames:v", "10", "-start_number", "1",
                folder.resolve("img_%04d.png").toString());
        Path odd = folder.resolve("img_0005.png");
        Ffmpeg.ffmpeg("-f", "lavfi", "-i", "testsrc2=size=160x120:rate=25", "-frames:v", "1", "-update", "1",
                odd.toString());
        try (VideoSource src = VideoSource.open(folder, options())) {
            assertEquals(10, src.frameCount());
            FrameUnreadableException e = assertThrows(FrameUnreadableException.class, () -> src.frame(4));
            assertEquals(folder, e.file());
            assertEquals(4, e.frame().orElse(-1));
            String m = e.getMessage();
            assertTrue(m.contains(folder.toString()) && m.contains("frame 4") && m.contains("img_0005.png")
                    && m.contains("160x120") && m.contains("320x240"), m);
            assertEquals(5, src.frame(5).index(), "the other images stay readable");
            List<Integer> seen = new ArrayList<>();
            List<Integer> bad = new ArrayList<>();
            src.read(0, 10, new FrameSink() {
                @Override
                public boolean accept(Frame f) {
                    seen.add(f.index());
                    return true;
                }

                @Override
                public void unreadable(int index, String reason) {
                    bad.add(index);
                }
            });
            assertEquals(List.of(0, 1, 2, 3, 5, 6, 7, 8, 9), seen);
            assertEquals(List.of(4), bad);
            assertArrayEquals(new int[] {4}, src.unreadableFrames());
            VideoException r = assertThrows(VideoException.class, () -> src.frame(10));
            assertOutOfRangeMessage(r, folder, 10, 10);
            r = assertThrows(VideoException.class, () -> src.frame(-1));
            assertOutOfRangeMessage(r, folder, -1, 10);
        }
    }

    @Test
    void emptyFolder() throws Exception {
        Path empty = Files.createDirectory(dir.resolve("empty"));
        VideoException e = assertThrows(VideoException.class, () -> VideoSource.open(empty, options()));
        assertEquals(empty, e.file());
        assertTrue(e.getMessage().contains(empty.toString()) && e.getMessage().contains("no numbered PNG or JPEG"),
                e.getMessage());
        Files.writeString(empty.resolve("readme.txt"), "not an image");
        e = assertThrows(VideoException.class, () -> VideoSource.open(empty, options()));
        assertTrue(e.getMessage().contains("no numbered PNG or JPEG"), e.getMessage());
    }
}
