package org.modetrail.demo;

import java.util.Set;

/**
 * How a clip is encoded.
 *
 * @param width        frame width in pixels, even (4:2:0 chroma needs it); no default, the scenario sets it
 * @param height       frame height in pixels, even
 * @param fps          frames per second; default 25
 * @param frameCount   frames in the clip
 * @param gopLength    maximum distance between key frames ({@code -g}); default 250, ten seconds at 25 fps, as
 *                     broadcast-style H.264 commonly uses
 * @param bFrames      maximum consecutive B-frames ({@code -bf}); default 3, libx264's own default
 * @param crf          H.264 constant rate factor, 0..51, lower is better; default 23, libx264's own default
 * @param qscale       MPEG-4 Part 2 and MJPEG quantiser ({@code -q:v}), 1..31, lower is better; default 4
 * @param preset       libx264 speed preset; default {@code medium}
 * @param pixelFormat  pixel format of the encoded video; default {@code yuv420p}, the format players accept
 * @param codec        encoder; default {@link VideoCodec#H264}. The container comes from the file extension
 * @param fastStart    for .mp4/.mov, move the index to the front ({@code -movflags +faststart}) so playback and
 *                     seeking can start before the whole file is read; default true
 * @param ffmpeg       the ffmpeg command; default {@code ffmpeg}, found on the PATH
 */
public record ClipOptions(int width, int height, int fps, int frameCount, int gopLength, int bFrames, int crf,
                          int qscale, String preset, String pixelFormat, VideoCodec codec, boolean fastStart,
                          String ffmpeg) {

    public static final int DEFAULT_FPS = 25;
    public static final int DEFAULT_GOP_LENGTH = 250;
    public static final int DEFAULT_B_FRAMES = 3;
    public static final int DEFAULT_CRF = 23;
    public static final int DEFAULT_QSCALE = 4;
    public static final String DEFAULT_PRESET = "medium";
    public static final String DEFAULT_PIXEL_FORMAT = "yuv420p";
    public static final String DEFAULT_FFMPEG = "ffmpeg";

    private static final Set<String> PRESETS = Set.of("ultrafast", "superfast", "veryfast", "faster", "fast",
            "medium", "slow", "slower", "veryslow", "placebo");
    private static final Set<String> PIXEL_FORMATS = Set.of("yuv420p", "yuvj420p", "yuv422p", "yuv444p");

    public ClipOptions {
        if (width < 2 || height < 2 || width % 2 != 0 || height % 2 != 0) {
            throw new IllegalArgumentException("frame size must be even and positive, got " + width + " x " + height);
        }
        if (fps < 1 || fps > 240) {
            throw new IllegalArgumentException("fps must be 1..240, got " + fps);
        }
        if (frameCount < 1) {
            throw new IllegalArgumentException("frame count must be 1 or more, got " + frameCount);
        }
        if (gopLength < 1) {
            throw new IllegalArgumentException("GOP length must be 1 or more, got " + gopLength);
        }
        if (bFrames < 0 || bFrames > 16) {
            throw new IllegalArgumentException("B-frames must be 0..16, got " + bFrames);
        }
        if (crf < 0 || crf > 51) {
            throw new IllegalArgumentException("crf must be 0..51, got " + crf);
        }
        if (qscale < 1 || qscale > 31) {
            throw new IllegalArgumentException("qscale must be 1..31, got " + qscale);
        }
        if (!PRESETS.contains(preset)) {
            throw new IllegalArgumentException("unknown libx264 preset '" + preset + "', expected one of " + PRESETS);
        }
        if (!PIXEL_FORMATS.contains(pixelFormat)) {
            throw new IllegalArgumentException("pixel format must be one of " + PIXEL_FORMATS + ", got " + pixelFormat);
        }
        if (codec == null) {
            throw new IllegalArgumentException("codec is required");
        }
        if (ffmpeg == null || ffmpeg.isBlank()) {
            throw new IllegalArgumentException("ffmpeg command is required");
        }
    }

    /** The defaults described above for a clip of the given size and length. */
    public static ClipOptions defaults(int width, int height, int frameCount) {
        return new ClipOptions(width, height, DEFAULT_FPS, frameCount, DEFAULT_GOP_LENGTH, DEFAULT_B_FRAMES,
                DEFAULT_CRF, DEFAULT_QSCALE, DEFAULT_PRESET, DEFAULT_PIXEL_FORMAT, VideoCodec.H264, true,
                DEFAULT_FFMPEG);
    }

    public ClipOptions withSize(int newWidth, int newHeight) {
        return new ClipOptions(newWidth, newHeight, fps, frameCount, gopLength, bFrames, crf, qscale, preset,
                pixelFormat, codec, fastStart, ffmpeg);
    }

    public ClipOptions withTiming(int newFps, int newFrameCount) {
        return new ClipOptions(width, height, newFps, newFrameCount, gopLength, bFrames, crf, qscale, preset,
                pixelFormat, codec, fastStart, ffmpeg);
    }

    public ClipOptions withGop(int newGopLength, int newBFrames) {
        return new ClipOptions(width, height, fps, frameCount, newGopLength, newBFrames, crf, qscale, preset,
                pixelFormat, codec, fastStart, ffmpeg);
    }

    public ClipOptions withQuality(int newCrf, int newQscale, String newPreset) {
        return new ClipOptions(width, height, fps, frameCount, gopLength, bFrames, newCrf, newQscale, newPreset,
                pixelFormat, codec, fastStart, ffmpeg);
    }

    public ClipOptions withCodec(VideoCodec newCodec) {
        return new ClipOptions(width, height, fps, frameCount, gopLength, bFrames, crf, qscale, preset,
                pixelFormat, newCodec, fastStart, ffmpeg);
    }

    public ClipOptions withPixelFormat(String newPixelFormat) {
        return new ClipOptions(width, height, fps, frameCount, gopLength, bFrames, crf, qscale, preset,
                newPixelFormat, codec, fastStart, ffmpeg);
    }

    public ClipOptions withFastStart(boolean newFastStart) {
        return new ClipOptions(width, height, fps, frameCount, gopLength, bFrames, crf, qscale, preset,
                pixelFormat, codec, newFastStart, ffmpeg);
    }

    public ClipOptions withFfmpeg(String newFfmpeg) {
        return new ClipOptions(width, height, fps, frameCount, gopLength, bFrames, crf, qscale, preset,
                pixelFormat, codec, fastStart, newFfmpeg);
    }
}
