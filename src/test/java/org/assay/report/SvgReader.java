package org.assay.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/**
 * Reads the plots' SVG back as XML (the JDK's parser, so a malformed plot fails the test) and reads
 * positions the way a person reads a plot: against the labelled ticks of the axis.
 */
final class SvgReader {
    private SvgReader() {}

    static Element parse(String svg) {
        try {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            Document d = f.newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
            return d.getDocumentElement();
        } catch (Exception e) {
            throw new AssertionError("the SVG does not parse as XML: " + e.getMessage() + "\n" + svg, e);
        }
    }

    /** Descendants of {@code root} (and root itself) whose class list holds {@code cls}, in document order. */
    static List<Element> byClass(Element root, String cls) {
        List<Element> out = new ArrayList<>();
        if (Arrays.asList(root.getAttribute("class").split(" ")).contains(cls)) out.add(root);
        NodeList all = root.getElementsByTagName("*");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (Arrays.asList(e.getAttribute("class").split(" ")).contains(cls)) out.add(e);
        }
        return out;
    }

    static List<Element> byTag(Element root, String tag) {
        List<Element> out = new ArrayList<>();
        NodeList all = root.getElementsByTagName(tag);
        for (int i = 0; i < all.getLength(); i++) out.add((Element) all.item(i));
        return out;
    }

    static Element one(Element root, String cls) {
        List<Element> found = byClass(root, cls);
        assertThat(found).as("elements of class " + cls).hasSize(1);
        return found.get(0);
    }

    static double num(Element e, String attribute) {
        String v = e.getAttribute(attribute);
        assertThat(v).as(attribute + " of <" + e.getTagName() + " class=" + e.getAttribute("class") + ">").isNotEmpty();
        return Double.parseDouble(v);
    }

    /** The x of a "translate(x y)" transform. */
    static double translateX(Element e) {
        String t = e.getAttribute("transform");
        assertThat(t).startsWith("translate(");
        return Double.parseDouble(t.substring("translate(".length(), t.indexOf(' ')));
    }

    /**
     * The value-to-x map a reader takes from the tick labels under {@code root}: the line through the
     * first and last labelled tick, after checking that every other tick lies on it.
     */
    static Scale ticks(Element root) {
        List<Element> labels = byClass(root, "tick-label");
        assertThat(labels).as("tick labels").hasSizeGreaterThanOrEqualTo(2);
        double v0 = Double.parseDouble(labels.get(0).getTextContent());
        double x0 = num(labels.get(0), "x");
        double v1 = Double.parseDouble(labels.get(labels.size() - 1).getTextContent());
        double x1 = num(labels.get(labels.size() - 1), "x");
        Scale s = new Scale(v0, x0, (x1 - x0) / (v1 - v0));
        for (Element l : labels) {
            assertThat(num(l, "x")).as("tick " + l.getTextContent())
                    .isCloseTo(s.x(Double.parseDouble(l.getTextContent())), within(0.02));
        }
        return s;
    }

    /** x = x0 + (v - v0) * pixelsPerUnit. */
    record Scale(double v0, double x0, double pixelsPerUnit) {
        double x(double value) { return x0 + (value - v0) * pixelsPerUnit; }
    }
}
