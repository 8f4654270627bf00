package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The malformed-input corpus under {@code src/test/resources/corpus}: malformed grid files (checked with
 * {@code convgrid check}) and malformed command lines, each with its expected exit code and a fragment of its
 * message ({@code grids/expected.tsv}, {@code commands.tsv}). Every case must exit with its code (2 for all of
 * them), print no stack trace and no Java exception class name, and every grid-file problem must start with
 * {@code file:line:column:}.
 */
class MalformedInputCorpusTest {

    private static final String CORPUS = "/corpus/";
    /** A Java exception or error class name, or a stack frame. */
    private static final Pattern JAVA_INTERNALS = Pattern.compile(
            "[A-Za-z]+(Exception|Error)\\b|\\n\\s+at [a-z]+\\.|For input string|Input length = ");
    /** A control character other than a line end or a tab (an escape sequence reaching the terminal). */
    private static final Pattern CONTROL = Pattern.compile("[\\x00-\\x08\\x0B-\\x1F\\x7F]");
    private static final Pattern GRID_PROBLEM_LINE = Pattern.compile("[^:\\n]+\\.yaml:\\d+:\\d+: \\S.*");

    @TempDir
    Path work;

    static Stream<Arguments> gridFiles() throws IOException {
        List<Arguments> cases = new ArrayList<>();
        for (String line : lines("grids/expected.tsv")) {
            String[] f = line.split("\t", 3);
            cases.add(Arguments.of(f[0], Integer.parseInt(f[1]), f[2]));
        }
        return cases.stream();
    }

    static Stream<Arguments> commandLines() throws IOException {
        List<Arguments> cases = new ArrayList<>();
        for (String line : lines("commands.tsv")) {
            String[] f = line.split("\t", -1);
            cases.add(Arguments.of(String.join(" ", Arrays.copyOfRange(f, 2, f.length)), Integer.parseInt(f[0]),
                    f[1]));
        }
        return cases.stream();
    }

    private static List<String> lines(String resource) throws IOException {
        try (InputStream in = MalformedInputCorpusTest.class.getResourceAsStream(CORPUS + resource)) {
            assertThat(in).as(resource).isNotNull();
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines()
                    .filter(l -> !l.isBlank() && !l.startsWith("#")).toList();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("gridFiles")
    void aMalformedGridFileExits2WithFileLineColumn(String file, int expectedCode, String fragment) throws Exception {
        try (InputStream in = getClass().getResourceAsStream(CORPUS + "grids/" + file)) {
            Files.write(work.resolve(file), in.readAllBytes());
        }
        CliHarness.Execution e = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", file);
        dump(file, e);
        assertThat(e.code()).as(e.err()).isEqualTo(expectedCode);
        assertThat(e.err()).contains(fragment);
        assertThat(e.err()).doesNotContainPattern(JAVA_INTERNALS).doesNotContainPattern(CONTROL);
        for (String line : e.err().strip().split("\n")) {
            assertThat(line).as("every problem names file:line:column").startsWith(file + ":")
                    .matches(GRID_PROBLEM_LINE);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("commandLines")
    void aMalformedCommandLineExits2WithAClearMessage(String line, int expectedCode, String fragment)
            throws Exception {
        CliHarness harness = CliHarness.in(work, FakeChunkSolver.fast());
        Path grid = CliHarness.writeGrid(work, "good.yaml", CliHarness.GRID.replace("to: 2.0", "to: 0.5"));
        Files.createDirectories(work.resolve("empty"));
        Files.writeString(work.resolve("notes.txt"), "secret first line\nsecond line\n");
        if (line.contains("big.yaml")) {
            // a valid grid after more than 1 MiB of comment lines
            Files.writeString(work.resolve("big.yaml"), ("# padding\n").repeat(120_000) + CliHarness.GRID);
        }
        if (line.contains("{run}")) {
            assertThat(harness.execute("run", grid.toString(), "--out", "finished", "--quiet").code()).isEqualTo(0);
        }
        String[] args = line.isEmpty() ? new String[0] : line.split(" ", -1);
        for (int i = 0; i < args.length; i++) {
            args[i] = args[i].replace("{grid}", grid.toString()).replace("{run}", work.resolve("finished").toString())
                    .replace("{missing}", work.resolve("missing").toString())
                    .replace("{dir}", work.resolve("empty").toString())
                    .replace("{file}", work.resolve("notes.txt").toString()).replace("{tmp}", work.toString())
                    .replace("\\0", "\0");
        }
        CliHarness.Execution e = harness.execute(args);
        dump(line, e);
        assertThat(e.code()).as(e.err()).isEqualTo(expectedCode);
        assertThat(e.err()).contains(fragment);
        assertThat(e.err()).doesNotContainPattern(JAVA_INTERNALS).doesNotContain("secret first line")
                .doesNotContainPattern(CONTROL);
    }

    /** With -Dcorpus.dump=FILE, appends what each case printed (for writing the expected fragments). */
    private static void dump(String name, CliHarness.Execution e) throws IOException {
        String target = System.getProperty("corpus.dump");
        if (target != null) {
            Files.writeString(Path.of(target), "=== " + name + " -> " + e.code() + "\n" + e.err() + "\n",
                    StandardCharsets.UTF_8, java.nio.file.StandardOpenOption.CREATE,
                    java.nio.file.StandardOpenOption.APPEND);
        }
    }
}
