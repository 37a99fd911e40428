package org.modetrail.trackbench;

/** The first frames of a clip, for the benchmark report's quick mode. */
record FirstFrames(BenchClip clip, int frames) implements BenchClip {
    FirstFrames {
        if (frames < 2) {
            throw new IllegalArgumentException("a clip to track needs at least 2 frames, got " + frames);
        }
        frames = Math.min(frames, clip.frameCount());
    }

    @Override
    public String name() {
        return clip.name();
    }

    @Override
    public int width() {
        return clip.width();
    }

    @Override
    public int height() {
        return clip.height();
    }

    @Override
    public int frameCount() {
        return frames;
    }

    @Override
    public void render(int frame, int[] rgb) {
        clip.render(frame, rgb);
    }

    @Override
    public TruthBox truth(int frame) {
        return clip.truth(frame);
    }
}
