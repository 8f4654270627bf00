package org.convgrid.grids;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.grids.yaml.GridFileReader;
import org.convgrid.grids.yaml.PresetWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PhysicsPresetKeyTest {

    @TempDir
    Path dir;

    private static final String GRID = """
            mass: {values: [1.0]}
            metallicity: {z: [0.02], y: [0.28]}
            physics:
              preset: %s
            """;

    /** The layout convgrid calibrate-sun writes. */
    private static final String PRESET = """
            # convgrid physics preset from a solar calibration
            mixing_length: 1.93
            y_init: 0.2712
            z_init: 0.01689
            z_over_x: 0.0231
            age_gyr: 4.57
            tool_version: "development"
            residual_ln_radius: -6.9e-06
            residual_ln_luminosity: 2.9e-05
            """;

    private Path grid(String preset, String extra) throws Exception {
        Path grid = dir.resolve("g.yaml");
        Files.writeString(grid, GRID.formatted(preset) + extra);
        return grid;
    }

    @Test
    void aPresetSetsTheMixingLengthButNotTheComposition() throws Exception {
        Files.createDirectories(dir.resolve("presets"));
        Files.writeString(dir.resolve("presets/sun.yaml"), PRESET);
        GridSpec spec = new GridFileReader().read(grid("presets/sun.yaml", "")).spec();
        var request = spec.requests().iterator().next();
        assertThat(request.physics().mixingLength()).isEqualTo(1.93);
        assertThat(request.initialHelium()).isEqualTo(0.28);
        assertThat(request.initialMetals()).isEqualTo(0.02);
    }

    /** What the writer writes, the reader reads: the mixing length and the atmosphere it belongs to. */
    @Test
    void aWrittenPresetReadsBack() throws Exception {
        String text = PresetWriter.toYaml(new PresetWriter.Calibration(1.8713, AtmosphereChoice.EDDINGTON, false,
                0.2701, 0.0172, 0.0231, 0.0231, 4.57, "1.2.3", -1e-6, 2e-6), Double::toString);
        Files.writeString(dir.resolve("sun.yaml"), text);
        var physics = new GridFileReader().read(grid("sun.yaml", "")).spec().requests().iterator().next().physics();
        assertThat(physics.mixingLength()).isEqualTo(1.8713);
        assertThat(physics.atmosphere()).isEqualTo(AtmosphereChoice.EDDINGTON);
    }

    @Test
    void aMissingPresetIsAProblemAtItsLineAndColumn() throws Exception {
        Path grid = grid("nowhere.yaml", "");
        assertThatThrownBy(() -> new GridFileReader().read(grid))
                .isInstanceOfSatisfying(GridFileException.class, e -> assertThat(e.problems()).singleElement()
                        .satisfies(p -> {
                            assertThat(p.line()).isEqualTo(4);
                            assertThat(p.column()).isEqualTo(11);
                            assertThat(p.kind()).isEqualTo(GridProblemKind.UNREADABLE_FILE);
                        }));
    }

    @Test
    void aBadPresetNamesItsOwnLineToo() throws Exception {
        Files.writeString(dir.resolve("bad.yaml"), PRESET.replace("mixing_length: 1.93", "mixing_length: -1")
                .replace("age_gyr: 4.57", "age_gyr: old\nflavour: sweet"));
        Path grid = grid("bad.yaml", "");
        assertThatThrownBy(() -> new GridFileReader().read(grid))
                .isInstanceOfSatisfying(GridFileException.class, e -> {
                    assertThat(e.problems()).hasSize(3).allSatisfy(p -> assertThat(p.line()).isEqualTo(4));
                    // each names its own place in the preset file too
                    assertThat(e.problems()).satisfiesExactlyInAnyOrder(
                            p -> assertPresetProblem(p, "bad.yaml:2:", GridProblemKind.OUT_OF_RANGE),
                            p -> assertPresetProblem(p, "bad.yaml:6:", GridProblemKind.WRONG_TYPE),
                            p -> assertPresetProblem(p, "bad.yaml:7:", GridProblemKind.UNKNOWN_KEY));
                });
    }

    @Test
    void presetAndMixingLengthTogetherConflict() throws Exception {
        Files.writeString(dir.resolve("sun.yaml"), PRESET);
        Path grid = grid("sun.yaml", "  mixing_length: 1.8\n");
        assertThatThrownBy(() -> new GridFileReader().read(grid))
                .isInstanceOfSatisfying(GridFileException.class, e -> assertThat(e.problems()).singleElement()
                        .satisfies(p -> {
                            assertThat(p.line()).isEqualTo(4);
                            assertThat(p.column()).isEqualTo(3);
                            assertThat(p.kind()).isEqualTo(GridProblemKind.CONFLICT);
                        }));
    }

    private static void assertPresetProblem(GridProblem p, String place, GridProblemKind kind) {
        assertThat(p.message()).contains(place);
        assertThat(p.kind()).isEqualTo(kind);
    }
}
