package org.modetrail.demo.scenario;

import java.util.List;

/**
 * A scenario of the family rendered from its {@link FamilyPlan}: floor, the bodies' soft shadows, the bodies back to
 * front with motion blur, the posts, then lighting (drift and a moving band of shade) and sensor noise.
 *
 * <p>Motion blur follows the exposure model of image synthesis (Potmesil and Chakravarty 1983, "Modeling motion
 * blur in computer-generated images"; Cook, Porter and Carpenter 1984, "Distributed ray tracing", temporal
 * sampling): a pixel records the time average of the scene over the exposure, a box filter in time. The exposure is
 * centred on the frame's instant and lasts {@code shutter} of the frame interval; it is sampled at an odd number of
 * instants spaced at most a pixel of the body's travel apart, and each pixel takes the mean of what the samples show
 * there (the body's texel where a sample covers it, what lies under the body elsewhere).
 *
 * <p>Truth is the body at the frame's instant (the middle sample): the box of its pixels inside the frame
 * (including pixels hidden behind a post or a nearer body, as an amodal box), width and height 0 when none is
 * inside, and the visible fraction of the whole body, pixels outside the frame counted as not seen. Computed when
 * the scenario is made with the pixel test the painter uses.
 */
final class FamilyScenario implements TrackingScenario {

    static final int ALL_OBJECTS = -1;
    private static final int GAIN_ONE = FamilyPainter.GAIN_ONE;
    /** Most exposure samples per body and frame: 40 px of travel at one sample per pixel. */
    private static final int MAX_SAMPLES = 41;

    private final FamilyPlan plan;
    private final FamilyRendering rendering;
    private final Backdrop backdrop;
    private final BodyTexture[] textures;
    private final int objects;
    private final int width;
    private final int height;
    /** Per frame and object: x, y, width, height, visible. */
    private final double[] boxes;
    /** Per frame: bodies in painting order (shown or not). */
    private final int[] order;
    /** Per frame and object: exposure samples. */
    private final int[] samples;
    /** Per frame: red, green and blue gain in 1/4096. */
    private final int[] gains;
    private final FamilyPainter painter;

    FamilyScenario(FamilyPlan plan, FamilyRendering rendering) {
        this.plan = plan;
        this.rendering = rendering;
        this.width = plan.width();
        this.height = plan.height();
        this.objects = plan.bodies().size();
        int[] floor = new int[width * height];
        if (rendering.texture()) {
            plan.floor().paint(floor, width, height, plan.seed());
        }
        this.backdrop = new Backdrop(width, height, floor, rendering.texture(), plan.blotches(), plan.posts(),
                plan.seed());
        this.textures = new BodyTexture[objects];
        for (int k = 0; k < objects; k++) {
            BodyTrack t = track(k);
            textures[k] = new BodyTexture(plan.bodies().get(k).look(), t.maxA(), t.maxB());
        }
        int frames = plan.frames();
        this.boxes = new double[frames * objects * 5];
        this.order = new int[frames * objects];
        this.samples = new int[frames * objects];
        this.gains = new int[frames * 3];
        Pose[] poses = new Pose[objects];
        int[] extent = new int[6];
        for (int f = 0; f < frames; f++) {
            double t = (double) f / (frames - 1);
            for (int c = 0; c < 3; c++) {
                gains[f * 3 + c] = rendering.lighting() ? (int) Math.round(plan.lighting().gain(c, t) * GAIN_ONE)
                        : GAIN_ONE;
            }
            sortByDepth(f);
            for (int k = 0; k < objects; k++) {
                poses[k] = track(k).shown(f) ? track(k).pose(f) : null;
                samples[f * objects + k] = exposureSamples(track(k), f);
            }
            for (int rank = 0; rank < objects; rank++) {
                int k = order[f * objects + rank];
                if (poses[k] == null) {
                    continue;
                }
                measure(poses, f, rank, extent);
                int at = (f * objects + k) * 5;
                if (extent[4] > 0 && extent[2] >= 0) {
                    boxes[at] = extent[0];
                    boxes[at + 1] = extent[1];
                    boxes[at + 2] = extent[2] - extent[0] + 1;
                    boxes[at + 3] = extent[3] - extent[1] + 1;
                    boxes[at + 4] = (double) extent[5] / extent[4];
                }
            }
        }
        this.painter = new FamilyPainter(plan, rendering, textures, gains);
    }

    @Override
    public ScenarioKind kind() {
        return plan.kind().nearest();
    }

    @Override
    public String name() {
        return plan.kind().slug() + "-" + plan.seed();
    }

    FamilyKind familyKind() {
        return plan.kind();
    }

    FamilyPlan plan() {
        return plan;
    }

    @Override
    public int width() {
        return width;
    }

    @Override
    public int height() {
        return height;
    }

    @Override
    public int fps() {
        return plan.fps();
    }

    @Override
    public int frameCount() {
        return plan.frames();
    }

    @Override
    public int objectCount() {
        return objects;
    }

    @Override
    public String toString() {
        return name();
    }

    @Override
    public void render(int frame, int[] rgb) {
        render(frame, rgb, ALL_OBJECTS, true);
    }

    /**
     * Renders with only some objects (bit {@code k} of {@code objectMask} for object {@code k}, with its shadow) and
     * with or without the posts; the same frame as {@link #render(int, int[])} otherwise.
     */
    void render(int frame, int[] rgb, int objectMask, boolean posts) {
        checkFrame(frame);
        if (rgb.length != width * height) {
            throw new IllegalArgumentException("frame buffer must hold " + width + " x " + height + " pixels, got "
                    + rgb.length);
        }
        System.arraycopy(backdrop.floor(), 0, rgb, 0, rgb.length);
        if (rendering.shadows() && plan.shadows().darkness() > 0) {
            for (int k = 0; k < objects; k++) {
                if ((objectMask & (1 << k)) != 0 && track(k).shown(frame)) {
                    painter.paintShadow(rgb, plan.bodies().get(k), frame);
                }
            }
        }
        for (int rank = 0; rank < objects; rank++) {
            int k = order[frame * objects + rank];
            if ((objectMask & (1 << k)) != 0 && track(k).shown(frame)) {
                painter.paintBody(rgb, k, frame, exposureSamples(k, frame));
            }
        }
        if (posts) {
            backdrop.paintPosts(rgb);
        }
        painter.finish(frame, rgb);
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

    /** Exposure samples used for {@code object} in {@code frame} (1 when it hardly moves during the exposure). */
    int exposureSamples(int object, int frame) {
        return rendering.blur() ? samples[frame * objects + object] : 1;
    }

    private BodyTrack track(int k) {
        return plan.bodies().get(k).track();
    }

    private void checkFrame(int frame) {
        if (frame < 0 || frame >= plan.frames()) {
            throw new IllegalArgumentException("frame " + frame + " outside 0.." + (plan.frames() - 1));
        }
    }

    /** Insertion sort of the frame's bodies by depth, ties by index: far first, painted first. */
    private void sortByDepth(int f) {
        int base = f * objects;
        for (int k = 0; k < objects; k++) {
            int r = k;
            while (r > 0 && track(order[base + r - 1]).depth(f) > track(k).depth(f)) {
                order[base + r] = order[base + r - 1];
                r--;
            }
            order[base + r] = k;
        }
    }

    /**
     * Odd sample count keeping samples at most a pixel of travel apart: the travel of the body's farthest point over
     * the exposure, bounded by the centre's path, the turn times the semi-length, and the change of the semi-axes.
     */
    private int exposureSamples(BodyTrack t, int f) {
        double half = plan.shutter() / 2;
        if (half == 0 || !t.shown(f)) {
            return 1;
        }
        Pose before = t.at(f - half);
        Pose now = t.pose(f);
        Pose after = t.at(f + half);
        double travel = travel(before, now) + travel(now, after);
        int s = 2 * (int) Math.ceil(travel / 2) + 1;
        return Math.min(MAX_SAMPLES, s);
    }

    private static double travel(Pose p, Pose q) {
        double turn = Math.abs(Math.atan2(p.sin() * q.cos() - p.cos() * q.sin(), p.cos() * q.cos() + p.sin() * q.sin()));
        return Math.hypot(q.cx() - p.cx(), q.cy() - p.cy()) + Math.max(p.a(), q.a()) * turn
                + Math.abs(q.a() - p.a()) + Math.abs(q.b() - p.b());
    }

    /**
     * Extent of the body at {@code rank} of the frame's order: {minX, minY, maxX, maxY} of its pixels inside the
     * frame, its pixels in all (inside or not), and those seen (inside, not under a post or a later-painted body).
     */
    private void measure(Pose[] poses, int f, int rank, int[] out) {
        Pose p = poses[order[f * objects + rank]];
        int minX = Integer.MAX_VALUE;
        int minY = Integer.MAX_VALUE;
        int maxX = -1;
        int maxY = -1;
        int pixels = 0;
        int seen = 0;
        for (int j = p.firstRow(); j <= p.lastRow(); j++) {
            for (int i = p.firstColumn(); i <= p.lastColumn(); i++) {
                if (!p.covers(i, j)) {
                    continue;
                }
                pixels++;
                if (i < 0 || j < 0 || i >= width || j >= height) {
                    continue;
                }
                minX = Math.min(minX, i);
                maxX = Math.max(maxX, i);
                minY = Math.min(minY, j);
                maxY = Math.max(maxY, j);
                boolean hidden = backdrop.hides(i);
                for (int later = rank + 1; later < objects && !hidden; later++) {
                    Pose q = poses[order[f * objects + later]];
                    hidden = q != null && q.covers(i, j);
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

    /** The bodies, for tests. */
    List<FamilyBody> bodies() {
        return plan.bodies();
    }
}
