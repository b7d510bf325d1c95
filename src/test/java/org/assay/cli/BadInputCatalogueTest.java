package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The bad-input catalogue in DEVELOPERS.md and the fixtures under src/test/resources/bad/ agree:
 * every fixture file has a row, every row names a fixture that exists (or one a test generates),
 * and every fixture is used by a test. The tests themselves assert what each row promises.
 */
class BadInputCatalogueTest {
    private static final Path BAD = Path.of("src/test/resources/bad");
    private static final Path TESTS = Path.of("src/test/java");
    /** A catalogue row: | `area/name.ext` | what it is | what assay does | */
    private static final Pattern ROW = Pattern.compile("^\\| `([^`]+)` \\|");
    private static final String GENERATED = "generated/";

    private static List<String> catalogueRows() throws IOException {
        String guide = Files.readString(Path.of("DEVELOPERS.md"));
        int start = guide.indexOf("### Bad-input catalogue");
        assertThat(start).as("DEVELOPERS.md has a Bad-input catalogue section").isNotNegative();
        int end = guide.indexOf("\n#", start + 5);
        List<String> rows = new ArrayList<>();
        for (String line : guide.substring(start, end < 0 ? guide.length() : end).split("\n")) {
            Matcher m = ROW.matcher(line);
            if (m.find()) rows.add(m.group(1));
        }
        return rows;
    }

    /** Fixture files: everything under bad/ except the scripts that make them and their sources. */
    private static Set<String> fixtureFiles() throws IOException {
        Set<String> files = new TreeSet<>();
        try (Stream<Path> s = Files.walk(BAD)) {
            s.filter(Files::isRegularFile)
                    .map(p -> BAD.relativize(p).toString().replace('\\', '/'))
                    .filter(p -> !p.contains("/sources/") && !p.matches(".*/make[^/]*") && !p.endsWith("README.md"))
                    .forEach(files::add);
        }
        return files;
    }

    private static String allTestSources() throws IOException {
        StringBuilder sb = new StringBuilder();
        try (Stream<Path> s = Files.walk(TESTS)) {
            for (Path p : s.filter(p -> p.toString().endsWith(".java")).toList()) sb.append(Files.readString(p));
        }
        return sb.toString();
    }

    @Test
    void atLeastFortyDistinctFixtures() throws IOException {
        List<String> rows = catalogueRows();
        assertThat(new TreeSet<>(rows)).as("no fixture listed twice").hasSize(rows.size());
        assertThat(rows).hasSizeGreaterThanOrEqualTo(40);
    }

    @Test
    void everyFixtureFileHasARowAndEveryRowAFixture() throws IOException {
        Set<String> listed = new TreeSet<>();
        for (String r : catalogueRows()) if (!r.startsWith(GENERATED)) listed.add(r);
        assertThat(listed).isEqualTo(fixtureFiles());
    }

    @Test
    void everyFixtureIsUsedByATest() throws IOException {
        String sources = allTestSources();
        for (String r : catalogueRows()) {
            String name = r.startsWith(GENERATED) ? r.substring(GENERATED.length()) : r;
            assertThat(sources).as("a test uses " + r).contains(name);
        }
    }
}
