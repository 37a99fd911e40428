package org.modetrail.overlay;

/**
 * How the overlay video is encoded.
 *
 * @param codec          which encoder; default {@link OverlayCodec#AUTO}
 * @param mpeg4Quantiser the mpeg4 encoder's fixed quantiser (ffmpeg's {@code -q:v}), 1 (best) to 31; default 3
 * @param h264BitsPerPixel libopenh264's target bitrate as bits per pixel per frame, 0.01 to 10; default 0.25
 *                       (about 1.9 Mbit/s for 640 x 480 at 25 fps)
 * @param gopFrames      at most this many frames between key frames, 1 to 1000; default 50
 */
public record OverlayEncoding(OverlayCodec codec, int mpeg4Quantiser, double h264BitsPerPixel, int gopFrames) {

    public OverlayEncoding {
        if (codec == null) {
            codec = OverlayCodec.AUTO;
        }
        if (mpeg4Quantiser < 1 || mpeg4Quantiser > 31) {
            throw new IllegalArgumentException("the mpeg4 quantiser must be 1 to 31, got " + mpeg4Quantiser);
        }
        if (!(h264BitsPerPixel >= 0.01 && h264BitsPerPixel <= 10)) {
            throw new IllegalArgumentException("H.264 bits per pixel must be 0.01 to 10, got " + h264BitsPerPixel);
        }
        if (gopFrames < 1 || gopFrames > 1000) {
            throw new IllegalArgumentException("key frame interval must be 1 to 1000 frames, got " + gopFrames);
        }
    }

    public static OverlayEncoding defaults() {
        return new OverlayEncoding(OverlayCodec.AUTO, 3, 0.25, 50);
    }

    public OverlayEncoding withCodec(OverlayCodec c) {
        return new OverlayEncoding(c, mpeg4Quantiser, h264BitsPerPixel, gopFrames);
    }

    public OverlayEncoding withMpeg4Quantiser(int q) {
        return new OverlayEncoding(codec, q, h264BitsPerPixel, gopFrames);
    }

    public OverlayEncoding withH264BitsPerPixel(double bpp) {
        return new OverlayEncoding(codec, mpeg4Quantiser, bpp, gopFrames);
    }
}
