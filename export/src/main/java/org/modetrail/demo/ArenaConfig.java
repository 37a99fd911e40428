package org.modetrail.demo;

/**
 * The arena scenario: a round arena seen from above with three animals.
 *
 * @param width      frame width in pixels; default 640
 * @param height     frame height in pixels; default 480. Arena and animals scale with {@code min(width, height)}
 * @param fps        frames per second; default 25
 * @param frameCount frames in the clip; default 450 (18 s)
 * @param seed       drives motion, texture and noise; default 1
 * @param style      background and noise; default textured with sensor noise of 3 grey levels
 */
public record ArenaConfig(int width, int height, int fps, int frameCount, long seed, RenderStyle style) {

    public static final int DEFAULT_WIDTH = 640;
    public static final int DEFAULT_HEIGHT = 480;
    public static final int DEFAULT_FPS = 25;
    public static final int DEFAULT_FRAME_COUNT = 450;
    public static final long DEFAULT_SEED = 1;
    public static final int DEFAULT_SENSOR_NOISE = 3;

    public ArenaConfig {
        if (width < 64 || height < 64 || width > 8192 || height > 8192) {
            throw new IllegalArgumentException(
                    "frame size must be 64..8192 pixels a side, got " + width + " x " + height);
        }
        if (fps < 1 || fps > 240) {
            throw new IllegalArgumentException("fps must be 1..240, got " + fps);
        }
        if (frameCount < 1) {
            throw new IllegalArgumentException("frame count must be 1 or more, got " + frameCount);
        }
        if (style == null) {
            throw new IllegalArgumentException("render style is required");
        }
    }

    public static ArenaConfig defaults() {
        return new ArenaConfig(DEFAULT_WIDTH, DEFAULT_HEIGHT, DEFAULT_FPS, DEFAULT_FRAME_COUNT, DEFAULT_SEED,
                RenderStyle.standard(DEFAULT_SENSOR_NOISE));
    }

    public ArenaConfig withSize(int newWidth, int newHeight) {
        return new ArenaConfig(newWidth, newHeight, fps, frameCount, seed, style);
    }

    public ArenaConfig withTiming(int newFps, int newFrameCount) {
        return new ArenaConfig(width, height, newFps, newFrameCount, seed, style);
    }

    public ArenaConfig withSeed(long newSeed) {
        return new ArenaConfig(width, height, fps, frameCount, newSeed, style);
    }

    public ArenaConfig withStyle(RenderStyle newStyle) {
        return new ArenaConfig(width, height, fps, frameCount, seed, newStyle);
    }

    /** Pixels per "reference pixel" of the 480-line design, so larger frames show the same scene. */
    double scale() {
        return Math.min(width, height) / 480.0;
    }

    double centreX() {
        return width / 2.0;
    }

    double centreY() {
        return height / 2.0;
    }

    /** Inner radius of the arena wall. */
    double radius() {
        return 0.46 * Math.min(width, height);
    }

    double wallThickness() {
        return 0.03 * Math.min(width, height);
    }
}
