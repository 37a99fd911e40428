package org.modetrail.demo;

/**
 * Stateless, seedable pseudo-random values addressed by coordinates (seed, frame, pixel...). Unlike a sequential
 * generator, any pixel of any frame can be produced on its own, in any order, always with the same result, which is
 * what makes rendering deterministic without storing noise images.
 */
public final class NoiseHash {

    private NoiseHash() {
    }

    /**
     * The SplitMix64 finaliser (Steele, Lea and Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014;
     * the same mixer as {@code java.util.SplittableRandom}): every input bit affects every output bit.
     */
    public static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** A well-mixed value for the triple (seed, a, b). */
    public static long hash(long seed, long a, long b) {
        return mix(mix(seed + 0x9E3779B97F4A7C15L * a) + 0xD1B54A32D192ED03L * b);
    }

    /** Uniform in [0, 1) from the 53 high bits of a hash. */
    public static double unit(long h) {
        return (h >>> 11) * 0x1.0p-53;
    }

    /** Uniform in [-1, 1) for the triple (seed, a, b). */
    public static double signed(long seed, long a, long b) {
        return 2 * unit(hash(seed, a, b)) - 1;
    }

    /**
     * Value noise in [-1, 1): random values on the integer lattice, blended with a smoothstep so that the field is
     * continuous. Used for blotches and wear patterns a few cells across.
     */
    public static double valueNoise(long seed, double x, double y) {
        double fx = Math.floor(x);
        double fy = Math.floor(y);
        long ix = (long) fx;
        long iy = (long) fy;
        double tx = smooth(x - fx);
        double ty = smooth(y - fy);
        double v00 = signed(seed, ix, iy);
        double v10 = signed(seed, ix + 1, iy);
        double v01 = signed(seed, ix, iy + 1);
        double v11 = signed(seed, ix + 1, iy + 1);
        double top = v00 + (v10 - v00) * tx;
        double bottom = v01 + (v11 - v01) * tx;
        return top + (bottom - top) * ty;
    }

    private static double smooth(double t) {
        return t * t * (3 - 2 * t);
    }
}
