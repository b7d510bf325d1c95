package org.assay.metrics.generation;

import java.util.Map;
import org.assay.data.generation.GenerationData;

/** One text-generation metric: what it is, and how to bind it to data (tokenizing once, up front). */
interface GenerationMetric {
    GenerationMetrics.Info info();

    /**
     * Tokenizes every item once, computes each item's sufficient statistics, and returns a
     * statistic the bootstrap resamples with weights. Bad parameter values are a
     * {@link org.assay.common.UserInputException} naming the parameter.
     */
    GenerationMeasure prepare(Map<String, String> params, GenerationData data);
}
