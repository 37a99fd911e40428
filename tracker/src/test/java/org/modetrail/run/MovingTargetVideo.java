package org.modetrail.run;

import java.nio.file.Path;
import java.util.Random;

import org.modetrail.model.Box;
import org.modetrail.video.Frame;
import org.modetrail.video.FrameIndex;
import org.modetrail.video.FrameSink;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoInfo;
import org.modetrail.video.VideoSource;

/**
 * An in-memory video of a textured red ellipse moving along a known path over a grey floor, optionally hidden
 * on some frames: a test double of {@link VideoSource} whose true boxes are known exactly. It counts decoded frames,
 * so tests can check that several tracks share one read.
 */
final class MovingTargetVideo implements VideoSource {
    final Box[] truth;
    private final boolean[] hidden;
    private final int width;
    private final int height;
    private final FrameIndex index;
    long framesRead;
    /** A second object, alike in every way, on its own path (null for none); always in view. */
    Box[] twin;

    MovingTargetVideo(int width, int height, Box[] truth, boolean[] hidden) {
        this.width = width;
        this.height = height;
        this.truth = truth;
        this.hidden = hidden;
        long[] pts = new long[truth.length];
        boolean[] key = new boolean[truth.length];
        for (int i = 0; i < pts.length; i++) {
            pts[i] = i;
            key[i] = true;
        }
        index = new FrameIndex(pts, key, 1, 25);
    }

    /** Moving right 3 px a frame and down 1. */
    static MovingTargetVideo straightLine(int frames, boolean[] hidden) {
        Box[] path = new Box[frames];
        for (int i = 0; i < frames; i++) {
            path[i] = new Box(20 + 3 * i, 60 + i, 40, 30);
        }
        return new MovingTargetVideo(480, 320, path, hidden == null ? new boolean[frames] : hidden);
    }

    private Frame render(int n) {
        int[] rgb = new int[width * height];
        Random floor = new Random(7);
        for (int i = 0; i < rgb.length; i++) {
            int g = 150 + floor.nextInt(40);
            rgb[i] = 0xFF000000 | (g << 16) | ((g - 10) << 8) | (g - 25);
        }
        if (twin != null) {
            paintObject(rgb, twin[n], new Random(n + 7919));
        }
        if (!hidden[n]) {
            paintObject(rgb, truth[n], new Random(n));
        }
        framesRead++;
        return new Frame(n, n / 25.0, width, height, rgb);
    }

    private void paintObject(int[] rgb, Box b, Random r) {
        for (int y = (int) b.y(); y < Math.ceil(b.bottom()); y++) {
            for (int x = (int) b.x(); x < Math.ceil(b.right()); x++) {
                double dx = (x + 0.5 - b.centreX()) / (b.width() / 2);
                double dy = (y + 0.5 - b.centreY()) / (b.height() / 2);
                if (dx * dx + dy * dy < 1 && x >= 0 && y >= 0 && x < width && y < height) {
                    int s = (int) (30 * dy) + r.nextInt(20) - 10;
                    rgb[y * width + x] = 0xFF000000 | (clamp(0xC0 + s) << 16) | (clamp(0x30 + s) << 8)
                            | clamp(0x20 + s);
                }
            }
        }
    }

    private static int clamp(int v) {
        return Math.max(0, Math.min(255, v));
    }

    @Override
    public Path path() {
        return Path.of("moving-target");
    }

    @Override
    public VideoInfo info() {
        return new VideoInfo(width, height, truth.length, truth.length / 25.0, 25, false, truth.length, "test",
                "memory");
    }

    @Override
    public FrameIndex index() {
        return index;
    }

    @Override
    public Frame frame(int n) {
        return render(n);
    }

    @Override
    public void read(int from, int to, FrameSink sink) throws VideoException {
        for (int n = from; n < to; n++) {
            if (!sink.accept(render(n))) {
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
