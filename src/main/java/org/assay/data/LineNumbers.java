package org.assay.data;

/**
 * The file line of each row, stored as runs: a new run starts only where a row does not follow
 * the previous one on the next line (after a blank line, a quoted field spanning lines, a
 * comment). A plain file of any length is one run, so lines cost nothing per row; the worst case
 * is 8 bytes a row.
 */
final class LineNumbers {
    private final IntColumn runRow = new IntColumn();    // first row of each run
    private final IntColumn runLine = new IntColumn();   // its line
    private int rows;
    private int lastLine;

    /** Records the line of the next row. */
    void add(int line) {
        if (rows == 0 || line != lastLine + 1) {
            runRow.add(rows);
            runLine.add(line);
        }
        lastLine = line;
        rows++;
    }

    int line(int row) {
        if (row < 0 || row >= rows) throw new IndexOutOfBoundsException(row);
        int lo = 0;
        int hi = runRow.size() - 1;
        while (lo < hi) {   // the last run starting at or before row
            int mid = (lo + hi + 1) >>> 1;
            if (runRow.get(mid) <= row) lo = mid; else hi = mid - 1;
        }
        return runLine.get(lo) + (row - runRow.get(lo));
    }

    int size() { return rows; }
}
