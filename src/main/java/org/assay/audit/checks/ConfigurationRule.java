package org.assay.audit.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;
import org.assay.claims.ClaimTable;

/**
 * A text-generation score means little without the settings it was computed with: BLEU moves by a
 * point or more with the tokenizer and casing alone (Post 2018, "A Call for Clarity in Reporting
 * BLEU Scores", WMT). A claim that does not state them in its params cannot be audited to a
 * fraction of a point, and this rule says so.
 */
public final class ConfigurationRule implements CheckRule {
    static final String NAME = "configuration";

    /** The params each generation metric's value depends on, in the order they are asked for. */
    static final Map<String, List<String>> REQUIRED = new LinkedHashMap<>();

    static {
        REQUIRED.put("bleu", List.of("tokenize", "lowercase"));
        REQUIRED.put("sentence_bleu", List.of("tokenize", "lowercase", "smoothing"));
        REQUIRED.put("rouge_1", List.of("stem"));
        REQUIRED.put("rouge_2", List.of("stem"));
        REQUIRED.put("rouge_l", List.of("stem"));
    }

    @Override public String name() { return NAME; }

    /** The settings a claim's metric depends on that the claim does not state (empty when none are missing). */
    public static List<String> missingSettings(Claim c) {
        List<String> needed = REQUIRED.get(c.metric());
        if (needed == null) return List.of();
        return needed.stream().filter(k -> !c.params().containsKey(k)).toList();
    }

    @Override
    public List<CheckFinding> check(ClaimTable table, Tally tally) {
        List<CheckFinding> out = new ArrayList<>();
        for (Claim c : table.claims()) {
            if (!REQUIRED.containsKey(c.metric())) continue;
            tally.ran(NAME);
            List<String> missing = missingSettings(c);
            if (missing.isEmpty()) continue;
            out.add(CheckFinding.of(NAME, CheckKind.QUESTIONABLE, table.id(), List.of(c),
                    Claims.quote(c) + " does not say its " + String.join(", ", missing) + " setting"
                            + (missing.size() > 1 ? "s" : "") + ": " + c.metric() + " changes with "
                            + (missing.contains("tokenize") ? "the tokenizer and casing" : "these settings")
                            + " by more than a printed decimal, so this claim cannot be audited to a fraction of a point.",
                    "state " + String.join(", ", missing) + " with the score (for example params: {"
                            + String.join(", ", missing.stream().map(ConfigurationRule::example).toList()) + "})",
                    Map.of("missing", missing)));
        }
        return out;
    }

    private static String example(String key) {
        return switch (key) {
            case "tokenize" -> "tokenize: 13a";
            case "lowercase" -> "lowercase: false";
            case "smoothing" -> "smoothing: exp";
            case "stem" -> "stem: true";
            default -> key + ": ...";
        };
    }
}
