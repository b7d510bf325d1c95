package org.assay.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** The user sees one line on stderr, whatever text from the file the message quotes. */
class UserInputExceptionTest {

    @Test
    void composesFilePositionProblemAndFix() {
        UserInputException e = new UserInputException(Path.of("scores.npy"), "header", "has no shape", "re-save it");
        assertThat(e.oneLine()).isEqualTo("scores.npy, header: has no shape (re-save it)");
    }

    @Test
    void everyKindOfLineBreakInQuotedTextBecomesASpace() {
        // Found by NpyScoreMatrixFuzzTest: a header quoted in the message held carriage returns.
        UserInputException e = new UserInputException(Path.of("scores.npy"), "header",
                "a header that is not a dict: {'a\r\rb\nc\u0085d\u2028e\u2029f", "re-save\r\nit");
        assertThat(e.oneLine()).isEqualTo("scores.npy, header: a header that is not a dict: {'a  b c d e f (re-save  it)");
    }

    @Test
    void otherControlCharactersAreShownAsQuestionMarksAndTabsStay() {
        UserInputException e = new UserInputException(null, "line 3", "label '\u001b[31mred\u0000' and\ttab", null);
        assertThat(e.oneLine()).isEqualTo("line 3: label '?[31mred?' and\ttab");
    }
}
