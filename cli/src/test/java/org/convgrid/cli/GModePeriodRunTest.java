package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The catalogue's g-mode period scale ({@code buoyancy_period_pi0_s}, {@code period_spacing_l1_s}, the last two
 * columns) in runs, and runs written before it: a resume, a merge of shards of both layouts, a refinement and the
 * charts take a catalogue without the two columns, bring it to this layout and leave its rows' two cells empty (a
 * model's Pi_0 cannot be had without solving it again), as fe_h_dex's introduction did for the columns before it.
 * Made-up stars (FakeChunkSolver): their Pi_0 is not physics.
 */
class GModePeriodRunTest {

    private static final String PERIOD_COLUMNS = "buoyancy_period_pi0_s,period_spacing_l1_s";

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.withPeriodScale()).execute(args);
    }

    private Path grid() throws Exception {
        return CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
    }

    private Path sweep(String out) throws Exception {
        CliHarness.Execution e = run("run", "--no-refine", grid().toString(), "--out", out, "--quiet");
        assertThat(e.code()).as(e.err()).isZero();
        return work.resolve(out);
    }

    private static final int PI0 = CatalogueColumns.HEADER.indexOf(CatalogueColumns.BUOYANCY_PERIOD_PI0_S);

    /**
     * The data lines of a catalogue with the g-mode period scale's cells and every cell after them (the p-mode scales,
     * added later) emptied: what a row written before them reads as.
     */
    private static List<String> withoutPeriods(List<String> lines) {
        return lines.stream().map(l -> String.join(",", List.of(l.split(",", -1)).subList(0, PI0))
                + ",".repeat(CatalogueColumns.HEADER.size() - PI0)).toList();
    }

    private static String[] cells(String line) {
        return line.split(",", -1);
    }

    @Test
    void everyRowWithACavityHasBothCellsAndTheFullyConvectiveOnesNone() throws Exception {
        List<String> lines = CliHarness.tableLines(sweep("run").resolve("catalogue.ecsv"));
        assertThat(lines.get(0)).endsWith(",fe_h_dex," + PERIOD_COLUMNS
                + ",large_separation_uhz,surface_cz_base_acoustic_depth_s,he_ii_ionisation_acoustic_depth_s"
                + ",moment_of_inertia_g_cm2,env_cz_moment_of_inertia_g_cm2");
        for (String line : lines.subList(1, lines.size())) {
            String[] c = cells(line);
            String pi0 = c[PI0];
            String spacing = c[PI0 + 1];
            if (line.contains(",fully_convective,")) {
                assertThat(pi0 + spacing).as(line).isEmpty();
            } else {
                // Delta Pi_1 = Pi_0 / sqrt(2) (Tassoul 1980; from memory), each written to seven digits
                assertThat(Double.parseDouble(spacing)).as(line)
                        .isCloseTo(Double.parseDouble(pi0) / Math.sqrt(2.0), org.assertj.core.api.Assertions
                                .within(1e-6 * Double.parseDouble(pi0)));
            }
        }
    }

    @Test
    void aRunWrittenBeforeTheColumnsResumesWithTheirCellsEmptyInItsOwnRows() throws Exception {
        List<String> whole = CliHarness.tableLines(sweep("whole").resolve("catalogue.ecsv"));
        Path dir = sweep("earlier");
        Path catalogue = dir.resolve("catalogue.ecsv");
        Files.writeString(catalogue, EarlierCatalogue.lackingFrom(Files.readString(catalogue),
                "buoyancy_period_pi0_s", 40));
        CliHarness.Execution resumed = run("run", "--no-refine", grid().toString(), "--out", "earlier", "--resume");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(resumed.err()).contains("40 already in the catalogue");
        List<String> lines = CliHarness.tableLines(catalogue);
        assertThat(Files.readString(catalogue).lines().filter(l -> l.startsWith("#")))
                .containsExactlyElementsOf(Files.readString(work.resolve("whole/catalogue.ecsv")).lines()
                        .filter(l -> l.startsWith("#")).toList());
        assertThat(lines.get(0)).isEqualTo(whole.get(0));
        // the 40 rows kept: every earlier cell as before, the two new ones empty; the rows computed now: as a whole run
        assertThat(lines.subList(1, 41)).isEqualTo(withoutPeriods(whole.subList(1, 41)));
        assertThat(lines.subList(41, lines.size())).isEqualTo(whole.subList(41, whole.size()));
        assertThat(lines.subList(1, 41)).anyMatch(l -> !l.contains(",fully_convective,"));
    }

    @Test
    void shardsOfBothLayoutsMergeIntoThisLayout() throws Exception {
        List<String> single = CliHarness.tableLines(sweep("single").resolve("catalogue.ecsv"));
        for (int k = 1; k <= 2; k++) {
            CliHarness.Execution shard = run("run", "--no-refine", grid().toString(), "--shard", k + "/2", "--quiet");
            assertThat(shard.code()).as(shard.err()).isZero();
        }
        Path old = work.resolve("runs/test-survey-shard-2-of-2/catalogue.ecsv");
        List<String> oldIds = CliHarness.tableLines(old).stream().skip(1).map(l -> cells(l)[0]).toList();
        Files.writeString(old, EarlierCatalogue.lackingFrom(Files.readString(old), "buoyancy_period_pi0_s",
                Integer.MAX_VALUE));
        CliHarness.Execution merged = run("merge", "runs/test-survey-shard-1-of-2", "runs/test-survey-shard-2-of-2", "--out",
                "merged");
        assertThat(merged.code()).as(merged.err()).isZero();
        List<String> lines = CliHarness.tableLines(work.resolve("merged/catalogue.ecsv"));
        assertThat(lines.get(0)).isEqualTo(single.get(0));
        assertThat(lines).hasSameSizeAs(single);
        for (int i = 1; i < lines.size(); i++) {
            boolean fromOld = oldIds.contains(cells(single.get(i))[0]);
            assertThat(lines.get(i)).isEqualTo(fromOld ? withoutPeriods(List.of(single.get(i))).get(0)
                    : single.get(i));
        }
        assertThat(Files.readString(work.resolve("merged/transitions.csv")))
                .isEqualTo(Files.readString(work.resolve("single/transitions.csv")));
    }

    @Test
    void aRefinementAndTheChartsTakeARunWrittenBeforeTheColumns() throws Exception {
        Path dir = sweep("old");
        Path catalogue = dir.resolve("catalogue.ecsv");
        String current = Files.readString(catalogue);
        String transitions = Files.readString(dir.resolve("transitions.csv"));
        Files.writeString(catalogue, EarlierCatalogue.lackingFrom(current, "buoyancy_period_pi0_s",
                Integer.MAX_VALUE));
        CliHarness.Execution plot = run("plot", dir.toString());
        assertThat(plot.code()).as(plot.err()).isZero();
        assertThat(dir.resolve("report.html")).exists();
        CliHarness.Execution again = run("transitions", dir.toString());
        assertThat(again.code()).as(again.err()).isZero();
        assertThat(Files.readString(dir.resolve("transitions.csv"))).isEqualTo(transitions);
        CliHarness.Execution refined = run("transitions", dir.toString(), "--refine");
        assertThat(refined.code()).as(refined.err()).isZero();
        // brought to this layout before the refinement's rows were appended: one header, every row its width
        String text = Files.readString(catalogue);
        assertThat(text).startsWith(current.substring(0, current.indexOf("\nmodel_id,")));
        List<String> lines = CliHarness.tableLines(catalogue);
        int columns = cells(lines.get(0)).length;
        assertThat(lines).hasSizeGreaterThan(1 + (int) CliHarness.GRID_MODELS)
                .allSatisfy(l -> assertThat(cells(l)).hasSize(columns));
        assertThat(CatalogueReader.read(catalogue)).hasSize(lines.size() - 1);
    }
}
