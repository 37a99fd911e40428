package org.modetrail.demo.scenario;

/** Measurements on rendered frames, computed from pixels alone. */
final class Pixels {

    private Pixels() {
    }

    /** Pixels that differ between two renders of the same frame. */
    static boolean[] differ(int[] a, int[] b) {
        boolean[] d = new boolean[a.length];
        for (int i = 0; i < a.length; i++) {
            d[i] = a[i] != b[i];
        }
        return d;
    }

    static int count(boolean[] mask) {
        int n = 0;
        for (boolean m : mask) {
            if (m) {
                n++;
            }
        }
        return n;
    }

    /** Tight box {minX, minY, maxX + 1, maxY + 1} of the set pixels, or null when none is set. */
    static int[] box(boolean[] mask, int width) {
        int minX = Integer.MAX_VALUE;
        int minY = Integer.MAX_VALUE;
        int maxX = -1;
        int maxY = -1;
        for (int k = 0; k < mask.length; k++) {
            if (mask[k]) {
                int i = k % width;
                int j = k / width;
                minX = Math.min(minX, i);
                maxX = Math.max(maxX, i);
                minY = Math.min(minY, j);
                maxY = Math.max(maxY, j);
            }
        }
        return maxX < 0 ? null : new int[] {minX, minY, maxX + 1, maxY + 1};
    }

    /** Mean {red, green, blue} of the set pixels. */
    static double[] meanColour(int[] rgb, boolean[] mask) {
        double[] sum = new double[3];
        int n = 0;
        for (int k = 0; k < rgb.length; k++) {
            if (mask[k]) {
                sum[0] += (rgb[k] >>> 16) & 0xFF;
                sum[1] += (rgb[k] >>> 8) & 0xFF;
                sum[2] += rgb[k] & 0xFF;
                n++;
            }
        }
        if (n == 0) {
            throw new IllegalArgumentException("no pixels selected");
        }
        return new double[] {sum[0] / n, sum[1] / n, sum[2] / n};
    }

    static double distance(double[] a, double[] b) {
        return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1])
                + (a[2] - b[2]) * (a[2] - b[2]));
    }

    /** Pixels outside {@code box} grown by {@code margin}: the floor around an object. */
    static boolean[] outside(ScenarioBox box, int width, int height, int margin) {
        boolean[] m = new boolean[width * height];
        for (int j = 0; j < height; j++) {
            for (int i = 0; i < width; i++) {
                m[j * width + i] = i < box.x() - margin || i >= box.x() + box.width() + margin
                        || j < box.y() - margin || j >= box.y() + box.height() + margin;
            }
        }
        return m;
    }

    static double median(double[] values) {
        double[] v = values.clone();
        java.util.Arrays.sort(v);
        return v.length % 2 == 1 ? v[v.length / 2] : (v[v.length / 2 - 1] + v[v.length / 2]) / 2;
    }

    /** Distance the truth box centre moves from each frame to the next. */
    static double[] steps(TrackingScenario s, int object) {
        double[] d = new double[s.frameCount() - 1];
        for (int f = 1; f < s.frameCount(); f++) {
            ScenarioBox a = s.truth(object, f - 1);
            ScenarioBox b = s.truth(object, f);
            d[f - 1] = Math.hypot(b.centreX() - a.centreX(), b.centreY() - a.centreY());
        }
        return d;
    }
}
