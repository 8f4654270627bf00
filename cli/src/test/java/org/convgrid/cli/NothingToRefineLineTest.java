package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run whose refinement adds no model says why instead of "transitions refined ... with 0 new models" (as a
 * one-mass grid's did), and no chart library message reaches the user.
 */
class NothingToRefineLineTest {

    @TempDir
    Path work;

    @Test
    void aOneMassGridSaysThereIsNothingToRefine() throws Exception {
        CliHarness cli = new CliHarness(new CommandContext(grid -> FakeChunkSolver.fast(), List.of(), Map.of(),
                work, false, new FakeMassLines(Set.of())));
        Path grid = CliHarness.writeGrid(work, "one-mass.yaml",
                "mass: {values: [1.0]}\nmetallicity: {z: [0.02], y: [0.28]}\nage: {gyr: [0.5]}\n");
        CliHarness.Execution done = cli.execute("run", grid.toString(), "--out", "r");
        // the fake solver may fail its one model (exit 3): the line is about the refinement either way
        assertThat(done.code()).as(done.err()).isIn(0, 3);
        assertThat(done.out()).contains("transitions.csv: nothing to refine (the grid has one mass, so no two models "
                + "bracket a transition)").doesNotContain("0 new models");
        assertThat(done.err()).doesNotContain("java.", "Exception");
        // and nothing announces a refinement that cannot happen
        assertThat(done.err()).doesNotContain("refining the transition masses");
    }
}
