package org.modetrail.testsupport;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.TreeSet;

/** Frame numbers to test, drawn with a fixed seed so a failure reproduces. */
public final class Sampling {
    private Sampling() {
    }

    /** {@code count} distinct frames of {@code 0..frameCount-1}, always with the first and last, in random order. */
    public static List<Integer> randomFrames(long seed, int frameCount, int count) {
        Random rnd = new Random(seed);
        TreeSet<Integer> set = new TreeSet<>();
        set.add(0);
        set.add(frameCount - 1);
        while (set.size() < Math.min(count, frameCount)) {
            set.add(rnd.nextInt(frameCount));
        }
        List<Integer> order = new ArrayList<>(set);
        Collections.shuffle(order, rnd);
        return order;
    }

    /** The frames and their neighbours n-1 and n+1 that exist. */
    public static TreeSet<Integer> withNeighbours(List<Integer> frames, int frameCount) {
        TreeSet<Integer> all = new TreeSet<>();
        for (int n : frames) {
            for (int m = n - 1; m <= n + 1; m++) {
                if (m >= 0 && m < frameCount) {
                    all.add(m);
                }
            }
        }
        return all;
    }
}
