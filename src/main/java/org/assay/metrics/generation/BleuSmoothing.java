package org.assay.metrics.generation;

import java.util.Arrays;
import java.util.List;

/**
 * How BLEU treats n-gram orders with few or no matches (Chen and Cherry 2014, "A Systematic
 * Comparison of Smoothing Techniques for Sentence-Level BLEU", WMT). The value of
 * {@code smoothing=}.
 */
enum BleuSmoothing {
    /** None: a zero match count at some order makes BLEU 0 (Papineni et al. 2002). */
    NONE("none"),
    /** Chen and Cherry's method 1: an order with 0 matches gets epsilon = 0.1 matches. */
    FLOOR("floor"),
    /**
     * Chen and Cherry's method 2 (Lin and Och 2004, "ORANGE", COLING): 1 added to the matches and
     * to the n-gram count of every order n &gt; 1.
     */
    ADD_ONE("add_one"),
    /**
     * Chen and Cherry's method 3, the geometric sequence of NIST's mteval script: the k-th order
     * with 0 matches gets precision 1 / (2^k * n-gram count), k = 1, 2, ...
     */
    EXP("exp");

    static final double FLOOR_EPSILON = 0.1;

    private final String id;

    BleuSmoothing(String id) { this.id = id; }

    String id() { return id; }

    static List<String> ids() { return Arrays.stream(values()).map(BleuSmoothing::id).toList(); }

    static BleuSmoothing of(String id) {
        for (BleuSmoothing s : values()) if (s.id.equals(id)) return s;
        throw new IllegalArgumentException(id);
    }
}
