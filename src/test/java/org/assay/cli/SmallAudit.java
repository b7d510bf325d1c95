package org.assay.cli;

/**
 * The smallest valid audit inputs, shared by the tests that damage one of them (bad inputs, limits):
 * one accuracy claim and six binary predictions. Invented test data.
 */
final class SmallAudit {
    private SmallAudit() {}

    /** One accuracy claim of 75.0 percent on 1,000 examples; the claim starts on line 5, its value is on line 8. */
    static final String CLAIMS = String.join("\n",
            "tables:",                                   // line 1
            "  - id: T1",                                // 2
            "    test_size: 1000",                       // 3
            "    claims:",                               // 4
            "      - row: Ours",                         // 5
            "        column: [Accuracy]",                // 6
            "        metric: accuracy",                  // 7
            "        value: \"75.0\"",                   // 8
            "        scale: percent",                    // 9
            "");

    /** Six binary predictions with scores (positive class 1), four of them correct. */
    static final String PREDICTIONS = "id,label,prediction,score\n"
            + "a,1,1,0.9\nb,0,0,0.2\nc,1,0,0.4\nd,0,0,0.1\ne,1,1,0.8\nf,0,1,0.6\n";
}
