package org.assay.pdf;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import org.assay.common.Limit;
import org.junit.jupiter.api.Test;

/** The per-page budget names the limit that ran out, so the error can name the option raising it. */
class PageBudgetTest {
    @Test
    void operatorsBeyondTheBudgetNameTheOperatorLimit() {
        PageBudget budget = new PageBudget(10, 60_000);
        PageBudget.Exceeded e = catchThrowableOfType(() -> { for (int i = 0; i < 11; i++) budget.tick(); },
                PageBudget.Exceeded.class);
        assertThat(e.limit()).isEqualTo(Limit.PDF_OPERATORS);
    }

    @Test
    void anExpiredTimeBudgetNamesTheTimeLimit() {
        // the clock is read every 1024 operators; with no time at all the first reading is past the deadline
        PageBudget budget = new PageBudget(1_000_000, 0);
        PageBudget.Exceeded e = catchThrowableOfType(() -> { for (int i = 0; i < 2048; i++) budget.tick(); },
                PageBudget.Exceeded.class);
        assertThat(e.limit()).isEqualTo(Limit.PDF_PAGE_MILLIS);
    }
}
