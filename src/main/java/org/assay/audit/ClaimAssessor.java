package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.assay.claims.Claim;
import org.assay.stats.Interval;

/**
 * Compares one claim with the evidence of a reproduction: the claim's rounding interval, the
 * p-value against it, the two one-sided tests for agreement within the margin, and the
 * verdict once the p-value has been adjusted for multiplicity.
 */
final class ClaimAssessor {
    private static final NormalDistribution NORMAL = new NormalDistribution(null, 0, 1);
    private final EstimationSettings settings;

    ClaimAssessor(EstimationSettings settings) { this.settings = settings; }

    /** A finding whose verdict uses the unadjusted p-value; {@link #withAdjustedP} finalises it. */
    Finding assess(Claim claim, Evidence evidence, long n, Long population, double margin, List<String> tableNotes) {
        double[] ci = claim.value().roundingInterval(claim.scale());
        double lo = ci[0], hi = ci[1];
        double conf = settings.confidence();
        Interval interval = evidence.interval(conf);
        // two one-sided tests at level alpha each = the (1 - 2 alpha) interval inside the margin band
        Interval equivalence = evidence.interval(1 - 2 * settings.alpha());
        double est = evidence.estimate();
        double difference = est < lo ? est - lo : est > hi ? est - hi : 0;
        double p = evidence.pValue(lo, hi);
        List<String> notes = new ArrayList<>(evidence.claimNotes(lo, hi));
        notes.addAll(evidence.notes());
        notes.addAll(tableNotes);
        Finding f = new Finding(claim, null, lo, hi, n, population, est, interval, equivalence,
                evidence.rangeIfTrue(lo, hi, conf), p, p, margin, difference, null, null, notes, evidence.histogram());
        Verdict v = verdict(f);
        Long settle = v == Verdict.INCONCLUSIVE ? itemsToSettle(evidence, n, population, lo, hi, margin) : null;
        return copy(f, v, p, settle);
    }

    Finding withAdjustedP(Finding f, double adjusted) {
        Finding g = copy(f, null, adjusted, f.itemsToSettle());
        return copy(g, verdict(g), adjusted, g.itemsToSettle());
    }

    private Verdict verdict(Finding f) {
        if (f.adjustedP() < settings.alpha()) return Verdict.DISCREPANT;
        boolean agrees = f.equivalence().lower() >= f.claimLower() - f.margin() - 1e-12
                && f.equivalence().upper() <= f.claimUpper() + f.margin() + 1e-12;
        return agrees ? Verdict.CONSISTENT : Verdict.INCONCLUSIVE;
    }

    /**
     * The smallest subsample size whose (1 - 2 alpha) normal-approximation interval around the
     * current estimate would fit inside the margin band; null when none would.
     */
    private Long itemsToSettle(Evidence evidence, long n, Long population, double lo, double hi, double margin) {
        double est = evidence.estimate();
        double room = Math.min(est - (lo - margin), (hi + margin) - est);
        if (room <= 0) return null;
        double z = NORMAL.inverseCumulativeProbability(1 - settings.alpha());
        long max = population != null ? population : Math.max(100_000_000L, n * 1000L);
        if (z * evidence.standardErrorAt(max) > room) return null;
        long a = n, b = max;   // se(a) too large, se(b) small enough
        while (b - a > 1) {
            long mid = a + (b - a) / 2;
            if (z * evidence.standardErrorAt(mid) <= room) b = mid; else a = mid;
        }
        return b;
    }

    private static Finding copy(Finding f, Verdict v, double adjusted, Long settle) {
        return new Finding(f.claim(), v, f.claimLower(), f.claimUpper(), f.n(), f.population(), f.estimate(),
                f.interval(), f.equivalence(), f.rangeIfTrue(), f.pValue(), adjusted, f.margin(), f.difference(),
                settle, f.reason(), f.notes(), f.histogram());
    }
}
