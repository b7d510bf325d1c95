package org.assay.data.retrieval;

import java.util.ArrayList;
import java.util.List;
import org.assay.common.UserInputException;

/**
 * Turns a score matrix and relevance into {@link RetrievalData}, for either direction:
 * rows as queries (columns are the candidates) or the transpose (columns as queries).
 *
 * <p>Only the relevant candidates' ranks are needed, so for each (query, relevant candidate)
 * the ranking counts the candidates scored strictly higher and those scored equal; the matrix is
 * streamed (once for rows as queries, twice for columns as queries: first to pick up the relevant
 * scores, then to count) and never held whole. Memory is one row plus O(relevant pairs).
 */
public final class MatrixRanking {
    public enum Side { ROWS, COLUMNS }

    private MatrixRanking() {}

    /**
     * @param matrix    the scores
     * @param side      which side of the matrix holds the queries
     * @param rowIds    ids of the matrix rows, or null for "0", "1", ...
     * @param columnIds ids of the matrix columns, or null for the file's header or "0", "1", ...
     * @param relevance relevance with queries on {@code side} (see {@link #queryIds}/{@link #candidateIds})
     */
    public static RetrievalData rank(ScoreMatrix matrix, Side side, List<String> rowIds, List<String> columnIds,
                                     Relevance relevance, TiePolicy ties, SentinelRule sentinel, String direction) {
        List<String> rows = ids(rowIds, matrix.rows(), matrix, "row");
        List<String> cols = ids(columnIds != null ? columnIds : matrix.columnIds(), matrix.columns(), matrix, "column");
        List<String> queries = side == Side.ROWS ? rows : cols;
        int candidates = side == Side.ROWS ? cols.size() : rows.size();
        if (relevance.queries() != queries.size() || relevance.candidates() != candidates) {
            throw new IllegalArgumentException("relevance is " + relevance.queries() + " x " + relevance.candidates()
                    + ", the " + side + " direction needs " + queries.size() + " x " + candidates);
        }
        for (int q = 0; q < queries.size(); q++) {
            if (relevance.relevant()[q].length == 0) {
                throw new UserInputException(matrix.file(), "query '" + queries.get(q) + "'",
                        "has no relevant candidate, so its rank metrics are undefined",
                        "add its relevant candidates to the relevance, or drop the query from the scores");
            }
        }
        Counts counts = new Counts(relevance.relevant(), queries.size());
        if (side == Side.ROWS) {
            matrix.scan((r, s) -> {
                counts.target(r, s);
                counts.observeRow(r, s);
            });
        } else {
            int[][] asRelevantTo = relevance.transposed().relevant();   // row -> columns it is relevant to
            int[][] slot = slots(relevance.relevant(), asRelevantTo);
            matrix.scan((r, s) -> {
                for (int k = 0; k < asRelevantTo[r].length; k++) counts.targets[asRelevantTo[r][k]][slot[r][k]] = s[asRelevantTo[r][k]];
                counts.noteGlobal(s);
            });
            matrix.scan((r, s) -> {
                for (int c = 0; c < s.length; c++) counts.observe(c, s[c]);
            });
        }
        return counts.finish(matrix, queries, candidates, ties, sentinel, direction);
    }

    /** Row and column ids as used for the direction: the given ones, or "0", "1", ... */
    public static List<String> ids(List<String> given, int n, ScoreMatrix matrix, String what) {
        if (given == null) {
            List<String> out = new ArrayList<>(n);
            for (int i = 0; i < n; i++) out.add(Integer.toString(i));
            return out;
        }
        if (given.size() != n) {
            throw new UserInputException(matrix.file(), null, given.size() + " " + what + " ids were given, but the"
                    + " matrix has " + n + " " + what + "s", "give one id per " + what);
        }
        if (new java.util.HashSet<>(given).size() != n) {
            throw new UserInputException(matrix.file(), null, "the " + what + " ids repeat an id",
                    "give every " + what + " a distinct id");
        }
        return given;
    }

    /** For row r and its k-th column, the position of r in that column's relevant list. */
    private static int[][] slots(int[][] relevantOfColumn, int[][] columnsOfRow) {
        int[][] slot = new int[columnsOfRow.length][];
        for (int r = 0; r < columnsOfRow.length; r++) {
            slot[r] = new int[columnsOfRow[r].length];
            for (int k = 0; k < columnsOfRow[r].length; k++) {
                slot[r][k] = java.util.Arrays.binarySearch(relevantOfColumn[columnsOfRow[r][k]], r);
            }
        }
        return slot;
    }

    /** Per query: its relevant candidates' scores, how many candidates beat or equal each, its minimum. */
    private static final class Counts {
        final int[][] relevant;
        final double[][] targets;
        final long[][] higher;
        final long[][] equal;
        final double[] min;
        final long[] minCount;
        double globalMin = Double.POSITIVE_INFINITY;

        Counts(int[][] relevant, int queries) {
            this.relevant = relevant;
            targets = new double[queries][];
            higher = new long[queries][];
            equal = new long[queries][];
            for (int q = 0; q < queries; q++) {
                targets[q] = new double[relevant[q].length];
                higher[q] = new long[relevant[q].length];
                equal[q] = new long[relevant[q].length];
            }
            min = new double[queries];
            java.util.Arrays.fill(min, Double.POSITIVE_INFINITY);
            minCount = new long[queries];
        }

        void target(int q, double[] row) {
            for (int i = 0; i < relevant[q].length; i++) targets[q][i] = row[relevant[q][i]];
        }

        void noteGlobal(double[] row) {
            for (double v : row) if (v < globalMin) globalMin = v;
        }

        /**
         * {@link #observe} for every score of query q's row, and the row's minimum into the global one,
         * with the query's state in locals. A score below every relevant score (most of a row, for a
         * useful model) costs one comparison before the minimum's.
         */
        void observeRow(int q, double[] row) {
            double[] t = targets[q];
            long[] above = higher[q];
            long[] same = equal[q];
            double lowest = Double.POSITIVE_INFINITY;
            for (double x : t) if (x < lowest) lowest = x;
            double m = min[q];
            long mCount = minCount[q];
            for (double v : row) {
                if (v >= lowest) {
                    for (int i = 0; i < t.length; i++) {
                        if (v > t[i]) above[i]++;
                        else if (v == t[i]) same[i]++;
                    }
                }
                if (v < m) {
                    m = v;
                    mCount = 1;
                } else if (v == m) {
                    mCount++;
                }
            }
            min[q] = m;
            minCount[q] = mCount;
            if (m < globalMin) globalMin = m;
        }

        void observe(int q, double v) {
            double[] t = targets[q];
            for (int i = 0; i < t.length; i++) {
                if (v > t[i]) higher[q][i]++;
                else if (v == t[i]) equal[q][i]++;
            }
            if (v < min[q]) {
                min[q] = v;
                minCount[q] = 1;
            } else if (v == min[q]) {
                minCount[q]++;
            }
        }

        RetrievalData finish(ScoreMatrix matrix, List<String> queries, int candidates, TiePolicy ties,
                             SentinelRule rule, String direction) {
            Double sentinel = switch (rule.kind()) {
                case NONE -> null;
                case VALUE -> rule.given();
                case DETECT -> {
                    boolean repeated = false;
                    for (int q = 0; q < min.length; q++) repeated |= min[q] == globalMin && minCount[q] >= 2;
                    yield repeated ? globalMin : null;
                }
            };
            int n = queries.size();
            double[][] ranks = new double[n][];
            int[] scored = new int[n];
            int depth = Integer.MAX_VALUE;
            for (int q = 0; q < n; q++) {
                long tail = 0;
                if (sentinel != null) {
                    if (min[q] < sentinel) {
                        throw new UserInputException(matrix.file(), "query '" + queries.get(q) + "'",
                                "has a score " + min[q] + " below the sentinel value " + sentinel,
                                "give the value that fills unscored candidates, or no sentinel");
                    }
                    if (min[q] == sentinel && minCount[q] >= 2) tail = minCount[q];
                }
                scored[q] = (int) (candidates - tail);
                depth = Math.min(depth, scored[q]);
                ranks[q] = ranks(q, ties, tail > 0 ? sentinel : null);
            }
            return new RetrievalData(direction, queries, candidates, depth, ties, ranks, scored, sentinel);
        }

        private double[] ranks(int q, TiePolicy ties, Double tailValue) {
            double[] t = targets[q];
            double[] out = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                if (tailValue != null && t[i] == tailValue) {
                    out[i] = Double.POSITIVE_INFINITY;
                    continue;
                }
                // relevant candidates sharing this score, and this one's place among them (by index)
                int inGroup = 0;
                int index = 0;
                for (int j = 0; j < t.length; j++) {
                    if (t[j] == t[i]) {
                        if (j < i) index++;
                        inGroup++;
                    }
                }
                out[i] = ties.rank(higher[q][i], equal[q][i], inGroup, index);
            }
            java.util.Arrays.sort(out);
            return out;
        }
    }
}
