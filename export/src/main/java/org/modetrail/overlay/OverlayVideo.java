package org.modetrail.overlay;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.IntBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import org.bytedeco.ffmpeg.avcodec.AVCodec;
import org.bytedeco.ffmpeg.global.avcodec;
import org.bytedeco.ffmpeg.global.avutil;
import org.bytedeco.javacv.FFmpegFrameRecorder;
import org.bytedeco.javacv.Frame;
import org.modetrail.format.project.AtomicWrite;
import org.modetrail.model.Project;
import org.modetrail.video.FrameSink;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoSource;

/**
 * Writes an MP4 of the source video with the project's tracks drawn over it (see {@link OverlayStyle}), encoded
 * through JavaCV's FFmpegFrameRecorder. The source is read once, in order. The video goes to a temporary file in
 * the target's folder and is renamed over the target only when complete, so a cancelled or failed run leaves no
 * partial file (and an older file of that name as it was).
 *
 * <p>The picture is the source's size, one pixel wider or higher when that is odd (4:2:0 needs even sizes; the
 * added column or row repeats the edge). The frame rate is the source's mean rate, snapped to a whole or NTSC
 * (n/1.001) rate within 0.05%; a variable-frame-rate source is written at that constant rate.
 */
public final class OverlayVideo {
    static final String H264_ENCODER = "libopenh264";
    static final String MPEG4_ENCODER = "mpeg4";

    private OverlayVideo() {
    }

    /** The whole video with the default encoding. */
    public static OverlayResult write(VideoSource source, Project project, Path out, OverlayStyle style,
                                      OverlayProgress progress, BooleanSupplier cancelled) throws IOException {
        return write(source, project, out, style, OverlayEncoding.defaults(), 0, source.frameCount(), progress,
                cancelled);
    }

    /**
     * Frames {@code from} (inclusive) to {@code to} (exclusive) of the source with the tracks drawn over them.
     *
     * @param progress  told after each frame
     * @param cancelled polled before each frame; when it answers true the run stops, the partial file is deleted
     *                  and a {@link CancellationException} is thrown
     * @throws IllegalArgumentException when the range is empty or outside the video, or the project annotates a
     *                                  video of another size or length
     * @throws IOException              when the video cannot be read or the file cannot be encoded or written
     */
    public static OverlayResult write(VideoSource source, Project project, Path out, OverlayStyle style,
                                      OverlayEncoding encoding, int from, int to, OverlayProgress progress,
                                      BooleanSupplier cancelled) throws IOException {
        VideoInfo info = source.info();
        if (project.video().width() != info.width() || project.video().height() != info.height()
                || project.video().frameCount() != source.frameCount()) {
            throw new IllegalArgumentException("the project annotates a " + project.video().width() + "x"
                    + project.video().height() + " video of " + project.video().frameCount() + " frames, but "
                    + source.path() + " is " + info.width() + "x" + info.height() + " with " + source.frameCount()
                    + " frames");
        }
        if (from < 0 || to > source.frameCount() || from >= to) {
            throw new IllegalArgumentException("frames " + from + " to " + to + " (end exclusive) are not a range"
                    + " within the video's frames 0 to " + source.frameCount());
        }
        OverlayProgress report = progress == null ? OverlayProgress.NONE : progress;
        BooleanSupplier stop = cancelled == null ? () -> false : cancelled;
        Encoder[] chosen = new Encoder[1];
        int[] counts = new int[2];
        double fps = snapFrameRate(info.meanFrameRate() > 0 ? info.meanFrameRate() : 25);
        int w = info.width() + (info.width() & 1);
        int h = info.height() + (info.height() & 1);
        AtomicWrite.replaceWithFile(out, temp -> {
            Run run = new Run(source, project, style, encoding, fps, w, h, from, to, report, stop);
            run.encode(temp);
            chosen[0] = run.encoder;
            counts[0] = run.written;
            counts[1] = run.repeated;
        });
        Path file = out.toAbsolutePath();
        return new OverlayResult(file, from, counts[0], chosen[0].name, chosen[0].codec, w, h, fps,
                Files.size(file), counts[1]);
    }

    /** Whether this FFmpeg build has the libopenh264 encoder. */
    public static boolean hasH264Encoder() {
        AVCodec c = avcodec.avcodec_find_encoder_by_name(H264_ENCODER);
        return c != null && !c.isNull();
    }

    /** The encoders to try, best first, for a codec choice. */
    static Encoder[] candidates(OverlayCodec codec) {
        return switch (codec) {
            case H264 -> new Encoder[] {Encoder.H264};
            case MPEG4 -> new Encoder[] {Encoder.MPEG4};
            case AUTO -> hasH264Encoder() ? new Encoder[] {Encoder.H264, Encoder.MPEG4}
                    : new Encoder[] {Encoder.MPEG4};
        };
    }

    enum Encoder {
        H264(H264_ENCODER, "h264"),
        MPEG4(MPEG4_ENCODER, "mpeg4");

        final String name;
        final String codec;

        Encoder(String name, String codec) {
            this.name = name;
            this.codec = codec;
        }
    }

    /** A frame rate within 0.05% of a whole number n, or of n/1.001, becomes exactly that. */
    static double snapFrameRate(double fps) {
        double whole = Math.rint(fps);
        if (whole > 0 && Math.abs(fps - whole) <= 5e-4 * whole) {
            return whole;
        }
        double ntsc = Math.rint(fps * 1.001) / 1.001;
        if (ntsc > 0 && Math.abs(fps - ntsc) <= 5e-4 * ntsc) {
            return ntsc;
        }
        return fps;
    }

    /** One encoding run: the picture buffers and the recorder, used from the reading thread only. */
    private static final class Run {
        private final VideoSource source;
        private final OverlayEncoding encoding;
        private final double fps;
        private final int w, h, from, to;
        private final OverlayProgress progress;
        private final BooleanSupplier cancelled;
        private final OverlayPainter painter;
        private final BufferedImage picture;
        private final int[] pixels;
        private final ByteBuffer bytes;
        private final IntBuffer words;
        Encoder encoder;
        int written;
        int repeated;

        Run(VideoSource source, Project project, OverlayStyle style, OverlayEncoding encoding, double fps, int w,
            int h, int from, int to, OverlayProgress progress, BooleanSupplier cancelled) {
            this.source = source;
            this.encoding = encoding;
            this.fps = fps;
            this.w = w;
            this.h = h;
            this.from = from;
            this.to = to;
            this.progress = progress;
            this.cancelled = cancelled;
            this.painter = new OverlayPainter(project, style, source.info().width(), source.info().height());
            this.picture = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
            this.pixels = ((DataBufferInt) picture.getRaster().getDataBuffer()).getData();
            // 0x00RRGGBB words stored little-endian are the bytes B, G, R, 0: FFmpeg's bgr0.
            this.bytes = ByteBuffer.allocateDirect(w * h * 4).order(ByteOrder.LITTLE_ENDIAN);
            this.words = bytes.asIntBuffer();
        }

        void encode(Path temp) throws IOException {
            FFmpegFrameRecorder recorder = start(temp);
            try {
                IOException[] failure = new IOException[1];
                boolean[] stopped = new boolean[1];
                source.read(from, to, new FrameSink() {
                    @Override
                    public boolean accept(org.modetrail.video.Frame frame) {
                        if (cancelled.getAsBoolean()) {
                            stopped[0] = true;
                            return false;
                        }
                        try {
                            fill(frame);
                            Graphics2D g = picture.createGraphics();
                            try {
                                painter.paint(g, frame.index());
                            } finally {
                                g.dispose();
                            }
                            record(recorder);
                            return true;
                        } catch (IOException e) {
                            failure[0] = e;
                            return false;
                        }
                    }

                    @Override
                    public void unreadable(int index, String reason) {
                        if (failure[0] != null || stopped[0]) {
                            return;
                        }
                        // Keep the timing: the picture before stands in for the frame that cannot be decoded.
                        try {
                            record(recorder);
                            repeated++;
                        } catch (IOException e) {
                            failure[0] = e;
                        }
                    }
                });
                if (stopped[0] || cancelled.getAsBoolean()) {
                    throw new CancellationException("overlay cancelled after " + written + " of " + (to - from)
                            + " frames");
                }
                if (failure[0] != null) {
                    throw failure[0];
                }
                if (written != to - from) {
                    throw new IOException("wrote " + written + " of " + (to - from) + " frames of " + source.path());
                }
                recorder.stop();
            } finally {
                recorder.release();
            }
        }

        /** The recorder for the first encoder that starts, in the order {@link #candidates} gives. */
        private FFmpegFrameRecorder start(Path temp) throws IOException {
            IOException last = null;
            for (Encoder e : candidates(encoding.codec())) {
                FFmpegFrameRecorder r = new FFmpegFrameRecorder(temp.toFile(), w, h, 0);
                r.setFormat("mp4");
                r.setFrameRate(fps);
                r.setGopSize(encoding.gopFrames());
                r.setPixelFormat(avutil.AV_PIX_FMT_YUV420P);
                r.setOption("movflags", "+faststart");
                if (e == Encoder.H264) {
                    r.setVideoCodecName(H264_ENCODER);
                    r.setVideoCodec(avcodec.AV_CODEC_ID_H264);
                    r.setVideoBitrate((int) Math.min(Integer.MAX_VALUE,
                            encoding.h264BitsPerPixel() * w * h * fps));
                } else {
                    r.setVideoCodecName(MPEG4_ENCODER);
                    r.setVideoCodec(avcodec.AV_CODEC_ID_MPEG4);
                    r.setVideoQuality(encoding.mpeg4Quantiser());
                    r.setMaxBFrames(0);
                }
                try {
                    r.start();
                    encoder = e;
                    return r;
                } catch (FFmpegFrameRecorder.Exception ex) {
                    last = new IOException("the " + e.name + " encoder would not start: " + ex.getMessage(), ex);
                    r.release();
                }
            }
            throw last;
        }

        /** Copies the source pixels into the picture, repeating the last column and row into the even padding. */
        private void fill(org.modetrail.video.Frame frame) {
            int sw = frame.width(), sh = frame.height();
            int[] rgb = frame.rgb();
            for (int y = 0; y < sh; y++) {
                System.arraycopy(rgb, y * sw, pixels, y * w, sw);
                if (sw < w) {
                    pixels[y * w + sw] = rgb[y * sw + sw - 1];
                }
            }
            if (sh < h) {
                System.arraycopy(pixels, (sh - 1) * w, pixels, sh * w, w);
            }
        }

        private void record(FFmpegFrameRecorder recorder) throws IOException {
            words.clear();
            words.put(pixels);
            bytes.clear();
            // recordImage answers false while the encoder still holds the frame back; that is not an error.
            recorder.recordImage(w, h, Frame.DEPTH_UBYTE, 4, w * 4, avutil.AV_PIX_FMT_BGR0, bytes);
            written++;
            progress.update(written, to - from);
        }
    }
}
