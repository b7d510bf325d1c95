package org.assay.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.SocketTimeoutException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * YAML tags that would build Java objects, evaluate code or include a file, in a claims file (read by
 * check and audit) and in an audit file: refused with one line naming the file, the line and the tag,
 * exit 2, no report folder, and never resolved: the URL tag points at a socket this test listens on,
 * which must see no connection, and nothing of /etc/passwd is printed.
 *
 * <p>How it was checked: with the claims reader's tag guard (YamlTreeReader.GuardedParser) letting every
 * tag through, the claims cases fail (assay reads the tagged value as text and writes a report); with
 * AuditFileReader.refuseTags not called, the audit-file cases fail the same way (Jackson ignores the tag).
 */
class UntrustedYamlTagsTest {
    @TempDir Path tmp;
    private ServerSocket listener;
    private Path inputs;

    @BeforeEach
    void setUp() throws Exception {
        listener = new ServerSocket(0, 1, InetAddress.getLoopbackAddress());
        listener.setSoTimeout(200);
        CliRun demo = CliRun.of("demo", "--out", tmp.resolve("demo").toString(), "--resamples", "200", "--format", "json");
        assertThat(demo.exitCode()).as(demo.err()).isZero();
        inputs = tmp.resolve("demo/inputs");
    }

    @AfterEach
    void noConnectionWasMade() throws Exception {
        try {
            listener.accept().close();
            throw new AssertionError("assay connected to the URL in the YAML tag");
        } catch (SocketTimeoutException expected) {
            // nothing connected
        } finally {
            listener.close();
        }
    }

    private String tagged(String which) {
        return switch (which) {
            case "url" -> "!!java.net.URL [\"http://127.0.0.1:" + listener.getLocalPort() + "/\"]";
            case "script" -> "!!javax.script.ScriptEngineManager []";
            case "include" -> "!include /etc/passwd";
            default -> throw new AssertionError(which);
        };
    }

    private static String shownTag(String which) {
        return switch (which) {
            case "url" -> "!!java.net.URL";
            case "script" -> "!!javax.script.ScriptEngineManager";
            default -> "!include";
        };
    }

    @ParameterizedTest
    @ValueSource(strings = {"url", "script", "include"})
    void aTagInAClaimsFileIsRefusedByCheckAndAudit(String which) throws Exception {
        Path claims = inputs.resolve("claims.yaml");
        String text = Files.readString(claims);
        Files.writeString(claims, text.replace("  document: chirpnet-invented.pdf", "  document: " + tagged(which)));
        int line = lineOf(Files.readString(claims), tagged(which));
        for (List<String> args : List.of(
                List.of("check", claims.toString(), "--out", tmp.resolve("check").toString()),
                List.of("audit", inputs.resolve("audit.yaml").toString(), "--out", tmp.resolve("audit").toString()))) {
            CliRun run = CliRun.of(args.toArray(String[]::new));
            refusedInOneLine(run, "claims.yaml", line, shownTag(which));
        }
        assertThat(tmp.resolve("check")).doesNotExist();
        assertThat(tmp.resolve("audit")).doesNotExist();
    }

    @ParameterizedTest
    @ValueSource(strings = {"url", "script", "include"})
    void aTagInAnAuditFileIsRefused(String which) throws Exception {
        Path audit = inputs.resolve("audit.yaml");
        Files.writeString(audit, Files.readString(audit).replace("    manifest: subsample.txt",
                "    manifest: subsample.txt\n    truth: " + tagged(which)));
        int line = lineOf(Files.readString(audit), tagged(which));
        CliRun run = CliRun.of("audit", audit.toString(), "--out", tmp.resolve("audit").toString());
        refusedInOneLine(run, "audit.yaml", line, shownTag(which));
        assertThat(tmp.resolve("audit")).doesNotExist();
    }

    private static void refusedInOneLine(CliRun run, String file, int line, String tag) {
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).startsWith("assay: ").contains(file).contains("line " + line)
                .contains("the YAML tag " + tag + " is not allowed")
                .doesNotContain("Exception").doesNotContain("\tat ").doesNotContain("root:");
        assertThat(run.out()).isEmpty();
    }

    private static int lineOf(String text, String piece) {
        List<String> lines = text.lines().toList();
        for (int i = 0; i < lines.size(); i++) if (lines.get(i).contains(piece)) return i + 1;
        throw new AssertionError(piece + " not found");
    }
}
