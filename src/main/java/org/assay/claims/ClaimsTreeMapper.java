package org.assay.claims;

import com.fasterxml.jackson.core.JsonPointer;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.assay.common.UserInputException;

/**
 * Validates a {@link TreeNode} read from any claims format and builds the {@link ClaimsFile}.
 * Every problem becomes a {@link UserInputException} naming the file and the node's line
 * (and, for JSON, its JSON pointer).
 */
final class ClaimsTreeMapper {
    static final List<String> TOP_FIELDS = List.of("source", "tables");
    static final List<String> SOURCE_FIELDS = List.of("title", "document");
    static final List<String> TABLE_FIELDS = List.of("id", "caption", "test_size", "runs", "scale", "margin", "class_counts", "compare", "claims",
            // provenance written by extract, kept for the reader of the file and not used by any check
            "page", "box", "label_columns", "columns", "rows", "other_cells");
    static final List<String> CLAIM_FIELDS =
            List.of("row", "column", "metric", "params", "value", "scale", "pm", "pm_kind", "page", "margin", "test_size",
                    "bold",
                    // provenance written by extract, kept for the reader of the file and not used by any check
                    "cell", "box", "underline", "markers", "confidence");

    private static final Pattern METRIC_ID = Pattern.compile("[a-z][a-z0-9_]*");
    private static final Pattern WHOLE = Pattern.compile("[-+]?\\d+");

    private final Path file;
    private final ClaimsFormat format;

    ClaimsTreeMapper(Path file, ClaimsFormat format) {
        this.file = file;
        this.format = format;
    }

    ClaimsFile map(TreeNode root) {
        JsonPointer here = JsonPointer.empty();
        if (root instanceof TreeNode.Scalar s && s.kind() == TreeNode.Kind.NULL) {
            throw fail(root, here, "the file has no content", "write the claims as a mapping with a tables: list");
        }
        TreeNode.Mapping top = mapping(root, here, "the top level", TOP_FIELDS);
        String title = null;
        String document = null;
        TreeNode.Entry source = top.entry("source");
        if (source != null && !isNull(source.value())) {
            JsonPointer at = here.appendProperty("source");
            TreeNode.Mapping src = mapping(source.value(), at, "source", SOURCE_FIELDS);
            title = optionalText(src, at, "title");
            document = optionalText(src, at, "document");
        }
        TreeNode.Entry tablesEntry = top.entry("tables");
        if (tablesEntry == null || isNull(tablesEntry.value())) {
            throw fail(top, here, "the file has no tables", "add a tables: list with at least one table");
        }
        JsonPointer tablesAt = here.appendProperty("tables");
        TreeNode.Sequence seq = sequence(tablesEntry.value(), tablesAt, "tables");
        if (seq.items().isEmpty()) {
            throw fail(seq, tablesAt, "the tables list is empty", "add at least one table with an id and claims");
        }
        List<ClaimTable> tables = new ArrayList<>();
        Map<String, SourceLocation> ids = new HashMap<>();
        for (int i = 0; i < seq.items().size(); i++) {
            tables.add(table(seq.items().get(i), tablesAt.appendIndex(i), i, ids));
        }
        return new ClaimsFile(file, title, document, tables);
    }

    private ClaimTable table(TreeNode node, JsonPointer at, int index, Map<String, SourceLocation> ids) {
        String what = "table " + (index + 1);
        TreeNode.Mapping t = mapping(node, at, what, TABLE_FIELDS);
        TreeNode.Entry idEntry = t.entry("id");
        String id = idEntry == null ? null : text(idEntry.value(), at.appendProperty("id"), "id of " + what);
        if (id == null || id.isBlank()) {
            TreeNode where = idEntry == null ? t : idEntry.value();
            throw fail(where, idEntry == null ? at : at.appendProperty("id"), what + " has no id",
                    format == ClaimsFormat.CSV ? "fill the table column" : "add id: with a name such as T3");
        }
        id = id.strip();
        SourceLocation idAt = location(idEntry.value(), at.appendProperty("id"));
        SourceLocation first = ids.putIfAbsent(id, idAt);
        if (first != null) {
            throw fail(idEntry.value(), at.appendProperty("id"),
                    "the table id " + id + " is used twice (first at " + first.describe() + ")",
                    "give each table its own id");
        }
        what = "table " + id;
        String caption = optionalText(t, at, "caption");
        Integer testSize = optionalWhole(t, at, "test_size", what, 1,
                "write the number of test items as a whole number, or null when unknown");
        Integer runsValue = optionalWhole(t, at, "runs", what, 1,
                "write how many runs were averaged, a whole number of at least 1; the default is 1");
        int runs = runsValue == null ? 1 : runsValue;
        Scale tableScale = optionalScale(t, at);
        BigDecimal tableMargin = optionalNumber(t, at, "margin", what, true);

        TreeNode.Entry claimsEntry = t.entry("claims");
        JsonPointer claimsAt = at.appendProperty("claims");
        if (claimsEntry == null || isNull(claimsEntry.value())) {
            throw fail(t, at, what + " has no claims", "add a claims: list with at least one claim");
        }
        TreeNode.Sequence list = sequence(claimsEntry.value(), claimsAt, "claims of " + what);
        if (list.items().isEmpty()) {
            throw fail(list, claimsAt, "the claims list of " + what + " is empty", "add at least one claim");
        }
        List<Claim> claims = new ArrayList<>();
        Map<List<Object>, Claim> seen = new HashMap<>();
        for (int i = 0; i < list.items().size(); i++) {
            Claim claim = claim(list.items().get(i), claimsAt.appendIndex(i), id, i, tableScale, tableMargin);
            // One printed cell is one claim: a second claim on the same cell and metric would be audited
            // twice (and, with another value, contradict the first), so it is refused rather than counted.
            // Claims with neither row nor column name no cell and are left alone.
            boolean namesACell = claim.row() != null || (claim.column() != null && !claim.column().isEmpty());
            Claim earlier = !namesACell ? null : seen.putIfAbsent(java.util.Arrays.asList(claim.row(), claim.column(), claim.metric(),
                    claim.params()), claim);
            if (earlier != null) {
                throw new UserInputException(file, claim.location().describe(),
                        "claim " + (i + 1) + " of " + what + " repeats the row, column and metric of the claim at "
                                + earlier.location().describe() + " (values " + quote(earlier.value().text()) + " and "
                                + quote(claim.value().text()) + ")",
                        "keep one of the two, or give them different rows or columns");
            }
            claims.add(claim);
        }
        return new ClaimTable(id, caption, testSize, runs, claims, classCounts(t, at, what), compare(t, at, what, claims));
    }

    private Claim claim(TreeNode node, JsonPointer at, String tableId, int index, Scale tableScale,
                        BigDecimal tableMargin) {
        String what = "claim " + (index + 1) + " of table " + tableId;
        TreeNode.Mapping c = mapping(node, at, what, CLAIM_FIELDS);
        String row = optionalText(c, at, "row");
        List<String> column = column(c, at);

        TreeNode.Entry metricEntry = c.entry("metric");
        String metric = metricEntry == null ? null : text(metricEntry.value(), at.appendProperty("metric"), "metric");
        if (metric == null || metric.isBlank()) {
            throw fail(metricEntry == null ? c : metricEntry.value(), metricEntry == null ? at : at.appendProperty("metric"),
                    what + " has no metric", "add metric: with a metric id such as accuracy, macro_f1 or roc_auc");
        }
        metric = metric.strip();
        if (!METRIC_ID.matcher(metric).matches()) {
            String suggestion = metric.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "_").replaceAll("^_+|_+$", "");
            throw fail(metricEntry.value(), at.appendProperty("metric"),
                    "the metric " + quote(metric) + " is not a metric id",
                    "write a lower-case id with underscores, such as " + (suggestion.isEmpty() ? "accuracy" : suggestion));
        }
        Map<String, String> params = params(c, at);

        TreeNode.Entry valueEntry = c.entry("value");
        if (valueEntry == null || isNull(valueEntry.value())) {
            throw fail(valueEntry == null ? c : valueEntry.value(), valueEntry == null ? at : at.appendProperty("value"),
                    what + " has no value", "add value: with the number exactly as printed, for example \"87.4\"");
        }
        JsonPointer valueAt = at.appendProperty("value");
        PrintedValue value = number(valueEntry.value(), valueAt, "value");

        Scale claimScale = optionalScale(c, at);
        Scale scale = claimScale != null ? claimScale : tableScale;
        if (scale == null) {
            throw fail(c, at, what + " has no scale",
                    format == ClaimsFormat.CSV
                            ? "fill the scale column with percent or fraction"
                            : "add scale: percent or scale: fraction to the claim or to its table");
        }

        BigDecimal pmNumber = optionalNumber(c, at, "pm", what, false);
        if (pmNumber != null && pmNumber.signum() < 0) {
            TreeNode.Entry e = c.entry("pm");
            throw fail(e.value(), at.appendProperty("pm"), "pm " + quote(pmNumber.toPlainString()) + " is negative",
                    "write the size of the ± amount without a sign");
        }
        PmKind pmKind = pmKind(c, at, pmNumber != null);
        Integer page = optionalWhole(c, at, "page", what, 1, "write the page number as a whole number, 1 or more");

        BigDecimal marginPrinted = optionalNumber(c, at, "margin", what, true);
        if (marginPrinted == null) marginPrinted = tableMargin;
        Double margin = marginPrinted == null ? null
                : marginPrinted.divide(BigDecimal.valueOf(scale.factor())).doubleValue();

        Integer ownSize = optionalWhole(c, at, "test_size", what, 1,
                "write the number of items this value was computed on, or leave it out to use the table's");
        boolean bold = optionalBoolean(c, at, "bold");
        return new Claim(tableId, row, column, metric, params, value, scale,
                pmNumber == null ? null : pmNumber.doubleValue(), pmKind, page, margin, location(c, at), ownSize, bold);
    }

    private boolean optionalBoolean(TreeNode.Mapping m, JsonPointer at, String field) {
        TreeNode.Entry e = m.entry(field);
        if (e == null || isNull(e.value())) return false;
        String s = scalarText(e.value(), at.appendProperty(field), field);
        if (s.equals("true")) return true;
        if (s.equals("false")) return false;
        throw fail(e.value(), at.appendProperty(field), field + " is " + quote(s) + ", not true or false",
                "write " + field + ": true or " + field + ": false");
    }

    private Map<String, Long> classCounts(TreeNode.Mapping t, JsonPointer at, String what) {
        TreeNode.Entry e = t.entry("class_counts");
        if (e == null || isNull(e.value())) return Map.of();
        JsonPointer countsAt = at.appendProperty("class_counts");
        if (!(e.value() instanceof TreeNode.Mapping m)) {
            throw fail(e.value(), countsAt, "class_counts of " + what + " is not a mapping",
                    "write class_counts as label: count pairs, for example {positive: 120, negative: 880}");
        }
        Map<String, Long> counts = new LinkedHashMap<>();
        for (TreeNode.Entry p : m.entries()) {
            JsonPointer pAt = countsAt.appendProperty(p.key());
            String s = scalarText(p.value(), pAt, "a class count");
            if (s == null || !WHOLE.matcher(s.strip()).matches() || s.strip().startsWith("-")) {
                throw fail(p.value(), pAt, "the count of class " + quote(p.key()) + " is " + quote(String.valueOf(s))
                        + ", not a whole number", "write the number of test items of that class, for example 120");
            }
            try {
                counts.put(p.key(), Long.parseLong(s.strip().replace("+", "")));
            } catch (NumberFormatException tooLarge) {
                throw fail(p.value(), pAt, "the count of class " + quote(p.key()) + " is " + quote(s.strip())
                        + ", too large to be a number of test items", "write the number of test items of that class");
            }
        }
        return counts;
    }

    /** The compared pairs; each must name two different rows that have claims in this table (else nothing is compared). */
    private List<List<String>> compare(TreeNode.Mapping t, JsonPointer at, String what, List<Claim> claims) {
        TreeNode.Entry e = t.entry("compare");
        if (e == null || isNull(e.value())) return List.of();
        JsonPointer cmpAt = at.appendProperty("compare");
        TreeNode.Sequence seq = sequence(e.value(), cmpAt, "compare of " + what);
        List<List<String>> pairs = new ArrayList<>();
        for (int i = 0; i < seq.items().size(); i++) {
            TreeNode item = seq.items().get(i);
            JsonPointer itemAt = cmpAt.appendIndex(i);
            if (!(item instanceof TreeNode.Sequence pair) || pair.items().size() != 2) {
                throw fail(item, itemAt, "each entry of compare must be a pair of row labels",
                        "write for example compare: [[\"Ours\", \"Baseline\"]]");
            }
            List<String> rows = new ArrayList<>();
            for (int j = 0; j < 2; j++) {
                String row = text(pair.items().get(j), itemAt.appendIndex(j), "a row label");
                if (row == null || claims.stream().noneMatch(c -> row.equals(c.row()))) {
                    throw fail(pair.items().get(j), itemAt.appendIndex(j), "compare names the row " + quote(String.valueOf(row))
                            + ", which has no claims in " + what, "use a row label exactly as the claims of " + what + " give it");
                }
                rows.add(row);
            }
            if (rows.get(0).equals(rows.get(1))) {
                throw fail(item, itemAt, "compare pairs the row " + quote(rows.get(0)) + " with itself",
                        "name two different rows, for example compare: [[\"Ours\", \"Baseline\"]]");
            }
            pairs.add(List.copyOf(rows));
        }
        return pairs;
    }

    private List<String> column(TreeNode.Mapping c, JsonPointer at) {
        TreeNode.Entry e = c.entry("column");
        if (e == null || isNull(e.value())) return List.of();
        JsonPointer colAt = at.appendProperty("column");
        if (e.value() instanceof TreeNode.Sequence seq) {
            List<String> path = new ArrayList<>();
            for (int i = 0; i < seq.items().size(); i++) {
                TreeNode item = seq.items().get(i);
                String s = text(item, colAt.appendIndex(i), "a column header");
                if (s == null) {
                    throw fail(item, colAt.appendIndex(i), "a column header is null",
                            "write each header as a string, for example [\"Clip-level\", \"Accuracy\"]");
                }
                path.add(s);
            }
            return path;
        }
        return List.of(text(e.value(), colAt, "column"));
    }

    private Map<String, String> params(TreeNode.Mapping c, JsonPointer at) {
        TreeNode.Entry e = c.entry("params");
        if (e == null || isNull(e.value())) return Map.of();
        JsonPointer paramsAt = at.appendProperty("params");
        if (!(e.value() instanceof TreeNode.Mapping m)) {
            throw fail(e.value(), paramsAt, "params is not a mapping", "write params as a mapping, for example {k: 5}");
        }
        Map<String, String> params = new LinkedHashMap<>();
        for (TreeNode.Entry p : m.entries()) {
            JsonPointer pAt = paramsAt.appendProperty(p.key());
            String v = text(p.value(), pAt, "the parameter " + p.key());
            if (v == null || p.key().isBlank()) {
                throw fail(p.value(), pAt, "the parameter " + quote(p.key()) + " has no value",
                        "give it a value or remove it");
            }
            params.put(p.key().strip(), v);
        }
        return params;
    }

    private PmKind pmKind(TreeNode.Mapping c, JsonPointer at, boolean hasPm) {
        TreeNode.Entry e = c.entry("pm_kind");
        boolean given = e != null && !isNull(e.value());
        String allowed = "sd, se, ci95 or unknown";
        if (!given) {
            if (!hasPm) return null;
            throw fail(c.entry("pm").value(), at.appendProperty("pm"), "pm is given without pm_kind",
                    "add pm_kind: " + allowed + "; unknown when the paper does not say");
        }
        JsonPointer kindAt = at.appendProperty("pm_kind");
        if (!hasPm) {
            throw fail(e.value(), kindAt, "pm_kind is given without pm", "add the ± amount as pm, or remove pm_kind");
        }
        String s = text(e.value(), kindAt, "pm_kind").strip();
        for (PmKind k : PmKind.values()) if (k.id().equals(s)) return k;
        throw fail(e.value(), kindAt, "pm_kind " + quote(s) + " is not one of the known kinds", "use one of " + allowed);
    }

    private Scale optionalScale(TreeNode.Mapping m, JsonPointer at) {
        TreeNode.Entry e = m.entry("scale");
        if (e == null || isNull(e.value())) return null;
        JsonPointer scaleAt = at.appendProperty("scale");
        String s = text(e.value(), scaleAt, "scale").strip();
        for (Scale k : Scale.values()) if (k.id().equals(s)) return k;
        throw fail(e.value(), scaleAt, "scale " + quote(s) + " is not percent or fraction",
                "use percent when 87.4 means 0.874, fraction when the printed number is 0.874");
    }

    /** A number field (pm, margin) in plain decimal notation; margins must be positive. */
    private BigDecimal optionalNumber(TreeNode.Mapping m, JsonPointer at, String field, String what, boolean positive) {
        TreeNode.Entry e = m.entry(field);
        if (e == null || isNull(e.value())) return null;
        BigDecimal n = number(e.value(), at.appendProperty(field), field).number();
        if (positive && n.signum() <= 0) {
            throw fail(e.value(), at.appendProperty(field), field + " of " + what + " must be greater than 0",
                    "write the margin on the printed scale, for example 1.0 for one percentage point");
        }
        return n;
    }

    private Integer optionalWhole(TreeNode.Mapping m, JsonPointer at, String field, String what, int min, String fix) {
        TreeNode.Entry e = m.entry(field);
        if (e == null || isNull(e.value())) return null;
        JsonPointer fieldAt = at.appendProperty(field);
        String s = scalarText(e.value(), fieldAt, field).strip();
        if (!WHOLE.matcher(s).matches()) {
            throw fail(e.value(), fieldAt, field + " of " + what + " is " + quote(s) + ", not a whole number", fix);
        }
        BigDecimal n = new BigDecimal(s);
        if (n.compareTo(BigDecimal.valueOf(min)) < 0) {
            throw fail(e.value(), fieldAt, field + " of " + what + " is " + s + "; it must be at least " + min, fix);
        }
        if (n.compareTo(BigDecimal.valueOf(Integer.MAX_VALUE)) > 0) {
            throw fail(e.value(), fieldAt, field + " of " + what + " is too large", fix);
        }
        return n.intValue();
    }

    private PrintedValue number(TreeNode node, JsonPointer at, String field) {
        if (node instanceof TreeNode.Scalar s && s.kind() == TreeNode.Kind.BOOLEAN) {
            throw fail(node, at, field + " " + quote(s.text()) + " is not a number",
                    "write the number exactly as printed, for example \"87.4\"");
        }
        String s = scalarText(node, at, field);
        try {
            return PrintedNumbers.parse(field, s);
        } catch (PrintedNumbers.NumberProblem p) {
            throw fail(node, at, p.problem(), p.fix());
        }
    }

    private String optionalText(TreeNode.Mapping m, JsonPointer at, String field) {
        TreeNode.Entry e = m.entry(field);
        return e == null ? null : text(e.value(), at.appendProperty(field), field);
    }

    /** The text of a scalar (numbers and booleans as written), null for null; lists and mappings are errors. */
    private String text(TreeNode node, JsonPointer at, String what) {
        if (isNull(node)) return null;
        return scalarText(node, at, what);
    }

    private String scalarText(TreeNode node, JsonPointer at, String what) {
        if (node instanceof TreeNode.Scalar s) return s.text() == null ? "" : s.text();
        throw fail(node, at, what + " is a " + (node instanceof TreeNode.Sequence ? "list" : "mapping")
                + " where a single value belongs", "write one value here");
    }

    private TreeNode.Mapping mapping(TreeNode node, JsonPointer at, String what, List<String> allowed) {
        if (!(node instanceof TreeNode.Mapping m)) {
            throw fail(node, at, what + " is not a mapping", "write it as key: value pairs (" + String.join(", ", allowed) + ")");
        }
        Set<String> known = Set.copyOf(allowed);
        for (TreeNode.Entry e : m.entries()) {
            if (!known.contains(e.key())) {
                JsonPointer keyAt = at.appendProperty(e.key());
                SourceLocation loc = new SourceLocation(file, e.keyLine(), format == ClaimsFormat.JSON ? keyAt.toString() : null);
                throw new UserInputException(file, loc.describe(),
                        "unknown field " + quote(e.key()) + " in " + what,
                        "allowed fields are " + String.join(", ", allowed));
            }
        }
        return m;
    }

    private TreeNode.Sequence sequence(TreeNode node, JsonPointer at, String what) {
        if (node instanceof TreeNode.Sequence s) return s;
        throw fail(node, at, what + " is not a list", "write it as a list of entries starting with '-'");
    }

    private static boolean isNull(TreeNode node) {
        return node instanceof TreeNode.Scalar s && s.kind() == TreeNode.Kind.NULL;
    }

    private SourceLocation location(TreeNode node, JsonPointer at) {
        return new SourceLocation(file, node.line(), format == ClaimsFormat.JSON ? at.toString() : null);
    }

    private UserInputException fail(TreeNode node, JsonPointer at, String problem, String fix) {
        return new UserInputException(file, location(node, at).describe(), problem, fix);
    }

    private static String quote(String s) { return "\"" + s + "\""; }
}
