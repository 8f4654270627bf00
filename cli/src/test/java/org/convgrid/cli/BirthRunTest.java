package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackStep;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code convgrid run} with ages from birth and the real engine (standard physics, Z = 0.02, Y = 0.28): the phase
 * and surface-lithium columns, the track files with their zone tables, the life-events table, the manifest's age
 * origin, and byte-identical results on 1 and 2 threads. Main-sequence time steps are three times the default to
 * keep it fast (the pre-main-sequence limits are the production ones).
 */
class BirthRunTest {

    private static final String GRID = """
            title: Birth test
            mass: {values: [0.25, 1.0]}
            metallicity: {z: [0.02], y: [0.28]}
            age: {myr: [5, 60]}
            output: {dir: runs/birth}
            """;

    @TempDir
    Path dir;

    private CliHarness.Execution run(String out, int threads) throws Exception {
        Path grid = CliHarness.writeGrid(dir, "birth.yaml", GRID);
        CliHarness harness = new CliHarness(
                new CommandContext(CoarseProductionSolvers.FACTORY, List.of(), Map.of(), dir, false));
        return harness.execute("run", "--no-refine", grid.toString(), "--out", out, "--threads",
                Integer.toString(threads), "--quiet");
    }

    @Test
    void youngStarsHaveTheirPhaseLithiumTracksAndLifeEventsIdenticallyOnOneAndTwoThreads() throws Exception {
        CliHarness.Execution one = run("one", 1);
        assertThat(one.code()).as(one.err()).isZero();
        List<CatalogueRow> rows = CatalogueReader.read(dir.resolve("one/catalogue.ecsv"));
        assertThat(rows).extracting(CatalogueRow::ageGyr).containsExactly(0.005, 0.06, 0.005, 0.06);
        // 0.25 Msun contracts for several hundred Myr; 1 Msun reaches the main sequence after ~50 Myr (Iben 1965,
        // ApJ 141, 993, contraction times, from memory; our engine gives 48.9 Myr): at 5 Myr it still contracts
        assertThat(rows).extracting(CatalogueRow::phase).containsExactly("pre_main_sequence", "pre_main_sequence",
                "pre_main_sequence", "main_sequence");
        // lithium is followed from birth: a fraction of the birth value, and it only burns
        assertThat(rows).allSatisfy(r -> assertThat(r.surfaceLiRel()).isBetween(0.0, 1.0));
        assertThat(rows.get(1).surfaceLiRel()).isLessThanOrEqualTo(rows.get(0).surfaceLiRel());
        assertThat(rows.get(3).surfaceLiRel()).isLessThanOrEqualTo(rows.get(2).surfaceLiRel());
        // 0.25 Msun stays fully convective (Chabrier & Baraffe 1997, A&A 327, 1039: fully convective below ~0.35 Msun)
        assertThat(rows.subList(0, 2)).allSatisfy(r -> assertThat(r.structureClass().label())
                .isEqualTo("fully_convective"));
        assertThat(RunManifestReader.read(Files.readString(dir.resolve("one/manifest.yaml"))).ageOrigin())
                .isEqualTo(AgeOrigin.BIRTH);

        Track sun = TrackReader.read(dir.resolve("one/tracks/p0-z00-m001.csv"));
        TrackStep first = sun.steps().get(0);
        TrackStep last = sun.steps().get(sun.steps().size() - 1);
        assertThat(first.ageGyr()).isZero();
        assertThat(first.phase()).isEqualTo("pre_main_sequence");
        assertThat(first.surfaceLiRel()).isEqualTo(1.0);
        assertThat(first.convZones()).singleElement().satisfies(z -> {
            assertThat(z.lo()).isZero();
            assertThat(z.hi()).isCloseTo(1.0, within(1e-5));
        });
        assertThat(last.ageGyr()).isEqualTo(0.06);
        assertThat(last.phase()).isEqualTo("main_sequence");
        assertThat(dir.resolve("one/tracks/p0-z00-m001.zones.csv")).exists();

        List<LifeEventRow> events = LifeEventReader.read(dir.resolve("one/life_events.csv"));
        assertThat(events).extracting(LifeEventRow::trackId).containsExactly("p0-z00-m000", "p0-z00-m001");
        LifeEventRow small = events.get(0);
        assertThat(small.radiativeCoreMyr()).as("never: fully convective").isNaN();
        assertThat(small.zamsMyr()).as("not reached on the computed track (to 60 Myr)").isNaN();
        assertThat(small.radiativeCoreEndMyr()).as("no radiative core to end").isNaN();
        assertThat(small.trackEndMyr()).as("the computed track's end").isEqualTo(60.0);
        LifeEventRow solar = events.get(1);
        // a 1 Msun star leaves its fully convective Hayashi track within its first few Myr (Iben 1965, ApJ 141, 993,
        // from memory; our engine gives 1.7 Myr)
        assertThat(solar.radiativeCoreMyr()).isBetween(1.0, 10.0);
        assertThat(solar.zamsMyr()).isBetween(30.0, 60.0);
        // a solar-mass star keeps its radiative core on the main sequence (common knowledge; e.g. the standard solar
        // model of Bahcall, Serenelli & Basu 2005, ApJ 621, L85, radiative below r/R ~0.71)
        assertThat(solar.radiativeCoreEndMyr()).as("its radiative core lasts").isNaN();
        assertThat(solar.trackEndMyr()).isEqualTo(60.0);

        CliHarness.Execution two = run("two", 2);
        assertThat(two.code()).as(two.err()).isZero();
        for (String file : List.of("catalogue.ecsv", "zones.csv", "life_events.csv", "tracks/p0-z00-m000.csv",
                "tracks/p0-z00-m001.zones.csv")) {
            assertThat(Files.readAllBytes(dir.resolve("two").resolve(file))).as(file)
                    .isEqualTo(Files.readAllBytes(dir.resolve("one").resolve(file)));
        }
    }
}
