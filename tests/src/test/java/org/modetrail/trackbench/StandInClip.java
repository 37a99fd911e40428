package org.modetrail.trackbench;

import org.modetrail.model.Box;

/**
 * The harness's own tiny clip, used before the generator's tracking scenarios exist and in the harness's tests: a
 * two-coloured ellipse (red body, yellow band) gliding on a sinusoid over a grey-green textured background, with an
 * optional steady growth. Deterministic; the truth is the ellipse's bounding box, always fully visible.
 */
public record StandInClip(String name, int width, int height, int frameCount, double growthPerFrame)
        implements BenchClip {

    public static StandInClip basic() {
        return new StandInClip("stand-in", 320, 240, 120, 0);
    }

    public StandInClip {
        if (width < 64 || height < 64 || frameCount < 2 || !(Math.abs(growthPerFrame) < 0.01)) {
            throw new IllegalArgumentException("stand-in clip needs at least 64x64, 2 frames and growth under 1%");
        }
    }

    @Override
    public TruthBox truth(int frame) {
        double t = (double) frame / (frameCount - 1);
        double scale = Math.pow(1 + growthPerFrame, frame);
        double w = 36 * scale;
        double h = 48 * scale;
        double cx = width * (0.2 + 0.6 * t);
        double cy = height * (0.5 + 0.25 * Math.sin(2 * Math.PI * t));
        return new TruthBox(Box.centredAt(cx, cy, w, h), 1);
    }

    @Override
    public void render(int frame, int[] rgb) {
        Box b = truth(frame).box();
        double cx = b.centreX();
        double cy = b.centreY();
        double ax = b.width() / 2;
        double ay = b.height() / 2;
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                // Static texture: a cheap integer hash, so the background has many colours but never the object's.
                int n = (x * 73856093) ^ (y * 19349663);
                n = (n ^ (n >>> 13)) * 0x5bd1e995;
                int v = (n >>> 24) & 0x3F;
                int pixel = 0xFF000000 | (70 + v) << 16 | (100 + v) << 8 | (80 + v / 2);
                double dx = (x + 0.5 - cx) / ax;
                double dy = (y + 0.5 - cy) / ay;
                if (dx * dx + dy * dy <= 1) {
                    pixel = Math.abs(dy) < 0.25 ? 0xFFF0E040 : 0xFFD02020;
                }
                rgb[y * width + x] = pixel;
            }
        }
    }
}
