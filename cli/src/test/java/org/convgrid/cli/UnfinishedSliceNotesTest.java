package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.manifest.RunManifestWriter;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * transitions.csv of an unfinished run says, in each row's notes, which slices lack some of their masses: stderr's
 * warning alone left a script that reads the file later unable to tell that a limit was found among part of a
 * slice's masses. The grid ({@link CliHarness#GRID}): 2 metallicities x 39 masses x 2 ages, in grid
 * order Z, then mass, then age, so the first 40 rows are 20 masses of Z = 0.004 at both ages.
 */
class UnfinishedSliceNotesTest {

    private static final String MARK = "unfinished slice: ";

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    /** Cuts a run's catalogue after {@code rows} rows and makes its manifest unfinished, as an interrupt leaves it. */
    private static void cut(Path dir, int rows, long expected) throws Exception {
        List<String> lines = Files.readAllLines(dir.resolve("catalogue.ecsv"));
        Files.write(dir.resolve("catalogue.ecsv"), lines.subList(0, CliHarness.CATALOGUE_HEADER_LINES + rows));
        Files.deleteIfExists(dir.resolve("transitions.csv"));
        RunManifest finished = RunManifestReader.read(Files.readString(dir.resolve("manifest.yaml")));
        Files.writeString(dir.resolve("manifest.yaml"), RunManifestWriter.toYaml(
                finished.unfinished(finished.counts(), finished.medianSecondsPerModel(), expected)));
    }

    private static List<TransitionRow> table(Path dir) throws Exception {
        return TransitionReader.read(new StringReader(Files.readString(dir.resolve("transitions.csv"))));
    }

    private Path grid() throws Exception {
        return CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
    }

    @Test
    void transitionsMarksTheSlicesThatLackMassesAndResumeTakesTheMarksAway() throws Exception {
        assertThat(run("run", "--no-refine", grid().toString(), "--out", "d", "--quiet").code()).isZero();
        Path dir = work.resolve("d");
        cut(dir, 40, CliHarness.GRID_MODELS);

        assertThat(run("transitions", dir.toString()).code()).isZero();

        List<TransitionRow> rows = table(dir);
        assertThat(rows).hasSize(2).allSatisfy(t -> assertThat(t.notes())
                .startsWith(MARK + "20 of 39 masses computed; complete it with convgrid run " + grid() + " --out DIR --resume (DIR: the directory of this table)"));
        // the column order and the CSV stay readable: the same header as a complete run's table
        String header = Files.readAllLines(dir.resolve("transitions.csv")).get(0);

        assertThat(run("run", "--no-refine", grid().toString(), "--out", "d", "--resume", "--quiet").code()).isZero();
        assertThat(Files.readString(dir.resolve("transitions.csv"))).doesNotContain(MARK);
        assertThat(Files.readAllLines(dir.resolve("transitions.csv")).get(0)).isEqualTo(header);
        assertThat(run("transitions", dir.toString()).code()).isZero();
        assertThat(Files.readString(dir.resolve("transitions.csv"))).doesNotContain(MARK);
    }

    @Test
    void aCompleteRunsTableIsUnmarkedAndUnchangedByTransitions() throws Exception {
        assertThat(run("run", "--no-refine", grid().toString(), "--out", "d", "--quiet").code()).isZero();
        Path dir = work.resolve("d");
        String written = Files.readString(dir.resolve("transitions.csv"));
        assertThat(written).doesNotContain(MARK);

        assertThat(run("transitions", dir.toString()).code()).isZero();

        assertThat(Files.readString(dir.resolve("transitions.csv"))).isEqualTo(written);
    }

    @Test
    void aSliceCompleteInAnUnfinishedRunIsNotMarked() throws Exception {
        assertThat(run("run", "--no-refine", grid().toString(), "--out", "d", "--quiet").code()).isZero();
        Path dir = work.resolve("d");
        // Z = 0.004 whole (78 rows), then 5 masses of Z = 0.02
        cut(dir, 78 + 10, CliHarness.GRID_MODELS);

        assertThat(run("transitions", dir.toString()).code()).isZero();

        List<TransitionRow> rows = table(dir);
        assertThat(rows).hasSize(4);
        assertThat(rows).filteredOn(t -> t.slice().zInit() == 0.004).allSatisfy(t ->
                assertThat(t.notes()).doesNotContain(MARK));
        assertThat(rows).filteredOn(t -> t.slice().zInit() == 0.02).hasSize(2).allSatisfy(t ->
                assertThat(t.notes()).startsWith(MARK + "5 of 39 masses computed"));
    }

    @Test
    void plotShowsTheMarksInTheReportAsTransitionsWritesThem() throws Exception {
        assertThat(run("run", "--no-refine", grid().toString(), "--out", "d", "--quiet").code()).isZero();
        Path dir = work.resolve("d");
        cut(dir, 40, CliHarness.GRID_MODELS);

        assertThat(run("plot", dir.toString()).code()).isZero();
        assertThat(Files.readString(dir.resolve("report.html")))
                .contains(MARK + "20 of 39 masses computed; complete it with convgrid run " + grid() + " --out DIR --resume (DIR: the directory of this table)");

        assertThat(run("transitions", dir.toString()).code()).isZero();
        assertThat(run("plot", dir.toString()).code()).isZero();
        assertThat(Files.readString(dir.resolve("report.html")))
                .contains(MARK + "20 of 39 masses computed; complete it with convgrid run " + grid() + " --out DIR --resume (DIR: the directory of this table)");
    }

    /**
     * A shard's slices are complete when its share of them is: shard 1/2 owns chunks 0, 2, 4 of each line of 5
     * chunks (8, 8, 8, 8, 7 masses) counted on across lines, so 23 masses of Z = 0.004 and 16 of Z = 0.02. Its
     * first 46 rows complete its Z = 0.004; 8 more masses of Z = 0.02 are half of its share there.
     */
    @Test
    void aShardsSlicesAreCountedAgainstItsShareAndItsMergeIsUnmarked() throws Exception {
        for (int k = 1; k <= 2; k++) {
            assertThat(run("run", grid().toString(), "--shard", k + "/2", "--out", "x", "--quiet").code()).isZero();
        }
        Path shard = work.resolve("x-shard-1-of-2");
        assertThat(run("transitions", shard.toString()).code()).isZero();
        assertThat(Files.readString(shard.resolve("transitions.csv"))).doesNotContain(MARK);
        assertThat(run("merge", shard.toString(), work.resolve("x-shard-2-of-2").toString(), "--out", "m").code())
                .isZero();
        assertThat(Files.readString(work.resolve("m/transitions.csv"))).doesNotContain(MARK);

        cut(shard, 46 + 16, 46 + 32);
        assertThat(run("transitions", shard.toString()).code()).isZero();

        List<TransitionRow> rows = table(shard);
        assertThat(rows).filteredOn(t -> t.slice().zInit() == 0.004).hasSize(2).allSatisfy(t ->
                assertThat(t.notes()).doesNotContain(MARK));
        assertThat(rows).filteredOn(t -> t.slice().zInit() == 0.02).hasSize(2).allSatisfy(t ->
                assertThat(t.notes()).startsWith(MARK + "8 of 16 masses of shard 1/2 computed; complete it with convgrid run "
                        + grid() + " --out DIR --shard 1/2 --resume (DIR: the directory of this table)"));
    }
}
