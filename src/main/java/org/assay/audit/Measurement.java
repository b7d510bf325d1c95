package org.assay.audit;

import java.util.List;
import java.util.Map;
import org.assay.stats.Interval;

/** One metric measured on a predictions file, without any claim. */
public record Measurement(String metric, Map<String, String> params, long n, Long population, double value,
                          Interval interval, double standardError, List<String> notes) {}
