package org.assay.data;

import org.assay.common.UserInputException;
import org.assertj.core.api.ThrowableAssert;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Test helpers: fixture paths, small files written on the fly, and the shape of user errors. */
final class Fixtures {
    private Fixtures() {}

    static Path resource(String name) {
        try {
            return Path.of(Fixtures.class.getResource("/data/" + name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static Path write(Path dir, String name, String content) throws IOException {
        return write(dir, name, content.getBytes(StandardCharsets.UTF_8));
    }

    static Path write(Path dir, String name, byte[] content) throws IOException {
        Path file = dir.resolve(name);
        Files.write(file, content);
        return file;
    }

    /**
     * Asserts a {@link UserInputException} about {@code file} at {@code position} (null: none)
     * whose one-line message contains every fragment, and which says what to do.
     */
    static void assertUserError(ThrowableAssert.ThrowingCallable call, Path file, String position,
                                String... fragments) {
        assertThatThrownBy(call)
                .isInstanceOfSatisfying(UserInputException.class, e -> {
                    org.assertj.core.api.Assertions.assertThat(e.where()).isEqualTo(file);
                    org.assertj.core.api.Assertions.assertThat(e.position()).isEqualTo(position);
                    org.assertj.core.api.Assertions.assertThat(e.fix()).isNotBlank();
                    org.assertj.core.api.Assertions.assertThat(e.oneLine())
                            .contains(file.getFileName().toString())
                            .doesNotContain("\n")
                            .contains(fragments);
                    if (position != null) org.assertj.core.api.Assertions.assertThat(e.oneLine()).contains(position);
                });
    }
}
