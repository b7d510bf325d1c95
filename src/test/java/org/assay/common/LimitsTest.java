package org.assay.common;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;
import org.junit.jupiter.api.Test;

/** Parsing --limit values and scoping them to one command. */
class LimitsTest {
    @Test
    void defaultsHoldUntilAValueIsGiven() {
        Limits limits = Limits.parse(Map.of("rows", "5"));
        assertThat(limits.get(Limit.ROWS)).isEqualTo(5);
        assertThat(limits.get(Limit.COLUMNS)).isEqualTo(Limit.COLUMNS.defaultValue());
    }

    @Test
    void suffixesArePowersOf1024AndUnderscoresAreIgnored() {
        assertThat(Limits.parse(Map.of("file-bytes", "4G")).get(Limit.FILE_BYTES)).isEqualTo(4L << 30);
        assertThat(Limits.parse(Map.of("line-chars", "64M")).get(Limit.LINE_CHARS)).isEqualTo(64L << 20);
        assertThat(Limits.parse(Map.of("template-bytes", "8k")).get(Limit.TEMPLATE_BYTES)).isEqualTo(8L << 10);
        assertThat(Limits.parse(Map.of("rows", "2_000_000")).get(Limit.ROWS)).isEqualTo(2_000_000L);
    }

    @Test
    void unknownNamesAndNonPositiveValuesAreUsageErrors() {
        assertThatThrownBy(() -> Limits.parse(Map.of("lines", "5")))
                .isInstanceOf(UserInputException.class).hasMessageContaining("no such limit").hasMessageContaining("line-chars");
        assertThatThrownBy(() -> Limits.parse(Map.of("rows", "0"))).hasMessageContaining("positive whole number");
        assertThatThrownBy(() -> Limits.parse(Map.of("rows", "-3"))).hasMessageContaining("positive whole number");
        assertThatThrownBy(() -> Limits.parse(Map.of("rows", "1.5"))).hasMessageContaining("positive whole number");
        assertThatThrownBy(() -> Limits.parse(Map.of("rows", "9999999999G"))).hasMessageContaining("positive whole number");
    }

    @Test
    void aCommandsLimitsAreRestoredAfterIt() {
        Limits.parse(Map.of("rows", "7")).runWith(() -> {
            assertThat(Limit.ROWS.value()).isEqualTo(7);
            return null;
        });
        assertThat(Limit.ROWS.value()).isEqualTo(Limit.ROWS.defaultValue());
    }

    @Test
    void theErrorNamesTheOptionThatRaisesTheLimit() {
        UserInputException e = Limit.DEPTH.exceeded(null, "line 3", "the JSON is nested too deeply");
        assertThat(e.oneLine()).contains("limit depth is 64").contains("--limit depth=N");
    }

    @Test
    void keysAreDistinct() {
        assertThat(java.util.Arrays.stream(Limit.values()).map(Limit::key).distinct().count())
                .isEqualTo(Limit.values().length);
    }
}
