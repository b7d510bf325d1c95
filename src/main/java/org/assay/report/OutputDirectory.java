package org.assay.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Map;
import org.assay.common.UserInputException;

/**
 * Writes a set of report files into a folder. Nothing is overwritten without {@code force};
 * every file is first written to a temporary file in the same folder and then moved into place,
 * so a crash never leaves a half-written report. All checks run before the first write.
 */
public final class OutputDirectory {
    private final Path dir;
    private final boolean force;

    public OutputDirectory(Path dir, boolean force) {
        this.dir = dir;
        this.force = force;
    }

    /** Writes {@code files} (name to text, UTF-8); returns the paths written. */
    public java.util.List<Path> write(Map<String, String> files) {
        Map<String, byte[]> bytes = new java.util.LinkedHashMap<>();
        files.forEach((name, text) -> bytes.put(name, text.getBytes(StandardCharsets.UTF_8)));
        return writeBytes(bytes);
    }

    /** Fails, before anything is written, when a file of {@code names} exists and {@code force} is off. */
    public void checkWritable(java.util.Collection<String> names) {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new UserInputException(dir, null, "the output path exists and is not a folder", "choose another --out");
        }
        for (String name : names) {
            Path target = dir.resolve(name);
            if (Files.exists(target) && !force) {
                throw new UserInputException(target, null, "refusing to overwrite an existing file",
                        "pass --force to replace it, or choose another --out");
            }
        }
    }

    /** Writes {@code files} (name to bytes); returns the paths written. */
    public java.util.List<Path> writeBytes(Map<String, byte[]> files) {
        checkWritable(files.keySet());
        boolean created = !Files.exists(dir);
        try {
            Files.createDirectories(dir);
            java.util.List<Path> written = new java.util.ArrayList<>();
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                Path target = dir.resolve(e.getKey());
                Path tmp = Files.createTempFile(dir, "." + e.getKey() + ".", ".tmp");
                try {
                    Files.write(tmp, e.getValue());
                    move(tmp, target);
                } finally {
                    Files.deleteIfExists(tmp);
                }
                written.add(target);
            }
            return written;
        } catch (IOException e) {
            if (created) deleteQuietly();
            throw new UserInputException(dir, null, "cannot write the report: " + e.getMessage(),
                    "check that the folder is writable");
        }
    }

    private static void move(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private void deleteQuietly() {
        try (var s = Files.walk(dir)) {
            s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException ignored) {
            // best effort: the folder was ours and is being abandoned
        }
    }
}
