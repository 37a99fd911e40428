package org.modetrail.reference;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.modetrail.testsupport.Ffprobe;
import org.modetrail.testsupport.RefData;
import org.modetrail.testsupport.ReferenceClips;
import org.modetrail.video.FrameIndex;
import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * The frame index against ffprobe (Debian's FFmpeg 5.1):
 * <ul>
 * <li>frame count and every timestamp against
 *     {@code ffprobe -select_streams v:0 -show_frames -show_entries frame=pts,pts_time,best_effort_timestamp,key_frame}
 *     (frames in decoder output order, i.e. presentation order); {@code index.pts(n)} against frame n's pts, or its
 *     best_effort_timestamp where ffprobe gives no pts (AVI); {@code ptsSeconds(n)} against pts_time within 1e-6 s
 *     (pts_time is printed with 6 decimals);</li>
 * <li>keyframe flags against the K flag of {@code ffprobe -show_packets}, packets sorted by pts (dts where pts is
 *     N/A), because the index's keyframes are "frames where decoding can start", which is what the container's
 *     packet flag says (a decoded frame's key_frame can differ, e.g. H.264 recovery points);</li>
 * <li>the time base against ffprobe's stream time_base; variable-rate detection against the intervals ffprobe
 *     shows; the mean rate against (frames - 1) / (last pts_time - first pts_time) from ffprobe.</li>
 * </ul>
 */
class TimestampsAgainstFfprobeTest {
    static final double SECONDS_TOLERANCE = 1e-6;

    @TempDir
    Path cacheDir;

    @ParameterizedTest(name = "{0}")
    @EnumSource(ReferenceClips.class)
    void everyTimestampAndKeyframeEqualsFfprobe(ReferenceClips clip) throws Exception {
        RefData.requireFfmpegTools();
        Path file = clip.path();
        try (VideoSource src = VideoSource.open(file, VideoOptions.defaults().withIndexCacheDir(cacheDir))) {
            assertIndexEqualsFfprobe(file, src);
        }
    }

    /** What ffprobe says about a file, fetched once when a test compares several opens against it. */
    record ProbeReference(List<Ffprobe.ProbeFrame> frames, List<Ffprobe.ProbePacket> packets,
                          Ffprobe.ProbeStream stream) {
        static ProbeReference of(Path file) {
            return new ProbeReference(Ffprobe.frames(file), Ffprobe.packetsInPresentationOrder(file),
                    Ffprobe.stream(file));
        }
    }

    /** Shared with the real-footage and cache tests. */
    static void assertIndexEqualsFfprobe(Path file, VideoSource src) {
        assertIndexEqualsFfprobe(ProbeReference.of(file), file, src);
    }

    static void assertIndexEqualsFfprobe(ProbeReference probe, Path file, VideoSource src) {
        List<Ffprobe.ProbeFrame> frames = probe.frames();
        List<Ffprobe.ProbePacket> packets = probe.packets();
        Ffprobe.ProbeStream stream = probe.stream();
        FrameIndex index = src.index();

        assertEquals(frames.size(), index.frameCount(), file + ": frame count vs ffprobe -show_frames");
        assertEquals(stream.timeBaseNum(), index.timeBaseNum(), "time base numerator vs ffprobe");
        assertEquals(stream.timeBaseDen(), index.timeBaseDen(), "time base denominator vs ffprobe");
        double tb = (double) stream.timeBaseNum() / stream.timeBaseDen();

        List<String> wrong = new ArrayList<>();
        double firstTime = Double.NaN;
        for (int n = 0; n < frames.size(); n++) {
            Ffprobe.ProbeFrame f = frames.get(n);
            long expectedPts = f.ptsOrBestEffort();
            if (expectedPts == Ffprobe.NA && n >= 2) {
                // ffprobe counts the frame but gives it no timestamp (the last picture of MPEG-4 part 2 with
                // B-frames in AVI, flushed out of the decoder). Our index places it one interval after the frame
                // before, as the AVI's frame slots do.
                long step = index.pts(n - 1) - index.pts(n - 2);
                if (index.pts(n) != index.pts(n - 1) + step) {
                    wrong.add("frame " + n + ": pts " + index.pts(n) + ", ffprobe N/A, expected the next slot "
                            + (index.pts(n - 1) + step));
                }
                continue;
            }
            double expectedTime = Double.isNaN(f.ptsTime()) ? expectedPts * tb : f.ptsTime();
            if (n == 0) {
                firstTime = expectedTime;
            }
            if (index.pts(n) != expectedPts) {
                wrong.add("frame " + n + ": pts " + index.pts(n) + ", ffprobe " + expectedPts
                        + (f.pts() == Ffprobe.NA ? " (best_effort_timestamp; pts N/A)" : ""));
            } else if (Math.abs(index.ptsSeconds(n) - expectedTime) > SECONDS_TOLERANCE) {
                wrong.add("frame " + n + ": ptsSeconds " + index.ptsSeconds(n) + ", ffprobe pts_time " + expectedTime);
            } else if (Math.abs(index.timeSeconds(n) - (expectedTime - firstTime)) > SECONDS_TOLERANCE) {
                wrong.add("frame " + n + ": timeSeconds " + index.timeSeconds(n) + ", ffprobe "
                        + (expectedTime - firstTime));
            }
        }
        assertTrue(wrong.isEmpty(), file + ": " + wrong.size() + " of " + frames.size()
                + " timestamps differ from ffprobe, first: " + wrong.subList(0, Math.min(8, wrong.size())));

        assertEquals(packets.size(), frames.size(), file + ": ffprobe packets vs frames (one packet per frame)");
        int keys = 0;
        for (int n = 0; n < packets.size(); n++) {
            assertEquals(packets.get(n).key(), index.isKeyframe(n), file + ": keyframe flag of frame " + n
                    + " vs ffprobe packet flags " + packets.get(n).flags());
            keys += packets.get(n).key() ? 1 : 0;
        }
        assertEquals(keys, index.keyframeCount(), "keyframe count vs ffprobe K packets");

        VideoInfo info = src.info();
        assertEquals(stream.width(), info.width(), "width vs ffprobe");
        assertEquals(stream.height(), info.height(), "height vs ffprobe");
        assertEquals(frames.size(), info.frameCount());
        double span = (frames.get(frames.size() - 1).ptsTime() - frames.get(0).ptsTime());
        if (!Double.isNaN(span)) {
            assertEquals((frames.size() - 1) / span, info.meanFrameRate(), 1e-6 * info.meanFrameRate(),
                    "mean frame rate vs ffprobe's timestamps");
        }
        // Variable rate: some interval between ffprobe's timestamps differs from the most common one by more than
        // a tick (our reading of "variable"; the tick allows rates that do not divide the time base).
        List<Long> intervals = new ArrayList<>();
        for (int n = 1; n < frames.size(); n++) {
            long a = frames.get(n - 1).ptsOrBestEffort();
            long b = frames.get(n).ptsOrBestEffort();
            if (a != Ffprobe.NA && b != Ffprobe.NA) { // a frame ffprobe gives no time says nothing of intervals
                intervals.add(b - a);
            }
        }
        long mode = intervals.stream().collect(java.util.stream.Collectors.groupingBy(x -> x,
                java.util.stream.Collectors.counting())).entrySet().stream()
                .max(java.util.Map.Entry.comparingByValue()).orElseThrow().getKey();
        boolean variable = intervals.stream().anyMatch(d -> Math.abs(d - mode) > 1 + 0.001 * mode);
        assertEquals(variable, info.variableFrameRate(), file + ": variable frame rate by ffprobe's intervals");
    }

    @ParameterizedTest(name = "{0}")
    @EnumSource(value = ReferenceClips.class, names = {"MP4_H264_BFRAMES_GOP250", "MKV_H264_BFRAMES", "AVI_MJPEG",
            "AVI_MPEG4", "TS_H264"})
    void constantRateClipsReportTheRateTheyWereMadeWith(ReferenceClips clip) throws Exception {
        RefData.requireFfmpegTools();
        try (VideoSource src = VideoSource.open(clip.path(), VideoOptions.defaults().withIndexCacheDir(cacheDir))) {
            // The recipe's testsrc2 rate=25 (our input to ffmpeg, not the code under test).
            assertEquals(25.0, src.info().meanFrameRate(), 1e-6);
            assertFalse(src.info().variableFrameRate());
            assertEquals(src.frameCount() / 25.0, src.info().durationSeconds(), 1e-6);
        }
    }

    @ParameterizedTest(name = "{0}")
    @EnumSource(value = ReferenceClips.class, names = {"MP4_H264_VFR"})
    void variableRateClipIsDetected(ReferenceClips clip) throws Exception {
        RefData.requireFfmpegTools();
        try (VideoSource src = VideoSource.open(clip.path(), VideoOptions.defaults().withIndexCacheDir(cacheDir))) {
            assertTrue(src.info().variableFrameRate());
            // Mean rate from the setpts recipe: 300 frames, (N + N/3*0.25 + N/5*0.5) / 25 s at N = 299.
            double last = (299 + 0.25 * Math.floor(299 / 3.0) + 0.5 * Math.floor(299 / 5.0)) / 25;
            assertEquals(299 / last, src.info().meanFrameRate(), 299 / last * 1e-3);
        }
    }
}
