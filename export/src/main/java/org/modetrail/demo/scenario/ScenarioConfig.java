package org.modetrail.demo.scenario;

/**
 * Size, timing and rendering of a tracking scenario. Object sizes, speeds and scene layout scale with
 * {@code min(width / 640, height / 480)}, so another frame size shows the same scene. Motion is designed in pixels
 * per frame, so {@code fps} only changes time stamps; a longer or shorter clip stretches the events of
 * {@link ScenarioKind#SCALE_CHANGE} and {@link ScenarioKind#CROSSING}, which sit at fixed fractions of the clip.
 *
 * @param width       frame width in pixels, even (H.264 in 4:2:0 needs it), 160..4096; default 640
 * @param height      frame height in pixels, even, 120..4096; default 480
 * @param fps         frames per second, 1..240; default 25
 * @param frameCount  frames in the clip, 100..2000; default 200 (8 s), long enough for every event with a lead-in
 *                    and a run-out, short enough that eight scenarios times a few trackers take seconds
 * @param seed        drives paths, textures and noise; default 1
 * @param sensorNoise amplitude in grey levels, 0..32, of the per-frame noise on every pixel; default 3, mild
 * @param texture     floor texture and clutter blotches; default true. When false the floor is the flat colour
 *                    {@link #FLAT_FLOOR} before lighting, so tests can tell object pixels from floor exactly
 */
public record ScenarioConfig(int width, int height, int fps, int frameCount, long seed, int sensorNoise,
                             boolean texture) {

    public static final int DEFAULT_WIDTH = 640;
    public static final int DEFAULT_HEIGHT = 480;
    public static final int DEFAULT_FPS = 25;
    public static final int DEFAULT_FRAME_COUNT = 200;
    public static final long DEFAULT_SEED = 1;
    public static final int DEFAULT_SENSOR_NOISE = 3;
    /** Pure green: no object, post or blotch colour is this. */
    public static final int FLAT_FLOOR = 0x00FF00;

    public ScenarioConfig {
        if (width < 160 || width > 4096 || height < 120 || height > 4096 || width % 2 != 0 || height % 2 != 0) {
            throw new IllegalArgumentException("frame size must be even, 160..4096 x 120..4096, got " + width + " x "
                    + height);
        }
        if (fps < 1 || fps > 240) {
            throw new IllegalArgumentException("fps must be 1..240, got " + fps);
        }
        if (frameCount < 100 || frameCount > 2000) {
            throw new IllegalArgumentException("frame count must be 100..2000, got " + frameCount);
        }
        if (sensorNoise < 0 || sensorNoise > 32) {
            throw new IllegalArgumentException("sensor noise must be 0..32 grey levels, got " + sensorNoise);
        }
    }

    public static ScenarioConfig defaults() {
        return new ScenarioConfig(DEFAULT_WIDTH, DEFAULT_HEIGHT, DEFAULT_FPS, DEFAULT_FRAME_COUNT, DEFAULT_SEED,
                DEFAULT_SENSOR_NOISE, true);
    }

    public ScenarioConfig withSize(int newWidth, int newHeight) {
        return new ScenarioConfig(newWidth, newHeight, fps, frameCount, seed, sensorNoise, texture);
    }

    public ScenarioConfig withTiming(int newFps, int newFrameCount) {
        return new ScenarioConfig(width, height, newFps, newFrameCount, seed, sensorNoise, texture);
    }

    public ScenarioConfig withSeed(long newSeed) {
        return new ScenarioConfig(width, height, fps, frameCount, newSeed, sensorNoise, texture);
    }

    public ScenarioConfig withSensorNoise(int newSensorNoise) {
        return new ScenarioConfig(width, height, fps, frameCount, seed, newSensorNoise, texture);
    }

    public ScenarioConfig withTexture(boolean newTexture) {
        return new ScenarioConfig(width, height, fps, frameCount, seed, sensorNoise, newTexture);
    }

    /** Scene pixels per pixel of the 640 x 480 design. */
    double scale() {
        return Math.min(width / 640.0, height / 480.0);
    }
}
