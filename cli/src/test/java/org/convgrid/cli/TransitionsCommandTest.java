package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code convgrid transitions} on runs of the fake solver (edges at 0.375 and 1.225 Msun, grid step 0.05 Msun). */
class TransitionsCommandTest {

    private static final double FC_EDGE = 0.375;
    private static final double CORE_EDGE = 1.225;

    @TempDir
    Path work;

    private CliHarness harness(FakeMassLines lines) {
        CliHarness plain = CliHarness.in(work, FakeChunkSolver.fast());
        return plain.with(plain.context().withLines(lines));
    }

    private Path finishedRun(String name) throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        assertThat(harness(new FakeMassLines(Set.of())).execute("run", "--no-refine", grid.toString(), "--out", name, "--quiet")
                .code()).isEqualTo(0);
        return work.resolve(name);
    }

    private static List<TransitionRow> transitions(Path dir) throws Exception {
        return TransitionReader.read(new StringReader(Files.readString(dir.resolve("transitions.csv"))));
    }

    @Test
    void withoutRefineTheTableIsRecomputedFromTheCatalogueAlone() throws Exception {
        Path dir = finishedRun("plain");
        byte[] written = Files.readAllBytes(dir.resolve("transitions.csv"));
        Files.delete(dir.resolve("transitions.csv"));
        FakeMassLines lines = new FakeMassLines(Set.of());
        CliHarness.Execution done = harness(lines).execute("transitions", "plain");
        assertThat(done.code()).isEqualTo(0);
        assertThat(Files.readAllBytes(dir.resolve("transitions.csv"))).isEqualTo(written);
        assertThat(lines.solved.get()).isZero();
        // one core threshold per run: the transitions cannot be asked for another one than the classes used
        assertThat(harness(lines).execute("transitions", "plain", "--core-threshold", "0.2").code()).isEqualTo(2);
    }

    @Test
    void refinementNarrowsTheBracketsOfEveryAgeBelowTheToleranceInsideTheGridBrackets() throws Exception {
        Path dir = finishedRun("refined");
        List<TransitionRow> grid = transitions(dir);
        byte[] gridCatalogue = Files.readAllBytes(dir.resolve("catalogue.ecsv"));
        // a sweep that ended long ago: the refinement's new models end the run later
        Path manifestFile = dir.resolve("manifest.yaml");
        Files.writeString(manifestFile, Files.readString(manifestFile)
                .replaceFirst("(?m)^finished: .*$", "finished: 2020-01-01T00:00:00Z"));
        java.time.Instant before = java.time.Instant.now().truncatedTo(java.time.temporal.ChronoUnit.SECONDS);
        CliHarness.Execution done = harness(new FakeMassLines(Set.of())).execute("transitions", "refined",
                "--refine", "--tolerance", "0.002", "--threads", "2");
        assertThat(done.code()).as(done.err()).isEqualTo(0);
        List<TransitionRow> refined = transitions(dir);
        assertThat(refined).hasSize(grid.size());
        for (int i = 0; i < refined.size(); i++) {
            TransitionRow r = refined.get(i);
            TransitionRow g = grid.get(i);
            assertThat(r.slice()).isEqualTo(g.slice());
            assertThat(r.method()).isEqualTo(TransitionMethod.REFINED);
            assertThat(r.toleranceMsun()).isEqualTo(0.002);
            assertThat(g.toleranceMsun()).isNaN();
            assertThat(r.fullyConvective().bracket().hi() - r.fullyConvective().bracket().lo()).isLessThan(0.002);
            assertThat(r.fullyConvective().massMsun()).isLessThan(FC_EDGE).isGreaterThan(FC_EDGE - 0.002)
                    .isBetween(g.fullyConvective().bracket().lo(), g.fullyConvective().bracket().hi());
            assertThat(r.convCoreOnset().bracket().hi() - r.convCoreOnset().bracket().lo()).isLessThan(0.002);
            assertThat(r.convCoreOnset().massMsun()).isGreaterThanOrEqualTo(CORE_EDGE).isLessThan(CORE_EDGE + 0.002)
                    .isBetween(g.convCoreOnset().bracket().lo(), g.convCoreOnset().bracket().hi());
        }
        // the grid rows stay as they were; the new rows follow them, slice by slice in increasing mass
        byte[] now = Files.readAllBytes(dir.resolve("catalogue.ecsv"));
        assertThat(java.util.Arrays.copyOf(now, gridCatalogue.length)).isEqualTo(gridCatalogue);
        List<CatalogueRow> added = CatalogueReader.read(dir.resolve("catalogue.ecsv")).stream()
                .filter(r -> RefinedModelIds.isRefined(r.modelId())).toList();
        // 0.05 Msun -> below 0.002 Msun takes 5 halvings, per transition, metallicity and age
        assertThat(added).hasSize(2 * 2 * 2 * 5);
        assertThat(added.get(0).modelId()).isEqualTo("p0-z00-r000-a00");
        assertThat(added.get(9).modelId()).isEqualTo("p0-z00-r009-a00");
        assertThat(added.get(10).modelId()).isEqualTo("p0-z00-r000-a01");
        assertThat(added.get(10).ageGyr()).isEqualTo(2.0);
        assertThat(added.get(20).modelId()).isEqualTo("p0-z01-r000-a00");
        assertThat(added.subList(0, 10)).extracting(CatalogueRow::massMsun).isSorted();
        assertThat(RunManifestReader.read(Files.readString(dir.resolve("manifest.yaml"))).total())
                .isEqualTo(CliHarness.GRID_MODELS + added.size());
        // its counts include the refinement's models, so its end is the refinement's
        assertThat(RunManifestReader.read(Files.readString(manifestFile)).finished()).isAfterOrEqualTo(before);
        assertThat(done.out()).contains("4 refined; 8 bisections, 40 new models");
    }

    @Test
    void withoutToleranceARefinementAimsAtTheGridFilesTolerance() throws Exception {
        // what finishing a merged or interrupted run does: it must give what a single run of the grid gives, so a
        // grid asking for 0.01 Msun is refined to 0.01, not to the command's own default of 0.002 (it had
        // given 112 catalogue rows instead of a single run's 82)
        Path grid = CliHarness.writeGrid(work, "coarse.yaml", CliHarness.GRID + "transitions: {tolerance_msun: 0.01}\n");
        FakeMassLines lines = new FakeMassLines(Set.of());
        assertThat(harness(lines).execute("run", "--no-refine", grid.toString(), "--out", "coarse", "--quiet").code())
                .isEqualTo(0);
        assertThat(harness(lines).execute("transitions", "coarse", "--refine").code()).isEqualTo(0);
        assertThat(transitions(work.resolve("coarse"))).allSatisfy(r -> assertThat(r.toleranceMsun()).isEqualTo(0.01));
        // the same grid run in one go refines alike: same catalogue, byte for byte
        assertThat(harness(lines).execute("run", grid.toString(), "--out", "single", "--quiet").code()).isEqualTo(0);
        assertThat(Files.readAllBytes(work.resolve("coarse").resolve("catalogue.ecsv")))
                .isEqualTo(Files.readAllBytes(work.resolve("single").resolve("catalogue.ecsv")));
        // an explicit --tolerance still wins
        assertThat(harness(lines).execute("transitions", "coarse", "--refine", "--tolerance", "0.005").code())
                .isEqualTo(0);
        assertThat(transitions(work.resolve("coarse"))).allSatisfy(r -> assertThat(r.toleranceMsun()).isEqualTo(0.005));
    }

    @Test
    void refiningTwiceKeepsTheAnswerAndAFinerToleranceContinuesTheIds() throws Exception {
        Path dir = finishedRun("twice");
        FakeMassLines lines = new FakeMassLines(Set.of());
        assertThat(harness(lines).execute("transitions", "twice", "--refine").code()).isEqualTo(0);
        byte[] catalogue = Files.readAllBytes(dir.resolve("catalogue.ecsv"));
        byte[] table = Files.readAllBytes(dir.resolve("transitions.csv"));
        List<TransitionRow> first = transitions(dir);
        int solved = lines.solved.get();
        java.time.Instant end = RunManifestReader.read(Files.readString(dir.resolve("manifest.yaml"))).finished();
        assertThat(harness(lines).execute("transitions", "twice", "--refine").code()).isEqualTo(0);
        assertThat(lines.solved.get()).isEqualTo(solved);
        // nothing added, so the run's end stays
        assertThat(RunManifestReader.read(Files.readString(dir.resolve("manifest.yaml"))).finished()).isEqualTo(end);
        assertThat(Files.readAllBytes(dir.resolve("catalogue.ecsv"))).isEqualTo(catalogue);
        assertThat(Files.readAllBytes(dir.resolve("transitions.csv"))).isEqualTo(table);

        assertThat(harness(lines).execute("transitions", "twice", "--refine", "--tolerance", "0.0005").code())
                .isEqualTo(0);
        List<TransitionRow> finer = transitions(dir);
        assertThat(finer.get(0).fullyConvective().massMsun())
                .isCloseTo(first.get(0).fullyConvective().massMsun(), within(0.002));
        assertThat(finer.get(0).convCoreOnset().massMsun())
                .isCloseTo(first.get(0).convCoreOnset().massMsun(), within(0.002));
        assertThat(finer.get(0).toleranceMsun()).isEqualTo(0.0005);
        assertThat(CatalogueReader.read(dir.resolve("catalogue.ecsv")).stream().map(CatalogueRow::modelId))
                .contains("p0-z00-r010-a00").doesNotHaveDuplicates();
        // a plain recompute of a refined catalogue gives the refined answer again, with the tolerance it stated
        assertThat(harness(lines).execute("transitions", "twice").code()).isEqualTo(0);
        assertThat(transitions(dir)).usingRecursiveFieldByFieldElementComparatorIgnoringFields("notes")
                .isEqualTo(finer);
    }

    @Test
    void aCatalogueWrittenBeforeTheLastColumnIsBroughtToThisLayoutBeforeTheRefinementAppends() throws Exception {
        // the run as the version before fe_h_dex wrote it: no such column in the header, one cell fewer per row;
        // the refinement's rows used to be appended under that header with a cell more than it named
        Path dir = finishedRun("earlier");
        Path catalogue = dir.resolve("catalogue.ecsv");
        String current = Files.readString(catalogue);
        Files.writeString(catalogue, EarlierCatalogue.lackingFrom(current, "fe_h_dex", Integer.MAX_VALUE));
        assertThat(harness(new FakeMassLines(Set.of())).execute("transitions", "earlier", "--refine").code())
                .isEqualTo(0);
        String refined = Files.readString(catalogue);
        assertThat(refined).startsWith(current.substring(0, current.indexOf("\nmodel_id,")));
        List<String> lines = CliHarness.tableLines(catalogue);
        int columns = lines.get(0).split(",", -1).length;
        assertThat(lines).hasSizeGreaterThan(1 + 156)
                .allSatisfy(l -> assertThat(l.split(",", -1)).hasSize(columns));
        assertThat(CatalogueReader.read(catalogue)).hasSize(lines.size() - 1);
    }

    @Test
    void theResultDoesNotDependOnTheThreadCount() throws Exception {
        finishedRun("one");
        finishedRun("two");
        assertThat(harness(new FakeMassLines(Set.of())).execute("transitions", "one", "--refine", "--threads", "1")
                .code()).isEqualTo(0);
        assertThat(harness(new FakeMassLines(Set.of())).execute("transitions", "two", "--refine", "--threads", "3")
                .code()).isEqualTo(0);
        for (String file : List.of("catalogue.ecsv", "transitions.csv")) {
            assertThat(Files.readAllBytes(work.resolve("two").resolve(file)))
                    .isEqualTo(Files.readAllBytes(work.resolve("one").resolve(file)));
        }
    }

    @Test
    void aRunWhoseRefinementHasAFailedNewModelExitsThreeAsTransitionsRefineDoes() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        // the first midpoint of the fully convective bracket 0.35-0.4 fails; every grid model is fine
        CliHarness.Execution done = harness(new FakeMassLines(Set.of(0.375))).execute("run", grid.toString(), "--out",
                "refining", "--quiet");
        assertThat(done.code()).isEqualTo(3);
        assertThat(done.err()).contains("some models failed or did not converge");
        assertThat(transitions(work.resolve("refining")).get(0).notes())
                .contains("the model at 0.375 Msun failed (fake line gave up)");
        // without the failure, the same run exits 0
        assertThat(harness(new FakeMassLines(Set.of())).execute("run", grid.toString(), "--out", "clean", "--quiet")
                .code()).isEqualTo(0);
    }

    @Test
    void aFailedNewModelStopsItsBisectionSaysWhereAndExitsThree() throws Exception {
        Path dir = finishedRun("failing");
        // the first midpoint of the fully convective bracket 0.35-0.4
        CliHarness.Execution done = harness(new FakeMassLines(Set.of(0.375))).execute("transitions", "failing",
                "--refine");
        assertThat(done.code()).isEqualTo(3);
        TransitionRow z0 = transitions(dir).get(0);
        assertThat(z0.fullyConvective().bracket().lo()).isEqualTo(0.35);
        assertThat(z0.fullyConvective().bracket().hi()).isEqualTo(0.4);
        assertThat(z0.notes()).contains("fully convective bracket widened past 1 model that did not converge");
        assertThat(z0.notes()).contains("fully convective refinement stopped at a bracket of 0.05 Msun: the model "
                + "at 0.375 Msun failed (fake line gave up)");
        assertThat(z0.method()).isEqualTo(TransitionMethod.REFINED);
        assertThat(done.err()).contains("the model at 0.375 Msun failed");
        // again: the known failure is neither recomputed nor appended twice, and the table says the same
        byte[] catalogue = Files.readAllBytes(dir.resolve("catalogue.ecsv"));
        byte[] table = Files.readAllBytes(dir.resolve("transitions.csv"));
        FakeMassLines lines = new FakeMassLines(Set.of(0.375));
        assertThat(harness(lines).execute("transitions", "failing", "--refine").code()).isEqualTo(0);
        assertThat(Files.readAllBytes(dir.resolve("catalogue.ecsv"))).isEqualTo(catalogue);
        assertThat(Files.readAllBytes(dir.resolve("transitions.csv"))).isEqualTo(table);
    }

    @Test
    void theTransientWindowAndTheLastingOnsetAreRefinedByDefault() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        FlickeringFake fake = new FlickeringFake();
        CliHarness h = CliHarness.in(work, FakeChunkSolver.fast());
        h = h.with(h.context().withSolvers(g -> fake).withLines(fake));
        assertThat(h.execute("run", "--no-refine", grid.toString(), "--out", "flicker", "--quiet").code()).isEqualTo(0);
        Path dir = work.resolve("flicker");
        TransitionRow before = transitions(dir).get(0);
        // the grid sees one cored model in the window (0.45) and the lasting core from 1.25
        assertThat(before.transientCore()).isEqualTo(new Span(0.45, 0.45));
        assertThat(before.convCoreOnset().massMsun()).isEqualTo(1.25);
        assertThat(h.execute("transitions", "flicker", "--refine").code()).isEqualTo(0);
        TransitionRow z0 = transitions(dir).get(0);
        assertThat(z0.transientCore().lo()).isGreaterThanOrEqualTo(FlickeringFake.WINDOW_LO)
                .isLessThan(FlickeringFake.WINDOW_LO + 0.002);
        assertThat(z0.transientCore().hi()).isLessThan(FlickeringFake.WINDOW_HI)
                .isGreaterThanOrEqualTo(FlickeringFake.WINDOW_HI - 0.002);
        assertThat(z0.convCoreOnset().massMsun()).isGreaterThanOrEqualTo(FlickeringFake.CORE_EDGE)
                .isLessThan(FlickeringFake.CORE_EDGE + 0.002);
        assertThat(z0.notes()).doesNotContain("other crossing").doesNotContain("changes");
        // every crossing asked for: these are all the crossings there are, so the same table
        assertThat(h.execute("run", "--no-refine", grid.toString(), "--out", "every", "--quiet").code()).isEqualTo(0);
        assertThat(h.execute("transitions", "every", "--refine", "--all-crossings").code()).isEqualTo(0);
        assertThat(Files.readString(work.resolve("every").resolve("transitions.csv")))
                .isEqualTo(Files.readString(dir.resolve("transitions.csv")));
    }

    @Test
    void aWindowTheGridMissedIsFoundRefinedAndSaidToLieBetweenGridMasses() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        // a core window between grid masses, found by the bisection of the fully convective limit 0.35-0.4
        FlickeringFake fake = new FlickeringFake(0.355, 0.36, 0.37);
        CliHarness h = CliHarness.in(work, FakeChunkSolver.fast());
        h = h.with(h.context().withSolvers(g -> fake).withLines(fake));
        assertThat(h.execute("run", "--no-refine", grid.toString(), "--out", "missed", "--quiet").code()).isEqualTo(0);
        Path dir = work.resolve("missed");
        assertThat(transitions(dir).get(0).transientCore()).isNull();
        assertThat(h.execute("transitions", "missed", "--refine").code()).isEqualTo(0);
        TransitionRow z0 = transitions(dir).get(0);
        // a second round refines both edges of the window the first round's models revealed
        assertThat(z0.transientCore().lo()).isCloseTo(0.36, within(0.002));
        assertThat(z0.transientCore().hi()).isCloseTo(0.37, within(0.002));
        assertThat(z0.convCoreOnset().bracket().lo()).isGreaterThan(1.2);
        assertThat(z0.notes()).contains("lies between grid masses");
        // the remark depends on the catalogue alone: a plain recompute repeats it
        assertThat(h.execute("transitions", "missed").code()).isEqualTo(0);
        assertThat(transitions(dir).get(0).notes()).contains("lies between grid masses");
    }

    @Test
    void aRefinedRunRefusesResumeAndMerge() throws Exception {
        Path dir = finishedRun("done");
        assertThat(harness(new FakeMassLines(Set.of())).execute("transitions", "done", "--refine").code())
                .isEqualTo(0);
        byte[] catalogue = Files.readAllBytes(dir.resolve("catalogue.ecsv"));
        byte[] manifest = Files.readAllBytes(dir.resolve("manifest.yaml"));
        CliHarness.Execution resumed = harness(new FakeMassLines(Set.of())).execute("run", "--no-refine",
                work.resolve("survey.yaml").toString(), "--out", "done", "--resume", "--quiet");
        assertThat(resumed.code()).isEqualTo(2);
        assertThat(resumed.err()).contains("holds models added by 'convgrid transitions --refine'")
                .contains("cannot be resumed");
        assertThat(Files.readAllBytes(dir.resolve("catalogue.ecsv"))).isEqualTo(catalogue);
        // refused before anything is written: the manifest still says the run finished
        assertThat(Files.readAllBytes(dir.resolve("manifest.yaml"))).isEqualTo(manifest);
        CliHarness.Execution merged = harness(new FakeMassLines(Set.of())).execute("merge", "done", "--out", "m");
        assertThat(merged.code()).isEqualTo(2);
        assertThat(merged.err()).contains("40 models added by 'convgrid transitions --refine'");
    }

    @Test
    void refusesShardsAndUnfinishedRunsAndBadOptions() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        FakeMassLines lines = new FakeMassLines(Set.of());
        assertThat(harness(lines).execute("run", "--no-refine", grid.toString(), "--shard", "1/2", "--out", "s1", "--quiet").code())
                .isEqualTo(0);
        CliHarness.Execution shard = harness(lines).execute("transitions", "s1-shard-1-of-2", "--refine");
        assertThat(shard.code()).isEqualTo(2);
        assertThat(shard.err()).contains("holds shard 1/2").contains("convgrid merge");
        Path dir = finishedRun("open");
        Files.writeString(dir.resolve("manifest.yaml"), Files.readString(dir.resolve("manifest.yaml"))
                .replaceFirst("finished: .*", "finished: null"));
        assertThat(harness(lines).execute("transitions", "open", "--refine").err()).contains("has not finished");
        assertThat(harness(lines).execute("transitions", "open", "--refine", "--tolerance", "0").code())
                .isEqualTo(2);
        assertThat(harness(lines).execute("transitions", "nowhere").code()).isEqualTo(2);
        assertThat(lines.solved.get()).isZero();
    }

    @Test
    void aTransitionsFileOfTheFirstLayoutIsRefusedByPlotAndRewrittenByTransitions() throws Exception {
        Path dir = finishedRun("old");
        byte[] current = Files.readAllBytes(dir.resolve("transitions.csv"));
        Files.writeString(dir.resolve("transitions.csv"), "z_init,age_gyr,fully_convective_limit_msun,"
                + "fully_convective_bracket_msun,conv_core_onset_msun,conv_core_bracket_msun,method\n"
                + "0.004,0,0.35,0.35-0.4,1.25,1.2-1.25,grid\n");
        CliHarness.Execution plot = harness(new FakeMassLines(Set.of())).execute("plot", "old");
        assertThat(plot.code()).isEqualTo(2);
        assertThat(plot.err()).contains("layout before version 2").contains("convgrid transitions RUN_DIR");
        CliHarness.Execution rewritten = harness(new FakeMassLines(Set.of())).execute("transitions", "old");
        assertThat(rewritten.code()).isEqualTo(0);
        assertThat(Files.readAllBytes(dir.resolve("transitions.csv"))).isEqualTo(current);
        // it prints the table it wrote
        assertThat(rewritten.out()).contains(new String(current, java.nio.charset.StandardCharsets.UTF_8).strip());
    }

    @Test
    void helpStatesUnitsAndDefinitions() {
        String help = harness(new FakeMassLines(Set.of())).execute("transitions", "--help").out()
                .replaceAll("\\s+", " ");
        assertThat(help).contains("--tolerance=MSUN", "solar masses", "0.002", "core threshold", "0.001",
                "mass fraction m/M", "criterion is the one the run used", "notes says how often",
                "p<i>-z<i>-r<n>-a<i>", "at every age", "transient_core_lo_msun", "refine every crossing");
        // conv_core_onset_msun is a mass at the slice's age, not the start of a core that lasts in time
        assertThat(help).contains("the lowest mass above which every star of the slice has a convective core at its "
                + "age (conv_core_onset_msun)").doesNotContain("lasting", "keeps a convective core");
    }
}
