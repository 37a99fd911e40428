package org.modetrail.tracking;

import java.util.List;

import org.modetrail.model.Box;

/**
 * The wide search: mean shift only climbs to the nearest mode, about one window away, so before it the colour
 * likelihood ({@link ColourLikelihood}) is back-projected over a search region, summed with an integral image
 * (Crow, "Summed-area tables for texture mapping", SIGGRAPH 1984; Viola and Jones 2001), and scored at every point
 * of a coarse grid for a box of the target's size. The best few places, kept apart by non-maximum suppression,
 * are the starts for mean shift.
 *
 * <p>The score is the mean likelihood over the central part of the box (70% of each side, where the inscribed
 * ellipse carries most of its kernel weight). Work buffers grow to the largest region seen and are reused.
 */
final class LikelihoodSearch {
    private static final double CORE = 0.7;

    private double[] integral = new double[0];
    private final double[] bestScore;
    private final double[] bestX;
    private final double[] bestY;
    private int found;

    LikelihoodSearch(int maxCandidates) {
        bestScore = new double[maxCandidates];
        bestX = new double[maxCandidates];
        bestY = new double[maxCandidates];
    }

    /**
     * Scores the grid over the whole bin image for boxes of {@code width x height}; the grid step is a quarter of
     * the smaller side (at least 2 px). Candidates whose centre lies inside an excluded box are skipped.
     *
     * @return how many candidates were found; read them with {@link #x}, {@link #y}, {@link #score}
     */
    int search(BinImage image, ColourLikelihood likelihood, double width, double height, List<Box> excluded) {
        int w = image.width();
        int h = image.height();
        found = 0;
        if (w <= 0 || h <= 0) {
            return 0;
        }
        int stride = w + 1;
        int size = stride * (h + 1);
        if (integral.length < size) {
            integral = new double[size];
        }
        int[] bins = image.raw();
        float[] c = likelihood.perBin;
        for (int x = 0; x <= w; x++) {
            integral[x] = 0;
        }
        for (int y = 0; y < h; y++) {
            double rowSum = 0;
            int src = y * w;
            int dst = (y + 1) * stride;
            integral[dst] = 0;
            for (int x = 0; x < w; x++) {
                rowSum += c[bins[src + x]];
                integral[dst + x + 1] = integral[dst - stride + x + 1] + rowSum;
            }
        }
        int coreW = Math.max(1, (int) Math.round(width * CORE));
        int coreH = Math.max(1, (int) Math.round(height * CORE));
        int step = Math.max(2, (int) Math.min(width, height) / 4);
        double suppress = Math.min(width, height) / 2;
        double norm = 1.0 / (coreW * coreH);
        for (int y = 0; y + coreH <= h; y += step) {
            for (int x = 0; x + coreW <= w; x += step) {
                double s = integral[(y + coreH) * stride + x + coreW] - integral[y * stride + x + coreW]
                        - integral[(y + coreH) * stride + x] + integral[y * stride + x];
                double score = s * norm;
                if (score <= 0) {
                    continue;
                }
                double cx = image.x0() + x + coreW / 2.0;
                double cy = image.y0() + y + coreH / 2.0;
                if (insideAny(cx, cy, excluded)) {
                    continue;
                }
                offer(score, cx, cy, suppress);
            }
        }
        return found;
    }

    private static boolean insideAny(double cx, double cy, List<Box> boxes) {
        for (int i = 0; i < boxes.size(); i++) {
            Box b = boxes.get(i);
            if (cx >= b.x() && cx < b.right() && cy >= b.y() && cy < b.bottom()) {
                return true;
            }
        }
        return false;
    }

    /** Keeps the best candidates, at most one within {@code suppress} pixels of another. */
    private void offer(double score, double cx, double cy, double suppress) {
        for (int i = 0; i < found; i++) {
            if (Math.abs(bestX[i] - cx) < suppress && Math.abs(bestY[i] - cy) < suppress) {
                if (score > bestScore[i]) {
                    bestScore[i] = score;
                    bestX[i] = cx;
                    bestY[i] = cy;
                    sortFrom(i);
                }
                return;
            }
        }
        if (found < bestScore.length) {
            bestScore[found] = score;
            bestX[found] = cx;
            bestY[found] = cy;
            found++;
            sortFrom(found - 1);
        } else if (score > bestScore[found - 1]) {
            bestScore[found - 1] = score;
            bestX[found - 1] = cx;
            bestY[found - 1] = cy;
            sortFrom(found - 1);
        }
    }

    private void sortFrom(int i) {
        while (i > 0 && bestScore[i] > bestScore[i - 1]) {
            swap(i, i - 1);
            i--;
        }
    }

    private void swap(int a, int b) {
        double s = bestScore[a];
        bestScore[a] = bestScore[b];
        bestScore[b] = s;
        double x = bestX[a];
        bestX[a] = bestX[b];
        bestX[b] = x;
        double y = bestY[a];
        bestY[a] = bestY[b];
        bestY[b] = y;
    }

    double x(int i) {
        return bestX[i];
    }

    double y(int i) {
        return bestY[i];
    }

    double score(int i) {
        return bestScore[i];
    }
}
