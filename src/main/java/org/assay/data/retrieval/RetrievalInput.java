package org.assay.data.retrieval;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.assay.common.UserInputException;

/**
 * Where one retrieval direction's outputs are and how to rank them: a score matrix (NumPy
 * {@code .npy} or CSV) with its query side, or ranked lists (JSON Lines); the relevance as a file
 * or a group-size rule; the tie policy and the sentinel rule.
 *
 * @param label      the direction's name in reports (a column-path prefix such as "Photo→Caption", or "rows")
 * @param scores     the score matrix, or null when {@code ranked} is given
 * @param side       which side of the matrix holds the queries
 * @param ranked     ranked lists, or null when {@code scores} is given
 * @param relevance  the relevance file, or null
 * @param relevanceFromOtherSide whether the relevance file lists the other side's items as its
 *                   queries (one file for both directions), so it is read the other way round
 * @param groupSize  the group-size rule (G candidates per query, or G queries per candidate), or null
 * @param ties       the tie policy
 * @param sentinel   how to recognise unscored candidates
 */
public record RetrievalInput(String label, Path scores, MatrixRanking.Side side, Path ranked, Path relevance,
                             boolean relevanceFromOtherSide, Integer groupSize, TiePolicy ties, SentinelRule sentinel) {

    public RetrievalInput {
        if ((scores == null) == (ranked == null)) {
            throw UserInputException.usage("give either a score matrix or ranked lists for " + label + ", not "
                    + (scores == null ? "neither" : "both"), "use --scores FILE or --ranked FILE");
        }
        if (ranked != null && relevance == null) {
            throw UserInputException.usage("ranked lists need a relevance file naming candidates by id",
                    "add --relevance FILE");
        }
        if (relevance == null && groupSize == null) {
            throw UserInputException.usage("no relevance for " + label, "give --relevance FILE or --group-size G");
        }
        if (relevance != null && groupSize != null) {
            throw UserInputException.usage("both a relevance file and a group size were given for " + label,
                    "give one of them");
        }
        if (groupSize != null && groupSize < 1) {
            throw UserInputException.usage("the group size must be at least 1, not " + groupSize, "for example --group-size 5");
        }
    }

    /** The files this direction reads (for the report's list of inputs). */
    public List<Path> files() {
        List<Path> out = new ArrayList<>();
        if (scores != null) out.add(scores);
        if (ranked != null) out.add(ranked);
        if (relevance != null) out.add(relevance);
        return out;
    }

    /** Reads and ranks the direction. */
    public RetrievalDirection read() {
        if (ranked != null) {
            RetrievalData data = RankedListReader.read(ranked, relevance, ties, label);
            return new RetrievalDirection(ranked, data, List.of());
        }
        ScoreMatrix matrix = open(scores);
        List<String> rowIds = MatrixRanking.ids(null, matrix.rows(), matrix, "row");
        List<String> columnIds = MatrixRanking.ids(matrix.columnIds(), matrix.columns(), matrix, "column");
        boolean rows = side == MatrixRanking.Side.ROWS;
        List<String> queries = rows ? rowIds : columnIds;
        List<String> candidates = rows ? columnIds : rowIds;
        Relevance rel = relevance == null ? byGroupSize(matrix, queries.size(), candidates.size())
                : relevanceFromOtherSide ? RelevanceReader.read(relevance, candidates, queries).transposed()
                : RelevanceReader.read(relevance, queries, candidates);
        RetrievalData data = MatrixRanking.rank(matrix, side, rowIds, columnIds, rel, ties, sentinel, label);
        List<String> warnings = new ArrayList<>();
        if (data.sentinel() != null && sentinel.kind() == SentinelRule.Kind.DETECT) {
            warnings.add(scores + ": the value " + SentinelRule.plain(data.sentinel()) + " repeats at the bottom of the rankings, so it is"
                    + " read as 'not scored': " + label + " is ranked only to depth " + data.depth()
                    + " (give the sentinel explicitly, or 'none' if it is a real score)");
        }
        return new RetrievalDirection(scores, data, warnings);
    }

    /**
     * The group-size rule for Q queries and C candidates: candidate j belongs to query j / G when
     * C = Q·G (images as queries, G captions each); query j belongs to candidate j / G when Q = C·G.
     */
    private Relevance byGroupSize(ScoreMatrix matrix, int queries, int candidates) {
        int g = groupSize;
        if ((long) queries * g == candidates) return Relevance.groupSize(queries, candidates, g);
        if ((long) candidates * g == queries) return Relevance.groupSizeTransposed(queries, candidates, g);
        throw new UserInputException(matrix.file(), null, "the group size " + g + " does not fit " + queries
                + " queries and " + candidates + " candidates (one side must be " + g + " times the other)",
                "check --group-size, or give a relevance file");
    }

    private static ScoreMatrix open(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".npy") ? NpyScoreMatrix.open(file) : CsvScoreMatrix.open(file);
    }

}
