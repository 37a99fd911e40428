package org.modetrail.groundtruth;

import org.modetrail.model.Box;

/**
 * One connected foreground region on one frame, with what is needed to split it by columns later: per column of its
 * box (from {@code x0}), the count of foreground pixels and the highest and lowest foreground row.
 *
 * @param frame  0-based frame
 * @param x0     left column (inclusive)
 * @param y0     top row (inclusive)
 * @param x1     right column (exclusive)
 * @param y1     bottom row (exclusive)
 * @param area   foreground pixels
 * @param colCount foreground pixels per column, {@code x1 - x0} entries
 * @param colTop   top foreground row per column ({@code Integer.MAX_VALUE} when the column is empty)
 * @param colBottom bottom foreground row per column, exclusive ({@code -1} when empty)
 */
record Blob(int frame, int x0, int y0, int x1, int y1, int area, int[] colCount, int[] colTop, int[] colBottom) {

    Box box() {
        return new Box(x0, y0, x1 - x0, y1 - y0);
    }

    int width() {
        return x1 - x0;
    }

    int height() {
        return y1 - y0;
    }

    /** The box of the columns {@code from..to-1} (image columns), or null when they hold no foreground. */
    Box columns(int from, int to) {
        int a = Math.max(from, x0);
        int b = Math.min(to, x1);
        int top = Integer.MAX_VALUE;
        int bottom = -1;
        int left = -1;
        int right = -1;
        for (int x = a; x < b; x++) {
            int c = x - x0;
            if (colCount[c] == 0) {
                continue;
            }
            if (left < 0) {
                left = x;
            }
            right = x + 1;
            top = Math.min(top, colTop[c]);
            bottom = Math.max(bottom, colBottom[c]);
        }
        return left < 0 ? null : new Box(left, top, right - left, bottom - top);
    }

    /** The union of two blobs of the same frame (fragments of one person). */
    Blob union(Blob o) {
        int nx0 = Math.min(x0, o.x0);
        int nx1 = Math.max(x1, o.x1);
        int[] cnt = new int[nx1 - nx0];
        int[] top = new int[nx1 - nx0];
        int[] bot = new int[nx1 - nx0];
        java.util.Arrays.fill(top, Integer.MAX_VALUE);
        java.util.Arrays.fill(bot, -1);
        for (Blob s : new Blob[] {this, o}) {
            for (int c = 0; c < s.colCount.length; c++) {
                int k = c + s.x0 - nx0;
                cnt[k] += s.colCount[c];
                top[k] = Math.min(top[k], s.colTop[c]);
                bot[k] = Math.max(bot[k], s.colBottom[c]);
            }
        }
        return new Blob(frame, nx0, Math.min(y0, o.y0), nx1, Math.max(y1, o.y1), area + o.area, cnt, top, bot);
    }

    @Override
    public String toString() {
        return "Blob[f" + frame + " " + x0 + "," + y0 + " " + width() + "x" + height() + " area " + area + "]";
    }
}
