package org.modetrail.run;

import java.util.Arrays;

import org.modetrail.model.Box;

/**
 * What one tracking pass found on the frames strictly between two keyframes, {@code first..last}: per frame a box,
 * its similarity and, where the tracker states one, its own uncertainty, where the tracker was sure of it (status
 * tracked); nothing where it coasted or had lost the object. Filled in frame by frame by a pass, then read by
 * {@link SpanFill}.
 */
public final class PassResult {
    private final int first;
    private final Box[] boxes;
    private final double[] scores;
    private final double[] uncertainties;
    /** Frames the tracker had lost the object on (or saw it leave the frame) and was looking for it. */
    private final boolean[] searching;

    /** An empty result for frames {@code first..last} inclusive (empty when last < first). */
    public PassResult(int first, int last) {
        this.first = first;
        int n = Math.max(0, last - first + 1);
        boxes = new Box[n];
        scores = new double[n];
        uncertainties = new double[n];
        searching = new boolean[n];
        Arrays.fill(uncertainties, Double.NaN);
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

    /** Records a box the tracker was sure of, without an uncertainty of its own. */
    public void put(int frame, Box box, double score) {
        put(frame, box, score, Double.NaN);
    }

    /**
     * Records a box the tracker was sure of with the tracker's own one-sigma uncertainty of its edges, pixels per
     * axis (NaN where the tracker states none); {@link SpanFill} combines it with what it works out itself.
     */
    public void put(int frame, Box box, double score, double uncertaintyPx) {
        if (!Double.isNaN(uncertaintyPx) && !(uncertaintyPx >= 0 && uncertaintyPx < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("frame " + frame + ": the uncertainty must be 0 or more pixels (NaN"
                    + " where not known), got " + uncertaintyPx);
        }
        boxes[frame - first] = box;
        scores[frame - first] = score;
        uncertainties[frame - first] = uncertaintyPx;
    }

    /** The box on {@code frame}, or null where the pass had none. */
    public Box box(int frame) {
        return covers(frame) ? boxes[frame - first] : null;
    }

    public double score(int frame) {
        return covers(frame) ? scores[frame - first] : 0;
    }

    /** Records that the tracker had lost the object on {@code frame} and was searching for it. */
    public void markSearching(int frame) {
        searching[frame - first] = true;
    }

    /** Whether the tracker was searching for a lost object on {@code frame}. */
    public boolean searching(int frame) {
        return covers(frame) && searching[frame - first];
    }

    /** The tracker's own uncertainty on {@code frame}, NaN where it stated none or the pass had no box. */
    public double uncertaintyPx(int frame) {
        return covers(frame) ? uncertainties[frame - first] : Double.NaN;
    }
}
