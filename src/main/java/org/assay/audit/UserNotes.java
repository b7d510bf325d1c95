package org.assay.audit;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.claims.Claim;

/**
 * Free-text notes the user wrote in the audit file, carried into the replication notes: one per
 * reproduced table ({@code notes:}) and one per claim ({@code claim_notes:}, keyed by the claim's
 * column path joined with " / ", as reports print it).
 *
 * @param tables per table id, its note
 * @param claims per table id, per column path, the claim's note
 */
public record UserNotes(Map<String, String> tables, Map<String, Map<String, String>> claims) {
    public UserNotes {
        tables = Map.copyOf(tables);
        Map<String, Map<String, String>> copy = new LinkedHashMap<>();
        claims.forEach((t, m) -> copy.put(t, Map.copyOf(m)));
        claims = Map.copyOf(copy);
    }

    public static UserNotes none() { return new UserNotes(Map.of(), Map.of()); }

    /** The note on a table, or null. */
    public String forTable(String tableId) { return tables.get(tableId); }

    /** The note on a claim, or null. */
    public String forClaim(Claim c) {
        Map<String, String> m = claims.get(c.tableId());
        return m == null ? null : m.get(String.join(" / ", c.column()));
    }

    /** The key used for notes of a reproduction that names no table (the claims file has one). */
    public static final String UNNAMED_TABLE = "";

    /** The notes filed under {@link #UNNAMED_TABLE}, filed under {@code tableId} instead. */
    public UserNotes naming(String tableId) {
        if (!tables.containsKey(UNNAMED_TABLE) && !claims.containsKey(UNNAMED_TABLE)) return this;
        Map<String, String> t = new LinkedHashMap<>(tables);
        Map<String, Map<String, String>> c = new LinkedHashMap<>(claims);
        if (t.containsKey(UNNAMED_TABLE)) t.put(tableId, t.remove(UNNAMED_TABLE));
        if (c.containsKey(UNNAMED_TABLE)) c.put(tableId, c.remove(UNNAMED_TABLE));
        return new UserNotes(t, c);
    }

    /** Both sets together ({@code other} wins on a clash). */
    public UserNotes with(UserNotes other) {
        Map<String, String> t = new LinkedHashMap<>(tables);
        t.putAll(other.tables);
        Map<String, Map<String, String>> c = new LinkedHashMap<>();
        claims.forEach((k, v) -> c.put(k, new LinkedHashMap<>(v)));
        other.claims.forEach((k, v) -> c.computeIfAbsent(k, x -> new LinkedHashMap<>()).putAll(v));
        return new UserNotes(t, c);
    }

    /** Column paths named in claim notes that match no claim of the table, so a typo is not lost silently. */
    public List<String> unmatched(String tableId, List<Claim> claimsOfTable) {
        Map<String, String> m = claims.get(tableId);
        if (m == null) return List.of();
        return m.keySet().stream().filter(k -> claimsOfTable.stream().noneMatch(c -> String.join(" / ", c.column()).equals(k)))
                .toList();
    }
}
