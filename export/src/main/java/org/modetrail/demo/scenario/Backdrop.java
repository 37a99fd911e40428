package org.modetrail.demo.scenario;

import java.util.Arrays;
import java.util.List;
import org.modetrail.demo.NoiseHash;
import org.modetrail.demo.Rgb;

/**
 * The parts of a scenario that do not move, painted once: the floor (with any blotches) under the objects and the
 * posts over them. Colours are packed {@code 0x00RRGGBB}, before lighting and noise.
 */
final class Backdrop {

    /** Which floor lies under the objects. */
    enum Floor {
        /** Grey-beige tiles with grout lines, wear and grain: neutral, so it takes no object's colour. */
        TILED,
        /** Pale, lightly mottled paper-like floor, for a dark object. */
        PALE
    }

    private static final int TILE = Rgb.pack(146, 142, 134);
    private static final int PAPER = Rgb.pack(216, 212, 202);

    private final int width;
    private final int height;
    private final int[] floor;
    private final int[] postColour;
    private final boolean[] postColumn;
    private final int postFirst;
    private final int postLast;

    Backdrop(ScenarioConfig config, Floor kind, List<Blotch> blotches, List<Post> posts) {
        this.width = config.width();
        this.height = config.height();
        this.floor = new int[width * height];
        this.postColour = new int[width * height];
        this.postColumn = new boolean[width];
        if (config.texture()) {
            paintFloor(config, kind);
            for (Blotch b : blotches) {
                paintBlotch(b, config.seed(), config.scale());
            }
        } else {
            Arrays.fill(floor, ScenarioConfig.FLAT_FLOOR);
        }
        int[] span = preparePosts(posts, config.seed());
        this.postFirst = span[0];
        this.postLast = span[1];
    }

    /**
     * A backdrop over a floor painted elsewhere ({@link FamilyFloor}), taken over as it is: blotches are painted
     * into it, then the posts are made ready. With {@code texture} false the floor is {@link
     * ScenarioConfig#FLAT_FLOOR} and there are no blotches, as for the first constructor.
     */
    Backdrop(int width, int height, int[] paintedFloor, boolean texture, List<Blotch> blotches, List<Post> posts,
             long seed) {
        if (paintedFloor.length != width * height) {
            throw new IllegalArgumentException("floor must hold " + width + " x " + height + " pixels");
        }
        this.width = width;
        this.height = height;
        this.floor = paintedFloor;
        this.postColour = new int[width * height];
        this.postColumn = new boolean[width];
        if (texture) {
            for (Blotch b : blotches) {
                paintBlotch(b, seed, 1);
            }
        } else {
            Arrays.fill(floor, ScenarioConfig.FLAT_FLOOR);
        }
        int[] span = preparePosts(posts, seed);
        this.postFirst = span[0];
        this.postLast = span[1];
    }

    /** Paints every post's columns; returns the first and last post column ({width, -1} when none). */
    private int[] preparePosts(List<Post> posts, long seed) {
        int first = width;
        int last = -1;
        for (Post p : posts) {
            for (int i = 0; i < width; i++) {
                if (p.coversColumn(i)) {
                    paintPostColumn(p, i, seed);
                    first = Math.min(first, i);
                    last = Math.max(last, i);
                }
            }
        }
        return new int[] {first, last};
    }

    /** The floor, row-major; callers must not change it. */
    int[] floor() {
        return floor;
    }

    /** True when a post hides pixel column {@code i}: posts span the full height. */
    boolean hides(int i) {
        return postColumn[i];
    }

    /** Paints the posts over whatever {@code rgb} holds. */
    void paintPosts(int[] rgb) {
        for (int j = 0; j < height; j++) {
            int row = j * width;
            for (int i = postFirst; i <= postLast; i++) {
                if (postColumn[i]) {
                    rgb[row + i] = postColour[row + i];
                }
            }
        }
    }

    private void paintFloor(ScenarioConfig config, Floor kind) {
        double s = config.scale();
        long seed = config.seed();
        int tile = Math.max(8, (int) Math.round(96 * s));
        int grout = Math.max(1, (int) Math.round(2 * s));
        for (int j = 0; j < height; j++) {
            for (int i = 0; i < width; i++) {
                double shade;
                int base;
                if (kind == Floor.TILED) {
                    base = TILE;
                    // Per-tile tint, broad wear, fine mottling and grain, darker grout between tiles.
                    shade = 5 * NoiseHash.signed(seed ^ 0x711EL, i / tile, j / tile)
                            + 10 * NoiseHash.valueNoise(seed ^ 0x3EA8L, i / (44 * s), j / (44 * s))
                            + 4 * NoiseHash.valueNoise(seed ^ 0x3EA9L, i / (9 * s), j / (9 * s))
                            + 4 * NoiseHash.signed(seed ^ 0x96A1L, i, j);
                    if (i % tile < grout || j % tile < grout) {
                        shade -= 18;
                    }
                } else {
                    base = PAPER;
                    shade = 6 * NoiseHash.valueNoise(seed ^ 0x3EA8L, i / (40 * s), j / (40 * s))
                            + 3 * NoiseHash.signed(seed ^ 0x96A1L, i, j);
                }
                floor[j * width + i] = Rgb.offset(base, (int) Math.round(shade));
            }
        }
    }

    private void paintBlotch(Blotch b, long seed, double s) {
        double reach = b.reach();
        int i0 = Math.max(0, (int) Math.floor(b.cx() - reach));
        int i1 = Math.min(width - 1, (int) Math.ceil(b.cx() + reach));
        int j0 = Math.max(0, (int) Math.floor(b.cy() - reach));
        int j1 = Math.min(height - 1, (int) Math.ceil(b.cy() + reach));
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                double r = b.radial(i, j);
                if (r > 1 + Blotch.WOBBLE + 0.1) {
                    continue;
                }
                // Soft edge over about 5 % of the radius, as a stain soaks in.
                double cover = Math.max(0, Math.min(1, (b.edge(i, j) - r) / 0.05));
                if (cover == 0) {
                    continue;
                }
                int delta = (int) Math.round(14 * NoiseHash.valueNoise(b.seed(), i / (7 * s), j / (7 * s))
                        + 4 * NoiseHash.signed(seed ^ 0x96A1L, i, j));
                int k = j * width + i;
                floor[k] = Rgb.mix(floor[k], Rgb.offset(b.colour(), delta), cover);
            }
        }
    }

    /** A round pillar lit from the front: bright down the middle, darker at the sides, with faint streaks. */
    private void paintPostColumn(Post p, int i, long seed) {
        postColumn[i] = true;
        double across = (i + 0.5 - p.left()) / (p.right() - p.left()) * 2 - 1;
        double light = 0.72 + 0.33 * Math.sqrt(Math.max(0, 1 - across * across));
        for (int j = 0; j < height; j++) {
            double streak = 4 * NoiseHash.valueNoise(seed ^ 0x9057L, i / 3.0, j / 40.0);
            int c = p.colour();
            postColour[j * width + i] = Rgb.pack(Rgb.red(c) * light + streak, Rgb.green(c) * light + streak,
                    Rgb.blue(c) * light + streak);
        }
    }
}
