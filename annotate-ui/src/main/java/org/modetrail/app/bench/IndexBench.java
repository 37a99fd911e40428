package org.modetrail.app.bench;

import static org.bytedeco.ffmpeg.global.avcodec.av_packet_alloc;
import static org.bytedeco.ffmpeg.global.avcodec.av_packet_free;
import static org.bytedeco.ffmpeg.global.avcodec.av_packet_unref;
import static org.bytedeco.ffmpeg.global.avformat.av_read_frame;
import static org.bytedeco.ffmpeg.global.avformat.avformat_close_input;
import static org.bytedeco.ffmpeg.global.avformat.avformat_find_stream_info;
import static org.bytedeco.ffmpeg.global.avformat.avformat_open_input;

import java.nio.file.Path;

import org.bytedeco.ffmpeg.avcodec.AVPacket;
import org.bytedeco.ffmpeg.avformat.AVFormatContext;
import org.bytedeco.ffmpeg.avutil.AVDictionary;
import org.bytedeco.javacpp.PointerPointer;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * What opening a file costs: with no index cache (the packet scan runs), with the index cached on disk, and the
 * floor for the scan, a bare av_read_frame loop over the same file.
 */
final class IndexBench {
    private IndexBench() {
    }

    /** Milliseconds per pass. */
    record Result(double[] coldOpenMs, double[] cachedOpenMs, double[] bareScanMs) {
    }

    static Result run(Path clip, VideoOptions cachedOptions, int repeats) throws VideoException {
        VideoOptions cold = cachedOptions.withIndexCacheDir(null);
        // Warm-up, and the first open with the cache folder stores the index there for the cached passes.
        open(clip, cold);
        open(clip, cachedOptions);
        bareScan(clip);
        double[] coldMs = new double[repeats];
        double[] cachedMs = new double[repeats];
        double[] scanMs = new double[repeats];
        for (int r = 0; r < repeats; r++) {
            coldMs[r] = open(clip, cold);
            cachedMs[r] = open(clip, cachedOptions);
            scanMs[r] = bareScan(clip);
        }
        return new Result(coldMs, cachedMs, scanMs);
    }

    /** VideoSource.open until it returns (index loaded or built, decoder open); closing is not timed. */
    private static double open(Path clip, VideoOptions options) throws VideoException {
        long t0 = System.nanoTime();
        VideoSource s = VideoSource.open(clip, options);
        double ms = (System.nanoTime() - t0) / 1e6;
        s.close();
        return ms;
    }

    /** Open, probe and read every packet without decoding: what any packet scan must at least cost. */
    static double bareScan(Path clip) throws VideoException {
        long t0 = System.nanoTime();
        AVFormatContext format = new AVFormatContext(null);
        if (avformat_open_input(format, clip.toString(), null, (AVDictionary) null) < 0) {
            throw new VideoException(clip, "FFmpeg cannot open it for the bare packet scan");
        }
        AVPacket packet = av_packet_alloc();
        try {
            avformat_find_stream_info(format, (PointerPointer<?>) null);
            while (av_read_frame(format, packet) >= 0) {
                av_packet_unref(packet);
            }
            return (System.nanoTime() - t0) / 1e6;
        } finally {
            av_packet_free(packet);
            avformat_close_input(format);
        }
    }
}
