package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * life_events.csv gives the end of a radiative core, not only its appearance, and where each track ends. This
 * grid gave radiative_core_myr 67.45 (0.26 Msun) and 38.72 (0.3 Msun) with nothing after, while the
 * catalogue calls both fully convective at 250 Myr (their transient radiative cores are a documented model
 * discrepancy, README "Known discrepancies"). The end must agree with the run's own files: it is the first step of
 * the track's last run of fully convective steps, and the catalogue's rows before and after it say so. Not a physics
 * test (production solver, that grid, no refinement; ~10 s).
 */
class RadiativeCoreEndTest {

    private static final String GRID = """
            title: Transient radiative cores
            mass: {values: [0.26, 0.3, 0.33]}
            metallicity: {z: [0.02], helium: {primordial: 0.2471, enrichment: 1.5}}
            age: {myr: [60, 250]}
            output: {dir: runs/transient}
            """;

    @TempDir
    Path dir;

    @Test
    void theRadiativeCoreEndsWhereTheTrackTurnsFullyConvectiveForGoodAndEveryTrackSaysWhereItEnds() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "transient.yaml", GRID);
        CliHarness.Execution run = CliHarness.real(dir).execute("run", "--no-refine", grid.toString(), "--out", "run",
                "--quiet");
        assertThat(run.code()).as(run.err()).isZero();
        List<LifeEventRow> events = LifeEventReader.read(dir.resolve("run/life_events.csv"));
        List<CatalogueRow> rows = CatalogueReader.read(dir.resolve("run/catalogue.ecsv"));
        assertThat(events).extracting(LifeEventRow::trackId).containsExactly("p0-z00-m000", "p0-z00-m001",
                "p0-z00-m002");
        assertThat(Files.readAllLines(dir.resolve("run/life_events.csv")).get(0))
                .contains("radiative_core_myr,radiative_core_end_myr,zams_myr").endsWith(",track_end_myr");
        for (LifeEventRow e : events) {
            // every track reaches the grid's oldest age; an empty event cell means "not by 250 Myr"
            assertThat(e.trackEndMyr()).as(e.trackId()).isCloseTo(250.0, within(1e-9));
            assertThat(e.radiativeCoreMyr()).as(e.trackId()).isBetween(20.0, 80.0);
            // both files keep seven digits of the age, one in Gyr, the other in Myr
            double fromTrack = lastReturnToFullConvectionMyr(dir.resolve("run/tracks/" + e.trackId() + ".csv"));
            if (Double.isNaN(fromTrack)) {
                assertThat(e.radiativeCoreEndMyr()).as(e.trackId()).isNaN();
            } else {
                assertThat(e.radiativeCoreEndMyr()).as(e.trackId()).isCloseTo(fromTrack, within(1e-6 * fromTrack));
            }
            for (CatalogueRow r : rows.stream().filter(r -> r.modelId().startsWith(e.trackId() + "-")).toList()) {
                double ageMyr = r.ageGyr() * 1000.0;
                boolean fullyConvective = r.structureClass().label().equals("fully_convective");
                boolean afterTheEnd = ageMyr >= e.radiativeCoreEndMyr();
                boolean afterTheOnset = ageMyr >= e.radiativeCoreMyr();
                assertThat(fullyConvective).as("%s at %.0f Myr", e.trackId(), ageMyr)
                        .isEqualTo(!afterTheOnset || afterTheEnd);
            }
        }
        // 0.26 and 0.3 Msun are fully convective again by 250 Myr; 0.33 Msun keeps its radiative region
        assertThat(events.get(0).radiativeCoreEndMyr()).isBetween(67.0, 250.0);
        assertThat(events.get(1).radiativeCoreEndMyr()).isBetween(39.0, 250.0);
        assertThat(events.get(2).radiativeCoreEndMyr()).isNaN();
    }

    /**
     * Myr since birth of the first step of the track's last run of fully convective steps (envelope base at the
     * centre), NaN when its last step is not fully convective.
     */
    private static double lastReturnToFullConvectionMyr(Path track) throws Exception {
        List<String> lines = Files.readAllLines(track);
        List<String> header = Arrays.asList(lines.get(0).split(","));
        int age = header.indexOf("age_gyr");
        int base = header.indexOf("env_cz_base_mass_frac");
        double since = Double.NaN;
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",", -1);
            boolean fullyConvective = cells[base].equals("0.0");
            if (!fullyConvective) {
                since = Double.NaN;
            } else if (Double.isNaN(since)) {
                since = Double.parseDouble(cells[age]) * 1000.0;
            }
        }
        return since;
    }
}
