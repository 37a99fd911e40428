package org.modetrail.demo;

/**
 * The road scenario: a four-lane road seen from a camera on a pole beside it.
 *
 * @param width      frame width in pixels; default 960
 * @param height     frame height in pixels; default 540
 * @param fps        frames per second; default 25
 * @param frameCount frames in the clip; default 450 (18 s)
 * @param seed       drives texture and sensor noise (the traffic timetable is fixed); default 1
 * @param style      background and noise; default textured, shadows, sensor noise of 3 grey levels
 * @param camera     the camera; default {@link #defaultCamera}
 */
public record RoadConfig(int width, int height, int fps, int frameCount, long seed, RenderStyle style,
                         RoadCamera camera) {

    public static final int DEFAULT_WIDTH = 960;
    public static final int DEFAULT_HEIGHT = 540;
    public static final int DEFAULT_FPS = 25;
    public static final int DEFAULT_FRAME_COUNT = 450;
    public static final long DEFAULT_SEED = 1;
    public static final int DEFAULT_SENSOR_NOISE = 3;
    /** Focal length as a fraction of image width: about a 67 degree horizontal field of view. */
    public static final double DEFAULT_FOCAL_PER_WIDTH = 0.75;
    /** Pole 4 m left of the road's left edge, at y = 0. */
    public static final double DEFAULT_CAMERA_X_M = -4;
    public static final double DEFAULT_CAMERA_HEIGHT_M = 10;
    public static final double DEFAULT_TILT_DEG = 20;
    /** Turned towards the road, so the carriageway runs diagonally up the image. */
    public static final double DEFAULT_PAN_DEG = 16;

    public RoadConfig {
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
        if (style == null || camera == null) {
            throw new IllegalArgumentException("render style and camera are required");
        }
        if (camera.widthPx() != width || camera.heightPx() != height) {
            throw new IllegalArgumentException("camera image size " + camera.widthPx() + " x " + camera.heightPx()
                    + " differs from the frame size " + width + " x " + height);
        }
    }

    public static RoadConfig defaults() {
        return new RoadConfig(DEFAULT_WIDTH, DEFAULT_HEIGHT, DEFAULT_FPS, DEFAULT_FRAME_COUNT, DEFAULT_SEED,
                RenderStyle.standard(DEFAULT_SENSOR_NOISE), defaultCamera(DEFAULT_WIDTH, DEFAULT_HEIGHT));
    }

    /** The default pole and angles; the focal length scales with width so any size shows the same view. */
    public static RoadCamera defaultCamera(int width, int height) {
        return new RoadCamera(width, height, DEFAULT_FOCAL_PER_WIDTH * width, DEFAULT_CAMERA_X_M, 0,
                DEFAULT_CAMERA_HEIGHT_M, DEFAULT_TILT_DEG, DEFAULT_PAN_DEG);
    }

    /** Same view at another size: the focal length scales with the width. */
    public RoadConfig withSize(int newWidth, int newHeight) {
        RoadCamera c = camera;
        RoadCamera scaled = new RoadCamera(newWidth, newHeight, c.focalPx() * newWidth / width, c.xM(), c.yM(),
                c.heightM(), c.tiltDeg(), c.panDeg());
        return new RoadConfig(newWidth, newHeight, fps, frameCount, seed, style, scaled);
    }

    public RoadConfig withTiming(int newFps, int newFrameCount) {
        return new RoadConfig(width, height, newFps, newFrameCount, seed, style, camera);
    }

    public RoadConfig withSeed(long newSeed) {
        return new RoadConfig(width, height, fps, frameCount, newSeed, style, camera);
    }

    public RoadConfig withStyle(RenderStyle newStyle) {
        return new RoadConfig(width, height, fps, frameCount, seed, newStyle, camera);
    }

    public RoadConfig withCamera(RoadCamera newCamera) {
        return new RoadConfig(width, height, fps, frameCount, seed, style, newCamera);
    }

    public double durationS() {
        return (double) frameCount / fps;
    }
}
