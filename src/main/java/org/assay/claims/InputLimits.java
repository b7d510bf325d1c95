package org.assay.claims;

/**
 * Limits that keep an untrusted claims file from exhausting memory or the stack. A real
 * claims file is a few kilobytes, six levels deep, with no YAML aliases at all, so the
 * limits are generous for honest files and small for hostile ones.
 */
final class InputLimits {
    /** Largest file accepted, in bytes (and in code points for the YAML scanner). */
    static final int MAX_FILE_BYTES = 50 * 1024 * 1024;
    /** Deepest nesting of mappings/sequences (JSON objects/arrays). */
    static final int MAX_DEPTH = 64;
    /** YAML aliases that may point at a mapping or sequence. */
    static final int MAX_COLLECTION_ALIASES = 50;
    /** Nodes after expanding YAML aliases; guards against exponential expansion within the alias limit. */
    static final int MAX_EXPANDED_NODES = 1_000_000;

    private InputLimits() {}
}
