package org.assay.common;

import java.nio.file.Path;

/**
 * One of the limits that keep an untrusted file from exhausting memory, the stack or time. Each
 * default lets any honest input through (the largest real inputs are noted beside it) and stops
 * files built to do harm. A user with a genuinely larger input raises a limit with
 * {@code --limit NAME=VALUE}; the error that a limit gives names that option.
 */
public enum Limit {
    /** Bytes in one predictions, truth, manifest, score, relevance or text file (a 10M-row CSV is ~0.5 GB). */
    FILE_BYTES("file-bytes", 64L << 30, "bytes in one data file"),
    /** Characters on one line of a CSV, TSV, JSON Lines or text file (a ranked list of 25,000 ids is ~0.3 M). */
    LINE_CHARS("line-chars", 16L << 20, "characters on one line"),
    /** Data rows in one file, and rows of a score matrix. */
    ROWS("rows", 1_000_000_000L, "rows in one file"),
    /** Columns of a CSV/TSV header, fields of a JSON Lines object, columns of a score matrix. */
    COLUMNS("columns", 1_000_000L, "columns in one file"),
    /** Nesting of mappings and lists in claims, audit and JSON Lines files (real ones: under 8). */
    DEPTH("depth", 64, "levels of nesting"),
    /** Bytes in a claims or audit file (real ones: a few kilobytes). */
    CLAIMS_BYTES("claims-bytes", 50L << 20, "bytes in a claims or audit file"),
    /** YAML aliases that point at a mapping or list (real claims files use none). */
    YAML_ALIASES("yaml-aliases", 50, "YAML aliases to mappings or lists"),
    /** Values after expanding YAML aliases: guards against exponential expansion within the alias limit. */
    YAML_VALUES("yaml-values", 1_000_000L, "values after expanding YAML aliases"),
    /** Bytes in a PDF (a long thesis is tens of megabytes). */
    PDF_BYTES("pdf-bytes", 500L << 20, "bytes in a PDF"),
    /** Pages in a PDF (a long thesis has a few hundred). */
    PDF_PAGES("pdf-pages", 2_000, "pages in a PDF"),
    /** Content-stream operators on one PDF page (a dense page has tens of thousands). */
    PDF_OPERATORS("pdf-operators", 5_000_000L, "drawing operators on one PDF page"),
    /** Milliseconds to read one PDF page (a dense page takes well under one second). */
    PDF_PAGE_MILLIS("pdf-page-millis", 10_000, "milliseconds to read one PDF page"),
    /** Bytes in one report template (the shipped ones are under 20 KiB). */
    TEMPLATE_BYTES("template-bytes", 1L << 20, "bytes in one template");

    private final String key;
    private final long defaultValue;
    private final String counts;

    Limit(String key, long defaultValue, String counts) {
        this.key = key;
        this.defaultValue = defaultValue;
        this.counts = counts;
    }

    /** The name users write after {@code --limit}. */
    public String key() { return key; }

    public long defaultValue() { return defaultValue; }

    /** What the limit counts, in words ("rows in one file"). */
    public String counts() { return counts; }

    /** The value in force for the running command. */
    public long value() { return Limits.current().get(this); }

    /** The value in force, for limits that library settings take as an int. */
    public int intValue() { return (int) Math.min(Integer.MAX_VALUE, value()); }

    /** True when {@code amount} goes beyond the value in force. */
    public boolean exceededBy(long amount) { return amount > value(); }

    /**
     * The error for an input that goes beyond this limit: {@code problem} says what the input
     * holds; the fix names the option that raises the limit.
     */
    public UserInputException exceeded(Path file, String position, String problem) {
        return new UserInputException(file, position, problem + " (limit " + key + " is " + value() + ")",
                "if the file is genuine, raise the limit with --limit " + key + "=N");
    }

    /** The limit named {@code key}, or null. */
    public static Limit byKey(String key) {
        for (Limit l : values()) if (l.key.equals(key)) return l;
        return null;
    }
}
