package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ResumeTest {

    /** Rows the child must have written before it is killed: two chunks of 8 masses x 2 ages. */
    private static final int ROWS_BEFORE_KILL = 32;
    /** Longest wait for the child to write them, ms. */
    private static final long CHILD_TIMEOUT_MILLIS = 30_000;

    @TempDir
    Path work;

    private CliHarness.Execution run(String... args) {
        return CliHarness.in(work, FakeChunkSolver.fast()).execute(args);
    }

    private byte[] uninterrupted(Path grid, String threads) throws Exception {
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "whole", "--threads", threads, "--quiet").code()).isEqualTo(0);
        return Files.readAllBytes(work.resolve("whole/catalogue.ecsv"));
    }

    @Test
    void aRunKilledPartWayResumesToTheSameBytes() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        Path dir = work.resolve("killed");
        Path catalogue = dir.resolve("catalogue.ecsv");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                SlowRunMain.class.getName(), "run", "--no-refine", grid.toString(), "--out", dir.toString(), "--threads", "1",
                "--quiet")
                .redirectErrorStream(true).redirectOutput(work.resolve("child.log").toFile()).start();
        long deadline = System.currentTimeMillis() + CHILD_TIMEOUT_MILLIS;
        int rows = 0;
        while (child.isAlive() && rows < ROWS_BEFORE_KILL && System.currentTimeMillis() < deadline) {
            Thread.sleep(20);
            rows = Files.exists(catalogue) ? (int) Files.readAllLines(catalogue, StandardCharsets.UTF_8).size()
                    - CliHarness.CATALOGUE_HEADER_LINES
                    : 0;
        }
        assertThat(child.isAlive()).as("child still running; its log: %s", log()).isTrue();
        child.destroyForcibly();
        assertThat(child.waitFor(10, TimeUnit.SECONDS)).isTrue();
        long kept = Files.readAllLines(catalogue).size() - CliHarness.CATALOGUE_HEADER_LINES;
        assertThat(kept).isBetween((long) ROWS_BEFORE_KILL, CliHarness.GRID_MODELS - 1);
        // killed outright: the start manifest is what is left, and it says how many models the run is to hold
        assertThat(Files.readString(dir.resolve("manifest.yaml"))).contains("finished: null")
                .contains("  expected: " + CliHarness.GRID_MODELS + "\n").doesNotContainIgnoringCase("nan");

        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", dir.toString(), "--resume",
                "--threads", "2");
        assertThat(resumed.code()).isEqualTo(0);
        assertThat(resumed.err()).contains("computing " + (CliHarness.GRID_MODELS - kept) + " models")
                .contains(kept + " already in the catalogue");
        assertThat(Files.readAllBytes(catalogue)).isEqualTo(uninterrupted(grid, "1"));
        assertThat(Files.readString(dir.resolve("transitions.csv")))
                .isEqualTo(Files.readString(work.resolve("whole/transitions.csv")));
    }

    private String log() throws Exception {
        Path log = work.resolve("child.log");
        return Files.exists(log) ? Files.readString(log) : "(none)";
    }

    @Test
    void aHalfWrittenLastRowIsDroppedAndRecomputed() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        byte[] whole = uninterrupted(grid, "2");
        Path dir = work.resolve("cut");
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "cut", "--quiet").code()).isEqualTo(0);
        // cut the file in the middle of row 41 (a chunk boundary is at row 32, so this chunk is recomputed)
        String text = new String(whole, StandardCharsets.UTF_8);
        int cut = 0;
        for (int line = 0; line < 40 + CliHarness.CATALOGUE_HEADER_LINES; line++) {
            cut = text.indexOf('\n', cut) + 1;
        }
        cut += 17;
        Files.write(dir.resolve("catalogue.ecsv"), java.util.Arrays.copyOf(whole, cut));
        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", "cut", "--resume");
        assertThat(resumed.code()).isEqualTo(0);
        assertThat(resumed.err()).contains("40 already in the catalogue").contains("(17 bytes) dropped");
        assertThat(Files.readAllBytes(dir.resolve("catalogue.ecsv"))).isEqualTo(whole);
    }

    /**
     * A resume of a finished run that has rows to compute again says the run is unfinished before it changes
     * anything: when such a resume was killed outright (kill -9) after it had cut the catalogue back, the manifest
     * still said finished, with the old counts, beside the shorter catalogue.
     */
    @Test
    void whileAResumeComputesTheManifestDoesNotSayTheRunFinished() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        byte[] whole = uninterrupted(grid, "1");
        Path manifest = work.resolve("whole/manifest.yaml");
        assertThat(Files.readString(manifest)).doesNotContain("finished: null");
        String text = new String(whole, StandardCharsets.UTF_8);
        int cut = 0;
        for (int line = 0; line < 40 + CliHarness.CATALOGUE_HEADER_LINES; line++) {
            cut = text.indexOf('\n', cut) + 1;
        }
        Files.write(work.resolve("whole/catalogue.ecsv"), java.util.Arrays.copyOf(whole, cut));
        List<String> seenWhileComputing = new java.util.concurrent.CopyOnWriteArrayList<>();
        FakeChunkSolver fake = FakeChunkSolver.fast();
        org.convgrid.engine.batch.ChunkSolver watching = chunk -> {
            try {
                seenWhileComputing.add(Files.readString(manifest));
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
            return fake.solve(chunk);
        };
        CliHarness.Execution resumed = new CliHarness(new CommandContext(g -> watching, List.of(), java.util.Map.of(),
                work, false, new FakeMassLines(java.util.Set.of()))).execute("run", "--no-refine", grid.toString(),
                "--out", "whole", "--resume", "--threads", "1");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(seenWhileComputing).isNotEmpty().allSatisfy(m -> assertThat(m).contains("finished: null"));
        assertThat(Files.readString(manifest)).doesNotContain("finished: null");
        assertThat(Files.readAllBytes(work.resolve("whole/catalogue.ecsv"))).isEqualTo(whole);
    }

    /**
     * A run interrupted under an earlier version (two columns fewer, a reworded description in the header) resumes
     * under this one: its rows are carried into this version's layout, the overshoot profile they could not name
     * taken from the grid, and the catalogue ends byte-identical to an uninterrupted run (every
     * header change had made such runs refuse to resume).
     */
    @Test
    void aRunOfAnEarlierLayoutResumesToTheSameBytes() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        byte[] whole = uninterrupted(grid, "2");
        String earlier = earlierLayout(new String(whole, StandardCharsets.UTF_8), 40);
        Path dir = work.resolve("earlier");
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "earlier", "--quiet").code()).isEqualTo(0);
        Files.writeString(dir.resolve("catalogue.ecsv"), earlier);
        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", "earlier", "--resume");
        assertThat(resumed.code()).as(resumed.err()).isEqualTo(0);
        assertThat(resumed.err()).contains("40 already in the catalogue");
        assertThat(Files.readAllBytes(dir.resolve("catalogue.ecsv"))).isEqualTo(whole);
    }

    /**
     * The catalogue {@code text} as an earlier version wrote it, its first {@code rows} rows only: without the
     * columns from {@code core_mixed_mass_frac} on ({@code overshoot_profile}, {@code fe_h_dex} and the g-mode period
     * scale followed it), and with one description worded otherwise.
     */
    static String earlierLayout(String text, int rows) {
        return EarlierCatalogue.lackingFrom(text, "core_mixed_mass_frac", rows)
                .replace("integral of dr / v_conv", "integral dr / v");
    }

    @Test
    void resumingACompleteRunComputesNothingAndChangesNothing() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        byte[] whole = uninterrupted(grid, "2");
        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", "whole", "--resume");
        assertThat(resumed.code()).isEqualTo(0);
        assertThat(resumed.out()).contains("0 computed now");
        assertThat(Files.readAllBytes(work.resolve("whole/catalogue.ecsv"))).isEqualTo(whole);
    }

    @Test
    void resumeWithNoRunInTheDirectorySaysSoAndStartsOne() throws Exception {
        // a mistyped --out with --resume recomputed the whole grid without a word
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        CliHarness.Execution fresh = run("run", "--no-refine", grid.toString(), "--out", "typo", "--resume", "--quiet");
        assertThat(fresh.code()).isEqualTo(0);
        assertThat(fresh.err()).contains("--resume found no run in " + work.resolve("typo")
                + "; starting a new one there");
        CliHarness.Execution again = run("run", "--no-refine", grid.toString(), "--out", "typo", "--resume", "--quiet");
        assertThat(again.err()).doesNotContain("found no run");
    }

    @Test
    void resumeRefusesAnotherGridOrAnotherShardAndChangesNothing() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        byte[] whole = uninterrupted(grid, "2");
        Path other = CliHarness.writeGrid(work, "other.yaml", CliHarness.GRID.replace("to: 2.0", "to: 1.9"));
        CliHarness.Execution refused = run("run", "--no-refine", other.toString(), "--out", "whole", "--resume");
        assertThat(refused.code()).isEqualTo(2);
        assertThat(refused.err()).contains("the grid's models differ from those of the run in")
                .contains("models_sha256");
        // a shard's directory is named for it, so shard 1/2 resumes (here: starts) whole-shard-1-of-2, not whole
        CliHarness.Execution shard = run("run", "--no-refine", grid.toString(), "--out", "whole", "--resume", "--shard",
                "1/2", "--quiet");
        assertThat(shard.code()).as(shard.err()).isEqualTo(0);
        assertThat(work.resolve("whole-shard-1-of-2/catalogue.ecsv")).exists();
        CliHarness.Execution unsharded = run("run", "--no-refine", grid.toString(), "--out", "whole-shard-1-of-2",
                "--resume", "--shard", "1/1");
        assertThat(unsharded.code()).isEqualTo(2);
        assertThat(unsharded.err()).contains("holds shard 1/2 but this run asks for shard 1/1");
        // an edited comment or title is not a different grid
        Path retitled = CliHarness.writeGrid(work, "retitled.yaml",
                "# edited\n" + CliHarness.GRID.replace("Test survey", "Renamed"));
        assertThat(run("run", "--no-refine", retitled.toString(), "--out", "whole", "--resume", "--quiet").code()).isEqualTo(0);
        assertThat(Files.readAllBytes(work.resolve("whole/catalogue.ecsv"))).isEqualTo(whole);
    }

    @Test
    void resumeRefusesACatalogueWhoseRowsAreNotThisGridsPrefix() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        uninterrupted(grid, "2");
        List<String> lines = Files.readAllLines(work.resolve("whole/catalogue.ecsv"));
        // drop row 3: the rows kept are no longer the first rows of the grid order
        int header = CliHarness.CATALOGUE_HEADER_LINES;
        List<String> holed = new java.util.ArrayList<>(lines.subList(0, header + 19));
        holed.remove(header + 2);
        Files.write(work.resolve("whole/catalogue.ecsv"), holed);
        CliHarness.Execution refused = run("run", "--no-refine", grid.toString(), "--out", "whole", "--resume");
        assertThat(refused.code()).isEqualTo(2);
        // this run's rows with one missing: a gap, not another run (once reported as "it belongs to another run")
        assertThat(refused.err()).contains("catalogue.ecsv misses model p0-z00-m001-a00, between p0-z00-m000-a01 "
                + "(row 2) and p0-z00-m001-a01 (row 3): rows were deleted by hand or the file was damaged")
                .contains("delete its rows from p0-z00-m001-a01 on and resume again").doesNotContain("another run");
        assertThat(Files.readAllLines(work.resolve("whole/catalogue.ecsv"))).isEqualTo(holed);
    }

    /**
     * Profiles turned on (or off) for a resume: the models already computed have none (or have them), so the
     * directory would hold profiles of some models while its manifest said all or none (such a
     * resume had exited 0 with 10 of 52 profiles). Refused like merge refuses such shards, changing nothing.
     */
    @Test
    void resumeRefusesTurningProfilesOnOrOffAndChangesNothing() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        byte[] whole = uninterrupted(grid, "2");
        String manifest = Files.readString(work.resolve("whole/manifest.yaml"));
        Path withProfiles = CliHarness.writeGrid(work, "profiles.yaml",
                CliHarness.GRID.replace("  dir: runs/test-survey\n", "  dir: runs/test-survey\n  profiles: true\n"));
        CliHarness.Execution refused = run("run", "--no-refine", withProfiles.toString(), "--out", "whole",
                "--resume");
        assertThat(refused.code()).isEqualTo(2);
        assertThat(refused.err()).contains("was run with 'output: profiles: false' and this grid file says "
                + "'profiles: true'").contains("resume with 'profiles: false'").doesNotContain("--force");
        assertThat(Files.readAllBytes(work.resolve("whole/catalogue.ecsv"))).isEqualTo(whole);
        assertThat(Files.readString(work.resolve("whole/manifest.yaml"))).isEqualTo(manifest);
        assertThat(work.resolve("whole/profiles")).doesNotExist();

        assertThat(run("run", "--no-refine", withProfiles.toString(), "--out", "on", "--quiet").code()).isZero();
        CliHarness.Execution off = run("run", "--no-refine", grid.toString(), "--out", "on", "--resume");
        assertThat(off.code()).isEqualTo(2);
        assertThat(off.err()).contains("was run with 'output: profiles: true' and this grid file says "
                + "'profiles: false'");
    }

    /**
     * A catalogue whose manifest is gone is continued when its rows are this grid's, with a new manifest and a note;
     * one of another grid of the same shape (the same ids) is refused without steering to --force (before,
     * "use a new --out or --force" was the only way out offered, and --force deletes the rows).
     */
    @Test
    void resumeWithoutAManifestRebuildsItWhenTheRowsAreThisGrids() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        byte[] whole = uninterrupted(grid, "2");
        assertThat(run("run", "--no-refine", grid.toString(), "--out", "lost", "--quiet").code()).isZero();
        List<String> lines = Files.readAllLines(work.resolve("lost/catalogue.ecsv"));
        Files.write(work.resolve("lost/catalogue.ecsv"), lines.subList(0, CliHarness.CATALOGUE_HEADER_LINES + 40));
        Files.delete(work.resolve("lost/manifest.yaml"));

        Path shifted = CliHarness.writeGrid(work, "shifted.yaml", CliHarness.GRID.replace("from: 0.1", "from: 0.15")
                .replace("to: 2.0", "to: 2.05"));
        CliHarness.Execution other = run("run", "--no-refine", shifted.toString(), "--out", "lost", "--resume");
        assertThat(other.code()).isEqualTo(2);
        assertThat(other.err()).contains("has a catalogue but no manifest.yaml, and the catalogue is not this grid's")
                .contains("row 1 is model p0-z00-m000-a00 of 0.1 Msun").doesNotContain("--force");
        assertThat(work.resolve("lost/manifest.yaml")).doesNotExist();
        // the same shape, so the same ids and stars, but other ages or physics (a resume had taken them)
        for (String[] change : new String[][] {{"gyr: [0, 2.0]", "gyr: [0, 3.0]", "age_gyr 2.0 where this grid has 3.0"},
            {"mixing_length: 1.8", "mixing_length: 2.0", "mixing_length 1.8 where this grid has 2.0"}}) {
            Path edited = CliHarness.writeGrid(work, "edited.yaml", CliHarness.GRID.replace(change[0], change[1]));
            CliHarness.Execution refused = run("run", "--no-refine", edited.toString(), "--out", "lost", "--resume");
            assertThat(refused.code()).as(refused.err()).isEqualTo(2);
            assertThat(refused.err()).contains(change[2]).contains("the catalogue was written by another grid");
            assertThat(work.resolve("lost/manifest.yaml")).doesNotExist();
        }
        Path profiles = CliHarness.writeGrid(work, "profiles.yaml", CliHarness.GRID.replace("output:",
                "output:\n  profiles: true"));
        CliHarness.Execution noProfiles = run("run", "--no-refine", profiles.toString(), "--out", "lost", "--resume");
        assertThat(noProfiles.code()).as(noProfiles.err()).isEqualTo(2);
        assertThat(noProfiles.err()).contains("no profile files, though this grid file asks for them");
        // a shard's directory, named so, is not taken for the whole grid's
        java.nio.file.Files.move(work.resolve("lost"), work.resolve("lost-shard-1-of-2"));
        CliHarness.Execution unnamed = run("run", "--no-refine", grid.toString(), "--out", "lost-shard-1-of-2",
                "--resume");
        assertThat(unnamed.code()).as(unnamed.err()).isEqualTo(2);
        assertThat(unnamed.err()).contains("is named for a shard: resume it with the --shard it was run with");
        java.nio.file.Files.move(work.resolve("lost-shard-1-of-2"), work.resolve("lost"));

        CliHarness.Execution resumed = run("run", "--no-refine", grid.toString(), "--out", "lost", "--resume",
                "--quiet");
        assertThat(resumed.code()).as(resumed.err()).isZero();
        assertThat(resumed.err()).contains("had no manifest.yaml; its catalogue's 40 rows are this grid's first "
                + "models, so the resume wrote a new manifest");
        assertThat(Files.readAllBytes(work.resolve("lost/catalogue.ecsv"))).isEqualTo(whole);
        assertThat(Files.readString(work.resolve("lost/manifest.yaml"))).contains("total: " + CliHarness.GRID_MODELS)
                .doesNotContain("finished: null");
    }

    /** A manifest cut short is named so, with the way on; a catalogue cut inside its header is not "another layout". */
    @Test
    void aDamagedManifestOrCatalogueHeaderIsNamedAsDamage() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        uninterrupted(grid, "2");
        Path manifest = work.resolve("whole/manifest.yaml");
        String text = Files.readString(manifest);
        Files.writeString(manifest, text.substring(0, text.indexOf("threads:")));
        CliHarness.Execution cutManifest = run("run", "--no-refine", grid.toString(), "--out", "whole", "--resume");
        assertThat(cutManifest.code()).isEqualTo(2);
        assertThat(cutManifest.err()).contains("manifest.yaml: not a complete convgrid manifest: its key 'models' is "
                + "missing or empty").contains("Move it aside").doesNotContain("Cannot invoke");

        Files.writeString(manifest, text);
        Path catalogue = work.resolve("whole/catalogue.ecsv");
        byte[] full = Files.readAllBytes(catalogue);
        Files.write(catalogue, java.util.Arrays.copyOf(full, 500));
        CliHarness.Execution cutHeader = run("run", "--no-refine", grid.toString(), "--out", "whole", "--resume");
        assertThat(cutHeader.code()).isEqualTo(2);
        assertThat(cutHeader.err()).contains("its header is cut short before the column names")
                .doesNotContain("not a catalogue this version writes");
        assertThat(Files.readAllBytes(catalogue)).hasSize(500);
    }

    /** `plot` of a finished run whose catalogue lost a row warns (51 of 52 rows had been drawn without a word). */
    @Test
    void plotWarnsWhenAFinishedRunsCatalogueLacksRows() throws Exception {
        Path grid = CliHarness.writeGrid(work, "survey.yaml", CliHarness.GRID);
        uninterrupted(grid, "2");
        List<String> lines = new java.util.ArrayList<>(Files.readAllLines(work.resolve("whole/catalogue.ecsv")));
        lines.remove(CliHarness.CATALOGUE_HEADER_LINES + 11);
        Files.write(work.resolve("whole/catalogue.ecsv"), lines);
        CliHarness.Execution plot = run("plot", "whole");
        assertThat(plot.err()).contains("holds " + (CliHarness.GRID_MODELS - 1) + " rows but the manifest of the "
                + "finished run counts " + CliHarness.GRID_MODELS);
    }
}
