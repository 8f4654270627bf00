package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check} on {@code ms_fraction} grids: a warning for stars that may outlive the 20 Gyr age limit, and no
 * refinement promised.
 */
class MsFractionCheckTest {

    @TempDir
    Path work;

    private CliHarness.Execution check(String masses, String ages) throws Exception {
        Path grid = CliHarness.writeGrid(work, "g.yaml", """
                title: fractions
                mass: {values: %s}
                metallicity:
                  z: [0.02]
                  helium: {primordial: 0.2471, enrichment: 1.5}
                age: %s
                """.formatted(masses, ages));
        return CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString());
    }

    @Test
    void fractionsOfStarsBelowPointNineSolarMassesAreWarnedOf() throws Exception {
        CliHarness.Execution low = check("[0.7, 0.8, 1.0, 2.0]", "{ms_fraction: [0, 0.5, 1]}");
        assertThat(low.code()).as(low.err()).isZero();
        assertThat(low.err()).contains("convgrid: warning: ms_fraction ages for stars of 0.7-0.8 Msun: below 0.9 Msun "
                + "a star may stay on the main sequence beyond the evolution's 20 Gyr age limit");
        // the same masses at ages in Gyr, or fractions of heavier stars only: nothing to say
        assertThat(check("[0.7, 0.8, 1.0, 2.0]", "{gyr: [1, 5]}").err()).doesNotContain("ms_fraction ages");
        assertThat(check("[0.9, 1.0, 2.0]", "{ms_fraction: [0.5]}").err()).doesNotContain("ms_fraction ages");
    }

    @Test
    void anMsFractionGridIsPromisedNoRefinement() throws Exception {
        // every star of such a grid has ages of its own, so no slice holds two masses: check promised ~20 new models
        CliHarness.Execution checked = check("[1.0, 1.2, 1.5, 2.0]", "{ms_fraction: [0.5]}");
        assertThat(checked.out()).contains("refinement:    none (ms_fraction ages are not refined");
    }

    @Test
    void anMsFractionGridFromTheZamsRunsToTheEndWithoutRefinement() throws Exception {
        // with origin zams every fraction-0 row sits at age 0, so that slice holds all the masses: refining it
        // appended rows without an age and the run failed ("slice ... has no grid model")
        Path grid = CliHarness.writeGrid(work, "z.yaml", """
                title: fractions from the ZAMS
                mass: {values: [0.9, 1.0, 1.1, 1.2, 1.3, 1.4]}
                metallicity:
                  z: [0.02]
                  helium: {primordial: 0.2471, enrichment: 1.5}
                age: {ms_fraction: [0], origin: zams}
                """);
        // the fake answers a fraction as the real solver does, at the age it stands for (here 1 Gyr per unit)
        FakeChunkSolver fake = FakeChunkSolver.fast();
        org.convgrid.engine.batch.ChunkSolver fractions = chunk -> fake.solve(chunk.stream()
                .map(r -> r.withAge(new org.convgrid.engine.request.Age.SinceZeroAge(
                        ((org.convgrid.engine.request.Age.MainSequenceFraction) r.age()).fraction()
                                * org.convgrid.engine.units.Constants.GYR))).toList());
        CliHarness.Execution run = new CliHarness(new CommandContext(g -> fractions, java.util.List.of(),
                java.util.Map.of(), work, false, new FakeMassLines(java.util.Set.of()))).execute("run",
                grid.toString(), "--out", "z");
        assertThat(run.code()).as(run.err()).isZero();
        assertThat(run.out()).contains("nothing to refine (ms_fraction ages are not refined");
        assertThat(run.err()).doesNotContain("refining the transition masses");
        assertThat(CliHarness.tableLines(work.resolve("z/catalogue.ecsv"))).hasSize(1 + 6);
    }
}
