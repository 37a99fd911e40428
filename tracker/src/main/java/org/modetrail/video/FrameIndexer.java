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

    /** The scan's result: the index and what describing the video needs. */
    record Scan(FrameIndex index, int width, int height, String codec, String container) {
        FrameIndexCache.Entry toCacheEntry() {
            return new FrameIndexCache.Entry(index, width, height, codec, container);
        }
    }

    static Scan scan(Path file) throws VideoException {
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
            int n = 0;
            long previous = AV_NOPTS_VALUE;
            while (av_read_frame(format, packet) >= 0) {
                try {
                    if (packet.stream_index() != s || (packet.flags() & AV_PKT_FLAG_DISCARD) != 0) {
                        continue;
                    }
                    long t = packet.pts() != AV_NOPTS_VALUE ? packet.pts() : packet.dts();
                    if (t == AV_NOPTS_VALUE) {
                        // No timestamp at all: the frame follows the previous one by its stated duration.
                        t = previous == AV_NOPTS_VALUE ? 0 : previous + Math.max(1, packet.duration());
                    }
                    previous = t;
                    if (n == ts.length) {
                        ts = Arrays.copyOf(ts, n * 2);
                        key = Arrays.copyOf(key, n * 2);
                    }
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
            return new Scan(presentationOrder(ts, key, n, stream.time_base().num(), stream.time_base().den()),
                    width, height, codec, container);
        } finally {
            av_packet_free(packet);
            avformat_close_input(format);
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
