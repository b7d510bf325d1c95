package org.assay.data;

/**
 * Per-class probabilities, one row per example and one column per class, kept in pages
 * ({@link DoubleColumn}) rather than one array: ten million rows of five classes are 400 MB,
 * which a growing array would need two or three times over while it is filled, and which a
 * final trimmed copy would need twice.
 */
public final class ProbabilityTable {
    private final int classes;
    private final DoubleColumn values = new DoubleColumn();

    ProbabilityTable(int classes) {
        if (classes < 1) throw new IllegalArgumentException("classes must be positive, got " + classes);
        this.classes = classes;
    }

    /** A table over {@code rowMajor} (rows x classes values, row after row); the array is copied. */
    public static ProbabilityTable of(double[] rowMajor, int classes) {
        if (rowMajor.length % classes != 0) {
            throw new IllegalArgumentException(rowMajor.length + " values do not make rows of " + classes);
        }
        ProbabilityTable table = new ProbabilityTable(classes);
        for (double p : rowMajor) table.values.add(p);
        return table;
    }

    /** Appends the next value, row after row. */
    void add(double p) { values.add(p); }

    public int rows() { return (int) (values.size() / classes); }

    public int classes() { return classes; }

    public double get(int row, int cls) {
        if (cls < 0 || cls >= classes) throw new IndexOutOfBoundsException(cls);
        return values.get((long) row * classes + cls);
    }

    /** Row-major copy of the whole table (for small tables: tests, reports). */
    public double[] toArray() { return values.toArray(); }

    /** Puts column {@code columnOf[c]} at column c in every row, in place. */
    void reorder(int[] columnOf) {
        if (columnOf.length != classes) throw new IllegalArgumentException("need one column per class");
        double[] row = new double[classes];
        for (long start = 0; start < values.size(); start += classes) {
            for (int c = 0; c < classes; c++) row[c] = values.get(start + c);
            for (int c = 0; c < classes; c++) values.set(start + c, row[columnOf[c]]);
        }
    }
}
