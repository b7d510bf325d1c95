package org.assay.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.assay.audit.AuditFileReader;
import org.assay.audit.RetrievalReproduction;
import org.assay.audit.Reproduction;
import org.assay.common.UserInputException;
import org.assay.data.retrieval.MatrixRanking;
import org.assay.data.retrieval.RetrievalInput;
import org.assay.data.retrieval.SentinelRule;
import org.assay.data.retrieval.TiePolicy;
import picocli.CommandLine.Option;

/** Where retrieval outputs are and how to rank them (the {@code measure --task retrieval} options). */
final class RetrievalOptions {
    @Option(names = "--scores", paramLabel = "FILE",
            description = "Retrieval: query x candidate score matrix (.npy float32/float64, or CSV).")
    Path scores;

    @Option(names = "--ranked", paramLabel = "FILE",
            description = "Retrieval: ranked lists instead of scores, JSON Lines {\"query\": ..., \"ranked\": [...]}.")
    Path ranked;

    @Option(names = "--relevance", paramLabel = "FILE",
            description = "Retrieval: relevant candidates per query (JSON object or CSV pairs), queries on the rows.")
    Path relevance;

    @Option(names = "--column-relevance", paramLabel = "FILE",
            description = "Retrieval: relevance with the columns as queries (default: --relevance read the other way).")
    Path columnRelevance;

    @Option(names = "--group-size", paramLabel = "G",
            description = "Retrieval: relevance by rule: candidate j belongs to query j / G (or query j to candidate j / G).")
    Integer groupSize;

    @Option(names = "--direction", paramLabel = "SIDE", defaultValue = "rows",
            description = "Retrieval: rows (the rows are the queries, default), columns, or both (and rsum).")
    String direction;

    @Option(names = "--ties", paramLabel = "POLICY", defaultValue = "pessimistic",
            description = "Retrieval: where a relevant candidate lands among equal scores: optimistic, pessimistic "
                    + "(default) or average.")
    String ties;

    @Option(names = "--sentinel", paramLabel = "VALUE", defaultValue = "auto",
            description = "Retrieval: the score that fills unscored candidates: auto (a repeated minimum, default), none, or a value such as -100.")
    String sentinel;

    boolean bothDirections() { return direction.strip().equalsIgnoreCase("both"); }

    /** The outputs as one reproduction: one direction, or both and their sum. */
    Reproduction reproduction(String table, String row, Path manifest) {
        TiePolicy policy = TiePolicy.parse(ties);
        SentinelRule rule = AuditFileReader.sentinel(null, "--sentinel", sentinel);
        String side = direction.strip().toLowerCase(Locale.ROOT);
        if (!List.of("rows", "columns", "both").contains(side)) {
            throw UserInputException.usage("unknown --direction '" + direction + "'", "use rows, columns or both");
        }
        if (ranked != null && !side.equals("rows")) {
            throw UserInputException.usage("ranked lists have one direction only", "leave out --direction, or give --scores");
        }
        if (columnRelevance != null && side.equals("rows")) {
            throw UserInputException.usage("--column-relevance is for the columns direction", "add --direction columns or both");
        }
        List<RetrievalInput> inputs = new ArrayList<>();
        if (!side.equals("columns")) {
            inputs.add(new RetrievalInput("rows", scores, MatrixRanking.Side.ROWS, ranked, relevance, false, groupSize,
                    policy, rule));
        }
        if (!side.equals("rows")) {
            Path rel = columnRelevance != null ? columnRelevance : relevance;
            inputs.add(new RetrievalInput("columns", scores, MatrixRanking.Side.COLUMNS, null, rel,
                    columnRelevance == null && relevance != null, groupSize, policy, rule));
        }
        return new RetrievalReproduction(table, row, inputs, inputs.size() == 2, manifest);
    }
}
