package org.assay.metrics.generation;

import org.assay.stats.Resampled;

/**
 * A generation metric bound to one data set.
 *
 * @param statistic     the metric over the item as resampling unit; its estimate is the value
 * @param successes     for count metrics (exact match): items with outcome 1; otherwise -1
 * @param configuration the settings the value depends on, in the one-line form of
 *                      {@link GenerationSettings#line}
 */
public record GenerationMeasure(Resampled statistic, long successes, String configuration) {}
