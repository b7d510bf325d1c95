package org.assay.audit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.ClassificationData;
import org.assay.data.EvaluationData;
import org.assay.data.generation.GenerationData;
import org.assay.data.regression.RegressionData;
import org.assay.data.retrieval.RetrievalBothDirections;
import org.assay.data.retrieval.RetrievalDirection;

/**
 * Two reproductions of the same items, matched by id: for every unit of the first, the position of
 * the same unit in the second. The two must cover exactly the same ids, and where the outputs carry
 * the ground truth (a classification label, a regression target) it must agree: otherwise the
 * pairing would compare different things, and the audit stops with a one-line error.
 *
 * @param bIndexOfA for A's unit i, B's position of the same id
 */
record ReproductionPairing(int[] bIndexOfA) {

    /** Matches {@code b}'s units to {@code a}'s; {@code rowA} and {@code rowB} name them in errors. */
    static ReproductionPairing match(EvaluationData a, String rowA, EvaluationData b, String rowB) {
        List<String> idsA = unitIds(a);
        List<String> idsB = unitIds(b);
        Map<String, Integer> positionInB = new HashMap<>();
        for (int j = 0; j < idsB.size(); j++) positionInB.put(idsB.get(j), j);
        int[] index = new int[idsA.size()];
        for (int i = 0; i < idsA.size(); i++) {
            Integer j = positionInB.get(idsA.get(i));
            if (j == null) throw missing(idsA.get(i), rowA, a, rowB, b);
            index[i] = j;
        }
        if (idsB.size() != idsA.size()) {
            java.util.Set<String> inA = new java.util.HashSet<>(idsA);
            for (String id : idsB) if (!inA.contains(id)) throw missing(id, rowB, b, rowA, a);
        }
        checkSameTruth(a, rowA, b, rowB, index);
        return new ReproductionPairing(index);
    }

    private static UserInputException missing(String id, String rowHaving, EvaluationData having, String rowLacking,
                                              EvaluationData lacking) {
        return new UserInputException(lacking.source(), null, "row '" + rowLacking + "' was not evaluated on the items of row '"
                + rowHaving + "', which a paired comparison needs: id '" + id + "' of " + having.source() + " is missing",
                "evaluate both rows on the same ids (the same subsample manifest), or remove the pair from 'compare:'");
    }

    /** The ids of the resampling units, in order; a retrieval direction's are its query ids. */
    static List<String> unitIds(EvaluationData data) {
        if (data instanceof ClassificationData c) return c.ids();
        if (data instanceof RegressionData r) return r.ids();
        if (data instanceof GenerationData g) return g.ids();
        if (data instanceof RetrievalDirection d) return d.ranks().queryIds();
        if (data instanceof RetrievalBothDirections both) {
            List<String> out = new ArrayList<>();
            for (RetrievalDirection d : List.of(both.first(), both.second())) {
                for (String id : d.ranks().queryIds()) out.add(d.ranks().direction() + ":" + id);
            }
            return out;
        }
        throw new IllegalStateException("no unit ids for " + data.getClass().getSimpleName());
    }

    private static void checkSameTruth(EvaluationData a, String rowA, EvaluationData b, String rowB, int[] index) {
        for (int i = 0; i < index.length; i++) {
            String ta = truth(a, i);
            String tb = truth(b, index[i]);
            if (ta != null && tb != null && !ta.equals(tb)) {
                throw new UserInputException(b.source(), null, "item '" + unitIds(a).get(i) + "' has the true value '" + ta
                        + "' in row '" + rowA + "' (" + a.source() + ") but '" + tb + "' in row '" + rowB + "'",
                        "score both rows against the same ground truth");
            }
        }
    }

    /** The ground truth of unit i as text, or null when the outputs do not carry it. */
    private static String truth(EvaluationData data, int i) {
        if (data instanceof ClassificationData c) return c.classes().get(c.truth()[i]);
        if (data instanceof RegressionData r) return Double.toString(r.target()[i]);
        return null;
    }
}
