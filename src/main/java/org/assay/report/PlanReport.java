package org.assay.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.assay.audit.ClaimPlan;
import org.assay.audit.PlanResult;
import org.assay.audit.PlanRow;
import org.assay.audit.PlanSettings;
import org.assay.claims.Claim;
import org.assay.claims.Scale;

/**
 * What {@code assay plan} prints: for one claim its sizes, a table of half-width and power against
 * n and one line in plain words; for a table of claims one line per claim and the size that serves
 * them all. JSON (schema_version 1) carries the same on the metric's fraction scale.
 */
public final class PlanReport {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private PlanReport() {}

    /** The plan for a single claim, with its table. */
    public static String text(PlanResult result) {
        if (result.plans().size() != 1 || !result.skipped().isEmpty()) return tableText(result);
        ClaimPlan plan = result.plans().get(0);
        PlanSettings s = result.settings();
        Claim c = plan.claim();
        StringBuilder sb = new StringBuilder();
        sb.append("Plan for ").append(metricLabel(c)).append(" claimed as ").append(printed(c)).append(" on a test set of ")
                .append(plan.testSize()).append(" items\n");
        sb.append("margin ±").append(margin(c, plan.margin())).append(", power ").append(number(s.power()))
                .append(", alpha ").append(number(s.alpha())).append(", direction ").append(s.direction().id())
                .append("; ").append(plan.method()).append('\n').append('\n');
        Long n = plan.n();
        sb.append(n == null ? "No subsample size meets every target (see below).\n"
                : "Evaluate n = " + n + " of the " + plan.testSize() + " items.\n").append('\n');
        String[][] lines = {
            {"(a) " + Display.percent(s.confidence()) + " interval no wider than ±" + margin(c, plan.margin()), size(plan.nInterval(), plan)},
            {"(b) power " + number(s.power()) + " to find a true " + truths(c, plan, " or ") + " discrepant", size(plan.nDetect(), plan)},
            {"(c) power " + number(s.power()) + " to find " + printed(c) + " consistent if it is right", size(plan.nAgree(), plan)}};
        int width = 0;
        for (String[] l : lines) width = Math.max(width, l[0].length());
        for (String[] l : lines) sb.append("  ").append(pad(l[0] + ":", width + 1)).append("  ").append(l[1]).append('\n');
        sb.append('\n').append(rowsTable(plan)).append('\n');
        sb.append(explanation(result)).append('\n');
        sb.append('\n').append("notes:\n");
        for (String note : plan.notes()) sb.append("  - ").append(note).append('\n');
        return sb.toString();
    }

    /** One line per claim of a table, and the size that serves them all. */
    private static String tableText(PlanResult result) {
        PlanSettings s = result.settings();
        StringBuilder sb = new StringBuilder();
        sb.append("Plan for table ").append(result.table()).append(": power ").append(number(s.power())).append(", alpha ")
                .append(number(s.alpha())).append(", direction ").append(s.direction().id())
                .append(", margin ±").append(points(s.margin())).append(" unless a claim sets its own\n\n");
        List<String[]> cells = new ArrayList<>();
        cells.add(new String[] {"claim", "printed", "N", "method", "(a) interval", "(b) detect", "(c) agree", "n"});
        for (ClaimPlan p : result.plans()) {
            Claim c = p.claim();
            cells.add(new String[] {c.label() + " (" + metricLabel(c) + ")", printed(c), Long.toString(p.testSize()),
                p.exact() ? "exact" : "normal", size(p.nInterval(), p), size(p.nDetect(), p), size(p.nAgree(), p),
                p.n() == null ? "none" : Long.toString(p.n())});
        }
        sb.append(grid(cells, Set.of(2, 4, 5, 6, 7)));
        Long all = result.nForAll();
        sb.append('\n');
        if (result.plans().isEmpty()) sb.append("No claim could be planned.\n");
        else if (all == null) sb.append("No subsample size serves every planned claim (a claim above has none).\n");
        else sb.append("Evaluate n = ").append(all).append(" items: the size that serves every planned claim.\n");
        if (!result.skipped().isEmpty()) {
            sb.append("\nnot planned:\n");
            for (PlanResult.Skipped k : result.skipped()) {
                sb.append("  - ").append(k.claim().label()).append(" (").append(k.claim().metric()).append(" ")
                        .append(k.claim().value().text()).append("): ").append(k.reason()).append('\n');
            }
        }
        if (!result.plans().isEmpty()) {
            sb.append('\n').append(explanation(result)).append('\n');
            Set<String> notes = new LinkedHashSet<>();
            result.plans().forEach(p -> notes.addAll(p.notes()));
            sb.append("\nnotes:\n");
            for (String note : notes) sb.append("  - ").append(note).append('\n');
            sb.append("  - each size is for its claim on its own; per-claim tables of half-width and power are in --format json\n");
        }
        return sb.toString();
    }

    /** The one line a non-statistician reads. */
    static String explanation(PlanResult result) {
        PlanSettings s = result.settings();
        String share = "at least " + Display.percent(s.power()) + " of the time";
        if (result.plans().size() == 1 && result.skipped().isEmpty()) {
            ClaimPlan p = result.plans().get(0);
            Claim c = p.claim();
            if (p.n() == null) {
                return "In plain words: no number of items drawn from the " + p.testSize() + " meets all three targets; "
                        + "a wider --margin or a lower --power would.";
            }
            return "In plain words: evaluate " + p.n() + " items drawn at random from the " + p.testSize()
                    + " (assay sample --n " + p.n() + " draws them); then the audit's " + Display.percent(s.confidence())
                    + " interval is at most ±" + margin(c, p.margin()) + " wide, a true value "
                    + margin(c, p.margin()) + " " + directionWords(p) + " than the printed " + printed(c)
                    + " is flagged as discrepant " + share + ", and a correct " + printed(c) + " is confirmed as consistent "
                    + share + ".";
        }
        Long all = result.nForAll();
        if (all == null) {
            return "In plain words: no single number of items serves every claim; see the claims without a size above.";
        }
        return "In plain words: evaluate " + all + " items drawn at random from the test set; that is enough for each planned "
                + "claim's interval to be at most ± its margin, for a true value one margin away to be flagged as discrepant "
                + share + ", and for a correct claim to be confirmed as consistent " + share
                + " (for each claim on its own: auditing them together, with Holm's adjustment, needs somewhat more).";
    }

    /** The plan as JSON on the metric's fraction scale. */
    public static String json(PlanResult result) {
        PlanSettings s = result.settings();
        ObjectNode root = JSON.createObjectNode();
        root.put("schema_version", 1);
        ObjectNode settings = root.putObject("settings");
        settings.put("margin", s.margin());
        settings.put("power", s.power());
        settings.put("confidence", s.confidence());
        settings.put("alpha", s.alpha());
        settings.put("direction", s.direction().id());
        settings.put("resamples", s.resamples());
        settings.put("seed", s.seed());
        root.put("table", result.table());
        putSize(root, "n", result.nForAll());
        ArrayNode plans = root.putArray("plans");
        for (ClaimPlan p : result.plans()) {
            ObjectNode o = plans.addObject();
            putClaim(o, p.claim());
            o.put("test_size", p.testSize());
            o.put("value", p.value());
            o.putArray("claim_interval").add(p.claimLower()).add(p.claimUpper());
            o.put("margin", p.margin());
            o.put("method", p.method());
            o.put("exact", p.exact());
            putNumber(o, "lower_truth", p.lowerTruth());
            putNumber(o, "higher_truth", p.higherTruth());
            putSize(o, "n_interval", p.nInterval());
            putSize(o, "n_detect", p.nDetect());
            putSize(o, "n_agree", p.nAgree());
            putSize(o, "n", p.n());
            o.put("searched_up_to", p.searchedUpTo());
            ArrayNode rows = o.putArray("rows");
            for (PlanRow r : p.rows()) {
                ObjectNode row = rows.addObject();
                row.put("n", r.n());
                putNumber(row, "half_width", r.halfWidth());
                putNumber(row, "detect_lower", r.detectLower());
                putNumber(row, "detect_higher", r.detectHigher());
                putNumber(row, "detect", r.detect());
                putNumber(row, "agree", r.agree());
                ArrayNode marks = row.putArray("marks");
                r.marks().forEach(marks::add);
            }
            ArrayNode notes = o.putArray("notes");
            p.notes().forEach(notes::add);
        }
        ArrayNode skipped = root.putArray("not_planned");
        for (PlanResult.Skipped k : result.skipped()) {
            ObjectNode o = skipped.addObject();
            putClaim(o, k.claim());
            o.put("reason", k.reason());
        }
        root.put("explanation", explanation(result));
        try {
            return JSON.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static String rowsTable(ClaimPlan plan) {
        Claim c = plan.claim();
        boolean lower = plan.lowerTruth() != null;
        boolean higher = plan.higherTruth() != null;
        List<String> head = new ArrayList<>(List.of("n", "±half-width"));
        if (lower) head.add("detect " + truth(c, plan.lowerTruth()));
        if (higher) head.add("detect " + truth(c, plan.higherTruth()));
        head.add("agree");
        head.add("");
        List<String[]> cells = new ArrayList<>();
        cells.add(head.toArray(String[]::new));
        for (PlanRow r : plan.rows()) {
            List<String> line = new ArrayList<>();
            line.add(Long.toString(r.n()));
            line.add(halfWidth(c, r.halfWidth()));
            if (lower) line.add(power(r.detectLower()));
            if (higher) line.add(power(r.detectHigher()));
            line.add(power(r.agree()));
            line.add(r.marks().isEmpty() ? "" : "← " + String.join(", ", r.marks().stream().map(PlanReport::markWord).toList()));
            cells.add(line.toArray(String[]::new));
        }
        Set<Integer> right = new java.util.HashSet<>();
        for (int i = 0; i < head.size() - 1; i++) right.add(i);
        return grid(cells, right);
    }

    private static String markWord(String mark) {
        return switch (mark) {
            case "interval" -> "(a)";
            case "detect" -> "(b)";
            case "agree" -> "(c)";
            case "asked" -> "asked for";
            default -> mark;
        };
    }

    /** Columns padded to their widest cell, two spaces apart; numbers right-aligned. */
    private static String grid(List<String[]> cells, Set<Integer> rightAligned) {
        int columns = cells.get(0).length;
        int[] width = new int[columns];
        for (String[] row : cells) for (int i = 0; i < columns; i++) width[i] = Math.max(width[i], row[i].length());
        StringBuilder sb = new StringBuilder();
        for (String[] row : cells) {
            StringBuilder line = new StringBuilder("  ");
            for (int i = 0; i < columns; i++) {
                String cell = row[i];
                String padding = " ".repeat(width[i] - cell.length());
                line.append(rightAligned.contains(i) ? padding + cell : cell + padding);
                if (i < columns - 1) line.append("  ");
            }
            sb.append(line.toString().stripTrailing()).append('\n');
        }
        return sb.toString();
    }

    private static String pad(String s, int width) { return s + " ".repeat(Math.max(0, width - s.length())); }

    private static String metricLabel(Claim c) {
        if (c.params().isEmpty()) return c.metric();
        StringBuilder sb = new StringBuilder(c.metric()).append(':');
        new java.util.TreeMap<>(c.params()).forEach((k, v) -> sb.append(k).append('=').append(v).append(';'));
        return sb.substring(0, sb.length() - 1);
    }

    private static String printed(Claim c) { return c.value().text() + (c.scale() == Scale.PERCENT ? "%" : ""); }

    private static String truth(Claim c, double fraction) {
        return clean(fraction * c.scale().factor()) + (c.scale() == Scale.PERCENT ? "%" : "");
    }

    private static String truths(Claim c, ClaimPlan p, String joiner) {
        List<String> t = new ArrayList<>();
        if (p.lowerTruth() != null) t.add(truth(c, p.lowerTruth()));
        if (p.higherTruth() != null) t.add(truth(c, p.higherTruth()));
        return String.join(joiner, t);
    }

    private static String directionWords(ClaimPlan p) {
        if (p.lowerTruth() != null && p.higherTruth() != null) return "lower or higher";
        return p.lowerTruth() != null ? "lower" : "higher";
    }

    /** The margin in the claim's units: "1 point" on the percent scale, the plain number otherwise. */
    private static String margin(Claim c, double fraction) {
        String v = clean(fraction * c.scale().factor());
        if (c.scale() != Scale.PERCENT) return v;
        return v + (v.equals("1") ? " point" : " points");
    }

    /** A default margin in percentage points, as --margin takes it. */
    private static String points(double fraction) {
        String v = clean(fraction * 100);
        return v + (v.equals("1") ? " point" : " points");
    }

    private static String halfWidth(Claim c, double fraction) {
        if (Double.isNaN(fraction)) return "n/a";
        return String.format(Locale.ROOT, c.scale() == Scale.PERCENT ? "%.2f" : "%.4f", fraction * c.scale().factor());
    }

    private static String power(Double p) {
        if (p == null || Double.isNaN(p)) return "n/a";
        return String.format(Locale.ROOT, "%.3f", p);
    }

    private static String size(Long n, ClaimPlan p) {
        return n == null ? "none up to " + p.searchedUpTo() : Long.toString(n);
    }

    private static String number(double x) { return clean(x); }

    /** A number with at most ten significant digits and no trailing zeros (0.9 * 100 prints as 90). */
    private static String clean(double x) {
        return new BigDecimal(x).round(new MathContext(10)).stripTrailingZeros().toPlainString();
    }

    private static void putClaim(ObjectNode o, Claim c) {
        o.put("table", c.tableId());
        if (c.row() == null) o.putNull("row"); else o.put("row", c.row());
        ArrayNode column = o.putArray("column");
        c.column().forEach(column::add);
        o.put("metric", c.metric());
        ObjectNode params = o.putObject("params");
        new java.util.TreeMap<>(c.params()).forEach(params::put);
        o.put("printed", c.value().text());
        o.put("scale", c.scale().id());
    }

    private static void putNumber(ObjectNode o, String key, Double x) {
        if (x == null || x.isNaN() || x.isInfinite()) o.putNull(key); else o.put(key, x);
    }

    private static void putSize(ObjectNode o, String key, Long n) {
        if (n == null) o.putNull(key); else o.put(key, n);
    }
}
