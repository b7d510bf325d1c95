package org.assay.metrics.generation;

/**
 * ROUGE's three numbers from an overlap count and the two lengths it is measured against (Lin 2004,
 * "ROUGE: A Package for Automatic Evaluation of Summaries", ACL Workshop Text Summarization
 * Branches Out): recall = overlap / reference length, precision = overlap / hypothesis length, and
 * their F-measure with beta = 1, 2PR / (P + R) (Lin defines F with a general beta; beta = 1 is
 * common practice). Lengths count n-grams for ROUGE-N and tokens for ROUGE-L. A zero length gives 0
 * for its ratio, and F is 0 when P + R = 0 (common practice: an empty text matches nothing).
 */
enum RougeMeasure {
    F("f"), PRECISION("precision"), RECALL("recall");

    private final String id;

    RougeMeasure(String id) { this.id = id; }

    String id() { return id; }

    static RougeMeasure parse(String id) {
        for (RougeMeasure m : values()) if (m.id.equals(id)) return m;
        throw new IllegalArgumentException(id);
    }

    double of(int overlap, int hypothesisLength, int referenceLength) {
        double p = hypothesisLength == 0 ? 0 : (double) overlap / hypothesisLength;
        double r = referenceLength == 0 ? 0 : (double) overlap / referenceLength;
        return switch (this) {
            case PRECISION -> p;
            case RECALL -> r;
            case F -> p + r == 0 ? 0 : 2 * p * r / (p + r);
        };
    }
}
