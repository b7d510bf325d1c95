package org.assay.data;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.assay.data.Fixtures.assertUserError;
import static org.assay.data.Fixtures.resource;
import static org.assay.data.Fixtures.write;
import static org.assertj.core.api.Assertions.assertThat;

/** Joining a truth file by id and checking a subsample manifest; values read off the fixtures. */
class ClassificationReaderTruthAndManifestTest {
    private static final Path PREDICTIONS = resource("predictions-without-labels.csv");
    private static final ReadOptions WITH_TRUTH = ReadOptions.defaults().withTruth(resource("truth.csv"));

    @Test
    void truthFileGivesLabelsAndAllItsClassesInNumericOrder() {
        ClassificationData data = ClassificationReader.read(PREDICTIONS, WITH_TRUTH);

        assertThat(data.ids()).containsExactly("t3", "t1", "t5");
        // Every truth label is a class, also "2" which no predicted row has as its truth;
        // numeric order puts 10 after 3 (lexicographic order would not).
        assertThat(data.classes()).containsExactly("2", "3", "10");
        assertThat(data.truth()).containsExactly(1, 2, 2);
        assertThat(data.predicted()).containsExactly(1, 0, 2);
        assertThat(data.positive()).isEqualTo(-1);
    }

    @Test
    void labelColumnThatAgreesWithTheTruthFileIsAccepted(@TempDir Path dir) throws Exception {
        Path file = write(dir, "agree.csv", "id,label,prediction\nt2,2,3\nt4,2,2\n");
        ClassificationData data = ClassificationReader.read(file, WITH_TRUTH);
        assertThat(data.truth()).containsExactly(0, 0);
        assertThat(data.predicted()).containsExactly(1, 0);
    }

    @Test
    void labelThatDisagreesWithTheTruthFileIsAnError(@TempDir Path dir) throws Exception {
        Path file = write(dir, "disagree.csv", "id,label,prediction\nt2,2,3\nt4,3,2\n");
        assertUserError(() -> ClassificationReader.read(file, WITH_TRUTH), file, "line 3",
                "id 't4' has label '3' here but '2' in the truth file", "truth.csv (line 5)", "check which file is right");
    }

    @Test
    void idMissingFromTheTruthFileIsAnErrorCountingTheOthers(@TempDir Path dir) throws Exception {
        Path file = write(dir, "unknown.csv", "id,prediction\nt1,2\nt9,2\nT3,3\nt8,2\n");
        assertUserError(() -> ClassificationReader.read(file, WITH_TRUTH), file, "line 3",
                "id 't9' is not in the truth file", "(and 2 more ids)", "same ids");
    }

    @Test
    void idMissingFromTheTruthFileMentionsANearMatch(@TempDir Path dir) throws Exception {
        Path file = write(dir, "case.csv", "id,prediction\nT3,3\n");
        assertUserError(() -> ClassificationReader.read(file, WITH_TRUTH), file, "line 2",
                "id 'T3' is not in the truth file", "'t3' on line 4 differs only by case or whitespace");
    }

    @Test
    void manifestThatMatchesIsAccepted() {
        ClassificationData data = ClassificationReader.read(PREDICTIONS, WITH_TRUTH.withManifest(resource("manifest.txt")));
        assertThat(data.ids()).containsExactly("t3", "t1", "t5");
    }

    @Test
    void manifestCommentsAreKeptAndBlankLinesIgnored() {
        Manifest manifest = Manifest.read(resource("manifest.txt"));
        assertThat(manifest.comments()).containsExactly("# seed: 42", "# method: simple random sample without replacement");
        assertThat(manifest.ids()).containsExactly("t1", "t3", "t5");
        assertThat(manifest.registry().line(2)).isEqualTo(7);   // t5 is on file line 7 after a blank line
    }

    @Test
    void predictionIdOutsideTheManifestIsAnError(@TempDir Path dir) throws Exception {
        Path manifest = write(dir, "short.txt", "# seed: 1\nt3\n");
        assertUserError(() -> ClassificationReader.read(PREDICTIONS, WITH_TRUTH.withManifest(manifest)),
                PREDICTIONS, "line 3", "id 't1' is not in the manifest", "short.txt", "(and 1 more)",
                "give the manifest the subsample was drawn with");
    }

    @Test
    void manifestIdWithoutPredictionIsAnError(@TempDir Path dir) throws Exception {
        Path manifest = write(dir, "long.txt", "t1\nt3\nt5\n# late comment\nt2\nt4\n");
        assertUserError(() -> ClassificationReader.read(PREDICTIONS, WITH_TRUTH.withManifest(manifest)),
                manifest, "line 5", "manifest id 't2' has no row in the predictions file", "(and 1 more)",
                "add predictions for every sampled id");
    }

    @Test
    void duplicateIdInTheManifestIsAnError(@TempDir Path dir) throws Exception {
        Path manifest = write(dir, "twice.txt", "t1\nt3\nt1\n");
        assertUserError(() -> ClassificationReader.read(PREDICTIONS, WITH_TRUTH.withManifest(manifest)),
                manifest, "line 3", "duplicate id 't1' (also on line 1)");
    }

    @Test
    void manifestWithOnlyCommentsIsAnError(@TempDir Path dir) throws Exception {
        Path manifest = write(dir, "comments.txt", "# seed: 1\n\n");
        assertUserError(() -> ClassificationReader.read(PREDICTIONS, WITH_TRUTH.withManifest(manifest)),
                manifest, "lines 1-2", "the manifest lists no ids, only comments");
    }

    @Test
    void truthFileWithoutTheLabelColumnNamesTheOption(@TempDir Path dir) throws Exception {
        Path truth = write(dir, "truth.tsv", "id\tclass\nt1\t2\n");
        assertUserError(() -> ClassificationReader.read(PREDICTIONS, ReadOptions.defaults().withTruth(truth)),
                truth, "line 1", "no column 'label'", "columns found: id, class", "--label-column");
    }

    @Test
    void truthFileWithEmptyLabelIsAnError(@TempDir Path dir) throws Exception {
        Path truth = write(dir, "gaps.jsonl", "{\"id\": \"t1\", \"label\": 2}\n{\"id\": \"t3\", \"label\": null}\n");
        assertUserError(() -> ClassificationReader.read(PREDICTIONS, ReadOptions.defaults().withTruth(truth)),
                truth, "line 2", "the label 'label' is empty");
    }

    @Test
    void missingTruthFileIsAnError(@TempDir Path dir) {
        Path truth = dir.resolve("nowhere.csv");
        assertUserError(() -> ClassificationReader.read(PREDICTIONS, ReadOptions.defaults().withTruth(truth)),
                truth, null, "truth file not found", "check the path");
    }
}
