package org.modetrail.video;

import static org.bytedeco.ffmpeg.global.avcodec.*;
import static org.bytedeco.ffmpeg.global.avformat.*;
import static org.bytedeco.ffmpeg.global.avutil.*;
import static org.bytedeco.ffmpeg.global.swscale.*;

import java.nio.ByteOrder;
import java.nio.file.Path;

import org.bytedeco.ffmpeg.avcodec.AVCodec;
import org.bytedeco.ffmpeg.avcodec.AVCodecContext;
import org.bytedeco.ffmpeg.avcodec.AVCodecParameters;
import org.bytedeco.ffmpeg.avcodec.AVPacket;
import org.bytedeco.ffmpeg.avformat.AVFormatContext;
import org.bytedeco.ffmpeg.avformat.AVStream;
import org.bytedeco.ffmpeg.avutil.AVDictionary;
import org.bytedeco.ffmpeg.avutil.AVFrame;
import org.bytedeco.ffmpeg.swscale.SwsContext;
import org.bytedeco.javacpp.BytePointer;
import org.bytedeco.javacpp.DoublePointer;
import org.bytedeco.javacpp.IntPointer;
import org.bytedeco.javacpp.PointerPointer;

/**
 * One demuxer and decoder for the video stream of a file, straight on FFmpeg's C API: reading packets, decoding
 * them into pictures with their presentation timestamps, seeking, and converting the current picture to packed
 * RGB. Going below JavaCV's frame grabber gives the exact timestamps, keyframe flags and seek behaviour that
 * frame-exact access needs. Every native call's result is checked, so bad input ends in a {@link VideoException}
 * rather than a crash.
 */
final class FfmpegDecoder implements AutoCloseable {
    /** FFmpeg's AVERROR(EAGAIN) on Linux: the decoder wants more input before it gives out a picture. */
    private static final int AVERROR_EAGAIN = -11;
    /** End of stream marker returned by {@link #decodeNext()}. */
    static final long END = Long.MIN_VALUE;
    /** Returned by {@link #decodeNext()} for a picture that carries no timestamp at all (distinct from END). */
    static final long NO_TIMESTAMP = Long.MIN_VALUE + 1;
    /**
     * Demuxers that will read almost any file as a picture of text, which a user who opened a file by mistake
     * should hear about instead.
     */
    private static final java.util.Set<String> TEXT_DEMUXERS = java.util.Set.of("tty", "bin", "xbin", "adf", "idf");
    /** FF_THREAD_FRAME | FF_THREAD_SLICE from avcodec.h, which the Java bindings do not carry as constants. */
    private static final int FRAME_AND_SLICE_THREADS = 1 | 2;

    static {
        // FFmpeg's own log would repeat on stderr what our exceptions already say, frame by frame.
        av_log_set_level(System.getenv("MODETRAIL_FFMPEG_LOG") != null ? AV_LOG_INFO : AV_LOG_QUIET);
    }

    private final Path file;
    private AVFormatContext format;
    private AVCodecContext codec;
    private final int streamIndex;
    private final AVStream stream;
    private final AVPacket packet;
    private final AVFrame picture;
    private final int width;
    private final int height;
    private SwsContext sws;
    private IntPointer rgbBuffer;
    private BytePointer rgbBytes;
    private PointerPointer<BytePointer> rgbPlanes;
    private IntPointer rgbStrides;
    private PacketStamps stamps = PacketStamps.NONE;
    private boolean demuxerDone;
    private boolean flushed;
    private int decodeErrors;

    private FfmpegDecoder(Path file, AVFormatContext format, int streamIndex, AVCodecContext codec) {
        this.file = file;
        this.format = format;
        this.streamIndex = streamIndex;
        this.stream = format.streams(streamIndex);
        this.codec = codec;
        this.packet = av_packet_alloc();
        this.picture = av_frame_alloc();
        this.width = codec.width();
        this.height = codec.height();
    }

    /** Opens the file's best video stream for demuxing only (no decoder), as the frame index scan needs. */
    static AVFormatContext openFormat(Path file) throws VideoException {
        AVFormatContext format = new AVFormatContext(null);
        int r = avformat_open_input(format, file.toString(), null, (AVDictionary) null);
        if (r < 0) {
            throw new VideoException(file, "FFmpeg cannot read this as a video (" + errorText(r)
                    + "); check that it is a complete video file");
        }
        if (TEXT_DEMUXERS.contains(format.iformat().name().getString())) {
            avformat_close_input(format);
            throw new VideoException(file, "this is a text file, not a video; open a video file instead");
        }
        r = avformat_find_stream_info(format, (PointerPointer<?>) null);
        if (r < 0) {
            avformat_close_input(format);
            throw new VideoException(file, "the file's streams could not be read (" + errorText(r)
                    + "); the file may be truncated or damaged");
        }
        return format;
    }

    static int bestVideoStream(Path file, AVFormatContext format) throws VideoException {
        int s = av_find_best_stream(format, AVMEDIA_TYPE_VIDEO, -1, -1, (AVCodec) null, 0);
        if (s < 0) {
            avformat_close_input(format);
            throw new VideoException(file, "the file holds no video stream; open a video file instead");
        }
        return s;
    }

    /** Opens demuxer and decoder; {@code threads} 0 lets FFmpeg use one thread per core. */
    static FfmpegDecoder open(Path file, int threads) throws VideoException {
        AVFormatContext format = openFormat(file);
        int s = bestVideoStream(file, format);
        for (int i = 0; i < format.nb_streams(); i++) {
            if (i != s) {
                format.streams(i).discard(AVDISCARD_ALL);
            }
        }
        AVCodecParameters par = format.streams(s).codecpar();
        AVCodec decoder = avcodec_find_decoder(par.codec_id());
        if (decoder == null || decoder.isNull()) {
            avformat_close_input(format);
            throw new VideoException(file, "no decoder for its video codec '"
                    + avcodec_get_name(par.codec_id()).getString() + "'; convert it to H.264 first");
        }
        AVCodecContext codec = avcodec_alloc_context3(decoder);
        int r = avcodec_parameters_to_context(codec, par);
        if (r >= 0) {
            codec.thread_count(threads);
            codec.thread_type(FRAME_AND_SLICE_THREADS);
            codec.pkt_timebase(format.streams(s).time_base());
            r = avcodec_open2(codec, decoder, (AVDictionary) null);
        }
        if (r < 0 || codec.width() <= 0 || codec.height() <= 0) {
            avcodec_free_context(codec);
            avformat_close_input(format);
            throw new VideoException(file, "the video decoder could not start (" + (r < 0 ? errorText(r)
                    : "no frame size in the stream") + "); the file may be damaged");
        }
        return new FfmpegDecoder(file, format, s, codec);
    }

    int width() {
        return width;
    }

    int height() {
        return height;
    }

    String codecName() {
        return avcodec_get_name(codec.codec_id()).getString();
    }

    String containerName() {
        return format.iformat().name().getString();
    }

    int timeBaseNum() {
        return stream.time_base().num();
    }

    int timeBaseDen() {
        return stream.time_base().den();
    }

    /** From now on, packets get the timestamps the index scan saw for them (see {@link PacketStamps}). */
    void stampPackets(PacketStamps packetStamps) {
        this.stamps = packetStamps;
    }

    /** Packets the decoder refused as damaged so far. */
    int decodeErrors() {
        return decodeErrors;
    }

    /**
     * Moves to the last keyframe at or before {@code pts} (the demuxer's idea of it: callers check the first
     * picture they get) and empties the decoder.
     */
    void seek(long pts) throws VideoException {
        int r = av_seek_frame(format, streamIndex, pts, AVSEEK_FLAG_BACKWARD);
        if (r < 0) {
            r = avformat_seek_file(format, streamIndex, Long.MIN_VALUE, pts, pts, 0);
        }
        if (r < 0) {
            throw new VideoException(file, "cannot seek to timestamp " + pts + " (" + errorText(r) + ")");
        }
        avcodec_flush_buffers(codec);
        demuxerDone = false;
        flushed = false;
    }

    /**
     * Decodes the next picture in presentation order and returns its presentation timestamp, or {@link #END}
     * when the stream has no more. Damaged packets are skipped: the pictures they held simply never appear.
     */
    long decodeNext() {
        while (true) {
            int r = avcodec_receive_frame(codec, picture);
            if (r >= 0) {
                return timestampOf(picture);
            }
            if (r == AVERROR_EOF) {
                return END;
            }
            if (r != AVERROR_EAGAIN) {
                decodeErrors++;
            }
            if (demuxerDone) {
                if (flushed) {
                    return END;
                }
                avcodec_send_packet(codec, null);
                flushed = true;
                continue;
            }
            feedOnePacket();
        }
    }

    private void feedOnePacket() {
        while (true) {
            int r = av_read_frame(format, packet);
            if (r < 0) {
                demuxerDone = true;
                return;
            }
            try {
                if (packet.stream_index() == streamIndex) {
                    restamp(packet);
                    int s = avcodec_send_packet(codec, packet);
                    if (s < 0 && s != AVERROR_EAGAIN) {
                        decodeErrors++;
                    }
                    return;
                }
            } finally {
                av_packet_unref(packet);
            }
        }
    }

    private void restamp(AVPacket p) {
        if (stamps.size() == 0) {
            return;
        }
        int i = stamps.find(p.pos());
        if (i < 0) {
            return;
        }
        if (stamps.fromDts()[i]) {
            p.dts(stamps.stamps()[i]);
        } else {
            p.pts(stamps.stamps()[i]);
        }
    }

    private static long timestampOf(AVFrame f) {
        long t = f.best_effort_timestamp();
        if (t == AV_NOPTS_VALUE) {
            t = f.pts();
        }
        if (t == AV_NOPTS_VALUE) {
            t = f.pkt_dts();
        }
        return t == AV_NOPTS_VALUE ? NO_TIMESTAMP : t;
    }

    /** Whether the decoder flagged the current picture as damaged (concealed errors). */
    boolean currentPictureDamaged() {
        return picture.decode_error_flags() != 0 || (picture.flags() & 1) != 0; // AV_FRAME_FLAG_CORRUPT
    }

    /**
     * Converts the current picture into packed 0xFFRRGGBB pixels at the stream's nominal size: one swscale pass
     * into native memory laid out as little-endian BGR0 (swscale fills the spare byte with 0xFF, so the bytes read
     * as 0xFFRRGGBB ints), then one bulk copy.
     */
    void convertTo(int[] rgb) {
        convert(picture, rgb);
    }

    /** A new reference to the current picture (no pixel copy), which outlives the next decode; null on failure. */
    AVFrame holdCurrent() {
        return av_frame_clone(picture);
    }

    /** Converts a picture held earlier (see {@link #holdCurrent()}) like {@link #convertTo(int[])}. */
    void convert(AVFrame picture, int[] rgb) {
        if (sws == null || sws.isNull() || picture.format() != lastSourceFormat
                || picture.width() != lastSourceWidth || picture.height() != lastSourceHeight) {
            int packed = ByteOrder.nativeOrder() == ByteOrder.LITTLE_ENDIAN ? AV_PIX_FMT_BGR0 : AV_PIX_FMT_0RGB;
            // Bicubic is what FFmpeg's command-line tool uses for its automatic conversions; matching it keeps our
            // pixels within rounding of ffmpeg's own output.
            sws = sws_getCachedContext(sws, picture.width(), picture.height(), picture.format(),
                    width, height, packed, SWS_BICUBIC, null, null, (DoublePointer) null);
            lastSourceFormat = picture.format();
            lastSourceWidth = picture.width();
            lastSourceHeight = picture.height();
            if (rgbBuffer == null) {
                rgbBuffer = new IntPointer((long) width * height);
                rgbBytes = new BytePointer(rgbBuffer);
                rgbPlanes = new PointerPointer<BytePointer>(4).put(0, rgbBytes);
                rgbStrides = new IntPointer(width * 4, 0, 0, 0);
            }
        }
        sws_scale(sws, picture.data(), picture.linesize(), 0, picture.height(), rgbPlanes, rgbStrides);
        rgbBuffer.position(0).get(rgb, 0, width * height);
    }

    private int lastSourceFormat = -1;
    private int lastSourceWidth = -1;
    private int lastSourceHeight = -1;

    static String errorText(int code) {
        byte[] buf = new byte[256];
        av_strerror(code, buf, buf.length);
        int len = 0;
        while (len < buf.length && buf[len] != 0) {
            len++;
        }
        return new String(buf, 0, len, java.nio.charset.StandardCharsets.UTF_8);
    }

    @Override
    public void close() {
        if (sws != null) {
            sws_freeContext(sws);
            sws = null;
        }
        if (rgbBuffer != null) {
            rgbPlanes.close();
            rgbStrides.close();
            rgbBuffer.close();
            rgbBuffer = null;
        }
        av_frame_free(picture);
        av_packet_free(packet);
        if (codec != null) {
            avcodec_free_context(codec);
            codec = null;
        }
        if (format != null) {
            avformat_close_input(format);
            format = null;
        }
    }
}
