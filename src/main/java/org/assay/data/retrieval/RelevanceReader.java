package org.assay.data.retrieval;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.TextFiles;

/**
 * Reads relevance judgements for a list of query ids and candidate ids.
 *
 * <ul>
 *   <li>JSON: an object from query id to a list of relevant candidates, each named by its id
 *       (a string) or by its 0-based index (an integer): {@code {"q1": ["c3", "c7"]}}.</li>
 *   <li>CSV: one {@code query,candidate} pair per line, ids as text; an optional first line
 *       {@code query,candidate} is a header.</li>
 * </ul>
 * Matrices without ids use the decimal indices "0", "1", ... as ids, so indices work in both
 * forms. Every query must have at least one relevant candidate (a query without one has no
 * defined rank metrics); a query, candidate or pair the lists do not know, or a pair given
 * twice, is an error naming the line or key.
 */
public final class RelevanceReader {
    private RelevanceReader() {}

    /** Reads JSON or CSV, chosen by the file name ({@code .json} or anything else as CSV). */
    public static Relevance read(Path file, List<String> queryIds, List<String> candidateIds) {
        String name = file.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        return name.endsWith(".json") ? json(file, queryIds, candidateIds) : csv(file, queryIds, candidateIds);
    }

    public static Relevance json(Path file, List<String> queryIds, List<String> candidateIds) {
        return json(new Ids(file, queryIds, candidateIds, false));
    }

    public static Relevance csv(Path file, List<String> queryIds, List<String> candidateIds) {
        return csv(new Ids(file, queryIds, candidateIds, false));
    }

    /**
     * Reads relevance where the candidates are not known in advance (ranked lists): a candidate
     * id not in {@code candidateIds} is appended to it (the list must be mutable). Candidates
     * must be named by id here.
     */
    static Relevance readOpen(Path file, List<String> queryIds, List<String> candidateIds) {
        Ids ids = new Ids(file, queryIds, candidateIds, true);
        String name = file.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        return name.endsWith(".json") ? json(ids) : csv(ids);
    }

    private static Relevance json(Ids ids) {
        Path file = ids.file;
        List<String> candidateIds = ids.candidateIds;
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(file.toFile());
        } catch (JsonParseException e) {
            throw new UserInputException(file, "line " + e.getLocation().getLineNr(),
                    "the relevance file is not valid JSON: " + e.getOriginalMessage(), "fix the JSON syntax");
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the relevance file: " + e.getMessage(),
                    "check the path", e);
        }
        if (root == null || !root.isObject()) {
            throw new UserInputException(file, null, "the relevance file must be a JSON object from query id to "
                    + "a list of relevant candidate ids", "write it as {\"q1\": [\"c3\", \"c7\"], ...}");
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = root.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String where = "key \"" + e.getKey() + "\"";
            int q = ids.query(e.getKey(), where);
            if (!e.getValue().isArray()) {
                throw new UserInputException(file, where, "the relevant candidates must be a JSON list",
                        "write [\"c3\", \"c7\"]");
            }
            for (JsonNode c : e.getValue()) {
                int cand;
                if (c.isIntegralNumber() && ids.open) {
                    throw new UserInputException(file, where, "ranked lists name candidates by id, so relevant "
                            + "candidate " + c + " must be an id too", "write it as a string, as in the ranked lists");
                } else if (c.isIntegralNumber()) {
                    cand = c.asInt();
                    if (!c.canConvertToInt() || cand < 0 || cand >= candidateIds.size()) {
                        throw new UserInputException(file, where, "candidate index " + c + " is outside 0.."
                                + (candidateIds.size() - 1), "use a 0-based candidate index or the candidate's id");
                    }
                } else if (c.isTextual()) {
                    cand = ids.candidate(c.asText(), where);
                } else {
                    throw new UserInputException(file, where, "a relevant candidate must be an id (string) or an index "
                            + "(integer), not " + c, "write [\"c3\", \"c7\"] or [3, 7]");
                }
                ids.add(q, cand, where);
            }
        }
        return ids.finish();
    }

    private static Relevance csv(Ids ids) {
        Path file = ids.file;
        List<String> queryIds = ids.queryIds;
        try (BufferedReader in = new BufferedReader(TextFiles.openUtf8(file, "relevance file"))) {
            String text;
            int line = 0;
            while ((text = in.readLine()) != null) {
                line++;
                if (line == 1 && text.startsWith("\uFEFF")) text = text.substring(1);
                if (text.isBlank()) continue;
                String[] f = text.split(",", -1);
                String where = "line " + line;
                if (f.length != 2) {
                    throw new UserInputException(file, where, "has " + f.length + " fields, expected query,candidate",
                            "write one query id and one relevant candidate id per line");
                }
                String query = f[0].trim();
                String cand = f[1].trim();
                if (line == 1 && query.equals("query") && cand.equals("candidate") && !queryIds.contains("query")) continue;
                ids.add(ids.query(query, where), ids.candidate(cand, where), where);
            }
        } catch (CharacterCodingException e) {
            throw new UserInputException(file, null, "the relevance file is not valid UTF-8", "save it as UTF-8");
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the relevance file: " + e.getMessage(),
                    "check the path", e);
        }
        return ids.finish();
    }

    /** Id lookup and the growing relevant lists, with the checks shared by both formats. */
    private static final class Ids {
        final Path file;
        final List<String> queryIds;
        final List<String> candidateIds;
        final boolean open;
        private final Map<String, Integer> queries = new HashMap<>();
        private final Map<String, Integer> candidates = new HashMap<>();
        private final List<List<Integer>> relevant = new ArrayList<>();

        Ids(Path file, List<String> queryIds, List<String> candidateIds, boolean open) {
            this.file = file;
            this.queryIds = queryIds;
            this.candidateIds = candidateIds;
            this.open = open;
            for (int i = 0; i < queryIds.size(); i++) {
                queries.put(queryIds.get(i), i);
                relevant.add(new ArrayList<>());
            }
            for (int i = 0; i < candidateIds.size(); i++) candidates.put(candidateIds.get(i), i);
        }

        int query(String id, String where) {
            Integer q = queries.get(id);
            if (q == null) {
                throw new UserInputException(file, where, "names query '" + id + "', which is not among the "
                        + queries.size() + " queries of the scores", "use the queries' ids"
                        + (queryIds.isEmpty() || !queryIds.get(0).equals("0") ? "" : " (here their 0-based indices)"));
            }
            return q;
        }

        int candidate(String id, String where) {
            Integer c = candidates.get(id);
            if (c == null && open) {
                c = candidateIds.size();
                candidateIds.add(id);
                candidates.put(id, c);
            }
            if (c == null) {
                throw new UserInputException(file, where, "names candidate '" + id + "', which is not among the "
                        + candidates.size() + " candidates of the scores", "use the candidates' ids");
            }
            return c;
        }

        void add(int q, int c, String where) {
            List<Integer> list = relevant.get(q);
            if (list.contains(c)) {
                throw new UserInputException(file, where, "gives candidate " + c + " as relevant to query '"
                        + queryIds.get(q) + "' twice", "list each relevant candidate once");
            }
            list.add(c);
        }

        Relevance finish() {
            int[][] rel = new int[relevant.size()][];
            for (int q = 0; q < rel.length; q++) {
                rel[q] = relevant.get(q).stream().mapToInt(Integer::intValue).toArray();
                Arrays.sort(rel[q]);
            }
            return new Relevance(rel.length, candidateIds.size(), rel);
        }
    }
}
