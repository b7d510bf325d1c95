package org.assay.data.retrieval;

import com.fasterxml.jackson.core.JsonProcessingException;
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
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.assay.common.UserInputException;
import org.assay.data.TextFiles;

/**
 * Ranked lists as JSON Lines, one query per line: {@code {"query": "q1", "ranked": ["c3", "c9"]}},
 * best candidate first, plus a relevance file naming candidates by id (see {@link RelevanceReader}).
 *
 * <p>A list's length is its query's scored depth. A relevant candidate absent from the list is
 * "not retrieved within the listed depth" (rank infinite). A list gives a strict order, so there
 * are no ties; the tie policy is recorded as given. The candidate count is the number of distinct
 * candidate ids in the lists and the relevance (a lower bound on the real collection).
 */
public final class RankedListReader {
    private RankedListReader() {}

    public static RetrievalData read(Path lists, Path relevanceFile, TiePolicy ties, String direction) {
        List<String> queries = new ArrayList<>();
        List<String[]> ranked = new ArrayList<>();
        readLists(lists, queries, ranked);

        List<String> candidateIds = new ArrayList<>();
        Map<String, Integer> candidateIndex = new HashMap<>();
        for (String[] list : ranked) {
            for (String c : list) {
                if (candidateIndex.putIfAbsent(c, candidateIds.size()) == null) candidateIds.add(c);
            }
        }
        Relevance relevance = RelevanceReader.readOpen(relevanceFile, queries, candidateIds);

        double[][] ranks = new double[queries.size()][];
        int[] depth = new int[queries.size()];
        for (int q = 0; q < queries.size(); q++) {
            int[] rel = relevance.relevant()[q];
            if (rel.length == 0) {
                throw new UserInputException(relevanceFile, "query '" + queries.get(q) + "'",
                        "has a ranked list but no relevant candidate, so its rank metrics are undefined",
                        "add its relevant candidates, or drop its line from " + lists.getFileName());
            }
            Map<String, Integer> position = new HashMap<>();
            String[] list = ranked.get(q);
            for (int i = 0; i < list.length; i++) position.put(list[i], i + 1);
            ranks[q] = new double[rel.length];
            for (int i = 0; i < rel.length; i++) {
                Integer p = position.get(candidateIds.get(rel[i]));
                ranks[q][i] = p == null ? Double.POSITIVE_INFINITY : p;
            }
            Arrays.sort(ranks[q]);
            depth[q] = list.length;
        }
        int min = Arrays.stream(depth).min().orElse(0);
        return new RetrievalData(direction, queries, candidateIds.size(), min, ties, ranks, depth, null);
    }

    private static void readLists(Path file, List<String> queries, List<String[]> ranked) {
        ObjectMapper json = new ObjectMapper();
        Set<String> seen = new HashSet<>();
        try (BufferedReader in = new BufferedReader(TextFiles.openUtf8(file, "ranked lists file"))) {
            String text;
            int line = 0;
            while ((text = in.readLine()) != null) {
                line++;
                if (text.isBlank()) continue;
                String where = "line " + line;
                JsonNode node;
                try {
                    node = json.readTree(text);
                } catch (JsonProcessingException e) {
                    throw new UserInputException(file, where, "is not valid JSON: " + e.getOriginalMessage(),
                            "write one JSON object per line");
                }
                JsonNode q = node == null ? null : node.get("query");
                JsonNode r = node == null ? null : node.get("ranked");
                if (q == null || !q.isTextual() || r == null || !r.isArray()) {
                    throw new UserInputException(file, where, "needs a string field \"query\" and a list field \"ranked\"",
                            "write {\"query\": \"q1\", \"ranked\": [\"c3\", \"c9\"]}");
                }
                if (!seen.add(q.asText())) {
                    throw new UserInputException(file, where, "repeats query '" + q.asText() + "'",
                            "give each query one line");
                }
                String[] list = new String[r.size()];
                Set<String> inList = new HashSet<>();
                for (int i = 0; i < list.length; i++) {
                    JsonNode c = r.get(i);
                    if (!c.isTextual()) {
                        throw new UserInputException(file, where, "ranked entry " + (i + 1) + " is " + c
                                + ", not a candidate id (string)", "write candidate ids as strings");
                    }
                    list[i] = c.asText();
                    if (!inList.add(list[i])) {
                        throw new UserInputException(file, where, "ranks candidate '" + list[i] + "' twice",
                                "list each candidate once per query");
                    }
                }
                queries.add(q.asText());
                ranked.add(list);
            }
        } catch (CharacterCodingException e) {
            throw new UserInputException(file, null, "the ranked lists are not valid UTF-8", "save them as UTF-8");
        } catch (IOException e) {
            throw new UserInputException(file, null, "cannot read the ranked lists: " + e.getMessage(), "check the path", e);
        }
        if (queries.isEmpty()) {
            throw new UserInputException(file, null, "holds no ranked list", "write one JSON object per query");
        }
    }
}
