package org.assay.metrics;

import java.util.Locale;

/** The kinds of model output assay reads; each metric belongs to one. */
public enum Task {
    CLASSIFICATION(org.assay.data.ClassificationData.class),
    RETRIEVAL(org.assay.data.EvaluationData.class),
    GENERATION(org.assay.data.EvaluationData.class),
    REGRESSION(org.assay.data.regression.RegressionData.class);

    private final Class<? extends org.assay.data.EvaluationData> dataType;

    Task(Class<? extends org.assay.data.EvaluationData> dataType) { this.dataType = dataType; }

    /** The data class this task's metrics read. */
    public Class<? extends org.assay.data.EvaluationData> dataType() { return dataType; }

    public String id() { return name().toLowerCase(Locale.ROOT); }

    public static Task parse(String text) {
        for (Task t : values()) if (t.id().equals(text.strip().toLowerCase(Locale.ROOT))) return t;
        throw org.assay.common.UserInputException.usage("unknown task '" + text + "'",
                "use classification, retrieval, generation or regression");
    }
}
