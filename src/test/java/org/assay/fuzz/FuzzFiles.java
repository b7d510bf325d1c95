package org.assay.fuzz;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;

/**
 * One temporary folder per test JVM where the harnesses write each fuzzed input as a file, because the
 * readers under test take a path (they check sizes, extensions and headers before reading). A fixed
 * name per harness is overwritten on every run, so fuzzing millions of inputs leaves one file each.
 */
final class FuzzFiles {
    private static final Path DIR = createFolder();
    private static final Set<String> NAMES = new HashSet<>();

    private FuzzFiles() {}

    /** Writes {@code bytes} to {@code name} in the folder and returns its path. */
    static synchronized Path write(String name, byte[] bytes) {
        Path file = DIR.resolve(name);
        if (NAMES.add(name)) file.toFile().deleteOnExit();   // registered after the folder: deleted before it
        try {
            Files.write(file, bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }

    private static Path createFolder() {
        try {
            Path dir = Files.createTempDirectory("assay-fuzz");
            dir.toFile().deleteOnExit();
            return dir;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
