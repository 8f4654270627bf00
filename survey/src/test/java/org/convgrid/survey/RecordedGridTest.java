package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.grids.GridFileException;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.manifest.RunManifest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The grid a manifest quotes is read again with its preset from where the grid file was, else from its name as typed:
 * a project moved or copied keeps working from its top.
 */
class RecordedGridTest {

    private static final String GRID = """
            title: preset
            mass: {from: 0.5, to: 1.0, step: 0.5}
            metallicity: {z: [0.02], helium: {primordial: 0.2471, enrichment: 1.5}}
            age: {myr: [0], origin: zams}
            physics: {preset: sun.yaml}
            """;

    private static RunManifest manifest(String typed, String location) {
        return new RunManifest("0.1.0", "unknown", typed, GRID, "ab".repeat(32), "cd".repeat(32), List.of(),
                Instant.EPOCH, Instant.EPOCH, 1, null, Map.of(), Double.NaN, AgeOrigin.ZAMS,
                RunManifest.EXPECTED_UNKNOWN, IronAbundance.DEFAULT, location);
    }

    private static Path project(Path root) throws Exception {
        Path grids = Files.createDirectories(root.resolve("grids"));
        Files.writeString(grids.resolve("sun.yaml"), "mixing_length: 2.05\natmosphere: krishna_swamy\n");
        return Files.writeString(grids.resolve("p.yaml"), GRID);
    }

    @Test
    void thePresetIsReadWhereTheGridFileWas(@TempDir Path dir) throws Exception {
        Path grid = project(dir);
        // typed as a name that means nothing from this working directory
        assertThat(RecordedGrid.of(manifest("grids/p.yaml", grid.toString())).physics().combinations().get(0)
                .mixingLength()).isEqualTo(2.05);
    }

    @Test
    void aMovedProjectIsReadFromTheNameAsTyped(@TempDir Path dir) throws Exception {
        // the run read dir/old/grids/p.yaml; the project now is dir/new (the name as typed is absolute here, as the
        // working directory of a test cannot be the project's top)
        Path moved = project(dir.resolve("new"));
        RunManifest m = manifest(moved.toString(), dir.resolve("old/grids/p.yaml").toString());
        assertThat(RecordedGrid.of(m).physics().combinations().get(0).mixingLength()).isEqualTo(2.05);
    }

    @Test
    void neitherPlaceHoldingThePresetSaysWhereItWasLookedFor(@TempDir Path dir) {
        String location = dir.resolve("old/grids/p.yaml").toString();
        assertThatThrownBy(() -> RecordedGrid.of(manifest(dir.resolve("elsewhere/p.yaml").toString(), location)))
                .isInstanceOf(GridFileException.class)
                .hasMessageContaining("preset: cannot read " + dir.resolve("old/grids/sun.yaml"))
                .hasMessageContaining("the grid text quoted by the run's manifest, read where the grid file was, "
                        + location);
    }

    @Test
    void aManifestWithoutALocationReadsTheNameAsTyped(@TempDir Path dir) throws Exception {
        Path grid = project(dir);
        assertThat(RecordedGrid.of(manifest(grid.toString(), "")).physics().combinations().get(0).mixingLength())
                .isEqualTo(2.05);
    }
}
