package org.assay.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import org.apache.commons.text.StringSubstitutor;

/**
 * Fills the shipped report templates (audit-templates/, bundled in the jar under templates/).
 * Substitution uses a plain map only: no lookups, no expressions, nothing a template could use
 * to run code or read files.
 */
final class Templates {
    private Templates() {}

    static String load(String name) {
        try (InputStream in = Templates.class.getResourceAsStream("/templates/" + name)) {
            if (in == null) throw new IllegalStateException("template " + name + " is missing from the jar");
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String fill(String template, Map<String, String> values) {
        StringSubstitutor sub = new StringSubstitutor(values);
        sub.setEnableSubstitutionInVariables(false);
        sub.setDisableSubstitutionInValues(true);
        return sub.replace(template);
    }
}
