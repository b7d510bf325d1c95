package org.assay.pdf;

import java.util.List;

/**
 * Whether a page is set in one column or two, from the glyph coverage across the page's width:
 * a two-column page has an empty gutter near the middle that most text lines do not cross.
 *
 * @param gutter x of the gutter's middle, or NaN on a one-column page
 */
record PageColumns(double width, double gutter) {

    static PageColumns of(PageContent page, List<TextLine> lines) {
        double w = page.width();
        int bins = (int) Math.ceil(w);
        int[] crossing = new int[bins];
        int counted = 0;
        for (TextLine line : lines) {
            if (line.phrases().size() == 1 && line.x1() - line.x0() < 0.2 * w) continue; // page numbers, labels
            counted++;
            for (Phrase p : line.phrases()) {
                for (int x = (int) Math.max(0, p.x0()); x < Math.min(bins, p.x1()); x++) crossing[x]++;
            }
        }
        if (counted < 6) return new PageColumns(w, Double.NaN);
        // Look for the least-crossed 6-point band in the middle fifth of the page.
        int from = (int) (0.4 * w), to = (int) (0.6 * w);
        int best = -1, bestCount = Integer.MAX_VALUE;
        for (int x = from; x + 6 <= to; x++) {
            int c = 0;
            for (int k = x; k < x + 6; k++) c = Math.max(c, crossing[k]);
            if (c < bestCount) { bestCount = c; best = x; }
        }
        boolean twoColumns = best >= 0 && bestCount <= 0.2 * counted && leftAndRightBusy(crossing, best, counted);
        return new PageColumns(w, twoColumns ? best + 3 : Double.NaN);
    }

    private static boolean leftAndRightBusy(int[] crossing, int gutter, int counted) {
        int left = 0, right = 0;
        for (int x = 0; x < gutter; x++) left = Math.max(left, crossing[x]);
        for (int x = gutter + 6; x < crossing.length; x++) right = Math.max(right, crossing[x]);
        return left >= 0.3 * counted && right >= 0.3 * counted;
    }

    boolean twoColumns() { return !Double.isNaN(gutter); }

    /** The x-range of the column holding [x0, x1]: one column, or the whole page when it spans the gutter. */
    double[] columnOf(double x0, double x1) {
        if (!twoColumns()) return new double[] {0, width};
        if (x1 <= gutter) return new double[] {0, gutter};
        if (x0 >= gutter) return new double[] {gutter, width};
        return new double[] {0, width};
    }
}
