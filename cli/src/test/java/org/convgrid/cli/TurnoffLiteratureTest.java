package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code run} with the production solver on three masses around the turn-off of an old metal-poor population
 * ([Fe/H] = -2, 12 Gyr from birth): the grid brackets the turn-off, the refinement narrows it with a model evolved to
 * the slice's age, and the mass falls where published isochrones put it. Kept small (three grid masses, one new
 * model at a tolerance of 0.03 Msun) to stay near 20 s.
 */
class TurnoffLiteratureTest {

    private static final double TOLERANCE = 0.03;
    private static final String GRID = """
            title: turn-off of an old metal-poor population
            mass: {values: [0.75, 0.8, 0.85]}
            metallicity: {fe_h_dex: [-2.0], helium: {primordial: 0.2471, enrichment: 1.5}}
            age: {gyr: [12]}
            transitions: {refine: true, tolerance_msun: 0.03}
            """;

    @TempDir
    Path work;

    @Test
    void theTurnoffOfAnOldMetalPoorPopulationIsNearEightTenthsOfASolarMass() throws Exception {
        Path grid = CliHarness.writeGrid(work, "old-metal-poor.yaml", GRID);
        CliHarness real = CliHarness.real(work);
        CliHarness.Execution done = real.execute("run", grid.toString(), "--out", "old", "--threads", "2");
        // models past the main sequence are answers here, not failures: the exit code stays 0
        assertThat(done.code()).as(done.err()).isZero();

        Path dir = work.resolve("old");
        List<TransitionRow> rows = TransitionReader.read(new StringReader(Files.readString(
                dir.resolve("transitions.csv"))));
        assertThat(rows).hasSize(1);
        TransitionRow t = rows.get(0);
        assertThat(t.turnoff().found()).as(t.notes()).isTrue();
        assertThat(t.method()).isEqualTo(TransitionMethod.REFINED);
        assertThat(t.turnoff().bracket().hi() - t.turnoff().bracket().lo()).isLessThan(TOLERANCE);
        assertThat(t.turnoff().massMsun()).isEqualTo(t.turnoff().bracket().lo());
        // Published isochrones of [Fe/H] ~ -2 put the turn-off of a 12-13 Gyr population near 0.80 Msun (from
        // memory: globular-cluster isochrone sets of the 2000s-2010s, which include helium and metal diffusion).
        // Diffusion shortens main-sequence lifetimes by ~10 % in that published work (from memory); with lifetime
        // ~ M^-3.5 near a solar mass our diffusion-free models turn off ~3 % (~0.025 Msun) higher at a given age.
        // Accepted: 0.76-0.86 Msun, i.e. 0.80 +/- 0.04 for the spread between isochrone sets (helium, alpha
        // enhancement, which ours lack) plus the diffusion shift upwards and the 0.03 Msun tolerance of this test.
        // Ours on an old-population grid refined to 0.005 Msun: 0.8375 at 10 Gyr, 0.78125 at 13 Gyr (README).
        assertThat(t.turnoff().massMsun()).isBetween(0.76, 0.86);

        // the new model is an ordinary catalogue row at the slice's age, on one side of the turn-off or the other
        List<CatalogueRow> added = CatalogueReader.read(dir.resolve("catalogue.ecsv")).stream()
                .filter(r -> RefinedModelIds.isRefined(r.modelId())).toList();
        assertThat(added).isNotEmpty().allSatisfy(r -> {
            assertThat(r.ageGyr()).isEqualTo(12.0);
            assertThat(r.status()).isIn(ModelStatus.OK, ModelStatus.PAST_MAIN_SEQUENCE);
        });
    }
}
