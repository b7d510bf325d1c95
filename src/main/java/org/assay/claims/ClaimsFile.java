package org.assay.claims;

import java.nio.file.Path;
import java.util.List;

/** A whole claims file: where the numbers come from and their tables. */
public record ClaimsFile(Path file, String title, String document, List<ClaimTable> tables) {
    public ClaimsFile {
        tables = List.copyOf(tables);
    }

    public List<Claim> allClaims() {
        return tables.stream().flatMap(t -> t.claims().stream()).toList();
    }
}
