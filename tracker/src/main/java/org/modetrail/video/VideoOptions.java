package org.modetrail.video;

import java.nio.file.Path;

/**
 * How a {@link VideoSource} is opened.
 *
 * @param cacheBudgetBytes  memory the decoded-frame cache may hold for random access; default 512 MB, enough for
 *                          about 60 frames of 1080p
 * @param indexCacheDir     folder for cached frame indexes, or null for no on-disk cache; default
 *                          {@code $XDG_CACHE_HOME/modetrail/frame-index} or {@code ~/.cache/modetrail/frame-index}
 * @param decoderThreads    decoder threads, 0 for one per core (the default)
 * @param imageSequenceFps  frame rate given to a folder of numbered images, which carries none; default 25
 */
public record VideoOptions(long cacheBudgetBytes, Path indexCacheDir, int decoderThreads, double imageSequenceFps) {

    public static final long DEFAULT_CACHE_BUDGET_BYTES = 512L << 20;
    public static final double DEFAULT_IMAGE_SEQUENCE_FPS = 25;

    public VideoOptions {
        if (cacheBudgetBytes < 0) {
            throw new IllegalArgumentException("cache budget must not be negative, got " + cacheBudgetBytes);
        }
        if (decoderThreads < 0) {
            throw new IllegalArgumentException("decoder threads must be 0 (automatic) or more, got " + decoderThreads);
        }
        if (!(imageSequenceFps > 0) || Double.isInfinite(imageSequenceFps)) {
            throw new IllegalArgumentException("image sequence frame rate must be positive, got " + imageSequenceFps);
        }
    }

    /** The defaults described above. */
    public static VideoOptions defaults() {
        return new VideoOptions(DEFAULT_CACHE_BUDGET_BYTES, defaultIndexCacheDir(), 0, DEFAULT_IMAGE_SEQUENCE_FPS);
    }

    public VideoOptions withCacheBudgetMegabytes(long megabytes) {
        return new VideoOptions(megabytes << 20, indexCacheDir, decoderThreads, imageSequenceFps);
    }

    public VideoOptions withIndexCacheDir(Path dir) {
        return new VideoOptions(cacheBudgetBytes, dir, decoderThreads, imageSequenceFps);
    }

    public VideoOptions withDecoderThreads(int threads) {
        return new VideoOptions(cacheBudgetBytes, indexCacheDir, threads, imageSequenceFps);
    }

    public VideoOptions withImageSequenceFps(double fps) {
        return new VideoOptions(cacheBudgetBytes, indexCacheDir, decoderThreads, fps);
    }

    /** The per-user cache folder for frame indexes, following the XDG base directory convention. */
    public static Path defaultIndexCacheDir() {
        String xdg = System.getenv("XDG_CACHE_HOME");
        Path base = xdg != null && !xdg.isBlank()
                ? Path.of(xdg)
                : Path.of(System.getProperty("user.home"), ".cache");
        return base.resolve("modetrail").resolve("frame-index");
    }
}
