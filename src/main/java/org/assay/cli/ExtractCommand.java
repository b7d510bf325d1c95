package org.assay.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.common.UserInputException;
import org.assay.pdf.ClaimsDraftWriter;
import org.assay.pdf.Extraction;
import org.assay.pdf.PageSelection;
import org.assay.pdf.TableExtractor;
import org.assay.pdf.TablePreview;
import org.assay.report.OutputDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code assay extract}: results tables out of a paper's PDF into a claims draft. */
@Command(name = "extract", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Reads the results tables of a paper's PDF into a claims draft to confirm.",
            "Finds each 'Table N' caption, rebuilds the table's grid (header paths, row groups), reads every "
                + "value with its printed decimals, ± value, marks, bold and underline, guesses each column's "
                + "metric and scale, and records the page and position of every value. Prints each table as a "
                + "grid to compare with the paper, and lists what was read with low confidence.", ""},
        footer = {"", "Examples:",
            "  assay extract paper.pdf --out claims.yaml",
            "  assay extract paper.pdf --table 3 --pages 6-7 --out t3.yaml",
            "  assay extract paper.pdf --out - --format json > claims.json",
            "",
            "Then fill in test_size: for each table and run 'assay check claims.yaml'.",
            "The PDF needs a text layer: for a scan, type the claims in or run OCR first.",
            "",
            "Exit codes: 0 done (also when no table is found); 2 bad usage or input; 3 internal error."})
final class ExtractCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @picocli.CommandLine.ParentCommand Main main;

    @Parameters(paramLabel = "PDF", description = "The paper (a PDF with a text layer).")
    Path pdf;

    @Option(names = "--out", paramLabel = "FILE",
            description = "Write the claims draft here ('-' for standard output, the preview then goes to stderr). "
                    + "Without it only the preview is shown.")
    String out;

    @Option(names = "--force", description = "Overwrite an existing --out file.")
    boolean force;

    @Option(names = "--format", paramLabel = "FORMAT",
            description = "yaml, json or csv (default: from the --out file's extension, else yaml).")
    String format;

    @Option(names = "--table", paramLabel = "N", description = "Only the table numbered N (as in its caption).")
    String table;

    @Option(names = "--pages", paramLabel = "PAGES", description = "Only these pages, for example 3, 2-5 or 1,4-6.")
    String pages;

    @Option(names = "--password", paramLabel = "PASSWORD", description = "Password of an encrypted PDF.")
    String password;

    @Override
    public Integer call() {
        String fmt = format(format, out);
        PageSelection selection = pages == null ? null : PageSelection.parse(pages);
        String only = table == null ? null : table.strip().replaceFirst("^(?i)(table|tab\\.?)\\s*", "");
        Extraction x = new TableExtractor().extract(pdf, password, selection, only, main.progress());
        boolean draftToStdout = "-".equals(out);
        var preview = draftToStdout ? spec.commandLine().getErr() : spec.commandLine().getOut();
        if (x.tables().isEmpty()) {
            preview.println("No tables found in " + pdf + " (" + x.pagesRead() + " pages read; a table needs a "
                    + "'Table N' caption" + (only == null ? "" : " and the number " + only) + ").");
            for (String n : x.notes()) preview.println("  - " + n);
            preview.flush();
            return Main.DONE;
        }
        preview.print(TablePreview.render(x));
        preview.flush();
        String draft = ClaimsDraftWriter.write(x, fmt);
        if (draftToStdout) {
            spec.commandLine().getOut().print(draft);
            spec.commandLine().getOut().flush();
        } else if (out != null) {
            Path target = Path.of(out);
            Path dir = target.toAbsolutePath().getParent();
            new OutputDirectory(dir, force).write(Map.of(target.getFileName().toString(), draft));
            preview.println("Wrote " + x.tables().size() + " table(s) to " + target
                    + ". Fill in test_size: for each table, confirm the guesses, then run: assay check " + target);
        } else {
            preview.println("Add --out claims.yaml to write the claims draft.");
        }
        preview.flush();
        return Main.DONE;
    }

    static String format(String format, String out) {
        String f = format;
        if (f == null && out != null && !out.equals("-")) {
            String lower = out.toLowerCase(Locale.ROOT);
            if (lower.endsWith(".json")) f = "json";
            else if (lower.endsWith(".csv")) f = "csv";
            else if (lower.endsWith(".yaml") || lower.endsWith(".yml")) f = "yaml";
        }
        if (f == null) return "yaml";
        f = f.strip().toLowerCase(Locale.ROOT);
        if (f.equals("yml")) f = "yaml";
        if (!f.equals("yaml") && !f.equals("json") && !f.equals("csv")) {
            throw UserInputException.usage("unknown --format '" + format + "'", "use yaml, json or csv");
        }
        return f;
    }
}
