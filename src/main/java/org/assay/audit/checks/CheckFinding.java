package org.assay.audit.checks;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;

/**
 * One result of a claim-only check.
 *
 * @param id         stable id: the rule and the claims it concerns, hashed, so a later audit or a
 *                   response to reviewers can refer to it (same claims file, same id)
 * @param rule       the rule's name (granularity, ratio-feasibility, f1-consistency, ...)
 * @param kind       what was found
 * @param tableId    the table
 * @param claims     the claims concerned, the main one first
 * @param message    what is wrong or unsupported, in one or two sentences
 * @param suggestion what the authors could do, or null
 * @param details    numbers behind the message (for JSON), in a stable order
 */
public record CheckFinding(String id, String rule, CheckKind kind, String tableId, List<Claim> claims, String message,
                           String suggestion, Map<String, Object> details) {

    public CheckFinding {
        claims = List.copyOf(claims);
        details = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(details));
    }

    static CheckFinding of(String rule, CheckKind kind, String tableId, List<Claim> claims, String message,
                           String suggestion, Map<String, Object> details) {
        return new CheckFinding(idFor(rule, tableId, claims), rule, kind, tableId, claims, message, suggestion, details);
    }

    static String idFor(String rule, String tableId, List<Claim> claims) {
        StringBuilder key = new StringBuilder(rule).append('\u0000').append(tableId);
        for (Claim c : claims) {
            key.append('\u0000').append(c.row()).append('\u0000').append(String.join("\u0001", c.column()))
                    .append('\u0000').append(c.metric()).append('\u0000')
                    .append(new java.util.TreeMap<>(c.params()));
        }
        try {
            byte[] h = MessageDigest.getInstance("SHA-256").digest(key.toString().getBytes(StandardCharsets.UTF_8));
            return rule + "-" + HexFormat.of().formatHex(h, 0, 4);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
