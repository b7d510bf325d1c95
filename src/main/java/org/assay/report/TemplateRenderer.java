package org.assay.report;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import com.github.mustachejava.DefaultMustacheVisitor;
import com.github.mustachejava.MustacheException;
import com.github.mustachejava.MustacheVisitor;
import com.github.mustachejava.TemplateContext;
import com.github.mustachejava.reflect.MapObjectHandler;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.Map;
import org.assay.common.UserInputException;

/**
 * Renders logic-less Mustache templates over a report model of plain maps, lists and strings.
 * The object handler resolves map keys only (no getters, no methods, no reflection), the model
 * holds no lambdas, and partials resolve through {@link TemplateSource} by plain file name: a
 * template can place values, repeat sections and include other templates, nothing else.
 * {@code {{value}}} is escaped for the output format; {@code {{{value}}}} is reserved for markup
 * assay builds itself (the SVG plots).
 */
public final class TemplateRenderer {
    /** How a {@code {{value}}} is escaped. */
    public enum Escaping { HTML, MARKDOWN, LATEX, NONE }

    private final TemplateSource source;

    public TemplateRenderer(TemplateSource source) { this.source = source; }

    public String render(String name, Map<String, Object> model, Escaping escaping) {
        Factory factory = new Factory(source, escaping);
        try {
            Mustache m = factory.compile(new StringReader(source.load(name)), name);
            StringWriter out = new StringWriter();
            m.execute(out, model);
            return out.toString();
        } catch (MustacheException e) {
            if (e.getCause() instanceof UserInputException u) throw u;
            // The context is where Mustache stopped: the template (or partial) and its line.
            TemplateContext at = e.getContext();
            String where = at == null ? name : at.file();
            String problem = e.getMessage().replaceFirst("\\s*@\\[[^\\]]*\\]$", "");
            throw new UserInputException(source.describe(where), at == null ? null : "line " + at.line(),
                    "the template " + where + " does not compile: " + problem,
                    "fix the template, or copy a fresh one with 'assay init'");
        }
    }

    /** A Mustache factory bound to one template source and one escaping. */
    private static final class Factory extends DefaultMustacheFactory {
        private final TemplateSource source;
        private final Escaping escaping;

        Factory(TemplateSource source, Escaping escaping) {
            this.source = source;
            this.escaping = escaping;
            setObjectHandler(new MapObjectHandler());
            setRecursionLimit(20);
        }

        @Override
        public Reader getReader(String resourceName) {
            return new StringReader(source.load(resourceName));
        }

        /** Checks each {{> partial}} where it is written, so a bad name is reported with its template and line. */
        @Override
        public MustacheVisitor createMustacheVisitor() {
            return new DefaultMustacheVisitor(this) {
                @Override
                public void partial(TemplateContext tc, String variable, String indent) {
                    if (!TemplateSource.isPlainName(variable.strip())) {
                        throw new UserInputException(source.describe(tc.file()), "line " + tc.line(),
                                "the partial '" + variable.strip() + "' is not a plain file name",
                                "include partials of the template folder by file name only, such as {{> cautions.md.mustache}}");
                    }
                    if (!source.exists(variable.strip())) {
                        throw new UserInputException(source.describe(tc.file()), "line " + tc.line(),
                                "the partial '" + variable.strip() + "' is neither in the template folder nor shipped",
                                "check the name, or copy the shipped templates with 'assay init'");
                    }
                    super.partial(tc, variable, indent);
                }

                @Override
                public void dynamicPartial(TemplateContext tc, String variable, String indent) {
                    // {{>*key}} would take the partial's name from the report model, that is, from the input files
                    throw new UserInputException(source.describe(tc.file()), "line " + tc.line(),
                            "dynamic partials ({{>" + variable.strip() + "}}) are not allowed",
                            "name the partial's file directly, such as {{> cautions.md.mustache}}");
                }
            };
        }

        @Override
        public String resolvePartialPath(String dir, String name, String extension) {
            return name;   // plain names only: no folders, no extension games
        }

        @Override
        public void encode(String value, Writer writer) {
            try {
                writer.write(switch (escaping) {
                    case HTML -> Escape.html(value);
                    case MARKDOWN -> Escape.markdown(value);
                    case LATEX -> Escape.latex(value);
                    case NONE -> value;
                });
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
