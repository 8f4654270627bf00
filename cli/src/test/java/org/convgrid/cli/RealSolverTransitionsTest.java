package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.TransitionColumns;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code run} with the production solver and refinement lines on a small grid at an age above zero: both transitions
 * are bracketed by the grid, refined with new models evolved to the slice's age, and the result does not depend on
 * the thread count. Coarse on purpose (four masses, a tolerance of 0.03 Msun) to stay quick.
 */
class RealSolverTransitionsTest {

    private static final double TOLERANCE = 0.03;
    private static final String GRID = """
            title: refinement at an age
            mass: {values: [0.3, 0.45, 1.05, 1.25]}
            metallicity: {z: [0.02], helium: {primordial: 0.2471, enrichment: 1.5}}
            age: {gyr: [0.5]}
            transitions: {refine: true, tolerance_msun: 0.03}
            """;

    @TempDir
    Path work;

    private Path run(String out, int threads) throws Exception {
        Path grid = CliHarness.writeGrid(work, "at-an-age.yaml", GRID);
        CliHarness real = CliHarness.real(work);
        CliHarness.Execution done = real.execute("run", grid.toString(), "--out", out, "--threads",
                Integer.toString(threads));
        assertThat(done.code()).as(done.err()).isZero();
        // before the refinement the run says what comes and roughly how long (then counts its new models)
        assertThat(done.err()).containsPattern("convgrid: refining the transition masses to 0.03 Msun by bisection "
                + "\\(about \\d+ new models, about \\d+ s\\); --no-refine skips this");
        // the sweep and the refinement each say how long they took, the refinement on its own line
        assertThat(done.out()).containsPattern("computed now in \\d+ s")
                .containsPattern("transitions refined to [0-9.]+ Msun with \\d+ new models in \\d+ s");
        return work.resolve(out);
    }

    @Test
    void bothTransitionsAreRefinedAtTheSlicesAgeTheSameAtOneAndTwoThreads() throws Exception {
        Path one = run("one", 1);
        Path two = run("two", 2);
        for (String file : List.of("catalogue.ecsv", "transitions.csv", "zones.csv")) {
            assertThat(Files.readAllBytes(two.resolve(file))).as(file).isEqualTo(Files.readAllBytes(one.resolve(file)));
        }

        String text = Files.readString(one.resolve("transitions.csv"));
        assertThat(text.lines().findFirst().orElseThrow()).isEqualTo(String.join(",", TransitionColumns.HEADER));
        List<TransitionRow> rows = TransitionReader.read(new StringReader(text));
        assertThat(rows).hasSize(1);
        TransitionRow t = rows.get(0);
        assertThat(t.slice().ageGyr()).isEqualTo(0.5);
        assertThat(t.yInit()).isEqualTo(0.2771); // the grid's own helium law, 0.2471 + 1.5 x 0.02 (arithmetic)
        assertThat(t.method()).isEqualTo(TransitionMethod.REFINED);
        assertThat(t.toleranceMsun()).isEqualTo(TOLERANCE);
        // narrowed below the tolerance, inside the grid's brackets 0.3-0.45 and 1.05-1.25
        assertThat(t.fullyConvective().bracket().hi() - t.fullyConvective().bracket().lo()).isLessThan(TOLERANCE);
        assertThat(t.fullyConvective().bracket().lo()).isGreaterThanOrEqualTo(0.3);
        assertThat(t.fullyConvective().bracket().hi()).isLessThanOrEqualTo(0.45);
        assertThat(t.convCoreOnset().bracket().hi() - t.convCoreOnset().bracket().lo()).isLessThan(TOLERANCE);
        assertThat(t.convCoreOnset().bracket().lo()).isGreaterThanOrEqualTo(1.05);
        assertThat(t.convCoreOnset().bracket().hi()).isLessThanOrEqualTo(1.25);
        // Chabrier & Baraffe 1997 (A&A 327, 1039): below ~0.35 Msun stars are fully convective; with our grey
        // atmosphere the accepted range is 0.28-0.42 Msun, as for the zero-age models (README)
        assertThat(t.fullyConvective().massMsun()).isBetween(0.28, 0.42);
        // Woo & Demarque 2001 (AJ 122, 1602): at solar Z a lasting convective core appears between ~1.1 and
        // 1.2 Msun; accepted range 1.0-1.35 Msun
        assertThat(t.convCoreOnset().massMsun()).isBetween(1.0, 1.35);
        // the transient window: both ends or neither, above the fully convective limit and below the onset
        if (t.transientCore() != null) {
            assertThat(t.transientCore().lo()).isGreaterThan(t.fullyConvective().massMsun());
            assertThat(t.transientCore().hi()).isLessThan(t.convCoreOnset().bracket().lo());
        }
        String dataRow = text.lines().skip(1).findFirst().orElseThrow();
        assertThat(dataRow.split(",", -1)).hasSize(TransitionColumns.HEADER.size());

        // the new models are ordinary catalogue rows at the slice's age, evolved (not zero-age) models
        List<CatalogueRow> added = CatalogueReader.read(one.resolve("catalogue.ecsv")).stream()
                .filter(r -> RefinedModelIds.isRefined(r.modelId())).toList();
        assertThat(added).isNotEmpty().allSatisfy(r -> {
            assertThat(r.ageGyr()).isEqualTo(0.5);
            assertThat(r.isOk()).as(r.modelId() + ": " + r.statusDetail()).isTrue();
        });
        assertThat(added).extracting(CatalogueRow::modelId).startsWith("p0-z00-r000-a00");
    }
}
