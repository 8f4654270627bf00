package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {

    @TempDir
    Path work;

    @Test
    void printsTheAxesAndTheModelCountAndRunsNothing() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast())
                .execute("check", grid.toString(), "--threads", "2");
        assertThat(check.code()).isEqualTo(0);
        assertThat(check.out()).contains("models:        156")
                .contains("masses:        39: from 0.1 to 2 Msun")
                .contains("Z=0.004 Y=0.2545", "Z=0.02 Y=0.2785")
                .contains("ages:          2: 0, 2 Gyr")
                .contains("mixing length 1.8 Hp, no overshoot, schwarzschild, opacity x1, krishna_swamy atmosphere")
                // 1.5 s to start, then on 2 threads: 2 lines' ladders (0.5 s each), 78 zero-age models (0.005 s
                // each) and 78 evolutions from them (0.2 s each at the demo's 600 Myr, x1.7 to 2 Gyr: 0.34 s):
                // 1.5 + (1 + 0.39 + 26.52) / 2 = 15.5 s
                .contains("about 15 s on 2 threads")
                .contains("each of the 78 stars evolved once to its oldest age, about 0.34 s (1.7 x the demo's, "
                        + "whose ages end at 600 Myr)");
        assertThat(Files.exists(work.resolve("runs"))).isFalse();
    }

    @Test
    void aGridOfOneStarSaysSoInItsEstimate() throws Exception {
        Path grid = CliHarness.writeGrid(work, "one.yaml", "mass: {values: [1.0]}\nmetallicity: {z: 0.014, y: 0.27}\n"
                + "age: {myr: [100, 200]}\n");
        String out = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString(), "--threads", "1")
                .out();
        assertThat(out).contains("the one star evolved from birth once to its oldest age")
                .doesNotContain("1 stars", "each of the 1");
    }

    @Test
    void gridErrorsWriteNumbersAsPeopleDoNotAsDoubleToString() throws Exception {
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        Path zs = CliHarness.writeGrid(work, "zs.yaml", "mass: {values: [1.0]}\n"
                + "metallicity: {z: [0.06, 1.0E-5], y: [0.27, 0.25]}\nage: {myr: [100]}\n");
        CliHarness.Execution z = cli.execute("check", zs.toString());
        assertThat(z.code()).isEqualTo(2);
        assertThat(z.err()).contains("Z values must increase: 1e-5 follows 0.06").doesNotContain("1.0E-5");
        // "age from birth in Gyr" + "s" said "Gyrs"
        Path ages = CliHarness.writeGrid(work, "ages.yaml", "mass: {values: [1.0]}\n"
                + "metallicity: {z: 0.014, y: 0.27}\nage: {gyr: [1.0, 0.5]}\n");
        CliHarness.Execution a = cli.execute("check", ages.toString());
        assertThat(a.err()).contains("ages from birth in Gyr must increase: 0.5 follows 1").doesNotContain("Gyrs");
    }

    @Test
    void theEstimateCountsEvolvedAgesPerStar() throws Exception {
        String axes = "mass: {values: [1.0, 2.0]}\nmetallicity: {z: 0.014, y: 0.27}\n";
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        // one line of 2 masses, on 1 thread; zero-age models only: 1.5 s start + 0.5 s ladder + 2 x 0.005 s
        Path zeroAge = CliHarness.writeGrid(work, "zams.yaml", axes + "age: {gyr: [0], origin: zams}\n");
        assertThat(cli.execute("check", zeroAge.toString(), "--threads", "1").out())
                .contains("about 2 s on 1 thread").contains("zero-age models only");
        // three ages of one evolution each: 2.01 + 2 x 0.2 s = 2.4 s, not 6 models' worth
        Path evolved = CliHarness.writeGrid(work, "evolved.yaml", axes + "age: {gyr: [0, 0.15, 0.6], origin: zams}\n");
        assertThat(cli.execute("check", evolved.toString(), "--threads", "1").out()).contains("about 2 s on 1")
                .contains("each of the 2 stars evolved once to its oldest age");
        // main-sequence fractions: evolved twice, each to exhaustion at the oldest age's factor (2):
        // 2.01 + 2 x 2 x 0.4 s = 3.6 s
        Path fractions = CliHarness.writeGrid(work, "fractions.yaml",
                axes + "age: {ms_fraction: [0, 0.5], origin: zams}\n");
        assertThat(cli.execute("check", fractions.toString(), "--threads", "1").out())
                .contains("about 4 s on 1 thread").contains("evolved twice (lifetime, then ages)");
        // from birth: no zero-age model nor ladder, one evolution of 0.8 s per star: 1.5 + 2 x 0.8 s = 3.1 s
        Path birth = CliHarness.writeGrid(work, "birth.yaml", axes + "age: {myr: [20, 150]}\n");
        assertThat(cli.execute("check", birth.toString(), "--threads", "1").out())
                .contains("about 3 s on 1 thread").contains("evolved from birth once to its oldest age");
        // a larger zero-age grid on 2 threads: 4 lines x 0.5 s + 200 x 0.005 s shared, 1.5 + 3 / 2 = 3 s
        Path large = CliHarness.writeGrid(work, "large.yaml", "mass: {from: 0.1, to: 20.0, count: 50, spacing: log}\n"
                + "metallicity: {z: [0.004, 0.01, 0.02, 0.03], helium: {primordial: 0.2471, enrichment: 1.5}}\n"
                + "age: {gyr: [0], origin: zams}\n");
        assertThat(cli.execute("check", large.toString(), "--threads", "2").out()).contains("about 3 s on 2");
    }

    @Test
    void theRefinementAfterTheSweepIsEstimatedApart() throws Exception {
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        // one slice (one Z, one age, one physics), one 1 Msun bracket halved 9 times to 0.002 Msun (2^9 = 512 >
        // 500); 1-2 Msun reach the core onset but not the fully convective limit with its window: 1 search x 9, 9
        // new zero-age models (a run added 9) at 0.05 s each on 1 thread: 0.45 s
        Path zeroAge = CliHarness.writeGrid(work, "zams.yaml",
                "mass: {values: [1.0, 2.0]}\nmetallicity: {z: 0.014, y: 0.27}\nage: {gyr: [0], origin: zams}\n");
        assertThat(cli.execute("check", zeroAge.toString(), "--threads", "1").out())
                .contains("refinement:    about 9 new models after them to narrow the transition masses, about 1 s"
                        + " more (1 search per (Z, age, physics) slice, 9 halvings of a 1 Msun bracket each,"
                        + " about 0.05 s per model; run --no-refine skips them)");
        // the demo's shape from birth: 3 Z x 3 ages, 0.2 Msun brackets halved 7 times (2^7 = 128 > 100):
        // 9 x 2.5 x 7 = 157.5, and at 20 Myr (before 0.2 Msun burns its lithium at ~31 Myr, after 0.6 Msun at ~7)
        // a lithium depletion boundary in 3 slices, 21 more: 178.5, 179 models (the demo added 201) at 0.3 s each on
        // 2 threads: 26.9 s
        Path birth = CliHarness.writeGrid(work, "birth.yaml", "mass: {from: 0.2, to: 2.0, step: 0.2}\n"
                + "metallicity: {z: [0.008, 0.014, 0.02], helium: {primordial: 0.2471, enrichment: 1.5}}\n"
                + "age: {myr: [20, 150, 600]}\n");
        assertThat(cli.execute("check", birth.toString(), "--threads", "2").out())
                .contains("about 179 new models after them").contains("about 27 s more")
                .contains("one more for the lithium depletion boundary in 3 slices young enough to have one");
        // a young cluster's low masses: 0.1-0.6 Msun reach the fully convective limit only (1.5 searches with its
        // window, which such young stars lack), and every age from 10 to 70 Myr has a lithium depletion boundary
        // among them (0.1 Msun keeps its lithium to ~76 Myr): 14 slices x 2.5 x 5 halvings = 175 (a run added 134)
        Path young = CliHarness.writeGrid(work, "young.yaml", "mass: {from: 0.1, to: 0.6, step: 0.05}\n"
                + "metallicity: {z: [0.014, 0.02], helium: {primordial: 0.2471, enrichment: 1.5}}\n"
                + "age: {myr: [10, 15, 20, 30, 40, 50, 70]}\n");
        assertThat(cli.execute("check", young.toString(), "--threads", "2").out())
                .contains("about 175 new models after them").contains("(1.5 searches per (Z, age, physics) slice, "
                        + "one more for the lithium depletion boundary in 14 slices young enough to have one");
        // below the fully convective limit's masses, the lithium depletion boundary alone: no per-slice searches
        Path lowest = CliHarness.writeGrid(work, "lowest.yaml", "mass: {values: [0.1, 0.2]}\n"
                + "metallicity: {z: [0.02], helium: {primordial: 0.2471, enrichment: 1.5}}\nage: {myr: [40]}\n");
        assertThat(cli.execute("check", lowest.toString(), "--threads", "1").out())
                .contains("(one for the lithium depletion boundary in 1 slice young enough to have one, 6 halvings");
        // masses that reach no transition: nothing to refine
        Path heavy = CliHarness.writeGrid(work, "heavy.yaml",
                "mass: {values: [2.0, 3.0]}\nmetallicity: {z: 0.014, y: 0.27}\nage: {gyr: [0], origin: zams}\n");
        assertThat(cli.execute("check", heavy.toString(), "--threads", "1").out())
                .contains("refinement:    none expected (the grid's masses, 2-3 Msun, reach none of the transitions)");
        // an old population, 1-13 Gyr from birth: 3 [Fe/H] x 4 ages, 0.05 Msun steps halved 4 times to
        // 0.005 Msun: 12 x 2.5 x 4 = 120 models, and the turn-off's search at the ages past the 1.2 Msun star's
        // lifetime (10 Gyr x 1.2^-2.5 = 6.3 Gyr: 10 and 13 Gyr, 6 slices x 4 = 24 models), each costing more the
        // older its age (mean 7.25 Gyr: 0.3 s x (1 + 7.25 / 31) = 0.37 s), 53 s on one thread; the run added 124
        // models (36 of them for its 9 turn-offs, found from 5 Gyr on) in 116 s on 2 loaded threads
        Path old = CliHarness.writeGrid(work, "old.yaml", "mass: {from: 0.1, to: 1.2, step: 0.05}\n"
                + "metallicity: {fe_h_dex: [-2.0, -1.0, 0.0], helium: {primordial: 0.2471, enrichment: 1.5}}\n"
                + "age: {gyr: [1, 5, 10, 13]}\ntransitions: {refine: true, tolerance_msun: 0.005}\n");
        assertThat(cli.execute("check", old.toString(), "--threads", "1").out())
                .contains("about 144 new models after them").contains("about 53 s more")
                .contains("one more for the turn-off in 6 slices old enough to have one")
                .contains("about 0.37 s per model");
        Path off = CliHarness.writeGrid(work, "off.yaml", "mass: {values: [1.0, 2.0]}\n"
                + "metallicity: {z: 0.014, y: 0.27}\nage: {gyr: [0], origin: zams}\ntransitions: {refine: false}\n");
        assertThat(cli.execute("check", off.toString()).out())
                .contains("refinement:    off (transitions: refine: false)");
        Path single = CliHarness.writeGrid(work, "single.yaml",
                "mass: {values: [1.0]}\nmetallicity: {z: 0.014, y: 0.27}\nage: {gyr: [0], origin: zams}\n");
        assertThat(cli.execute("check", single.toString()).out())
                .contains("refinement:    none (one mass: no bracket to narrow)");
    }

    @Test
    void aFinishedRunOfTheSameGridGivesItsOwnCosts() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        assertThat(cli.execute("run", grid.toString(), "--threads", "1", "--quiet").code()).isEqualTo(0);
        Path runDir = work.resolve("runs/test-survey");
        long rows = Files.readAllLines(runDir.resolve("catalogue.ecsv")).stream()
                .filter(l -> !l.startsWith("#")).count() - 1;
        assertThat(rows).as("the fake solver's transitions are refined").isGreaterThan(156);
        String check = cli.execute("check", grid.toString(), "--threads", "1").out();
        assertThat(check).contains("s per model (median of the run in " + runDir + ")");
        // the new models the refinement appended to the catalogue, beyond the grid's 156
        assertThat(check).contains("refinement:    about " + (rows - 156) + " new models after them")
                .contains("as many as the run in " + runDir + " added, about 0.25 s per model");
        // another grid in the same directory: its refinement is estimated afresh
        Files.writeString(grid, CliHarness.GRID.replace("step: 0.05", "step: 0.1"));
        assertThat(cli.execute("check", grid.toString(), "--threads", "1").out())
                .contains("searches per (Z, age, physics) slice");
    }

    @Test
    void printsMainSequenceFractions() throws Exception {
        Path grid = CliHarness.writeGrid(work, "fractions.yaml", """
                mass: {values: [1.0, 2.0]}
                metallicity: {z: 0.014, y: 0.27}
                age: {ms_fraction: [0, 0.25, 0.5, 0.9]}
                """);
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString());
        assertThat(check.code()).as(check.err()).isEqualTo(0);
        assertThat(check.out()).contains("models:        8")
                .contains("ages:          4: 0, 0.25, 0.5, 0.9 of each star's main-sequence lifetime (0 = ZAMS, "
                        + "1 = core-hydrogen exhaustion at X_c = 1e-4; evolved from birth, ages reported from birth)");
    }

    @Test
    void printsWhereAgesCountFrom() throws Exception {
        Path birth = CliHarness.writeGrid(work, "birth.yaml", """
                mass: {values: [1.0, 2.0]}
                metallicity: {z: 0.014, y: 0.27}
                age: {myr: [20, 150]}
                """);
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", birth.toString());
        assertThat(check.code()).as(check.err()).isEqualTo(0);
        assertThat(check.out()).contains("ages:          2: 20, 150 Myr since birth (pre-main sequence included)");
        Path zams = CliHarness.writeGrid(work, "zams.yaml", """
                mass: {values: [1.0, 2.0]}
                metallicity: {z: 0.014, y: 0.27}
                age: {gyr: [0, 0.15], origin: zams}
                """);
        check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", zams.toString());
        assertThat(check.out()).contains("ages:          2: 0, 150 Myr since the ZAMS (0 = ZAMS)");
    }

    @Test
    void badGridListsEveryProblemWithFileLineAndColumn() throws Exception {
        Path grid = CliHarness.writeGrid(work, "bad.yaml", """
                mass:
                  from: 0.1
                  to: 2.0
                  stepp: 0.05
                metallicity:
                  z: [0.004, -0.02]
                  y: [0.25, 0.27]
                """);
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString());
        assertThat(check.code()).isEqualTo(2);
        assertThat(check.err()).contains(grid + ":4:3: ").contains(grid + ":6:");
        assertThat(check.err().lines().filter(l -> l.startsWith(grid + ":"))).hasSizeGreaterThanOrEqualTo(2);
        assertThat(check.out()).isEmpty();
    }

    @Test
    void missingGridFileIsAUsageError() {
        CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", "nowhere.yaml");
        assertThat(check.code()).isEqualTo(2);
        assertThat(check.err()).contains("grid file nowhere.yaml not found");
    }

    @Test
    void everyOptionOfTheGridCommandsHasAHelpLineWithItsUnit() {
        CliHarness cli = CliHarness.in(work, FakeChunkSolver.fast());
        assertThat(cli.execute("run", "--help").out()).contains("--threads=N", "(count;", "--out=DIR", "(path;",
                "--shard=K/N", "--resume", "--force", "--yes", "--quiet");
        assertThat(cli.execute("merge", "--help").out()).contains("--out=DIR", "(path;");
        assertThat(cli.execute("check", "--help").out()).contains("--threads=N", "(count;");
    }

    @Test
    void checkRefusesAnOutputDirectoryThatRunWouldRefuse() throws Exception {
        java.nio.file.Files.writeString(work.resolve("plain-file"), "x");
        for (String dir : new String[] {"plain-file", "plain-file/below", "/proc/convgrid-check"}) {
            Path grid = CliHarness.writeGrid(work, "survey.yaml",
                    CliHarness.GRID.replace("dir: runs/test-survey", "dir: " + dir));
            CliHarness.Execution check = CliHarness.in(work, FakeChunkSolver.fast()).execute("check", grid.toString());
            assertThat(check.code()).as(dir).isEqualTo(2);
            assertThat(check.err()).contains("the run directory (output dir)");
            CliHarness.Execution run = CliHarness.in(work, FakeChunkSolver.fast()).execute("run", grid.toString());
            assertThat(run.code()).as(dir).isEqualTo(2);
        }
    }
}
