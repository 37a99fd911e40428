package org.modetrail.tracking;

import java.util.Random;

import org.modetrail.model.Box;
import org.modetrail.video.Frame;

/**
 * A small moving-target scene for the tracker's own tests: a textured elliptical object on a textured floor, at a
 * position and size the test sets per frame. The exact box is known, so tests measure what the tracker does.
 * (The benchmark scenarios with clutter, occlusion and crossing live in the export module's generator.)
 */
final class SyntheticScene {
    final int width;
    final int height;
    private final int[] floor;
    private final int colour;
    private final long seed;

    SyntheticScene(int width, int height, int objectColour, long seed) {
        this.width = width;
        this.height = height;
        this.colour = objectColour;
        this.seed = seed;
        floor = new int[width * height];
        Random r = new Random(seed);
        for (int i = 0; i < floor.length; i++) {
            int g = 150 + r.nextInt(40);
            floor[i] = 0xFF000000 | (g << 16) | ((g - 10) << 8) | (g - 25);
        }
    }

    /** The frame with the object filling the ellipse inscribed in {@code box}. */
    Frame frame(int index, Box box) {
        int[] rgb = floor.clone();
        paint(rgb, index, box, colour);
        return new Frame(index, index / 25.0, width, height, rgb);
    }

    /** The frame with a second object of another colour painted over the first. */
    Frame frame(int index, Box box, Box other, int otherColour) {
        int[] rgb = floor.clone();
        paint(rgb, index, box, colour);
        paint(rgb, index + 7919, other, otherColour);
        return new Frame(index, index / 25.0, width, height, rgb);
    }

    /** The frame with a grey post covering the columns {@code postFrom..postTo-1} in front of the object. */
    Frame frameBehindPost(int index, Box box, int postFrom, int postTo) {
        int[] rgb = floor.clone();
        paint(rgb, index, box, colour);
        for (int y = 0; y < height; y++) {
            for (int x = Math.max(0, postFrom); x < Math.min(width, postTo); x++) {
                rgb[y * width + x] = 0xFF526076;
            }
        }
        return new Frame(index, index / 25.0, width, height, rgb);
    }

    private void paint(int[] rgb, int index, Box box, int colour) {
        Random r = new Random(seed * 31 + index);
        double cx = box.centreX();
        double cy = box.centreY();
        double ax = box.width() / 2;
        double ay = box.height() / 2;
        for (int y = Math.max(0, (int) box.y()); y < Math.min(height, (int) Math.ceil(box.bottom())); y++) {
            for (int x = Math.max(0, (int) box.x()); x < Math.min(width, (int) Math.ceil(box.right())); x++) {
                double dx = (x + 0.5 - cx) / ax;
                double dy = (y + 0.5 - cy) / ay;
                if (dx * dx + dy * dy < 1) {
                    int shade = (int) (30 * dy) + r.nextInt(20) - 10;
                    rgb[y * width + x] = shadeOf(colour, shade);
                }
            }
        }
    }

    private static int shadeOf(int c, int d) {
        int rr = clamp((c >> 16 & 0xFF) + d);
        int gg = clamp((c >> 8 & 0xFF) + d);
        int bb = clamp((c & 0xFF) + d);
        return 0xFF000000 | (rr << 16) | (gg << 8) | bb;
    }

    private static int clamp(int v) {
        return Math.max(0, Math.min(255, v));
    }
}
