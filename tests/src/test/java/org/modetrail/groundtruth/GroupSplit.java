package org.modetrail.groundtruth;

import org.modetrail.model.Box;

/**
 * Splits the region of people side by side into one box each, by columns: the cut between two neighbours is the
 * column with the fewest foreground pixels near where their widths put it (the vertical-projection histogram used
 * to separate people in a merged blob, as in Haritaoglu, Harwood and Davis 2000, "W4: real-time surveillance of
 * people and their activities", IEEE PAMI 22(8), section 5.2). Each person's box is then the extent of the
 * foreground in their columns. When the region is much narrower than the people in it, they stand one behind the
 * other and columns cannot part them: no split.
 */
final class GroupSplit {
    /** Below this ratio of region width to the sum of the expected widths there is no split (common practice, no source). */
    static final double MIN_WIDTH_RATIO = 0.75;
    /** How far from the expected cut the valley may be, as a fraction of the narrower neighbour's width. */
    static final double SEARCH = 0.3;

    private GroupSplit() {
    }

    /**
     * @param widths the expected widths of the people, left to right
     * @return one box per person, left to right, or null when the region cannot be split
     */
    static Box[] split(Blob b, double[] widths) {
        int n = widths.length;
        double sum = 0;
        for (double w : widths) {
            sum += w;
        }
        if (b.width() < MIN_WIDTH_RATIO * sum) {
            return null;
        }
        double scale = b.width() / sum;
        int[] cuts = new int[n + 1];
        cuts[0] = b.x0();
        cuts[n] = b.x1();
        double acc = b.x0();
        for (int i = 0; i < n - 1; i++) {
            acc += widths[i] * scale;
            int expected = (int) Math.round(acc);
            int reach = (int) Math.round(SEARCH * Math.min(widths[i], widths[i + 1]));
            int best = expected;
            long bestCost = Long.MAX_VALUE;
            for (int x = Math.max(cuts[i] + 2, expected - reach); x <= Math.min(b.x1() - 2, expected + reach); x++) {
                // fewest pixels, then nearest to the expected cut
                long cost = (long) b.colCount()[x - b.x0()] * 1000 + Math.abs(x - expected);
                if (cost < bestCost) {
                    bestCost = cost;
                    best = x;
                }
            }
            cuts[i + 1] = best;
        }
        Box[] out = new Box[n];
        for (int i = 0; i < n; i++) {
            out[i] = b.columns(cuts[i], cuts[i + 1]);
            if (out[i] == null) {
                return null;
            }
        }
        return out;
    }
}
