package org.assay.audit;

import java.util.ArrayList;
import java.util.List;
import org.assay.stats.BinomialTest;
import org.assay.stats.FinitePopulation;
import org.assay.stats.Interval;
import org.assay.stats.ProportionMethod;

/**
 * Exact evidence for a count metric (k successes of n units). With a known test-set size N
 * the counts of a random subsample are hypergeometric (DESIGN.md principle 3); without it
 * they are binomial. P-values and "range if true" are always exact; the reported interval is
 * the exact one unless the user named another proportion method.
 */
final class CountEvidence implements Evidence {
    private final long k;
    private final long n;
    private final Long population;
    private final IntervalChoice choice;
    private final List<String> notes = new ArrayList<>();

    CountEvidence(long k, long n, Long population, IntervalChoice choice) {
        this.k = k;
        this.n = n;
        this.population = population;
        this.choice = choice;
        if (population != null && choice != IntervalChoice.EXACT) {
            notes.add("the " + choice.id() + " interval assumes an infinite population; it ignores the finite test set of "
                    + population + " items");
        }
    }

    long successes() { return k; }

    long trials() { return n; }

    @Override public double estimate() { return (double) k / n; }

    @Override
    public Interval interval(double confidence) {
        if (choice == IntervalChoice.EXACT) {
            return population != null
                    ? FinitePopulation.exactInterval(k, n, population, confidence)
                    : ProportionMethod.CLOPPER_PEARSON.interval().compute(k, n, confidence);
        }
        ProportionMethod m = ProportionMethod.fromId(choice.id());
        return m.interval().compute(k, n, confidence);
    }

    /** Integer success counts K of the whole test set whose K/N lies in [lo, hi]; nearest ones when none does. */
    long[] populationCounts(double lo, double hi) {
        long size = population;
        long kMin = (long) Math.ceil(lo * size - 1e-9);
        long kMax = (long) Math.floor(hi * size + 1e-9);
        if (kMin > kMax) {   // no count rounds to the claim: test the two nearest achievable counts
            long t = kMin;
            kMin = kMax;
            kMax = t;
        }
        return new long[] {Math.max(0, kMin), Math.min(size, kMax)};
    }

    @Override
    public List<String> claimNotes(double lo, double hi) {
        if (population == null) return List.of();
        long kMin = (long) Math.ceil(lo * population - 1e-9);
        long kMax = (long) Math.floor(hi * population + 1e-9);
        if (kMin <= kMax) return List.of();
        return List.of("no count out of " + population + " items falls in the claim's rounding interval; it was tested "
                + "against the nearest achievable values " + kMax + "/" + population + " and " + kMin + "/" + population);
    }

    @Override
    public double pValue(double lo, double hi) {
        if (population != null) {
            long[] range = populationCounts(lo, hi);
            // the p-value is unimodal in K: its maximum over [kMin, kMax] is at the K nearest the
            // sample's own estimate, or at an end of the range
            double centre = (double) k / n * population;
            long best = Math.max(range[0], Math.min(range[1], Math.round(centre)));
            double p = 0;
            for (long cand : new long[] {range[0], range[1], best - 1, best, best + 1}) {
                if (cand < range[0] || cand > range[1]) continue;
                p = Math.max(p, FinitePopulation.twoSidedPValue(k, n, population, cand));
            }
            return Math.min(1, p);
        }
        double p0 = Math.max(lo, Math.min(hi, estimate()));
        return Math.min(1, BinomialTest.twoSidedPValue(k, n, Math.max(0, Math.min(1, p0))));
    }

    @Override
    public double[] rangeIfTrue(double lo, double hi, double confidence) {
        double tail = (1 - confidence) / 2;
        if (population != null) {
            long[] range = populationCounts(lo, hi);
            long low = FinitePopulation.quantiles(n, population, range[0], tail, 1 - tail)[0];
            long high = FinitePopulation.quantiles(n, population, range[1], tail, 1 - tail)[1];
            return new double[] {(double) low / n, (double) high / n};
        }
        long low = BinomialTest.quantiles(n, Math.max(0, lo), tail, 1 - tail)[0];
        long high = BinomialTest.quantiles(n, Math.min(1, hi), tail, 1 - tail)[1];
        return new double[] {(double) low / n, (double) high / n};
    }

    @Override
    public double standardError() { return standardErrorAt(n); }

    @Override
    public double standardErrorAt(long units) {
        double p = estimate();
        double var = p * (1 - p) / units;
        if (population != null) var *= FinitePopulation.correction(units, population);
        return Math.sqrt(var);
    }

    @Override public List<String> notes() { return notes; }
}
