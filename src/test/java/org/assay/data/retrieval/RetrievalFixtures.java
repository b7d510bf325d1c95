package org.assay.data.retrieval;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.assay.testing.ReferenceData;

/**
 * Shared access to the retrieval fixtures and reference values written by
 * src/test/reference/retrieval_reference.py (NumPy/SciPy/scikit-learn, versions in the JSON's
 * generated_by field).
 */
public final class RetrievalFixtures {
    private RetrievalFixtures() {}

    public static final JsonNode REFERENCE = ReferenceData.load("retrieval.json");

    public static Path fixture(String name) {
        try {
            return Path.of(RetrievalFixtures.class.getResource("/retrieval/" + name).toURI());
        } catch (URISyntaxException | NullPointerException e) {
            throw new IllegalStateException("missing fixture /retrieval/" + name, e);
        }
    }

    public static Relevance relevance(JsonNode lists, int candidates) {
        int[][] rel = new int[lists.size()][];
        for (int q = 0; q < rel.length; q++) rel[q] = ReferenceData.ints(lists.get(q));
        return new Relevance(rel.length, candidates, rel);
    }

    /** Ranks one reference case in one direction, reading its .npy file; relevance from the JSON. */
    public static RetrievalData rank(JsonNode c, String side, TiePolicy ties) {
        ScoreMatrix m = NpyScoreMatrix.open(fixture(c.get("matrix_file").asText()));
        MatrixRanking.Side s = side.equals("rows") ? MatrixRanking.Side.ROWS : MatrixRanking.Side.COLUMNS;
        int candidates = s == MatrixRanking.Side.ROWS ? m.columns() : m.rows();
        Relevance rel = relevance(c.get("directions").get(side).get("relevant"), candidates);
        return MatrixRanking.rank(m, s, null, null, rel, ties, SentinelRule.detect(), side);
    }

    /** Reference ranks with JSON null read as "not ranked within the depth" (+infinity). */
    public static double[] ranks(JsonNode list) {
        double[] out = new double[list.size()];
        for (int i = 0; i < out.length; i++) out[i] = list.get(i).isNull() ? Double.POSITIVE_INFINITY : list.get(i).asDouble();
        return out;
    }

    public static List<JsonNode> cases() {
        List<JsonNode> out = new ArrayList<>();
        REFERENCE.get("cases").forEach(out::add);
        return out;
    }
}
