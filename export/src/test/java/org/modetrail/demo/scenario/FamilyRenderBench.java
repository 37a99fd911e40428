package org.modetrail.demo.scenario;

import java.util.Locale;

/**
 * Render cost of the scenario family: per kind, milliseconds to make a clip (plan, floor, truth) and per rendered
 * frame, with the single-difficulty translation scenario rendered in the same run as the reference. A test-scope
 * main, {@code mvn -B -q -o -pl export -am test-compile exec:java
 * -Dexec.mainClass=org.modetrail.demo.scenario.FamilyRenderBench -Dexec.classpathScope=test}; figures, no
 * assertions (speed is measured by benchmarks, not timed tests).
 */
public final class FamilyRenderBench {

    private static final long[] SEEDS = {1, 2, 3};
    private static final int FRAMES = 60;

    private FamilyRenderBench() {
    }

    public static void main(String[] args) {
        double reference = 0;
        for (int round = 0; round < 2; round++) {
            // The first round warms the JIT; the second is reported.
            reference = perFrame(TrackingScenarios.create(ScenarioKind.TRANSLATION, 1));
            if (round == 1) {
                System.out.printf(Locale.ROOT, "%-20s %9s %8s %9s %8s%n", "kind", "size", "make ms", "frame ms",
                        "x ref");
                System.out.printf(Locale.ROOT, "%-20s %9s %8s %9.2f %8.2f%n", "translation (ref)", "640x480", "-",
                        reference, 1.0);
            }
            for (FamilyKind kind : FamilyKind.values()) {
                double make = 0;
                double frame = 0;
                String size = "";
                for (long seed : SEEDS) {
                    long t0 = System.nanoTime();
                    TrackingScenario s = ScenarioFamily.create(kind, seed);
                    make += (System.nanoTime() - t0) / 1e6 / SEEDS.length;
                    frame += perFrame(s) / SEEDS.length;
                    size = s.width() + "x" + s.height();
                }
                if (round == 1) {
                    System.out.printf(Locale.ROOT, "%-20s %9s %8.0f %9.2f %8.2f%n", kind.slug(), size, make, frame,
                            frame / reference);
                }
            }
            // The full-HD clips of the fast-large kind, from the first tuning seeds that draw that size.
            double make = 0;
            double frame = 0;
            int found = 0;
            for (long seed = 1; found < SEEDS.length && seed < 100; seed++) {
                long t0 = System.nanoTime();
                TrackingScenario s = ScenarioFamily.create(FamilyKind.FAST_LARGE, seed);
                if (s.width() != 1920) {
                    continue;
                }
                make += (System.nanoTime() - t0) / 1e6 / SEEDS.length;
                frame += perFrame(s) / SEEDS.length;
                found++;
            }
            if (round == 1) {
                System.out.printf(Locale.ROOT, "%-20s %9s %8.0f %9.2f %8.2f%n", "fast-large", "1920x1080", make, frame,
                        frame / reference);
            }
        }
    }

    /** Mean milliseconds per frame over {@value #FRAMES} frames spread over the clip. */
    private static double perFrame(TrackingScenario s) {
        int[] rgb = new int[s.width() * s.height()];
        long t0 = System.nanoTime();
        for (int k = 0; k < FRAMES; k++) {
            s.render((int) ((long) k * (s.frameCount() - 1) / (FRAMES - 1)), rgb);
        }
        return (System.nanoTime() - t0) / 1e6 / FRAMES;
    }
}
