package org.modetrail.app.bench;

/**
 * The speed targets from the issue, in one place, and how a figure is judged against them. Ratios are judged on
 * the median of paired ratios; one-frame steps on their p90, since a step that is usually instant but sometimes
 * slow still feels slow in the editor.
 */
final class Targets {
    /** VideoSource.read within 10% of the bare grabber: at least 0.90 of its frames per second. */
    static final double MIN_SEQUENTIAL_RATIO = 0.90;
    /** Random access no slower than the bare seek. */
    static final double MAX_RANDOM_ACCESS_RATIO = 1.00;
    /** A step of one frame either way after a random access. */
    static final double MAX_STEP_MS = 20;

    private Targets() {
    }

    static Figure sequentialRatio(Figure ratio) {
        return ratio.withTarget(String.format(java.util.Locale.ROOT, ">= %.2fx", MIN_SEQUENTIAL_RATIO),
                ratio.median() >= MIN_SEQUENTIAL_RATIO);
    }

    static Figure randomAccessRatio(Figure ratio) {
        return ratio.withTarget(String.format(java.util.Locale.ROOT, "<= %.2fx", MAX_RANDOM_ACCESS_RATIO),
                ratio.median() <= MAX_RANDOM_ACCESS_RATIO);
    }

    static Figure step(Figure step) {
        double judged = Double.isNaN(step.p90()) ? step.median() : step.p90();
        return step.withTarget(String.format(java.util.Locale.ROOT, "p90 < %.0f ms", MAX_STEP_MS),
                judged < MAX_STEP_MS);
    }
}
