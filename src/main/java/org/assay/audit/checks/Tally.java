package org.assay.audit.checks;

import java.util.Map;
import java.util.TreeMap;

/** Counts the checks each rule ran, so a report can say "12 granularity checks, 1 problem". */
final class Tally {
    private final Map<String, Integer> counts = new TreeMap<>();

    void ran(String rule) { counts.merge(rule, 1, Integer::sum); }

    Map<String, Integer> counts() { return counts; }
}
