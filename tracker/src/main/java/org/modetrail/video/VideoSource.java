package org.modetrail.video;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Frame-exact access to a video: every other part of Modetrail reads frames through this. Frame n is the n-th
 * frame in presentation order, the same pixels as decoding the file from the start, on constant and variable
 * frame-rate files alike.
 *
 * <p>Not safe for concurrent use: give each thread its own source (reopening is cheap once the index is cached).
 */
public interface VideoSource extends AutoCloseable {

    /** Opens a video file (anything FFmpeg reads) or a folder of numbered PNG/JPEG images, with default options. */
    static VideoSource open(Path path) throws VideoException {
        return open(path, VideoOptions.defaults());
    }

    /** Opens a video file or a folder of numbered images. */
    static VideoSource open(Path path, VideoOptions options) throws VideoException {
        return open(path, options, IndexProgress.NONE);
    }

    /** Opens a video file or a folder of numbered images, telling {@code progress} how the first scan goes. */
    static VideoSource open(Path path, VideoOptions options, IndexProgress progress) throws VideoException {
        if (!Files.exists(path)) {
            throw new VideoException(path, "no such file or folder; check the path");
        }
        if (Files.isDirectory(path)) {
            return ImageSequenceSource.open(path, options);
        }
        return FfmpegVideoSource.open(path, options, progress);
    }

    /** The file or folder this reads. */
    Path path();

    VideoInfo info();

    FrameIndex index();

    default int frameCount() {
        return index().frameCount();
    }

    /**
     * Frame n (0-based, presentation order). Served from the decoded-frame cache when it is there; the returned
     * frame is shared with the cache, so do not modify its pixels.
     *
     * @throws VideoException            when n is out of range (the message gives the valid range)
     * @throws FrameUnreadableException  when the file is damaged at that frame; other frames stay readable
     */
    Frame frame(int n) throws VideoException;

    /**
     * Frame n written into the caller's own pixel array ({@code width * height} entries, reused from call to call
     * by a viewer that steps through a video), without keeping it in the decoded-frame cache. The returned frame
     * wraps {@code into}. Stepping with this allocates nothing per frame: a new 8 MB array per 1080p frame costs
     * more than decoding it (fresh memory is zeroed and paged in, and the garbage collector is kept busy).
     *
     * @throws IllegalArgumentException  when {@code into} is smaller than a frame
     * @throws VideoException            as {@link #frame(int)}
     */
    default Frame frame(int n, int[] into) throws VideoException {
        Frame f = frame(n);
        int size = f.width() * f.height();
        if (into.length < size) {
            throw new IllegalArgumentException("pixel array holds " + into.length + " entries, a frame needs " + size);
        }
        System.arraycopy(f.rgb(), 0, into, 0, size);
        return new Frame(f.index(), f.timeSeconds(), f.width(), f.height(), into);
    }

    /**
     * Reads frames {@code from} (inclusive) to {@code to} (exclusive) in order, as fast as the decoder goes, without
     * filling the random-access cache. The sink's frame buffer is reused from call to call. Frames that cannot be
     * decoded are reported to {@link FrameSink#unreadable} and skipped.
     */
    void read(int from, int to, FrameSink sink) throws VideoException;

    /** Frames that turned out to be unreadable so far, in ascending order. */
    int[] unreadableFrames();

    @Override
    void close();
}
