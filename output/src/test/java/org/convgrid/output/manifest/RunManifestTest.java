package org.convgrid.output.manifest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.output.OutputFormatException;
import org.junit.jupiter.api.Test;

class RunManifestTest {

    private static final String GRID = "title: Demo\nmass:\n  values: [0.5, 1.0]   # solar masses\n"
            + "metallicity: {z: 0.014, y: 0.27}\n";

    private static final String COMMIT = "0123456789abcdef0123456789abcdef01234567";

    private static RunManifest manifest() {
        return new RunManifest("0.1.0", COMMIT, "grids/demo.yaml", GRID, "ab".repeat(32), "cd".repeat(32),
                List.of(PhysicsOptions.DEFAULT, new PhysicsOptions(2.0, 0.1, StabilityCriterion.LEDOUX, 1.0),
                        new PhysicsOptions(1.7, 0.016, StabilityCriterion.SCHWARZSCHILD, 1.0,
                                OpacityChoice.tableAt("tables/mine.txt", () -> {
                                    throw new AssertionError("a manifest never reads its opacity table");
                                }),
                                AtmosphereChoice.EDDINGTON, OvershootScheme.EXPONENTIAL)),
                Instant.parse("2026-03-01T10:00:00Z"), null, 2, "1/3", Map.of(ModelStatus.OK, 3L), Double.NaN);
    }

    @Test
    void writesReadableYamlAndReadsItBack() {
        RunManifest finished = manifest().finishedAt(Instant.parse("2026-03-01T10:05:30.250Z"),
                Map.of(ModelStatus.OK, 58L, ModelStatus.FAILED, 2L), 1.75);
        String yaml = RunManifestWriter.toYaml(finished);
        assertThat(yaml).contains("tool_version: 0.1.0", "tool_commit: " + COMMIT, "started: 2026-03-01T10:00:00Z",
                "criterion: ledoux", "total: 60", "failed: 2", "median_seconds_per_model: 1.75",
                "atmosphere: krishna_swamy", "atmosphere: eddington", "overshoot_profile: decaying", "core_threshold_mass_frac: 0.001",
                "opacity_table: tables/mine.txt");
        assertThat(yaml).contains("  text: |");
        RunManifest back = RunManifestReader.read(yaml);
        assertThat(back).isEqualTo(finished);
        assertThat(back.gridText()).isEqualTo(GRID);
    }

    @Test
    void theGridFilesLocationIsWrittenBesideItsNameAndReadBack() {
        RunManifest m = manifest();
        RunManifest located = new RunManifest(m.toolVersion(), m.toolCommit(), m.gridFile(), m.gridText(),
                m.gridFileSha256(), m.gridModelsSha256(), m.physics(), m.started(), m.finished(), m.threads(),
                m.shard(), m.counts(), m.medianSecondsPerModel(), m.ageOrigin(), m.expectedModels(),
                m.ironAbundance(), "/home/me/project/grids/demo.yaml");
        String yaml = RunManifestWriter.toYaml(located.finishedAt(Instant.parse("2026-03-01T10:05:30Z"),
                Map.of(ModelStatus.OK, 3L), 1.0));
        assertThat(yaml).contains("  file: grids/demo.yaml\n  location: /home/me/project/grids/demo.yaml\n");
        assertThat(RunManifestReader.read(yaml).gridLocation()).isEqualTo("/home/me/project/grids/demo.yaml");
        // a manifest written before the location was recorded reads as not knowing it, and writes none
        assertThat(RunManifestWriter.toYaml(m)).doesNotContain("location:");
        assertThat(RunManifestReader.read(RunManifestWriter.toYaml(m)).gridLocation()).isEmpty();
    }

    @Test
    void anUnfinishedRunWithoutATimedModelWritesNoNanAndSaysHowManyModelsItExpects() {
        RunManifest unfinished = manifest().unfinished(Map.of(ModelStatus.OK, 3L), Double.NaN, 90);
        String yaml = RunManifestWriter.toYaml(unfinished);
        assertThat(yaml).doesNotContainIgnoringCase("nan").doesNotContain("median_seconds_per_model")
                .contains("finished: null").contains("  total: 3\n").contains("  expected: 90\n");
        RunManifest back = RunManifestReader.read(yaml);
        assertThat(back).isEqualTo(unfinished);
        assertThat(back.medianSecondsPerModel()).isNaN();
        assertThat(back.expectedModels()).isEqualTo(90);
        // earlier versions wrote .nan: still read
        assertThat(RunManifestReader.read(yaml + "median_seconds_per_model: .nan\n").medianSecondsPerModel()).isNaN();
    }

    @Test
    void aFinishedRunDoesNotSayWhatItExpected() {
        RunManifest finished = manifest().unfinished(Map.of(ModelStatus.OK, 3L), 0.5, 90)
                .finishedAt(Instant.parse("2026-03-01T10:05:30Z"), Map.of(ModelStatus.OK, 90L), 0.5);
        String yaml = RunManifestWriter.toYaml(finished);
        assertThat(yaml).doesNotContain("expected").contains("median_seconds_per_model: 0.5");
        assertThat(RunManifestReader.read(yaml).expectedModels()).isEqualTo(RunManifest.EXPECTED_UNKNOWN);
    }

    @Test
    void aManifestWrittenBeforeTheCommitWasRecordedSaysItIsUnknown() {
        String yaml = RunManifestWriter.toYaml(manifest()).replaceAll("(?m)^tool_commit: .*\\n", "");
        assertThat(yaml).doesNotContain("tool_commit");
        assertThat(RunManifestReader.read(yaml).toolCommit()).isEqualTo("unknown");
    }

    @Test
    void aManifestWithoutTheLaterPhysicsKeysReadsAsTheOldDefaults() {
        // manifests of earlier versions had no atmosphere / overshoot_profile / opacity_table keys
        String yaml = RunManifestWriter.toYaml(manifest())
                .replaceAll("(?m)^\\s+(atmosphere|overshoot_profile|opacity_table): .*\\n", "");
        assertThat(yaml).doesNotContain("atmosphere:");
        RunManifest back = RunManifestReader.read(yaml);
        assertThat(back.physics()).allSatisfy(p -> {
            assertThat(p.atmosphere()).isEqualTo(AtmosphereChoice.EDDINGTON);
            assertThat(p.overshootScheme()).isEqualTo(OvershootScheme.STEP);
            assertThat(p.usesOpacityTable()).isFalse();
        });
    }

    @Test
    void unfinishedRunHasNoEndAndNoMedian() {
        RunManifest back = RunManifestReader.read(RunManifestWriter.toYaml(manifest()));
        assertThat(back.finished()).isNull();
        assertThat(back.medianSecondsPerModel()).isNaN();
        assertThat(back.counts()).containsEntry(ModelStatus.PAST_MAIN_SEQUENCE, 0L);
    }

    @Test
    void medianOfOddAndEvenCounts() {
        assertThat(RunManifest.median(new double[] {3, 1, 2})).isEqualTo(2.0);
        assertThat(RunManifest.median(new double[] {4, 1, 2, 3})).isEqualTo(2.5);
        assertThat(RunManifest.median(new double[0])).isNaN();
    }

    @Test
    void rejectsSomethingElse() {
        assertThatThrownBy(() -> RunManifestReader.read("- just\n- a list\n"))
                .isInstanceOf(OutputFormatException.class);
    }

    @Test
    void aManifestQuotingTheLargestGridFileReadsBack() {
        // the grid reader accepts files up to 1 MiB; the manifest quotes the file whole, with non-ASCII text that
        // the writer may escape, and must stay readable (the YAML library's own limit is 3 MB)
        String line = "# comment \u00e9\u4e2d\u00e9\u4e2d\n";
        String big = GRID + line.repeat(1024 * 1024 / line.getBytes(java.nio.charset.StandardCharsets.UTF_8).length);
        RunManifest m = new RunManifest("0.1.0", COMMIT, "grids/big.yaml", big, "ab".repeat(32), "cd".repeat(32),
                List.of(PhysicsOptions.DEFAULT), Instant.parse("2026-03-01T10:00:00Z"), null, 1, null,
                Map.of(ModelStatus.OK, 3L), Double.NaN);
        String yaml = RunManifestWriter.toYaml(m);
        assertThat(RunManifestReader.read(yaml).gridText()).isEqualTo(big);
    }

    /**
     * A manifest cut short at any line end reads as cut short, naming the key it lacks or where its YAML breaks off,
     * never with Java's null-pointer or cast text (such as "Cannot invoke java.util.List.iterator()").
     */
    @Test
    void aManifestCutShortAtAnyLineSaysSoInPlainWords() {
        String yaml = RunManifestWriter.toYaml(manifest().finishedAt(Instant.parse("2026-03-01T10:05:30Z"),
                Map.of(ModelStatus.OK, 3L), 1.5));
        int lines = 0;
        for (int end = yaml.indexOf('\n'); end >= 0 && end < yaml.length() - 1; end = yaml.indexOf('\n', end + 1)) {
            String cut = yaml.substring(0, end + 1);
            if (yaml.startsWith("median_seconds_per_model", end + 1)) {
                // the last key is optional (absent while no model was timed): without it the manifest is whole
                continue;
            }
            assertThatThrownBy(() -> RunManifestReader.read(cut)).as("cut after %s", cut.lines().reduce((a, b) -> b))
                    .isInstanceOf(OutputFormatException.class)
                    .message().doesNotContain("Cannot invoke", "null", "java.", "class ")
                    .containsAnyOf("is missing or empty", "breaks off", "is empty");
            lines++;
        }
        assertThat(lines).isGreaterThan(20);
        assertThatThrownBy(() -> RunManifestReader.read(yaml.substring(0, yaml.indexOf("threads:"))))
                .hasMessageContaining("its key 'models' is missing or empty (the file is cut short or was edited)");
    }
}
