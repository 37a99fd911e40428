package org.modetrail.app.bench;

import java.nio.file.Path;

/**
 * What one {@code modetrail bench} run measures and on what.
 *
 * @param frames   frames of the generated 1080p clip (ignored with {@code clip})
 * @param gop      keyframe interval of the generated clip; long GOPs are what make random access expensive
 * @param clip     an existing clip to measure instead of a generated one, or null
 * @param repeats  timed passes of each sequential and index measurement; the median is reported
 * @param samples  random frames for the random-access measurement
 * @param threads  decoder threads given to every decoder measured, 0 for FFmpeg's automatic choice
 * @param seed     seed of the random frame numbers, so two runs ask for the same frames
 * @param work     folder for the generated clip and the index cache, or null for a fresh temp folder
 * @param keep     whether to keep the work folder afterwards
 * @param json     file to write the figures to as JSON, or null
 */
public record BenchSettings(int frames, int gop, Path clip, int repeats, int samples, int threads, long seed,
                            Path work, boolean keep, Path json) {

    public static final int DEFAULT_FRAMES = 600;
    public static final int DEFAULT_GOP = 250;
    public static final int DEFAULT_REPEATS = 3;
    public static final int DEFAULT_SAMPLES = 15;
    public static final long DEFAULT_SEED = 20240601L;

    public BenchSettings {
        // Three frames is the least that leaves a frame either side of a random one for the step figures.
        if (frames < 3 || frames > 100_000) {
            throw new IllegalArgumentException("--frames must be 3 to 100000, got " + frames);
        }
        if (gop < 1 || gop > 10_000) {
            throw new IllegalArgumentException("--gop must be 1 to 10000, got " + gop);
        }
        if (repeats < 1 || repeats > 100) {
            throw new IllegalArgumentException("--repeats must be 1 to 100, got " + repeats);
        }
        if (samples < 1 || samples > 10_000) {
            throw new IllegalArgumentException("--samples must be 1 to 10000, got " + samples);
        }
        if (threads < 0 || threads > 64) {
            throw new IllegalArgumentException("--threads must be 0 (automatic) to 64, got " + threads);
        }
    }

    public static BenchSettings defaults() {
        return new BenchSettings(DEFAULT_FRAMES, DEFAULT_GOP, null, DEFAULT_REPEATS, DEFAULT_SAMPLES, 0,
                DEFAULT_SEED, null, false, null);
    }
}
