package org.assay.report;

import java.util.Locale;
import org.assay.audit.AuditResult;
import org.assay.audit.Comparison;
import org.assay.audit.ComparisonVerdict;
import org.assay.audit.Finding;
import org.assay.audit.Verdict;
import org.assay.claims.Claim;

/** The short plain-text table printed on stdout after an audit. */
public final class SummaryTable {
    private SummaryTable() {}

    public static String render(AuditResult r) {
        StringBuilder sb = new StringBuilder();
        String fmt = "%-36s %-20s %9s %11s  %-22s %s%n";
        sb.append(String.format(Locale.ROOT, fmt, "claim", "metric", "printed", "reproduced",
                Display.percent(r.settings().confidence()) + " interval", "verdict"));
        for (Finding f : r.findings()) {
            Claim c = f.claim();
            String label = c.tableId() + ": " + c.label();
            // keep the end: the column path tells the claims of one row apart
            if (label.length() > 36) label = "…" + label.substring(label.length() - 35);
            boolean ok = f.verdict() != Verdict.NOT_COMPUTABLE;
            sb.append(String.format(Locale.ROOT, fmt, label, metric(c), c.value().text(),
                    ok ? Display.value(c, f.estimate()) : "n/a",
                    ok ? Display.range(c, f.interval().lower(), f.interval().upper()) : "n/a",
                    f.verdict().word()));
        }
        sb.append(String.format(Locale.ROOT, "%n%d consistent, %d inconclusive, %d discrepant", r.count(Verdict.CONSISTENT),
                r.count(Verdict.INCONCLUSIVE), r.count(Verdict.DISCREPANT)));
        if (r.count(Verdict.NOT_COMPUTABLE) > 0) sb.append(", ").append(r.count(Verdict.NOT_COMPUTABLE)).append(" not computable");
        if (!r.unaudited().isEmpty()) sb.append(", ").append(r.unaudited().size()).append(" not audited");
        sb.append('\n');
        if (!r.comparisons().isEmpty()) {
            sb.append(String.format(Locale.ROOT, "%ncompared rows (first - second)%n"));
            for (Comparison c : r.comparisons()) {
                Claim a = c.claimA();
                String gap = c.verdict() == ComparisonVerdict.NOT_COMPUTABLE ? "n/a" : ReportModel.signed(a, c.gap());
                sb.append(String.format(Locale.ROOT, "%s: %s - %s / %s  printed gap %s, reproduced %s  %s%n", a.tableId(),
                        a.row(), c.claimB().row(), String.join(" / ", a.column()), ReportModel.signed(a, c.printedGap()),
                        gap, c.verdict().word()));
            }
        }
        return sb.toString();
    }

    /** The metric id with its parameters (recall_at_k:k=5), as --metric takes it. */
    private static String metric(Claim c) {
        if (c.params().isEmpty()) return c.metric();
        StringBuilder sb = new StringBuilder(c.metric()).append(':');
        c.params().forEach((k, v) -> sb.append(k).append('=').append(v).append(';'));
        return sb.substring(0, sb.length() - 1);
    }
}
