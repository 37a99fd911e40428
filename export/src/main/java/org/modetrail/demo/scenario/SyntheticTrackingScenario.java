package org.modetrail.demo.scenario;

import java.util.List;
import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * A scenario rendered from its {@link ScenarioPlan}: floor, objects back to front, posts, then lighting and sensor
 * noise. Ground truth for every frame is computed when the scenario is made, with the same pixel test the painter
 * uses, so {@link #truth} is a look-up.
 */
final class SyntheticTrackingScenario implements TrackingScenario {

    /** Object mask selecting every object. */
    static final int ALL_OBJECTS = -1;
    private static final int GAIN_ONE = 1 << 12;
    private static final int OPAQUE = 0xFF000000;

    private final ScenarioConfig config;
    private final ScenarioPlan plan;
    private final Backdrop backdrop;
    private final int objects;
    /** Per frame and object: x, y, width, height, visible. */
    private final double[] boxes;
    /** Per frame: red, green and blue gain in 1/4096. */
    private final int[] gains;

    SyntheticTrackingScenario(ScenarioKind kind, ScenarioConfig config) {
        this.config = config;
        this.plan = ScenarioPlans.plan(kind, config);
        this.backdrop = new Backdrop(config, plan.floor(), plan.blotches(), plan.posts());
        this.objects = plan.looks().size();
        this.boxes = new double[config.frameCount() * objects * 5];
        this.gains = new int[config.frameCount() * 3];
        int[] order = new int[objects];
        int[] extent = new int[6];
        Pose[] poses = new Pose[objects];
        for (int f = 0; f < config.frameCount(); f++) {
            double t = (double) f / (config.frameCount() - 1);
            for (int c = 0; c < 3; c++) {
                gains[f * 3 + c] = (int) Math.round(plan.lighting().gain(c, t) * GAIN_ONE);
            }
            paintOrder(f, order);
            for (int k = 0; k < objects; k++) {
                poses[k] = pose(k, f);
            }
            for (int rank = 0; rank < objects; rank++) {
                int k = order[rank];
                measure(poses, order, rank, extent);
                int at = (f * objects + k) * 5;
                if (extent[4] > 0) {
                    boxes[at] = extent[0];
                    boxes[at + 1] = extent[1];
                    boxes[at + 2] = extent[2] - extent[0] + 1;
                    boxes[at + 3] = extent[3] - extent[1] + 1;
                    boxes[at + 4] = (double) extent[5] / extent[4];
                }
            }
        }
    }

    @Override
    public ScenarioKind kind() {
        return plan.kind();
    }

    @Override
    public int width() {
        return config.width();
    }

    @Override
    public int height() {
        return config.height();
    }

    @Override
    public int fps() {
        return config.fps();
    }

    @Override
    public int frameCount() {
        return config.frameCount();
    }

    @Override
    public int objectCount() {
        return objects;
    }

    /** The stains on the floor, for tests that check the clutter is of the target's colour family. */
    List<Blotch> blotches() {
        return plan.blotches();
    }

    /** The occluders, for tests that check the post's colour. */
    List<Post> posts() {
        return plan.posts();
    }

    @Override
    public void render(int frame, int[] rgb) {
        render(frame, rgb, ALL_OBJECTS, true);
    }

    /**
     * Renders with only some objects (bit {@code k} of {@code objectMask} for object {@code k}) and with or without
     * the posts: the same frame as {@link #render(int, int[])} otherwise, so tests can tell each object's pixels
     * apart by difference.
     */
    void render(int frame, int[] rgb, int objectMask, boolean posts) {
        checkFrame(frame);
        if (rgb.length != config.width() * config.height()) {
            throw new IllegalArgumentException("frame buffer must hold " + config.width() + " x " + config.height()
                    + " pixels, got " + rgb.length);
        }
        System.arraycopy(backdrop.floor(), 0, rgb, 0, rgb.length);
        int[] order = new int[objects];
        paintOrder(frame, order);
        for (int k : order) {
            if ((objectMask & (1 << k)) != 0) {
                paintBody(rgb, pose(k, frame), plan.looks().get(k));
            }
        }
        if (posts) {
            backdrop.paintPosts(rgb);
        }
        finish(frame, rgb);
    }

    @Override
    public ScenarioBox truth(int object, int frame) {
        if (object < 0 || object >= objects) {
            throw new IllegalArgumentException("object " + object + " outside 0.." + (objects - 1));
        }
        checkFrame(frame);
        int at = (frame * objects + object) * 5;
        return new ScenarioBox(boxes[at], boxes[at + 1], boxes[at + 2], boxes[at + 3], boxes[at + 4]);
    }

    private void checkFrame(int frame) {
        if (frame < 0 || frame >= config.frameCount()) {
            throw new IllegalArgumentException("frame " + frame + " outside 0.." + (config.frameCount() - 1));
        }
    }

    private Pose pose(int object, int frame) {
        return plan.tracks().get(object).pose(frame, plan.looks().get(object));
    }

    /** Objects in painting order: the frame's front object last, the others before it by index. */
    private void paintOrder(int frame, int[] order) {
        int front = plan.front()[frame];
        int r = 0;
        for (int k = 0; k < objects; k++) {
            if (k != front) {
                order[r++] = k;
            }
        }
        order[r] = front;
    }

    /**
     * Extent of the body painted at {@code rank} in {@code order}: {minX, minY, maxX, maxY, pixels, seen pixels},
     * a pixel being seen when no post and no later-painted body covers it.
     */
    private void measure(Pose[] poses, int[] order, int rank, int[] out) {
        Pose p = poses[order[rank]];
        int i0 = Math.max(0, p.firstColumn());
        int i1 = Math.min(config.width() - 1, p.lastColumn());
        int j0 = Math.max(0, p.firstRow());
        int j1 = Math.min(config.height() - 1, p.lastRow());
        int minX = Integer.MAX_VALUE;
        int minY = Integer.MAX_VALUE;
        int maxX = -1;
        int maxY = -1;
        int pixels = 0;
        int seen = 0;
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                if (!p.covers(i, j)) {
                    continue;
                }
                pixels++;
                minX = Math.min(minX, i);
                maxX = Math.max(maxX, i);
                minY = Math.min(minY, j);
                maxY = Math.max(maxY, j);
                boolean hidden = backdrop.hides(i);
                for (int later = rank + 1; later < order.length && !hidden; later++) {
                    hidden = poses[order[later]].covers(i, j);
                }
                if (!hidden) {
                    seen++;
                }
            }
        }
        out[0] = minX;
        out[1] = minY;
        out[2] = maxX;
        out[3] = maxY;
        out[4] = pixels;
        out[5] = seen;
    }

    private void paintBody(int[] rgb, Pose p, ObjectLook look) {
        int w = config.width();
        int i0 = Math.max(0, p.firstColumn());
        int i1 = Math.min(w - 1, p.lastColumn());
        int j0 = Math.max(0, p.firstRow());
        int j1 = Math.min(config.height() - 1, p.lastRow());
        for (int j = j0; j <= j1; j++) {
            double dy = j + 0.5 - p.cy();
            for (int i = i0; i <= i1; i++) {
                double dx = i + 0.5 - p.cx();
                double nu = (dx * p.cos() + dy * p.sin()) / p.a();
                double nv = (-dx * p.sin() + dy * p.cos()) / p.b();
                double u2 = nu * nu;
                double v2 = nv * nv;
                double q = u2 * u2 + v2 * v2;
                // The same test as Pose.covers, written out to reuse nu and nv for the pattern.
                if (q < 1) {
                    rgb[j * w + i] = look.colour(nu, nv, q);
                }
            }
        }
    }

    /**
     * Lighting gains, then zero-mean sensor noise (a brightness offset per pixel plus a weaker one per channel, a
     * function of seed, frame and pixel only), then opaque alpha.
     */
    private void finish(int frame, int[] rgb) {
        int gr = gains[frame * 3];
        int gg = gains[frame * 3 + 1];
        int gb = gains[frame * 3 + 2];
        boolean lit = gr != GAIN_ONE || gg != GAIN_ONE || gb != GAIN_ONE;
        int amplitude = config.sensorNoise();
        int span = 2 * amplitude + 1;
        int chromaHalf = amplitude / 2;
        int chromaSpan = 2 * chromaHalf + 1;
        long seed = config.seed() ^ 0x5E75L;
        int half = GAIN_ONE / 2;
        for (int i = 0; i < rgb.length; i++) {
            int c = rgb[i];
            int r = (c >>> 16) & 0xFF;
            int g = (c >>> 8) & 0xFF;
            int b = c & 0xFF;
            if (lit) {
                r = (r * gr + half) >> 12;
                g = (g * gg + half) >> 12;
                b = (b * gb + half) >> 12;
            }
            if (amplitude > 0) {
                long h = NoiseHash.hash(seed, frame, i);
                int luma = (int) ((h >>> 40) % span) - amplitude;
                r += luma + (int) ((h & 0xFF) % chromaSpan) - chromaHalf;
                g += luma + (int) (((h >>> 8) & 0xFF) % chromaSpan) - chromaHalf;
                b += luma + (int) (((h >>> 16) & 0xFF) % chromaSpan) - chromaHalf;
            }
            rgb[i] = OPAQUE | Rgb.pack(r, g, b);
        }
    }
}
