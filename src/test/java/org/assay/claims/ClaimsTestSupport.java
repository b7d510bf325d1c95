package org.assay.claims;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.assay.common.UserInputException;

/** Small helpers shared by the claims tests. */
final class ClaimsTestSupport {
    private ClaimsTestSupport() {}

    static Path fixture(String name) {
        try {
            return Path.of(ClaimsTestSupport.class.getResource("/claims/" + name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static Path write(Path dir, String name, String content) {
        try {
            return Files.writeString(dir.resolve(name), content, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads a file that must be rejected and returns the exception. */
    static UserInputException rejected(Path file) {
        UserInputException[] caught = new UserInputException[1];
        assertThatThrownBy(() -> ClaimsReader.read(file))
                .isInstanceOfSatisfying(UserInputException.class, e -> caught[0] = e);
        return caught[0];
    }

    /** The same model with every location and the file path removed, for comparing formats. */
    static ClaimsFile withoutLocations(ClaimsFile f) {
        return new ClaimsFile(null, f.title(), f.document(), f.tables().stream()
                .map(t -> new ClaimTable(t.id(), t.caption(), t.testSize(), t.runs(), t.claims().stream()
                        .map(c -> new Claim(c.tableId(), c.row(), c.column(), c.metric(), c.params(), c.value(),
                                c.scale(), c.pm(), c.pmKind(), c.page(), c.margin(), null, c.testSize(), c.bold()))
                        .toList(), t.classCounts(), t.compare()))
                .toList());
    }
}
