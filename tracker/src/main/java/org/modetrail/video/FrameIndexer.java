package org.modetrail.video;

import static org.bytedeco.ffmpeg.global.avcodec.*;
import static org.bytedeco.ffmpeg.global.avformat.*;
import static org.bytedeco.ffmpeg.global.avutil.*;

import java.nio.file.Path;
import java.util.Arrays;

import org.bytedeco.ffmpeg.avcodec.AVPacket;
import org.bytedeco.ffmpeg.avformat.AVFormatContext;
import org.bytedeco.ffmpeg.avformat.AVStream;

/**
 * Builds a {@link FrameIndex} with one scan of the file's packets and no decoding: one packet of the video stream
 * is one frame, its presentation timestamp places it, and its key flag says whether decoding can start there.
 * Sorting the timestamps turns decode order (B-frames come after the frames they precede) into presentation order.
 */
final class FrameIndexer {
    private FrameIndexer() {
    }

    /** Packets between two progress reports. */
    private static final int REPORT_EVERY = 2000;

    static IndexedVideo scan(Path file) throws VideoException {
        return scan(file, IndexProgress.NONE);
    }

    static IndexedVideo scan(Path file, IndexProgress progress) throws VideoException {
        long fileBytes;
        try {
            fileBytes = java.nio.file.Files.size(file);
        } catch (java.io.IOException e) {
            throw new VideoException(file, "its size cannot be read (" + e.getMessage() + ")");
        }
        AVFormatContext format = FfmpegDecoder.openFormat(file);
        AVPacket packet = av_packet_alloc();
        try {
            int s = FfmpegDecoder.bestVideoStream(file, format);
            for (int i = 0; i < format.nb_streams(); i++) {
                if (i != s) {
                    format.streams(i).discard(AVDISCARD_ALL);
                }
            }
            AVStream stream = format.streams(s);
            int width = stream.codecpar().width();
            int height = stream.codecpar().height();
            if (width <= 0 || height <= 0) {
                throw new VideoException(file, "the video stream states no frame size; the file may be damaged");
            }
            String codec = avcodec_get_name(stream.codecpar().codec_id()).getString();
            String container = format.iformat().name().getString();

            long[] ts = new long[4096];
            boolean[] key = new boolean[4096];
            long[] pos = new long[4096];
            boolean[] dts = new boolean[4096];
            int n = 0;
            long previous = AV_NOPTS_VALUE;
            boolean fromDecodeTimestamps = false;
            while (av_read_frame(format, packet) >= 0) {
                try {
                    if (packet.stream_index() != s || (packet.flags() & AV_PKT_FLAG_DISCARD) != 0) {
                        continue;
                    }
                    long t = packet.pts();
                    boolean usedDts = false;
                    if (t == AV_NOPTS_VALUE) {
                        t = packet.dts();
                        usedDts = true;
                        fromDecodeTimestamps = true;
                    }
                    if (t == AV_NOPTS_VALUE) {
                        // No timestamp at all: the frame follows the previous one by its stated duration.
                        t = previous == AV_NOPTS_VALUE ? 0 : previous + Math.max(1, packet.duration());
                    }
                    previous = t;
                    if (n == ts.length) {
                        ts = Arrays.copyOf(ts, n * 2);
                        key = Arrays.copyOf(key, n * 2);
                        pos = Arrays.copyOf(pos, n * 2);
                        dts = Arrays.copyOf(dts, n * 2);
                    }
                    if (n % REPORT_EVERY == 0 && packet.pos() > 0) {
                        progress.scanned(packet.pos(), fileBytes);
                    }
                    pos[n] = packet.pos();
                    dts[n] = usedDts;
                    ts[n] = t;
                    key[n] = (packet.flags() & AV_PKT_FLAG_KEY) != 0;
                    n++;
                } finally {
                    av_packet_unref(packet);
                }
            }
            if (n == 0) {
                throw new VideoException(file, "the video stream holds no frames; the file may be truncated");
            }
            progress.scanned(fileBytes, fileBytes);
            FrameIndex index = presentationOrder(ts, key, n, stream.time_base().num(), stream.time_base().den());
            if (fromDecodeTimestamps) {
                index = alignToDecoder(file, index);
            }
            return new IndexedVideo(index, PacketStamps.of(pos, ts, dts, n), width, height, codec, container);
        } finally {
            av_packet_free(packet);
            avformat_close_input(format);
        }
    }

    /**
     * Where packets carry only decode timestamps (AVI), the decoder's pictures come out with timestamps shifted by
     * the B-frame delay (MPEG-4 part 2 with B-frames in AVI: one frame, as ffprobe's best_effort_timestamp shows).
     * Decoding the first few pictures tells the shift; the index then holds the timestamps the decoder gives, which
     * is what frame-exact matching and ffprobe both go by. A shift that does not hold for all of them is not applied.
     */
    private static FrameIndex alignToDecoder(Path file, FrameIndex index) throws VideoException {
        final int checked = 6;
        try (FfmpegDecoder decoder = FfmpegDecoder.open(file, 1)) {
            long first = decoder.decodeNext();
            if (first == FfmpegDecoder.END || first == FfmpegDecoder.NO_TIMESTAMP) {
                return index;
            }
            long shift = first - index.pts(0);
            if (shift == 0) {
                return index;
            }
            for (int k = 1; k < checked; k++) {
                long t = decoder.decodeNext();
                if (t == FfmpegDecoder.END) {
                    break;
                }
                if (index.frameWithPts(t - shift) < 0) {
                    return index;
                }
            }
            return index.shifted(shift);
        }
    }

    /** Sorts packets by timestamp; a repeated timestamp (a damaged file) keeps its first packet. */
    static FrameIndex presentationOrder(long[] ts, boolean[] key, int n, int tbNum, int tbDen) {
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        final long[] t = ts;
        Arrays.sort(order, (a, b) -> Long.compare(t[a], t[b]));
        long[] pts = new long[n];
        boolean[] keyframe = new boolean[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            long v = ts[order[i]];
            if (m > 0 && pts[m - 1] == v) {
                keyframe[m - 1] |= key[order[i]];
                continue;
            }
            pts[m] = v;
            keyframe[m] = key[order[i]];
            m++;
        }
        return new FrameIndex(Arrays.copyOf(pts, m), Arrays.copyOf(keyframe, m), tbNum, tbDen);
    }
}
