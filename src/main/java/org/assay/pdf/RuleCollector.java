package org.assay.pdf;

import java.awt.geom.Point2D;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.contentstream.PDFGraphicsStreamEngine;
import org.apache.pdfbox.contentstream.operator.Operator;
import org.apache.pdfbox.cos.COSBase;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.graphics.image.PDImage;

/**
 * Captures the ruling lines of a page: filled thin rectangles (how pdfTeX draws {@code \toprule},
 * {@code \hline}, {@code \cmidrule}, {@code \vrule} and underlines) and stroked straight
 * segments, widened by the current line width. Curves, images and shadings are ignored.
 */
final class RuleCollector extends PDFGraphicsStreamEngine {
    private final List<Rule> rules = new ArrayList<>();
    private final List<double[]> pathRectangles = new ArrayList<>();
    private final List<double[]> pathSegments = new ArrayList<>();
    private final double pageTop;
    private final double pageLeft;
    private final PageBudget budget;
    private Point2D.Float current = new Point2D.Float();

    RuleCollector(PDPage page, PageBudget budget) {
        super(page);
        PDRectangle box = page.getCropBox();
        this.pageTop = box.getUpperRightY();
        this.pageLeft = box.getLowerLeftX();
        this.budget = budget;
    }

    List<Rule> collect() throws IOException {
        processPage(getPage());
        return List.copyOf(rules);
    }

    @Override
    protected void processOperator(Operator operator, List<COSBase> operands) throws IOException {
        budget.tick();
        super.processOperator(operator, operands);
    }

    @Override
    public void appendRectangle(Point2D p0, Point2D p1, Point2D p2, Point2D p3) {
        double x0 = Math.min(Math.min(p0.getX(), p1.getX()), Math.min(p2.getX(), p3.getX()));
        double x1 = Math.max(Math.max(p0.getX(), p1.getX()), Math.max(p2.getX(), p3.getX()));
        double y0 = Math.min(Math.min(p0.getY(), p1.getY()), Math.min(p2.getY(), p3.getY()));
        double y1 = Math.max(Math.max(p0.getY(), p1.getY()), Math.max(p2.getY(), p3.getY()));
        pathRectangles.add(new double[] {x0, x1, y0, y1});
        current = new Point2D.Float((float) p0.getX(), (float) p0.getY());
    }

    @Override
    public void moveTo(float x, float y) { current = new Point2D.Float(x, y); }

    @Override
    public void lineTo(float x, float y) {
        pathSegments.add(new double[] {current.x, current.y, x, y});
        current = new Point2D.Float(x, y);
    }

    @Override
    public void curveTo(float x1, float y1, float x2, float y2, float x3, float y3) {
        current = new Point2D.Float(x3, y3); // a curve is never a rule
    }

    @Override
    public Point2D getCurrentPoint() { return current; }

    @Override
    public void closePath() {}

    @Override
    public void endPath() { clearPath(); }

    @Override
    public void strokePath() {
        double w = Math.max(0.1, getGraphicsState().getLineWidth()
                * getGraphicsState().getCurrentTransformationMatrix().getScalingFactorX());
        for (double[] s : pathSegments) {
            boolean flat = Math.abs(s[1] - s[3]) < 0.01;
            boolean upright = Math.abs(s[0] - s[2]) < 0.01;
            if (!flat && !upright) continue;
            double x0 = Math.min(s[0], s[2]), x1 = Math.max(s[0], s[2]);
            double y0 = Math.min(s[1], s[3]), y1 = Math.max(s[1], s[3]);
            if (flat) add(x0, x1, y0 - w / 2, y1 + w / 2);
            else add(x0 - w / 2, x1 + w / 2, y0, y1);
        }
        for (double[] r : pathRectangles) { // a stroked rectangle: its four sides
            add(r[0], r[1], r[2] - w / 2, r[2] + w / 2);
            add(r[0], r[1], r[3] - w / 2, r[3] + w / 2);
            add(r[0] - w / 2, r[0] + w / 2, r[2], r[3]);
            add(r[1] - w / 2, r[1] + w / 2, r[2], r[3]);
        }
        clearPath();
    }

    @Override
    public void fillPath(int windingRule) {
        for (double[] r : pathRectangles) add(r[0], r[1], r[2], r[3]);
        clearPath();
    }

    @Override
    public void fillAndStrokePath(int windingRule) { fillPath(windingRule); }

    @Override
    public void clip(int windingRule) {}

    @Override
    public void drawImage(PDImage pdImage) {}

    @Override
    public void shadingFill(COSName shadingName) {}

    private void clearPath() {
        pathRectangles.clear();
        pathSegments.clear();
    }

    /** Keeps thin boxes only, converted to top-left page coordinates. */
    private void add(double x0, double x1, double yLow, double yHigh) {
        double w = x1 - x0, h = yHigh - yLow;
        if (Math.min(w, h) > Rule.MAX_THICKNESS || Math.max(w, h) < 1.0) return;
        rules.add(new Rule(x0 - pageLeft, x1 - pageLeft, pageTop - yHigh, pageTop - yLow));
    }
}
