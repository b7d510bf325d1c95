package org.assay.data;

import org.assay.common.UserInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The manifest and the truth file are streamed against the prediction ids (JoinedIds) rather
 * than read into registries of their own. On random small files full of repeats and case or
 * whitespace variants, the outcome (the first error's whole message, or success) must be the one
 * the straightforward way gives: a full registry per file, then the comparisons in order. The
 * oracle below is that straightforward way, written with plain IdRegistry calls.
 */
class StreamedJoinEquivalenceTest {
    private static final String[] POOL = {"a", "A", " a", "b", "B", "b ", "c", "d", "D", "e", "f", "g"};
    private static final String[] LABELS = {"x", "y"};

    @TempDir Path dir;

    @Test
    void streamedManifestCheckGivesTheSameOutcomeAsTwoRegistries() throws IOException {
        Random random = new Random(17);
        int errors = 0;
        for (int round = 0; round < 800; round++) {
            List<String> predictionIds = distinctIds(random);
            List<String> manifestIds = sample(random, 1 + random.nextInt(8));
            Path predictions = dir.resolve("p" + round + ".csv");
            Path manifest = Fixtures.write(dir, "m" + round + ".txt", manifestText(random, manifestIds));
            IdRegistry registry = new IdRegistry(predictions);
            for (int i = 0; i < predictionIds.size(); i++) registry.add(predictionIds.get(i), i + 2);

            String expected = outcome(() -> oracleManifest(registry, manifest));
            String actual = outcome(() -> Manifest.checkCovers(manifest, registry, org.assay.common.Progress.Task.NONE));
            assertThat(actual).as("round %d: predictions %s, manifest %s", round, predictionIds, manifestIds)
                    .isEqualTo(expected);
            if (!expected.equals("ok")) errors++;
        }
        assertThat(errors).as("the random cases must exercise the errors").isGreaterThan(150);
    }

    @Test
    void streamedTruthJoinGivesTheSameOutcomeAsReadingTheTruthFirst() throws IOException {
        Random random = new Random(23);
        int errors = 0;
        for (int round = 0; round < 800; round++) {
            boolean labelColumn = random.nextBoolean();
            List<String> predictionIds = distinctIds(random);
            List<String> truthIds = sample(random, 1 + random.nextInt(8));
            List<String> truthLabels = labels(random, truthIds.size());
            List<String> columnLabels = labels(random, predictionIds.size());
            StringBuilder p = new StringBuilder(labelColumn ? "id,label,prediction\n" : "id,prediction\n");
            for (int i = 0; i < predictionIds.size(); i++) {
                p.append('"').append(predictionIds.get(i)).append('"');
                if (labelColumn) p.append(',').append(columnLabels.get(i));
                p.append(",x\n");
            }
            StringBuilder t = new StringBuilder("id,label\n");
            for (int i = 0; i < truthIds.size(); i++) {
                t.append('"').append(truthIds.get(i)).append("\",").append(truthLabels.get(i)).append('\n');
            }
            Path predictions = Fixtures.write(dir, "p" + round + ".csv", p.toString());
            Path truth = Fixtures.write(dir, "t" + round + ".csv", t.toString());

            String expected = outcome(() -> oracleTruth(predictions, predictionIds, labelColumn ? columnLabels : null,
                    truth, truthIds, truthLabels));
            String actual = outcome(() -> ClassificationReader.read(predictions, ReadOptions.defaults().withTruth(truth)));
            assertThat(actual).as("round %d: predictions %s %s, truth %s %s", round, predictionIds,
                    labelColumn ? columnLabels : "", truthIds, truthLabels).isEqualTo(expected);
            if (!expected.equals("ok")) errors++;
        }
        assertThat(errors).as("the random cases must exercise the errors").isGreaterThan(150);
    }

    /** The manifest read into its own registry, then the two comparisons (the way before streaming). */
    private static void oracleManifest(IdRegistry predictions, Path manifestFile) {
        Manifest manifest = Manifest.read(manifestFile);
        IdRegistry listed = manifest.registry();
        int missing = 0;
        int first = -1;
        for (int i = 0; i < predictions.size(); i++) {
            if (listed.indexOf(predictions.id(i)) < 0 && missing++ == 0) first = i;
        }
        if (missing > 0) {
            String id = predictions.id(first);
            throw new UserInputException(predictions.file(), RowErrors.line(predictions.line(first)),
                    "id '" + id + "' is not in the manifest " + manifestFile + more(missing) + listed.similarHint(id),
                    "give the manifest the subsample was drawn with, or remove predictions for ids outside it");
        }
        for (int i = 0; i < listed.size(); i++) {
            if (predictions.indexOf(listed.id(i)) < 0 && missing++ == 0) first = i;
        }
        if (missing > 0) {
            String id = listed.id(first);
            throw new UserInputException(manifestFile, RowErrors.line(listed.line(first)),
                    "manifest id '" + id + "' has no row in the predictions file " + predictions.file()
                            + more(missing) + predictions.similarHint(id),
                    "add predictions for every sampled id, or give the manifest of the subsample you evaluated");
        }
    }

    /** The truth file read into its own registry first, then each prediction looked up in order. */
    private static void oracleTruth(Path predictionsFile, List<String> predictionIds, List<String> columnLabels,
                                    Path truthFile, List<String> truthIds, List<String> truthLabels) {
        IdRegistry truth = new IdRegistry(truthFile);
        for (int i = 0; i < truthIds.size(); i++) truth.add(truthIds.get(i), i + 2);
        IdRegistry predictions = new IdRegistry(predictionsFile);
        int missing = 0;
        int first = -1;
        for (int i = 0; i < predictionIds.size(); i++) {
            String id = predictionIds.get(i);
            predictions.add(id, i + 2);
            int at = truth.indexOf(id);
            if (at < 0) {
                if (missing++ == 0) first = i;
            } else if (columnLabels != null && !columnLabels.get(i).equals(truthLabels.get(at))) {
                throw new UserInputException(predictionsFile, RowErrors.line(i + 2),
                        "id '" + id + "' has label '" + columnLabels.get(i) + "' here but '" + truthLabels.get(at)
                                + "' in the truth file " + truthFile + " (line " + truth.line(at) + ")",
                        "check which file is right; drop the label column or the truth file if one is stale");
            }
        }
        if (missing > 0) {
            String id = predictionIds.get(first);
            throw new UserInputException(predictionsFile, RowErrors.line(first + 2),
                    "id '" + id + "' is not in the truth file " + truthFile
                            + (missing > 1 ? " (and " + (missing - 1) + " more ids)" : "") + truth.similarHint(id),
                    "give a truth file that covers every example, or check that both files use the same ids");
        }
    }

    private interface Step { void run(); }

    private static String outcome(Step step) {
        try {
            step.run();
            return "ok";
        } catch (UserInputException e) {
            return e.oneLine();
        }
    }

    /** Prediction ids the predictions' own check accepts (case variants included). */
    private static List<String> distinctIds(Random random) {
        List<String> out = new ArrayList<>();
        IdRegistry accepted = new IdRegistry(Path.of("pool.csv"));
        int n = 1 + random.nextInt(6);
        for (int tries = 0; out.size() < n && tries < 100; tries++) {
            String id = POOL[random.nextInt(POOL.length)];
            try {
                accepted.add(id, out.size() + 2);
                out.add(id);
            } catch (UserInputException e) {
                // a repeat or a whitespace variant: not a valid predictions file
            }
        }
        return out;
    }

    private static List<String> sample(Random random, int n) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < n; i++) out.add(POOL[random.nextInt(POOL.length)]);
        return out;
    }

    private static List<String> labels(Random random, int n) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < n; i++) out.add(random.nextInt(5) == 0 ? LABELS[1] : LABELS[0]);
        return out;
    }

    private static String manifestText(Random random, List<String> ids) {
        StringBuilder sb = new StringBuilder("# drawn for a test\n");
        for (String id : ids) {
            if (random.nextInt(4) == 0) sb.append('\n');   // blank lines move the line numbers
            sb.append(id).append('\n');
        }
        return sb.toString();
    }

    private static String more(int missing) {
        return missing > 1 ? " (and " + (missing - 1) + " more)" : "";
    }
}
