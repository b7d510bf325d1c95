package org.assay.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Pattern;
import org.assay.common.Limit;
import org.assay.common.UserInputException;
import org.assay.common.Utf8Text;

/**
 * Where report templates come from: a folder of the user's (from {@code assay init} or
 * {@code --template DIR}), falling back to the templates bundled in the jar for any file the
 * folder does not have. Only plain file names are looked up, never paths, and a name that is a
 * symbolic link must lead to a file inside the folder, so a template (or a partial it includes)
 * cannot read a file outside the folder.
 */
public final class TemplateSource {
    private static final Pattern NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9_.-]{0,99}");

    /** Every template shipped in audit-templates/ (a test keeps this list equal to the folder). */
    public static final java.util.List<String> SHIPPED = java.util.List.of(
            "report.md.mustache", "report.html.mustache", "replication-notes.md.mustache", "reviewer-comments.md.mustache",
            "claims-table.md.mustache", "claims-table.tex.mustache", "check.md.mustache", "check.html.mustache",
            "check-findings.md.mustache", "check-findings.tex.mustache", "cautions.md.mustache", "provenance.md.mustache",
            "check-findings.html.mustache", "cautions.html.mustache", "provenance.html.mustache", "report-style.html.mustache");

    private final Path folder;

    private TemplateSource(Path folder) { this.folder = folder; }

    /**
     * The shipped templates: those bundled in the jar, or, when the system property
     * {@code assay.templates} names a folder (the {@code ./assay} launcher points it at the
     * checkout's audit-templates/), that folder first, so an edit there shows in the next report
     * without rebuilding the jar.
     */
    public static TemplateSource bundled() {
        String dev = System.getProperty("assay.templates");
        return dev != null && Files.isDirectory(Path.of(dev)) ? new TemplateSource(Path.of(dev)) : new TemplateSource(null);
    }

    /** The user's folder first, the bundled templates for the rest. */
    public static TemplateSource folder(Path folder) {
        if (!Files.isDirectory(folder)) {
            throw new UserInputException(folder, null, "the template folder does not exist",
                    "give the folder 'assay init' wrote, or leave out --template");
        }
        return new TemplateSource(folder);
    }

    /** The user's folder, or null for the bundled templates. */
    public Path folder() { return folder; }

    /** The text of template {@code name} ("report.md.mustache"); partials are looked up the same way. */
    public String load(String name) {
        if (!isPlainName(name)) {
            throw new UserInputException(folder, null, "template name '" + name + "' is not a plain file name",
                    "include partials by file name only, such as {{> table-row.md.mustache}}");
        }
        if (folder != null) {
            Path p = folder.resolve(name);
            if (Files.isRegularFile(p)) return read(insideFolder(p));
        }
        try (InputStream in = TemplateSource.class.getResourceAsStream("/templates/" + name)) {
            if (in == null) {
                throw new UserInputException(folder, null, "no template named '" + name + "'",
                        "check the name, or copy the shipped templates with 'assay init'");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * {@code p}, when the file it finally names (after symbolic links) is inside the template folder: a
     * plain name can still be a link, and a link to /etc/passwd or a colleague's home folder must not
     * be read as a template.
     */
    private Path insideFolder(Path p) {
        try {
            if (p.toRealPath().startsWith(folder.toRealPath())) return p;
        } catch (IOException e) {
            throw new UserInputException(p, null, "cannot read the template: " + e.getMessage(), "check the file");
        }
        throw new UserInputException(p, null, "the template is a link to a file outside the template folder",
                "copy the file into the folder instead of linking to it");
    }

    /** True for a name {@link #load} accepts: a file name of the folder, never a path. */
    static boolean isPlainName(String name) {
        return NAME.matcher(name).matches() && !name.contains("..");
    }

    /** True when {@link #load} finds template {@code name} (a plain name) in the folder or among the shipped ones. */
    boolean exists(String name) {
        if (!isPlainName(name)) return false;
        if (folder != null && Files.isRegularFile(folder.resolve(name))) return true;
        return TemplateSource.class.getResource("/templates/" + name) != null;
    }

    /** The file template {@code name} is read from, for messages: the user's copy, else just the name. */
    Path describe(String name) {
        return folder != null && isPlainName(name) && Files.isRegularFile(folder.resolve(name)) ? folder.resolve(name)
                : Path.of(name);
    }

    private static String read(Path p) {
        try {
            // Template files are small; a larger one is a mistake or a hostile file.
            long size = Files.size(p);
            if (Limit.TEMPLATE_BYTES.exceededBy(size)) {
                throw Limit.TEMPLATE_BYTES.exceeded(p, null, "the template has " + size + " bytes");
            }
            return Utf8Text.decode(p, Files.readAllBytes(p));
        } catch (IOException e) {
            throw new UserInputException(p, null, "cannot read the template: " + e.getMessage(), "check the file");
        }
    }
}
