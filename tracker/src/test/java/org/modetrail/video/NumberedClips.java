package org.modetrail.video;

import static org.bytedeco.ffmpeg.global.avcodec.AV_CODEC_ID_MPEG4;
import static org.bytedeco.ffmpeg.global.avutil.AV_PIX_FMT_BGR24;
import static org.bytedeco.ffmpeg.global.avutil.AV_PIX_FMT_YUV420P;

import java.nio.ByteBuffer;
import java.nio.file.Path;

import org.bytedeco.javacv.FFmpegFrameRecorder;

/**
 * Test clips whose every frame shows its own number as a row of large black and white cells, so a decoded frame
 * says which frame it is, whatever the codec did to the fine detail. Written with FFmpeg's MPEG-4 part 2 encoder
 * through JavaCV, which ships with the bindings (no command-line tool needed).
 */
final class NumberedClips {
    static final int WIDTH = 192;
    static final int HEIGHT = 96;
    private static final int BITS = 12;
    private static final int CELL = WIDTH / BITS;

    private NumberedClips() {
    }

    /** Writes {@code frames} frames at 25 fps with the given GOP length and B-frames into {@code file}. */
    static Path write(Path file, String format, int frames, int gop, int bFrames) throws Exception {
        try (FFmpegFrameRecorder recorder = new FFmpegFrameRecorder(file.toFile(), WIDTH, HEIGHT, 0)) {
            recorder.setFormat(format);
            recorder.setVideoCodec(AV_CODEC_ID_MPEG4);
            recorder.setPixelFormat(AV_PIX_FMT_YUV420P);
            recorder.setFrameRate(25);
            recorder.setGopSize(gop);
            recorder.setVideoQuality(2);
            recorder.setVideoOption("bf", Integer.toString(bFrames));
            recorder.start();
            org.bytedeco.javacv.Frame frame = new org.bytedeco.javacv.Frame(WIDTH, HEIGHT,
                    org.bytedeco.javacv.Frame.DEPTH_UBYTE, 3);
            ByteBuffer pixels = (ByteBuffer) frame.image[0];
            int stride = frame.imageStride;
            for (int n = 0; n < frames; n++) {
                paint(n, pixels, stride);
                recorder.record(frame, AV_PIX_FMT_BGR24);
            }
            recorder.stop();
        }
        return file;
    }

    private static void paint(int n, ByteBuffer pixels, int stride) {
        for (int y = 0; y < HEIGHT; y++) {
            for (int x = 0; x < WIDTH; x++) {
                int v;
                if (y < HEIGHT / 2) {
                    int bit = (n >> (BITS - 1 - Math.min(BITS - 1, x / CELL))) & 1;
                    v = bit == 1 ? 235 : 20;
                } else {
                    v = (x * 2 + n * 3) & 0xFF; // a moving ramp, so consecutive frames really differ
                }
                int at = y * stride + x * 3;
                pixels.put(at, (byte) v).put(at + 1, (byte) v).put(at + 2, (byte) v);
            }
        }
    }

    /** The number a decoded frame shows. */
    static int numberOf(Frame f) {
        int n = 0;
        for (int b = 0; b < BITS; b++) {
            int x = b * CELL + CELL / 2;
            int green = (f.rgbAt(x, HEIGHT / 4) >> 8) & 0xFF;
            n = (n << 1) | (green > 128 ? 1 : 0);
        }
        return n;
    }
}
