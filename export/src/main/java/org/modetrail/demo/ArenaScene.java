package org.modetrail.demo;

import java.util.ArrayList;
import java.util.List;

/**
 * A round lab arena seen from straight above: a pale, slightly grainy floor inside a white wall, and three animals
 * of distinct colours that wander, bounce off the wall and cross over each other. Animals are painted in cast order,
 * so a later animal hides an earlier one where they overlap.
 */
public final class ArenaScene implements SyntheticScene {

    private static final int FLOOR = Rgb.pack(172, 164, 150);
    private static final int WALL = Rgb.pack(208, 208, 212);
    private static final int BENCH = Rgb.pack(58, 60, 66);

    private final ArenaConfig config;
    private final List<Animal> cast;
    private final ArenaMotion motion;
    private final int[] background;
    private final Canvas canvas;

    public ArenaScene(ArenaConfig config) {
        this.config = config;
        this.cast = Animal.cast(config.scale());
        this.motion = ArenaMotion.simulate(config, cast);
        this.background = new int[config.width() * config.height()];
        this.canvas = new Canvas(config.width(), config.height());
        paintBackground();
    }

    public ArenaConfig config() {
        return config;
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
    public boolean hasWorldCoordinates() {
        return false;
    }

    @Override
    public List<TruthRow> render(int frame, int[] rgb) {
        if (frame < 0 || frame >= config.frameCount()) {
            throw new IllegalArgumentException("frame " + frame + " outside 0.." + (config.frameCount() - 1));
        }
        canvas.beginFrame(rgb, background);
        Coverage[] covered = new Coverage[cast.size()];
        for (int a = 0; a < cast.size(); a++) {
            canvas.beginObject(a);
            paintAnimal(cast.get(a), motion.x(frame, a), motion.y(frame, a), motion.heading(frame, a));
            covered[a] = canvas.endObject();
        }
        int[] owned = canvas.ownedPixels(cast.size());
        canvas.addSensorNoise(config.seed(), frame, config.style().sensorNoise());
        double time = (double) frame / config.fps();
        List<TruthRow> rows = new ArrayList<>(cast.size());
        for (int a = 0; a < cast.size(); a++) {
            if (!covered[a].isEmpty()) {
                double visible = (double) owned[a] / covered[a].pixels();
                rows.add(TruthRow.image(cast.get(a).trackId(), Animal.CLASS, frame, time, covered[a], visible));
            }
        }
        return rows;
    }

    /**
     * Body shading: brighter on the back than at the rim (a rounded body lit from above), a pale stripe along the
     * spine, darker spots fixed to the body so they turn with it, and a darker head end. All this spreads each
     * animal's colour histogram over many bins, as real fur or shells do.
     */
    private void paintAnimal(Animal animal, double cx, double cy, double heading) {
        double a = animal.semiLength();
        double b = animal.semiWidth();
        double cos = StrictMath.cos(heading);
        double sin = StrictMath.sin(heading);
        double halfW = Math.sqrt(a * a * cos * cos + b * b * sin * sin);
        double halfH = Math.sqrt(a * a * sin * sin + b * b * cos * cos);
        int i0 = Math.max(0, (int) Math.floor(cx - halfW));
        int i1 = Math.min(canvas.width() - 1, (int) Math.ceil(cx + halfW));
        int j0 = Math.max(0, (int) Math.floor(cy - halfH));
        int j1 = Math.min(canvas.height() - 1, (int) Math.ceil(cy + halfH));
        double spot = 0.3 * b;
        long spotSeed = config.seed() * 31 + animal.trackId();
        int body = animal.bodyColour();
        int head = animal.headColour();
        for (int j = j0; j <= j1; j++) {
            double dy = j + 0.5 - cy;
            for (int i = i0; i <= i1; i++) {
                double dx = i + 0.5 - cx;
                double u = dx * cos + dy * sin;
                double v = -dx * sin + dy * cos;
                double q = (u * u) / (a * a) + (v * v) / (b * b);
                if (q > 1) {
                    continue;
                }
                double light = 0.6 + 0.4 * Math.sqrt(1 - q);
                if (Math.abs(v) < 0.2 * b && u < 0.5 * a) {
                    light *= 1.12;
                }
                long cell = NoiseHash.hash(spotSeed, (long) Math.floor((u + a) / spot),
                        (long) Math.floor((v + b) / spot));
                if (NoiseHash.unit(cell) < 0.25) {
                    light *= 0.82;
                }
                int colour = u > 0.62 * a ? head : body;
                canvas.paint(i, j, Rgb.pack(Rgb.red(colour) * light, Rgb.green(colour) * light,
                        Rgb.blue(colour) * light));
            }
        }
    }

    private void paintBackground() {
        int w = config.width();
        int h = config.height();
        if (!config.style().texture()) {
            java.util.Arrays.fill(background, RenderStyle.FLAT_BACKGROUND);
            return;
        }
        double cx = config.centreX();
        double cy = config.centreY();
        double radius = config.radius();
        double outer = radius + config.wallThickness();
        double blotch = 38 * config.scale();
        long seed = config.seed();
        for (int j = 0; j < h; j++) {
            for (int i = 0; i < w; i++) {
                double dx = i + 0.5 - cx;
                double dy = j + 0.5 - cy;
                double r = Math.sqrt(dx * dx + dy * dy);
                int grain = (int) Math.round(5 * NoiseHash.signed(seed ^ 0x5EED, i, j));
                double wear = 9 * NoiseHash.valueNoise(seed, i / blotch, j / blotch);
                // The wall casts a soft shadow on the floor next to it.
                double shadow = 14 * Math.max(0, 1 - (radius - r) / (6 * config.scale()));
                double rim = r / radius;
                int floor = Rgb.offset(FLOOR, (int) Math.round(wear - 10 * rim * rim * rim * rim - shadow) + grain);
                int wall = Rgb.offset(WALL, (int) Math.round(-18 * (r - radius) / (outer - radius)) + grain / 2);
                int bench = Rgb.offset(BENCH, grain);
                // One-pixel linear blend across each edge instead of a hard step.
                int colour;
                if (r < radius + 0.5) {
                    colour = Rgb.mix(floor, wall, clamp01(r - radius + 0.5));
                } else {
                    colour = Rgb.mix(wall, bench, clamp01(r - outer + 0.5));
                }
                background[j * w + i] = colour;
            }
        }
    }

    private static double clamp01(double v) {
        return v < 0 ? 0 : Math.min(1, v);
    }
}
