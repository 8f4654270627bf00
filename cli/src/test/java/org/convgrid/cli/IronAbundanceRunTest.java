package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run of a grid given in spectroscopic [Fe/H] against its own Sun (solar_z_over_x 0.0181): every table says each
 * row's [Fe/H] ({@code fe_h_dex}, log10((Z/X) / (Z/X)_sun) for a solar-scaled mixture, common practice), the manifest
 * records the Sun, and runs written before the column (catalogue, transitions, manifest without it) resume, merge and
 * plot with it filled in against that Sun, as the overshoot_profile column was before.
 */
class IronAbundanceRunTest {

    private static final String GRID = """
            title: Planet hosts
            mass: {values: [0.8, 1.0, 1.2]}
            metallicity:
              fe_h_dex: [-0.5, 0.0, 0.3]
              solar_z_over_x: 0.0181
              helium: {primordial: 0.2471, enrichment: 1.5}
            age: {gyr: [0, 1.0], origin: zams}
            output: {dir: runs/hosts}
            """;

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    private Path sweep(String out) throws Exception {
        Path grid = CliHarness.writeGrid(work, "hosts.yaml", GRID);
        CliHarness.Execution e = run("run", "--no-refine", grid.toString(), "--out", out, "--quiet");
        assertThat(e.code()).as(e.err()).isZero();
        return work.resolve(out);
    }

    @Test
    void everyTableGivesBackTheGridsIronAndTheManifestItsSun() throws Exception {
        Path dir = sweep("hosts");
        List<String> catalogue = CliHarness.tableLines(dir.resolve("catalogue.ecsv"));
        assertThat(catalogue.get(0)).contains(",overshoot_profile,fe_h_dex,");
        assertThat(catalogue.subList(1, catalogue.size()).stream().map(IronAbundanceRunTest::ironCell).distinct())
                .containsExactly("-0.5", "0.0", "0.3");
        assertThat(Files.readString(dir.resolve("catalogue.ecsv"))).contains("{name: fe_h_dex, unit: 'dex', "
                + "datatype: float64, description: '[Fe/H] = log10 of (Z/X) over the solar Z/X 0.0181 (solar-scaled "
                + "mixture)");
        List<String> transitions = Files.readAllLines(dir.resolve("transitions.csv"));
        assertThat(transitions.get(0)).startsWith("z_init,y_init,fe_h_dex,age_gyr,");
        assertThat(transitions.subList(1, transitions.size()).stream().map(l -> l.split(",")[2]).distinct())
                .containsExactly("-0.5", "0.0", "0.3");
        assertThat(Files.readString(dir.resolve("manifest.yaml")))
                .contains("metallicity:\n  axis: fe_h_dex\n  solar_z_over_x: 0.0181\n");
    }

    @Test
    void aRunWrittenBeforeTheColumnResumesToTheSameBytes() throws Exception {
        byte[] whole = Files.readAllBytes(sweep("whole").resolve("catalogue.ecsv"));
        Path dir = sweep("earlier");
        Path catalogue = dir.resolve("catalogue.ecsv");
        Files.writeString(catalogue, withoutIronColumn(Files.readString(catalogue), 7));
        Path grid = work.resolve("hosts.yaml");
        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", "earlier", "--resume");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(resumed.err()).contains("7 already in the catalogue");
        assertThat(Files.readAllBytes(catalogue)).isEqualTo(whole);
    }

    @Test
    void shardsWrittenBeforeTheColumnMergeToTheSingleRun() throws Exception {
        Path single = sweep("single");
        Path grid = work.resolve("hosts.yaml");
        for (int k = 1; k <= 2; k++) {
            assertThat(run("run", "--no-refine", grid.toString(), "--shard", k + "/2", "--quiet").code()).isZero();
        }
        Path old = work.resolve("runs/hosts-shard-2-of-2/catalogue.ecsv");
        Files.writeString(old, withoutIronColumn(Files.readString(old), Integer.MAX_VALUE));
        CliHarness.Execution merged = run("merge", "runs/hosts-shard-1-of-2", "runs/hosts-shard-2-of-2", "--out",
                "merged");
        assertThat(merged.code()).as(merged.err()).isZero();
        for (String file : List.of("catalogue.ecsv", "transitions.csv")) {
            assertThat(Files.readString(work.resolve("merged").resolve(file)))
                    .isEqualTo(Files.readString(single.resolve(file)));
        }
    }

    @Test
    void plotAndTransitionsOfARunWrittenBeforeTheColumnTakeTheSunFromTheGridText() throws Exception {
        Path dir = sweep("old");
        Path catalogue = dir.resolve("catalogue.ecsv");
        Files.writeString(catalogue, withoutIronColumn(Files.readString(catalogue), Integer.MAX_VALUE));
        Path transitions = dir.resolve("transitions.csv");
        String newTransitions = Files.readString(transitions);
        Files.writeString(transitions, newTransitions.lines().map(l -> {
            List<String> cells = new java.util.ArrayList<>(List.of(l.split(",", -1)));
            cells.remove(2);
            return String.join(",", cells) + "\n";
        }).reduce("", String::concat));
        // the manifest as the version before this one wrote it: no metallicity mapping (its grid text says fe_h_dex)
        Path manifest = dir.resolve("manifest.yaml");
        Files.writeString(manifest, Files.readString(manifest)
                .replace("metallicity:\n  axis: fe_h_dex\n  solar_z_over_x: 0.0181\n", ""));
        CliHarness.Execution plot = run("plot", dir.toString());
        assertThat(plot.code()).as(plot.err()).isZero();
        String report = Files.readString(dir.resolve("report.html"));
        assertThat(report).contains("[Fe/H] = -0.50, Z = ").contains("[Fe/H] = +0.30, Z = ")
                .contains("<th>[Fe/H]</th>").contains("over the solar Z/X 0.0181");
        CliHarness.Execution again = run("transitions", dir.toString());
        assertThat(again.code()).as(again.err()).isZero();
        assertThat(Files.readString(transitions)).isEqualTo(newTransitions);
    }

    @Test
    void aGridInZKeepsItsChartsWordsAndMeasuresAgainstTheDefaultSun() throws Exception {
        Path grid = CliHarness.writeGrid(work, "z.yaml", GRID.replace("fe_h_dex: [-0.5, 0.0, 0.3]",
                "z: [0.0, 0.014]").replace("  solar_z_over_x: 0.0181\n", ""));
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "z", "--quiet").code()).isZero();
        List<String> catalogue = CliHarness.tableLines(work.resolve("z/catalogue.ecsv"));
        // Z = 0 has no [Fe/H]; 0.014 with Y = 0.2471 + 1.5 x 0.014 = 0.2681: log10(0.014 / 0.7179 / 0.0245) = -0.0991
        assertThat(catalogue.subList(1, catalogue.size()).stream().map(IronAbundanceRunTest::ironCell).distinct())
                .containsExactly("", "-0.0991");
        assertThat(Files.readString(work.resolve("z/manifest.yaml")))
                .contains("metallicity:\n  axis: z\n  solar_z_over_x: 0.0245\n");
        assertThat(run("plot", work.resolve("z").toString()).code()).isZero();
        assertThat(Files.readString(work.resolve("z/report.html"))).doesNotContain("[Fe/H]");
    }

    /** The fe_h_dex cell of a catalogue row, at its place in the header. */
    private static String ironCell(String line) {
        String[] cells = line.split(",", -1);
        return cells[CatalogueColumns.HEADER.indexOf(CatalogueColumns.FE_H_DEX)];
    }

    /** A catalogue as the version before fe_h_dex wrote it, its first {@code rows} rows only. */
    private static String withoutIronColumn(String text, int rows) {
        return EarlierCatalogue.lackingFrom(text, "fe_h_dex", rows);
    }
}
