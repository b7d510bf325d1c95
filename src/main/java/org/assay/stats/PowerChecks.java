package org.assay.stats;

import org.assay.common.UserInputException;

/**
 * Argument checks shared by the power and paired-comparison classes. The values usually come
 * from a printed results table, so a bad one is the user's to fix: one wording, one place.
 */
final class PowerChecks {
    private PowerChecks() {}

    static void proportion(String name, double p) {
        if (!(p >= 0 && p <= 1)) {
            throw UserInputException.usage(name + " must be a proportion between 0 and 1, got " + p,
                    "give it as a fraction of the items, e.g. 0.912 for 91.2%");
        }
    }

    static void items(String name, long n) {
        if (n < 1) {
            throw UserInputException.usage(name + " must be at least 1, got " + n,
                    "give the number of test items the values were computed on");
        }
    }

    static void count(String name, long k) {
        if (k < 0) {
            throw UserInputException.usage(name + " must not be negative, got " + k, "give a count of items");
        }
    }

    static void alpha(double alpha) {
        if (!(alpha > 0 && alpha < 1)) {
            throw UserInputException.usage("significance level must be strictly between 0 and 1, got " + alpha,
                    "use e.g. 0.05");
        }
    }

    static void power(double power, double alpha) {
        if (!(power > alpha && power < 1)) {
            throw UserInputException.usage("target power must be above the significance level " + alpha
                    + " and below 1, got " + power, "use e.g. 0.8");
        }
    }
}
