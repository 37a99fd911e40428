package org.modetrail.evaluation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The assignment against its definition: the least total cost over all one-to-one pairings, found by enumerating
 * every pairing (feasible for small matrices).
 */
class AssignmentTest {
    @Test
    void aSmallSquareMatrixWorkedByHand() {
        // Rows 0, 1, 2 take columns 1, 0, 2: 1 + 2 + 2 = 5; every other pairing costs more (checked by hand).
        double[][] cost = {{4, 1, 3}, {2, 0, 5}, {3, 2, 2}};
        assertArrayEquals(new int[] {1, 0, 2}, Assignment.minimumCost(cost));
    }

    @Test
    void randomMatricesSquareAndRectangularMatchEnumeration() {
        Random r = new Random(5);
        for (int trial = 0; trial < 200; trial++) {
            int rows = 1 + r.nextInt(6);
            int cols = 1 + r.nextInt(6);
            double[][] c = new double[rows][cols];
            for (double[] row : c) {
                for (int j = 0; j < cols; j++) {
                    row[j] = r.nextInt(20) - 5 + r.nextDouble();
                }
            }
            int[] pick = Assignment.minimumCost(c);
            assertEquals(rows, pick.length);
            boolean[] taken = new boolean[cols];
            double total = 0;
            int assigned = 0;
            for (int i = 0; i < rows; i++) {
                if (pick[i] >= 0) {
                    assertEquals(false, taken[pick[i]], "column given twice");
                    taken[pick[i]] = true;
                    total += c[i][pick[i]];
                    assigned++;
                }
            }
            assertEquals(Math.min(rows, cols), assigned, "the smaller side is assigned whole");
            assertEquals(best(c, 0, new boolean[cols], Math.min(rows, cols)), total, 1e-9, "trial " + trial);
        }
    }

    /** Least cost of assigning min(rows, cols) pairs, rows from {@code row} on, by enumeration. */
    private static double best(double[][] c, int row, boolean[] used, int toAssign) {
        if (toAssign == 0) {
            return 0;
        }
        if (c.length - row < toAssign) {
            return Double.POSITIVE_INFINITY;
        }
        double b = best(c, row + 1, used, toAssign); // this row left out (more rows than columns)
        for (int j = 0; j < used.length; j++) {
            if (!used[j]) {
                used[j] = true;
                b = Math.min(b, c[row][j] + best(c, row + 1, used, toAssign - 1));
                used[j] = false;
            }
        }
        return b;
    }

    @Test
    void positiveScoresByGroupsGiveTheSameTotalAsOneAssignment() {
        Random r = new Random(9);
        for (int trial = 0; trial < 200; trial++) {
            int rows = 1 + r.nextInt(7);
            int cols = 1 + r.nextInt(7);
            double[][] s = new double[rows][cols];
            for (double[] row : s) {
                for (int j = 0; j < cols; j++) {
                    row[j] = r.nextInt(3) == 0 ? r.nextDouble() : 0; // sparse, as boxes overlap few others
                }
            }
            double whole = 0;
            int[] all = Assignment.maximumScore(s);
            for (int i = 0; i < rows; i++) {
                if (all[i] >= 0 && s[i][all[i]] > 0) {
                    whole += s[i][all[i]];
                }
            }
            double grouped = 0;
            boolean[] taken = new boolean[cols];
            int[] pick = Assignment.maximumPositiveScore(s);
            for (int i = 0; i < rows; i++) {
                if (pick[i] >= 0) {
                    assertEquals(false, taken[pick[i]], "column given twice");
                    taken[pick[i]] = true;
                    assertEquals(true, s[i][pick[i]] > 0, "only positive pairs");
                    grouped += s[i][pick[i]];
                }
            }
            assertEquals(whole, grouped, 1e-9, "trial " + trial);
        }
    }

    @Test
    void emptySidesAssignNothing() {
        assertArrayEquals(new int[0], Assignment.minimumCost(new double[0][0]));
        assertArrayEquals(new int[] {-1, -1}, Assignment.minimumCost(new double[2][0]));
    }

    @Test
    void maximumScoreTakesTheLargestTotal() {
        assertArrayEquals(new int[] {0, 2, 1}, Assignment.maximumScore(new double[][] {{4, 1, 3}, {2, 0, 5}, {3, 2, 2}}));
    }
}
