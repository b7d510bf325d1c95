package org.assay.stats;

/**
 * A confidence interval for a binomial proportion from {@code successes} out of {@code trials}
 * independent trials (an infinite population, or sampling with replacement). One small class per
 * published method implements it; {@link ProportionMethod} names them.
 */
public interface ProportionInterval {
    /**
     * @param successes  0 &lt;= successes &lt;= trials
     * @param trials     &gt; 0
     * @param confidence two-sided confidence level, 0 &lt; confidence &lt; 1
     * @throws IllegalArgumentException when an argument is out of range
     */
    Interval compute(long successes, long trials, double confidence);
}
