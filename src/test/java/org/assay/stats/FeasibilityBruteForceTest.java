package org.assay.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.math3.fraction.BigFraction;
import org.junit.jupiter.api.Test;

/**
 * An independent oracle: every outcome on a small test set is enumerated (all TP, FP, FN, TN;
 * all score vectors; all per-class counts), its exact value rounded with plain integer division
 * (no BigDecimal, none of the production code), and the set of printable strings compared with
 * the production answer for every claim on a grid of printed values.
 */
class FeasibilityBruteForceTest {
    private static final List<String> FRACTIONS = grid(2, 101, 1);      // 0.00 .. 1.01
    private static final List<String> PERCENTS = grid(1, 1001, 100);    // 0.0 .. 100.1

    /** Printed values i / 10^decimals for i = 0..count, as text. */
    private static List<String> grid(int decimals, int count, int scale) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i <= count; i++) out.add(text(BigInteger.valueOf(i), decimals));
        return out;
    }

    private static String text(BigInteger units, int decimals) {
        String digits = units.toString();
        if (decimals == 0) return digits;
        while (digits.length() <= decimals) digits = "0" + digits;
        return digits.substring(0, digits.length() - decimals) + "." + digits.substring(digits.length() - decimals);
    }

    /** Rounds v >= 0, times scale, to decimals by rule with integer division only. */
    static String print(BigFraction v, int scale, int decimals, RoundingRule rule) {
        BigInteger a = v.getNumerator().multiply(BigInteger.valueOf(scale)).multiply(BigInteger.TEN.pow(decimals));
        BigInteger den = v.getDenominator();
        BigInteger[] qr = a.divideAndRemainder(den);
        BigInteger q = qr[0];
        int half = qr[1].shiftLeft(1).compareTo(den);
        boolean up = switch (rule) {
            case HALF_UP -> half >= 0;
            case HALF_EVEN -> half > 0 || half == 0 && q.testBit(0);
            case TRUNCATE -> false;
        };
        return text(up ? q.add(BigInteger.ONE) : q, decimals);
    }

    /** What the enumerated values say about one printed claim. */
    record Expected(boolean halfUp, boolean halfEven, boolean truncated, String below, String above) {}

    static final class Oracle {
        private final TreeSet<BigFraction> values;
        private final int scale;
        private final int decimals;
        private final Map<RoundingRule, Set<String>> printable = new HashMap<>();

        Oracle(Set<BigFraction> values, int scale, int decimals) {
            this.values = new TreeSet<>(values);
            this.scale = scale;
            this.decimals = decimals;
            for (RoundingRule rule : RoundingRule.values()) {
                Set<String> s = new HashSet<>();
                for (BigFraction v : values) s.add(print(v, scale, decimals, rule));
                printable.put(rule, s);
            }
        }

        Expected expect(String claim) {
            BigFraction x = new BigFraction(new BigInteger(claim.replace(".", "")),
                    BigInteger.TEN.pow(decimals).multiply(BigInteger.valueOf(scale)));
            BigFraction below = values.lower(x);
            while (below != null && roundsTo(below, claim)) below = values.lower(below);
            BigFraction above = values.higher(x);
            while (above != null && roundsTo(above, claim)) above = values.higher(above);
            return new Expected(printable.get(RoundingRule.HALF_UP).contains(claim),
                    printable.get(RoundingRule.HALF_EVEN).contains(claim),
                    printable.get(RoundingRule.TRUNCATE).contains(claim),
                    below == null ? null : print(below, scale, decimals, RoundingRule.HALF_UP),
                    above == null ? null : print(above, scale, decimals, RoundingRule.HALF_UP));
        }

        private boolean roundsTo(BigFraction v, String claim) {
            return print(v, scale, decimals, RoundingRule.HALF_UP).equals(claim)
                    || print(v, scale, decimals, RoundingRule.HALF_EVEN).equals(claim);
        }
    }

    /** Compares every claim on both grids; witness(text) recomputes the value a witness names, or null if invalid. */
    private static void compare(String what, Set<BigFraction> achievable, Function<Printed, Feasibility> check,
                                Function<String, BigFraction> witnessValue) {
        for (int scale : new int[] {1, 100}) {
            int decimals = scale == 1 ? 2 : 1;
            Oracle oracle = new Oracle(achievable, scale, decimals);
            for (String claim : scale == 1 ? FRACTIONS : PERCENTS) {
                Expected e = oracle.expect(claim);
                Feasibility f = check.apply(Printed.of(claim, scale));
                String ctx = what + " claim " + claim + " (scale " + scale + "): " + f;
                assertThat(f.exhaustive()).as(ctx).isTrue();
                assertThat(f.halfUpFeasible()).as(ctx).isEqualTo(e.halfUp());
                assertThat(f.halfEvenFeasible()).as(ctx).isEqualTo(e.halfEven());
                assertThat(f.roundedFeasible()).as(ctx).isEqualTo(e.halfUp() || e.halfEven());
                assertThat(f.truncatedFeasible()).as(ctx).isEqualTo(e.truncated());
                assertThat(f.nearestBelow()).as(ctx).isEqualTo(e.below());
                assertThat(f.nearestAbove()).as(ctx).isEqualTo(e.above());
                RoundingRule rule = e.halfUp() ? RoundingRule.HALF_UP : e.halfEven() ? RoundingRule.HALF_EVEN
                        : e.truncated() ? RoundingRule.TRUNCATE : null;
                if (rule == null) {
                    assertThat(f.witness()).as(ctx).isNull();
                } else {
                    BigFraction v = witnessValue.apply(f.witness());
                    assertThat(v).as(ctx + " witness invalid").isNotNull();
                    assertThat(achievable).as(ctx).contains(v);
                    assertThat(print(v, scale, decimals, rule)).as(ctx).isEqualTo(claim);
                }
            }
        }
    }

    private static Map<String, Long> fields(String witness) {
        Map<String, Long> out = new HashMap<>();
        Matcher m = Pattern.compile("(\\w+) = (\\d+)").matcher(witness);
        while (m.find()) out.put(m.group(1), Long.parseLong(m.group(2)));
        return out;
    }

    /** Small test sets, and the positive counts to try with each. */
    private static long[][] sizes() {
        List<long[]> out = new ArrayList<>();
        for (long n = 1; n <= 9; n++) {
            long[] row = new long[(int) n + 2];
            row[0] = n;
            for (int p = 0; p <= n; p++) row[p + 1] = p;
            out.add(row);
        }
        for (long n : new long[] {16, 25, 40}) out.add(new long[] {n, 0, 1, n / 3, n / 2, n - 1, n});
        return out.toArray(new long[0][]);
    }

    @Test
    void binaryMetricsAgreeWithEnumeration() {
        for (long[] row : sizes()) {
            long n = row[0];
            Map<Long, Set<BigFraction>> recall = new HashMap<>();
            Map<Long, Set<BigFraction>> precision = new HashMap<>();
            Map<Long, Set<BigFraction>> f1 = new HashMap<>();
            Set<BigFraction> anyRecall = new HashSet<>();
            Set<BigFraction> anyPrecision = new HashSet<>();
            Set<BigFraction> anyF1 = new HashSet<>();
            for (long tp = 0; tp <= n; tp++) {
                for (long fp = 0; tp + fp <= n; fp++) {
                    for (long fn = 0; tp + fp + fn <= n; fn++) {
                        long p = tp + fn;
                        if (p > 0) add(recall, anyRecall, p, new BigFraction(tp, p));
                        if (tp + fp > 0) add(precision, anyPrecision, p, new BigFraction(tp, tp + fp));
                        // F1 = 0 when TP = 0: scikit-learn's zero_division=0 convention
                        add(f1, anyF1, p, tp == 0 ? BigFraction.ZERO : new BigFraction(2 * tp, 2 * tp + fp + fn));
                    }
                }
            }
            compare("recall n=" + n, anyRecall, pr -> RatioFeasibility.recall(pr, n, null), w -> recallOf(w, n, null));
            compare("precision n=" + n, anyPrecision, pr -> RatioFeasibility.precision(pr, n, null), w -> precisionOf(w, n, null));
            compare("f1 n=" + n, anyF1, pr -> RatioFeasibility.f1(pr, n, null), w -> f1Of(w, n, null));
            for (int i = 1; i < row.length; i++) {
                long p = row[i];
                if (p > 0) compare("recall n=" + n + " P=" + p, recall.get(p),
                        pr -> RatioFeasibility.recall(pr, n, p), w -> recallOf(w, n, p));
                if (precision.containsKey(p)) compare("precision n=" + n + " P=" + p, precision.get(p),
                        pr -> RatioFeasibility.precision(pr, n, p), w -> precisionOf(w, n, p));
                compare("f1 n=" + n + " P=" + p, f1.get(p), pr -> RatioFeasibility.f1(pr, n, p), w -> f1Of(w, n, p));
            }
        }
    }

    private static void add(Map<Long, Set<BigFraction>> byP, Set<BigFraction> any, long p, BigFraction v) {
        byP.computeIfAbsent(p, x -> new HashSet<>()).add(v);
        any.add(v);
    }

    private static BigFraction recallOf(String witness, long n, Long p) {
        Map<String, Long> c = fields(witness);
        long tp = c.get("TP");
        long fn = c.get("FN");
        if (tp + fn < 1 || tp + fn > n || p != null && tp + fn != p) return null;
        return new BigFraction(tp, tp + fn);
    }

    private static BigFraction precisionOf(String witness, long n, Long p) {
        Map<String, Long> c = fields(witness);
        long tp = c.get("TP");
        long fp = c.get("FP");
        if (tp + fp < 1 || tp + fp > n || p != null && (tp > p || fp > n - p)) return null;
        return new BigFraction(tp, tp + fp);
    }

    private static BigFraction f1Of(String witness, long n, Long p) {
        Map<String, Long> c = fields(witness);
        long tp = c.get("TP");
        long fp = c.get("FP");
        long fn = c.get("FN");
        long tn = c.get("TN");
        if (tp + fp + fn + tn != n || p != null && tp + fn != p) return null;
        return tp == 0 ? BigFraction.ZERO : new BigFraction(2 * tp, 2 * tp + fp + fn);
    }

    @Test
    void rocAucAgreesWithEveryScoreVector() {
        long[][] shapes = {{1, 1}, {1, 2}, {2, 1}, {1, 3}, {2, 2}, {2, 3}, {3, 3}, {1, 5}, {2, 4}};
        for (long[] shape : shapes) {
            int pos = (int) shape[0];
            int neg = (int) shape[1];
            int n = pos + neg;
            Set<BigFraction> auc = new HashSet<>();
            int[] score = new int[n];
            long total = (long) Math.pow(n, n);
            for (long code = 0; code < total; code++) {
                long c = code;
                for (int i = 0; i < n; i++) {
                    score[i] = (int) (c % n);
                    c /= n;
                }
                long halves = 0;                                      // items 0..pos-1 are positive
                for (int i = 0; i < pos; i++) {
                    for (int j = pos; j < n; j++) halves += score[i] > score[j] ? 2 : score[i] == score[j] ? 1 : 0;
                }
                auc.add(new BigFraction(halves, 2L * pos * neg));
            }
            compare("auc " + pos + "x" + neg, auc, pr -> RatioFeasibility.rocAuc(pr, pos, neg), w -> {
                Matcher m = Pattern.compile("\\((\\d+) ordered correctly, (\\d+) tied, (\\d+) reversed\\)").matcher(w);
                if (!m.find()) return null;
                long ordered = Long.parseLong(m.group(1));
                long tied = Long.parseLong(m.group(2));
                long reversed = Long.parseLong(m.group(3));
                if (ordered + tied + reversed != (long) pos * neg) return null;
                return new BigFraction(2 * ordered + tied, 2L * pos * neg);
            });
        }
    }

    @Test
    void macroRecallAgreesWithEveryPerClassCount() {
        long[][] shapes = {{1}, {4}, {2, 3}, {7, 9}, {3, 4, 5}, {1, 1, 7}, {2, 5, 6, 3}, {30, 40, 50}};
        for (long[] counts : shapes) {
            Set<BigFraction> means = new HashSet<>();
            enumerate(counts, 0, BigFraction.ZERO, means);
            compare("macro recall " + java.util.Arrays.toString(counts), means,
                    pr -> RatioFeasibility.macroRecall(pr, counts), w -> macroOf(w, counts));
        }
    }

    private static void enumerate(long[] counts, int c, BigFraction sum, Set<BigFraction> out) {
        if (c == counts.length) {
            out.add(sum.divide(counts.length));
            return;
        }
        for (long t = 0; t <= counts[c]; t++) enumerate(counts, c + 1, sum.add(new BigFraction(t, counts[c])), out);
    }

    static BigFraction macroOf(String witness, long[] counts) {
        Matcher m = Pattern.compile("(\\d+) of (\\d+)").matcher(witness);
        BigFraction sum = BigFraction.ZERO;
        int c = 0;
        while (m.find()) {
            long right = Long.parseLong(m.group(1));
            long of = Long.parseLong(m.group(2));
            if (c >= counts.length || of != counts[c] || right > of) return null;
            sum = sum.add(new BigFraction(right, of));
            c++;
        }
        return c == counts.length ? sum.divide(counts.length) : null;
    }
}
