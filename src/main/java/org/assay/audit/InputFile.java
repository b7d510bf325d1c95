package org.assay.audit;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.assay.common.UserInputException;

/** A file the audit read, with its SHA-256, so a report says exactly what was run on what. */
public record InputFile(String role, Path path, long bytes, String sha256) {

    /** The path relative to the working folder when it lies inside it, so reports travel well. */
    private static Path display(Path path) {
        Path abs = path.toAbsolutePath().normalize();
        Path cwd = Path.of("").toAbsolutePath();
        return abs.startsWith(cwd) ? cwd.relativize(abs) : abs;
    }

    public static InputFile of(String role, Path path) {
        try (InputStream in = Files.newInputStream(path)) {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            byte[] buf = new byte[1 << 16];
            long total = 0;
            for (int r; (r = in.read(buf)) > 0; ) {
                md.update(buf, 0, r);
                total += r;
            }
            return new InputFile(role, display(path), total, HexFormat.of().formatHex(md.digest()));
        } catch (IOException e) {
            throw new UserInputException(path, null, "cannot read file: " + e.getMessage(), "check the path");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
