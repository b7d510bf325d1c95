package org.assay.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.assay.audit.EstimationSettings;
import org.assay.audit.SubsampleManifests;
import org.assay.common.UserInputException;
import org.assay.data.IdList;
import org.assay.report.OutputDirectory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code assay sample}: draws a seeded random subsample of a test set's ids and writes the
 * manifest, with a header that lets anyone redraw it (and {@code assay audit} verify it).
 */
@Command(name = "sample", mixinStandardHelpOptions = true,
        description = {"Draws a seeded random subsample of a test set and writes its manifest.",
            "Simple random sampling without replacement, or stratified with proportional allocation "
                + "(--stratify-by). The manifest's header records the seed, method, n, N and the SHA-256 of "
                + "the id list, so the draw can be repeated and checked; give it to 'assay audit' with "
                + "manifest: or --manifest.", ""},
        footer = {"", "Examples:",
            "  assay sample test-ids.txt --n 400 --out subsample.txt",
            "  assay sample test-labels.csv --id-column clip_id --stratify-by species --n 400 --out subsample.txt",
            "",
            "Evaluate exactly the ids in the manifest: the intervals assume the subsample is a random one."})
final class SampleCommand implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Parameters(paramLabel = "IDS", description = "The full test set's ids: one per line, or a CSV/TSV/JSONL with --id-column.")
    Path ids;

    @Option(names = "--n", paramLabel = "N", required = true, description = "Subsample size.")
    int n;

    @Option(names = "--id-column", paramLabel = "NAME", description = "Id column, when IDS is a table file.")
    String idColumn;

    @Option(names = "--stratify-by", paramLabel = "COLUMN",
            description = "Draw within the strata of this column (a label column), allocating n proportionally "
                    + "(largest remainder).")
    String stratifyBy;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "" + EstimationSettings.DEFAULT_SEED,
            description = "Seed of the draw (default ${DEFAULT-VALUE}); recorded in the manifest.")
    long seed;

    @Option(names = "--out", paramLabel = "FILE", defaultValue = "subsample.txt",
            description = "Manifest to write (default ${DEFAULT-VALUE}); an existing file is kept unless --force.")
    Path out;

    @Option(names = "--force", description = "Overwrite an existing manifest.")
    boolean force;

    @Override
    public Integer call() {
        if (stratifyBy != null && idColumn == null) {
            throw UserInputException.usage("--stratify-by needs --id-column (a table file with ids and the stratum column)",
                    "add --id-column NAME");
        }
        IdList list = IdList.read(ids, idColumn, stratifyBy);
        Path target = out.toAbsolutePath().normalize();
        Path folder = target.getParent();
        // the id list as seen from the manifest's folder, so the manifest and list can move together
        String named = folder.relativize(ids.toAbsolutePath().normalize()).toString();
        SubsampleManifests.Drawn drawn = SubsampleManifests.draw(list, n, seed, named, idColumn, stratifyBy);
        new OutputDirectory(folder, force).writeBytes(Map.of(target.getFileName().toString(),
                drawn.text().getBytes(StandardCharsets.UTF_8)));
        var stdout = spec.commandLine().getOut();
        stdout.println("drew " + drawn.n() + " of " + drawn.populationSize() + " ids with seed " + seed
                + (drawn.allocation() == null ? " (simple random sample)" : " (stratified by " + stratifyBy + ")"));
        if (drawn.allocation() != null) {
            drawn.allocation().forEach((k, v) -> stdout.println("  " + k + ": " + v[0] + " of " + v[1]));
        }
        stdout.println("wrote " + target);
        stdout.flush();
        return Main.DONE;
    }
}
