package org.modetrail.run;

import org.modetrail.model.Box;

/**
 * What one tracking pass found on the frames strictly between two keyframes, {@code first..last}: per frame a box
 * and its similarity where the tracker was sure of it (status tracked), nothing where it coasted or had lost the
 * object. Filled in frame by frame by a pass, then read by {@link SpanFill}.
 */
public final class PassResult {
    private final int first;
    private final Box[] boxes;
    private final double[] scores;

    /** An empty result for frames {@code first..last} inclusive (empty when last < first). */
    public PassResult(int first, int last) {
        this.first = first;
        int n = Math.max(0, last - first + 1);
        boxes = new Box[n];
        scores = new double[n];
    }

    public int first() {
        return first;
    }

    public int last() {
        return first + boxes.length - 1;
    }

    public boolean covers(int frame) {
        return frame >= first && frame < first + boxes.length;
    }

    /** Records a box the tracker was sure of. */
    public void put(int frame, Box box, double score) {
        boxes[frame - first] = box;
        scores[frame - first] = score;
    }

    /** The box on {@code frame}, or null where the pass had none. */
    public Box box(int frame) {
        return covers(frame) ? boxes[frame - first] : null;
    }

    public double score(int frame) {
        return covers(frame) ? scores[frame - first] : 0;
    }
}
