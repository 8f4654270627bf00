package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.TrackColumns;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code convgrid run} with ages above zero and the real engine (standard physics, Z = 0.0188, Y = 0.275), with
 * time steps three times the default to keep it fast: rows at every age, track files, and byte-identical results
 * on 1 and 2 threads.
 */
class EvolvedRunTest {

    private static final String GRID = """
            title: Evolved test
            mass: {values: [1.0, 2.0]}
            metallicity: {z: [0.0188], y: [0.275]}
            age: {gyr: [0, 1, 5], origin: zams}
            output: {dir: runs/evolved}
            """;

    @TempDir
    Path dir;

    private CliHarness.Execution run(String out, int threads) throws Exception {
        Path grid = CliHarness.writeGrid(dir, "evolved.yaml", GRID);
        CliHarness harness = new CliHarness(
                new CommandContext(CoarseProductionSolvers.FACTORY, List.of(), Map.of(), dir, false));
        return harness.execute("run", "--no-refine", grid.toString(), "--out", out, "--threads", Integer.toString(threads),
                "--quiet");
    }

    @Test
    void agesGiveRowsTracksAndPastMainSequenceIdenticallyOnOneAndTwoThreads() throws Exception {
        CliHarness.Execution one = run("one", 1);
        // the 2 Msun star is past its main sequence at 1 and 5 Gyr (it lives ~1.1 Gyr with overshoot, Schaller et al.
        // 1992, A&A Suppl. 96, 269; ~0.76 Gyr here without): an answer, not a failure, so exit code 0
        assertThat(one.code()).as(one.err()).isZero();
        List<CatalogueRow> rows = CatalogueReader.read(dir.resolve("one/catalogue.ecsv"));
        assertThat(rows).extracting(r -> r.status().label())
                .containsExactly("ok", "ok", "ok", "ok", "past_main_sequence", "past_main_sequence");
        // the Sun brightens on the main sequence (Sackmann, Boothroyd & Kraemer 1993, ApJ 418, 457)
        assertThat(rows.get(1).luminosityLsun()).isGreaterThan(rows.get(0).luminosityLsun());
        assertThat(rows.get(2).luminosityLsun()).isGreaterThan(rows.get(1).luminosityLsun());
        assertThat(rows.get(2).ageGyr()).isEqualTo(5.0);
        assertThat(rows.get(5).statusDetail()).startsWith("core hydrogen exhausted");
        assertThat(rows.get(5).ageGyr()).isEqualTo(5.0);
        // no model is solved past core-hydrogen exhaustion, so its iteration count is "not applicable": an empty
        // cell, as the conventions ask, where 0 stood for "none"; the solved rows keep their counts
        List<String> cells = Files.readAllLines(dir.resolve("one/catalogue.ecsv")).stream()
                .filter(l -> !l.startsWith("#")).skip(1)
                .map(l -> l.split(",", -1)[CatalogueColumns.HEADER.indexOf(CatalogueColumns.SOLVER_ITERATIONS)])
                .toList();
        assertThat(cells.subList(4, 6)).containsOnly("");
        assertThat(cells.subList(0, 4)).allSatisfy(c -> assertThat(Integer.parseInt(c)).isPositive());

        Path sunTrack = dir.resolve("one/tracks/p0-z00-m000.csv");
        List<String> lines = Files.readAllLines(sunTrack);
        assertThat(lines.get(0)).isEqualTo(String.join(",", TrackColumns.ALL));
        assertThat(lines.get(0)).startsWith("age_gyr,phase,luminosity_lsun,radius_rsun,teff_k,log_g_cgs,central_temp_k,"
                + "central_density_cgs,central_h_frac,surface_li_rel,central_cz_top_mass_frac,env_cz_base_mass_frac,"
                + "conv_zone_count,burning_inner_mass_frac,burning_outer_mass_frac");
        double previous = -1;
        for (String line : lines.subList(1, lines.size())) {
            double age = CsvNumbers.parse(line.split(",", -1)[0]);
            assertThat(age).isGreaterThan(previous);
            previous = age;
        }
        assertThat(previous).isEqualTo(5.0);
        String[] first = lines.get(1).split(",", -1);
        assertThat(first[TrackColumns.ALL.indexOf(TrackColumns.BURNING_INNER)]).as("burning zone at the centre")
                .isEqualTo("0.0");
        // from the zero-age main sequence: main sequence throughout, lithium not followed
        assertThat(first[TrackColumns.ALL.indexOf(TrackColumns.PHASE)]).isEqualTo("main_sequence");
        assertThat(first[TrackColumns.ALL.indexOf(TrackColumns.SURFACE_LI)]).isEmpty();
        assertThat(rows).allSatisfy(r -> assertThat(r.surfaceLiRel()).isNaN());
        assertThat(rows.subList(0, 4)).allSatisfy(r -> assertThat(r.phase()).isEqualTo("main_sequence"));
        assertThat(rows.subList(4, 6)).allSatisfy(r -> assertThat(r.phase()).isEmpty());
        assertThat(dir.resolve("one/life_events.csv")).as("no life events from the zero-age main sequence")
                .doesNotExist();
        assertThat(dir.resolve("one/tracks/p0-z00-m001.csv")).exists();
        // at a requested age the track's row and the catalogue's are the same model: the cells they share by name
        // are the same text (turnover times, seismic scales and moments of inertia come from that model in both)
        List<String> catalogueLines = CliHarness.tableLines(dir.resolve("one/catalogue.ecsv"));
        List<String> header = List.of(catalogueLines.get(0).split(",", -1));
        for (String shared : List.of("luminosity_lsun", "radius_rsun", "teff_k", "central_h_frac",
                "turnover_time_days", "turnover_time_global_days", "buoyancy_period_pi0_s", "period_spacing_l1_s",
                "large_separation_uhz", "surface_cz_base_acoustic_depth_s", "he_ii_ionisation_acoustic_depth_s",
                "moment_of_inertia_g_cm2", "env_cz_moment_of_inertia_g_cm2")) {
            int inTrack = TrackColumns.ALL.indexOf(shared);
            assertThat(inTrack).as(shared).isNotNegative();
            for (String row : catalogueLines.subList(1, 4)) {
                String[] rowCells = row.split(",", -1);
                String age = rowCells[header.indexOf("age_gyr")];
                String[] step = lines.stream().skip(1).map(l -> l.split(",", -1)).filter(c -> c[0].equals(age))
                        .reduce((a, b) -> b).orElseThrow();
                assertThat(step[inTrack]).as(shared + " at " + age + " Gyr")
                        .isEqualTo(rowCells[header.indexOf(shared)]);
            }
        }
        assertThat(lines.get(1).split(",", -1)[TrackColumns.ALL.indexOf(TrackColumns.TURNOVER_TIME)]).isNotEmpty();

        CliHarness.Execution two = run("two", 2);
        assertThat(two.code()).isZero();
        assertThat(Files.readAllBytes(dir.resolve("two/catalogue.ecsv")))
                .isEqualTo(Files.readAllBytes(dir.resolve("one/catalogue.ecsv")));
        try (Stream<Path> files = Files.list(dir.resolve("one/tracks"))) {
            List<Path> tracks = files.sorted().toList();
            assertThat(tracks).hasSize(4);
            for (Path t : tracks) {
                assertThat(Files.readAllBytes(dir.resolve("two/tracks").resolve(t.getFileName())))
                        .isEqualTo(Files.readAllBytes(t));
            }
        }
    }

    @Test
    void aZeroAgeGridWritesNoTracks() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "zams.yaml", GRID.replace("[0, 1, 5]", "[0]")
                .replace("[1.0, 2.0]", "[1.0]"));
        CliHarness harness = new CliHarness(
                new CommandContext(CoarseProductionSolvers.FACTORY, List.of(), Map.of(), dir, false));
        CliHarness.Execution e = harness.execute("run", "--no-refine", grid.toString(), "--out", "zams", "--quiet");
        assertThat(e.code()).as(e.err()).isZero();
        assertThat(dir.resolve("zams/tracks")).doesNotExist();
    }
}
