package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code run}'s refinement counts its new models on the error stream as the sweep counts its models (a practitioner's
 * demo run sat 20-45 s without a word after the "refining" line), and the count ends on the number the summary gives.
 */
class RefinementProgressLineTest {

    @TempDir
    Path work;

    @Test
    void onATerminalTheRefinementLineEndsOnTheSummarysCountOfNewModels() throws Exception {
        FakeMassLines lines = new FakeMassLines(Set.of());
        CliHarness terminal = new CliHarness(new CommandContext(grid -> FakeChunkSolver.fast(), List.of(), Map.of(),
                work, true, lines));
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        CliHarness.Execution done = terminal.execute("run", grid.toString(), "--out", "r", "--threads", "2");
        assertThat(done.code()).as(done.err()).isZero();

        Matcher summary = Pattern.compile("transitions refined to [0-9.]+ Msun with (\\d+) new models").matcher(done.out());
        assertThat(summary.find()).as(done.out()).isTrue();
        String refining = done.err().substring(done.err().indexOf("convgrid: refining"));
        // redrawn in place after the "refining" line, then ended on the final count
        assertThat(refining).containsPattern("\r\\d+ new models?, [0-9.]+ models/s")
                .endsWith("\r" + summary.group(1) + " new models, " + rate(refining) + " models/s\n");
        // the fake lines' models, less the bracket ends each zero-age search recomputes: the count is of new models
        assertThat(Integer.parseInt(summary.group(1))).isPositive().isLessThan(lines.solved.get());
    }

    @Test
    void inABatchLogTheRefinementsLastLineIsTheSummarysCount() throws Exception {
        // a log (stderr not a terminal) had ended on 89 or 148 new models while the summary said 169
        CliHarness log = new CliHarness(new CommandContext(grid -> FakeChunkSolver.fast(), List.of(), Map.of(),
                work, false, new FakeMassLines(Set.of())));
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        CliHarness.Execution done = log.execute("run", grid.toString(), "--out", "b", "--threads", "2");
        assertThat(done.code()).as(done.err()).isZero();

        Matcher summary = Pattern.compile("transitions refined to [0-9.]+ Msun with (\\d+) new models").matcher(done.out());
        assertThat(summary.find()).as(done.out()).isTrue();
        List<String> counts = done.err().lines().filter(l -> l.matches("convgrid: \\d+ new models?, .*")).toList();
        assertThat(counts).isNotEmpty();
        assertThat(counts.get(counts.size() - 1)).startsWith("convgrid: " + summary.group(1) + " new models, ");
        // the sweep's log ends on its 100 % line, once
        assertThat(done.err().lines().filter(l -> l.contains("(100%)"))).hasSize(1);
    }

    private static String rate(String refining) {
        Matcher last = Pattern.compile("\r\\d+ new models?, ([0-9.]+) models/s\n$").matcher(refining);
        return last.find() ? last.group(1) : "(no final line)";
    }

    @Test
    void transitionsRefineCountsItsNewModelsToo() throws Exception {
        FakeMassLines lines = new FakeMassLines(Set.of());
        CliHarness terminal = new CliHarness(new CommandContext(grid -> FakeChunkSolver.fast(), List.of(), Map.of(),
                work, true, lines));
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        CliHarness.Execution swept = terminal.execute("run", grid.toString(), "--out", "t", "--no-refine");
        assertThat(swept.code()).as(swept.err()).isZero();
        CliHarness.Execution done = terminal.execute("transitions", work.resolve("t").toString(), "--refine",
                "--threads", "2");
        assertThat(done.code()).as(done.err()).isZero();

        Matcher summary = Pattern.compile(", (\\d+) new models in catalogue").matcher(done.out());
        assertThat(summary.find()).as(done.out()).isTrue();
        assertThat(Integer.parseInt(summary.group(1))).isPositive();
        assertThat(done.err()).containsPattern("\r\\d+ new models?, [0-9.]+ models/s")
                .contains("\r" + summary.group(1) + " new models, ");
    }

    @Test
    void withQuietTheRefinementSaysNothing() throws Exception {
        CliHarness terminal = new CliHarness(new CommandContext(grid -> FakeChunkSolver.fast(), List.of(), Map.of(),
                work, true, new FakeMassLines(Set.of())));
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        CliHarness.Execution done = terminal.execute("run", grid.toString(), "--out", "q", "--quiet");
        assertThat(done.code()).isZero();
        assertThat(done.err()).doesNotContain("new model");
    }
}
