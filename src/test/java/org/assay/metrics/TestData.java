package org.assay.metrics;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.data.ClassificationData;
import org.assay.data.ProbabilityTable;
import org.assay.testing.ReferenceData;

/** Builds ClassificationData directly from arrays, for metric tests that bypass the readers. */
final class TestData {
    private TestData() {}

    static ClassificationData fromReference(JsonNode c) {
        int k = c.get("classes").asInt();
        return of(k, ReferenceData.ints(c.get("truth")), ReferenceData.ints(c.get("predicted")),
                ReferenceData.doubles(c.get("scores")), ReferenceData.doubles(c.get("probabilities")));
    }

    static ClassificationData of(int k, int[] truth, int[] predicted, double[] scores, double[] probabilities) {
        List<String> classes = new ArrayList<>();
        for (int i = 0; i < k; i++) classes.add(Integer.toString(i));
        String[] ids = new String[truth.length];
        for (int i = 0; i < ids.length; i++) ids[i] = "x" + i;
        return new ClassificationData(Path.of("test.csv"), List.of(ids), classes, truth, predicted, scores,
                table(probabilities, k), k == 2 ? 1 : -1, List.of());
    }

    /** The data with example i repeated weights[i] times. */
    static ClassificationData repeated(ClassificationData d, int[] weights) {
        int n = 0;
        for (int w : weights) n += w;
        int k = d.classCount();
        int[] truth = new int[n];
        int[] pred = d.predicted() == null ? null : new int[n];
        double[] scores = d.scores() == null ? null : new double[n];
        double[] all = d.probabilities() == null ? null : d.probabilities().toArray();
        double[] probs = all == null ? null : new double[n * k];
        int at = 0;
        for (int i = 0; i < weights.length; i++) {
            for (int r = 0; r < weights[i]; r++, at++) {
                truth[at] = d.truth()[i];
                if (pred != null) pred[at] = d.predicted()[i];
                if (scores != null) scores[at] = d.scores()[i];
                if (probs != null) System.arraycopy(all, i * k, probs, at * k, k);
            }
        }
        String[] ids = new String[n];
        for (int i = 0; i < n; i++) ids[i] = "r" + i;
        return new ClassificationData(d.source(), List.of(ids), d.classes(), truth, pred, scores, table(probs, k), d.positive(),
                List.of());
    }

    /** The data with its examples in the order {@code perm}. */
    static ClassificationData permuted(ClassificationData d, int[] perm) {
        int n = d.size(), k = d.classCount();
        int[] truth = new int[n];
        int[] pred = d.predicted() == null ? null : new int[n];
        double[] scores = d.scores() == null ? null : new double[n];
        double[] all = d.probabilities() == null ? null : d.probabilities().toArray();
        double[] probs = all == null ? null : new double[n * k];
        for (int i = 0; i < n; i++) {
            int j = perm[i];
            truth[i] = d.truth()[j];
            if (pred != null) pred[i] = d.predicted()[j];
            if (scores != null) scores[i] = d.scores()[j];
            if (probs != null) System.arraycopy(all, j * k, probs, i * k, k);
        }
        return new ClassificationData(d.source(), d.ids(), d.classes(), truth, pred, scores, table(probs, k), d.positive(),
                List.of());
    }

    /** The examples in another order or with repeats: example index[j] is placed at j (ids renamed). */
    static ClassificationData select(ClassificationData d, int[] index) {
        int n = index.length, k = d.classCount();
        int[] truth = new int[n];
        int[] pred = d.predicted() == null ? null : new int[n];
        double[] scores = d.scores() == null ? null : new double[n];
        double[] all = d.probabilities() == null ? null : d.probabilities().toArray();
        double[] probs = all == null ? null : new double[n * k];
        String[] ids = new String[n];
        for (int i = 0; i < n; i++) {
            int j = index[i];
            ids[i] = "r" + i;
            truth[i] = d.truth()[j];
            if (pred != null) pred[i] = d.predicted()[j];
            if (scores != null) scores[i] = d.scores()[j];
            if (probs != null) System.arraycopy(all, j * k, probs, i * k, k);
        }
        return new ClassificationData(d.source(), List.of(ids), d.classes(), truth, pred, scores, table(probs, k), d.positive(),
                List.of());
    }

    private static ProbabilityTable table(double[] rowMajor, int k) {
        return rowMajor == null ? null : ProbabilityTable.of(rowMajor, k);
    }
}
