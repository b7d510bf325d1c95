package org.assay.metrics;

/**
 * A unit table where every unit contributes 1 to exactly one cell: a confusion-matrix cell
 * (true class, predicted class) or a correct/incorrect flag. Stored as one int per unit,
 * so a million examples with ten classes cost 4 MB rather than 800 MB of dense rows.
 */
public final class OneHotUnitTable implements UnitTable {
    private final int[] cell;
    private final int width;

    public OneHotUnitTable(int[] cell, int width) {
        for (int c : cell) {
            if (c < 0 || c >= width) throw new IllegalArgumentException("cell " + c + " outside 0.." + (width - 1));
        }
        this.cell = cell;
        this.width = width;
    }

    @Override public int units() { return cell.length; }
    @Override public int width() { return width; }

    /** The cell unit {@code i} contributes to. */
    public int cellOf(int i) { return cell[i]; }

    @Override
    public void addUnit(int i, double weight, double[] sums) { sums[cell[i]] += weight; }

    @Override
    public double[] weightedSums(int[] weights) {
        double[] sums = new double[width];
        if (weights == null) {
            for (int c : cell) sums[c] += 1;
        } else {
            for (int i = 0; i < cell.length; i++) sums[cell[i]] += weights[i];
        }
        return sums;
    }
}
