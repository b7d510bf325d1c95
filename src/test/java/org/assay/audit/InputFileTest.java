package org.assay.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InputFileTest {
    @TempDir Path dir;

    @Test
    void hashIsTheSha256OfTheBytes() throws Exception {
        Path f = Files.writeString(dir.resolve("abc.txt"), "abc", StandardCharsets.US_ASCII);
        InputFile in = InputFile.of("claims", f);
        // FIPS 180-2, appendix B.1: SHA-256("abc")
        assertThat(in.sha256()).isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
        assertThat(in.bytes()).isEqualTo(3);
        assertThat(in.role()).isEqualTo("claims");
    }

    @Test
    void theFileIsReadOnlyWhenItsHashIsAskedFor() throws Exception {
        Path f = dir.resolve("later.txt");
        InputFile in = InputFile.of("predictions", f);   // no file yet: nothing read
        assertThatThrownBy(in::sha256).isInstanceOf(UserInputException.class).hasMessageContaining("cannot read file");
        Files.writeString(f, "abc", StandardCharsets.US_ASCII);
        InputFile now = InputFile.of("predictions", f);
        assertThat(now.sha256()).startsWith("ba7816bf");
        Files.writeString(f, "changed", StandardCharsets.US_ASCII);
        assertThat(now.sha256()).as("hashed once, as first read").startsWith("ba7816bf");
        assertThat(now.bytes()).isEqualTo(3);
    }
}
