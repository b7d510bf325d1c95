package org.assay.audit;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Objects;
import org.assay.common.UserInputException;

/**
 * A file the audit read, with its size and SHA-256, so a report says exactly what was run on what.
 *
 * <p>The file is hashed on the first call to {@link #bytes()} or {@link #sha256()}, not when the
 * reproduction is read: {@code measure} never reports its inputs, and hashing a 500 MB score matrix
 * costs about as much as ranking it. {@code audit} asks for the hashes right after reading
 * (Auditor), so a report still describes the files as they were read.
 */
public final class InputFile {
    private final String role;
    private final Path path;
    private long bytes = -1;
    private String sha256;
    private RowCount rows;

    private InputFile(String role, Path path) {
        this.role = Objects.requireNonNull(role);
        this.path = Objects.requireNonNull(path);
    }

    /** The path relative to the working folder when it lies inside it, so reports travel well. */
    private static Path display(Path path) {
        Path abs = path.toAbsolutePath().normalize();
        Path cwd = Path.of("").toAbsolutePath();
        return abs.startsWith(cwd) ? cwd.relativize(abs) : abs;
    }

    /** The file {@code path} in the role {@code role} ("predictions for T3"); hashed when first asked. */
    public static InputFile of(String role, Path path) {
        return new InputFile(role, display(path));
    }

    public String role() { return role; }

    /** Records what became of the file's rows; returns this file. */
    public InputFile withRows(RowCount rows) {
        this.rows = rows;
        return this;
    }

    /** What became of the file's rows, or null where rows are not counted (a relevance file, a claims file). */
    public RowCount rows() { return rows; }

    public Path path() { return path; }

    /** The file's length in bytes, as hashed. */
    public synchronized long bytes() {
        hash();
        return bytes;
    }

    /** The file's SHA-256 in lower-case hex. */
    public synchronized String sha256() {
        hash();
        return sha256;
    }

    private void hash() {
        if (sha256 != null) return;
        try (InputStream in = Files.newInputStream(path)) {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            byte[] buf = new byte[1 << 16];
            long total = 0;
            for (int r; (r = in.read(buf)) > 0; ) {
                md.update(buf, 0, r);
                total += r;
            }
            bytes = total;
            sha256 = HexFormat.of().formatHex(md.digest());
        } catch (IOException e) {
            throw new UserInputException(path, null, "cannot read file: " + e.getMessage(), "check the path");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof InputFile f && role.equals(f.role) && path.equals(f.path) && sha256().equals(f.sha256());
    }

    @Override
    public int hashCode() { return Objects.hash(role, path); }

    @Override
    public String toString() { return "InputFile[" + role + ", " + path + "]"; }
}
