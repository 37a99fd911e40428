package org.modetrail.evaluation;

import java.util.Arrays;

/**
 * The optimal assignment of rows to columns of a cost matrix (the Hungarian method of Kuhn, 1955, as completed by
 * Munkres, 1957), solved by shortest augmenting paths with dual potentials, O(n^2 m) for n rows and m columns
 * (the form of Jonker and Volgenant, 1987). Rectangular matrices are allowed: every row of the smaller side is
 * assigned. Works on a primitive array; no allocation per step.
 */
public final class Assignment {
    private Assignment() {
    }

    /**
     * The assignment of least total cost.
     *
     * @param cost {@code cost[r][c]}, all rows of one length; finite values
     * @return for each row the column it is given, or -1 when there are more rows than columns and it got none
     */
    public static int[] minimumCost(double[][] cost) {
        int rows = cost.length;
        if (rows == 0) {
            return new int[0];
        }
        int cols = cost[0].length;
        for (double[] row : cost) {
            if (row.length != cols) {
                throw new IllegalArgumentException("cost matrix rows differ in length");
            }
            for (double v : row) {
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("cost matrix holds a value that is not finite: " + v);
                }
            }
        }
        if (cols == 0) {
            int[] none = new int[rows];
            Arrays.fill(none, -1);
            return none;
        }
        boolean transposed = rows > cols;
        double[][] a = transposed ? transpose(cost) : cost;
        int n = a.length;       // n <= m
        int m = a[0].length;
        // 1-based potentials and matching, as the classic formulation: p[j] is the row matched to column j.
        double[] u = new double[n + 1];
        double[] v = new double[m + 1];
        int[] p = new int[m + 1];
        int[] way = new int[m + 1];
        double[] minv = new double[m + 1];
        boolean[] used = new boolean[m + 1];
        for (int i = 1; i <= n; i++) {
            p[0] = i;
            int j0 = 0;
            Arrays.fill(minv, Double.POSITIVE_INFINITY);
            Arrays.fill(used, false);
            do {
                used[j0] = true;
                int i0 = p[j0];
                double delta = Double.POSITIVE_INFINITY;
                int j1 = 0;
                for (int j = 1; j <= m; j++) {
                    if (!used[j]) {
                        double cur = a[i0 - 1][j - 1] - u[i0] - v[j];
                        if (cur < minv[j]) {
                            minv[j] = cur;
                            way[j] = j0;
                        }
                        if (minv[j] < delta) {
                            delta = minv[j];
                            j1 = j;
                        }
                    }
                }
                for (int j = 0; j <= m; j++) {
                    if (used[j]) {
                        u[p[j]] += delta;
                        v[j] -= delta;
                    } else {
                        minv[j] -= delta;
                    }
                }
                j0 = j1;
            } while (p[j0] != 0);
            do {
                int j1 = way[j0];
                p[j0] = p[j1];
                j0 = j1;
            } while (j0 != 0);
        }
        int[] rowToCol = new int[n];
        Arrays.fill(rowToCol, -1);
        for (int j = 1; j <= m; j++) {
            if (p[j] != 0) {
                rowToCol[p[j] - 1] = j - 1;
            }
        }
        if (!transposed) {
            return rowToCol;
        }
        int[] result = new int[rows];
        Arrays.fill(result, -1);
        for (int c = 0; c < n; c++) {
            if (rowToCol[c] >= 0) {
                result[rowToCol[c]] = c;
            }
        }
        return result;
    }

    /** The assignment of greatest total score: {@link #minimumCost} of the negated scores. */
    public static int[] maximumScore(double[][] score) {
        double[][] neg = new double[score.length][];
        for (int r = 0; r < score.length; r++) {
            neg[r] = new double[score[r].length];
            for (int c = 0; c < score[r].length; c++) {
                neg[r][c] = -score[r][c];
            }
        }
        return minimumCost(neg);
    }

    /**
     * The assignment of greatest total score where only positive scores count: rows and columns are split into the
     * groups that positive scores connect, and each group is assigned on its own (a pair of score 0 or less adds
     * nothing, so the total is the same as one assignment over all, at a fraction of the cost on a crowded frame
     * where each box overlaps only its neighbours).
     *
     * @return for each row its column, or -1 where the row got none or only a pair of score 0 or less
     */
    public static int[] maximumPositiveScore(double[][] score) {
        int rows = score.length;
        int cols = rows == 0 ? 0 : score[0].length;
        int[] parent = new int[rows + cols];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                if (score[r][c] > 0) {
                    parent[root(parent, r)] = root(parent, rows + c);
                }
            }
        }
        int[] result = new int[rows];
        Arrays.fill(result, -1);
        java.util.Map<Integer, java.util.List<Integer>> groupRows = new java.util.HashMap<>();
        java.util.Map<Integer, java.util.List<Integer>> groupCols = new java.util.HashMap<>();
        for (int r = 0; r < rows; r++) {
            groupRows.computeIfAbsent(root(parent, r), k -> new java.util.ArrayList<>()).add(r);
        }
        for (int c = 0; c < cols; c++) {
            groupCols.computeIfAbsent(root(parent, rows + c), k -> new java.util.ArrayList<>()).add(c);
        }
        for (java.util.Map.Entry<Integer, java.util.List<Integer>> g : groupRows.entrySet()) {
            java.util.List<Integer> cs = groupCols.get(g.getKey());
            if (cs == null) {
                continue; // a row with no positive score
            }
            java.util.List<Integer> rs = g.getValue();
            double[][] sub = new double[rs.size()][cs.size()];
            for (int i = 0; i < rs.size(); i++) {
                for (int j = 0; j < cs.size(); j++) {
                    sub[i][j] = score[rs.get(i)][cs.get(j)];
                }
            }
            int[] pick = maximumScore(sub);
            for (int i = 0; i < pick.length; i++) {
                if (pick[i] >= 0 && sub[i][pick[i]] > 0) {
                    result[rs.get(i)] = cs.get(pick[i]);
                }
            }
        }
        return result;
    }

    /** The root of {@code i} in a union-find forest, halving paths on the way. */
    static int root(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static double[][] transpose(double[][] a) {
        double[][] t = new double[a[0].length][a.length];
        for (int r = 0; r < a.length; r++) {
            for (int c = 0; c < a[0].length; c++) {
                t[c][r] = a[r][c];
            }
        }
        return t;
    }
}
