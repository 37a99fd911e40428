package org.modetrail.trackbench;

import java.nio.file.Path;

import org.modetrail.video.Frame;
import org.modetrail.video.FrameIndex;
import org.modetrail.video.FrameSink;
import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoSource;

/** A scenario clip rendered once into memory and served as a {@link VideoSource}, so repeated runs cost no render. */
final class RenderedVideo implements VideoSource {
    private final BenchClip clip;
    private final Frame[] frames;
    private final FrameIndex index;

    RenderedVideo(BenchClip clip) {
        this.clip = clip;
        frames = new Frame[clip.frameCount()];
        long[] pts = new long[frames.length];
        boolean[] key = new boolean[frames.length];
        for (int n = 0; n < frames.length; n++) {
            int[] rgb = new int[clip.width() * clip.height()];
            clip.render(n, rgb);
            frames[n] = new Frame(n, n / 25.0, clip.width(), clip.height(), rgb);
            pts[n] = n;
            key[n] = true;
        }
        index = new FrameIndex(pts, key, 1, 25);
    }

    @Override
    public Path path() {
        return Path.of(clip.name());
    }

    @Override
    public VideoInfo info() {
        return new VideoInfo(clip.width(), clip.height(), frames.length, frames.length / 25.0, 25, false,
                frames.length, "rendered", "memory");
    }

    @Override
    public FrameIndex index() {
        return index;
    }

    @Override
    public Frame frame(int n) {
        return frames[n];
    }

    @Override
    public void read(int from, int to, FrameSink sink) throws org.modetrail.video.VideoException {
        for (int n = from; n < to; n++) {
            if (!sink.accept(frames[n])) {
                return;
            }
        }
    }

    @Override
    public int[] unreadableFrames() {
        return new int[0];
    }

    @Override
    public void close() {
    }
}
