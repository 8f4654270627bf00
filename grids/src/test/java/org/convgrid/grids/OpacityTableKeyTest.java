package org.convgrid.grids;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.engine.physics.opacity.AnalyticCompositeOpacity;
import org.convgrid.engine.physics.opacity.OpacityTableWriter;
import org.convgrid.engine.physics.opacity.TabulatedOpacity;
import org.convgrid.grids.yaml.GridFileReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OpacityTableKeyTest {

    @TempDir
    Path dir;

    private static final String GRID = """
            mass: {values: [1.0]}
            metallicity: {z: [0.02], y: [0.28]}
            physics:
              opacity_table: %s
            """;

    @Test
    void aUserTableIsResolvedNextToTheGridFileAndReachesEveryModel() throws Exception {
        double[] logT = {3.75, 4.0, 5.0, 6.0, 7.0, 8.0};
        double[] logR = {-6.0, -4.0, -2.0, 0.0};
        TabulatedOpacity table = TabulatedOpacity.generate(AnalyticCompositeOpacity.standard(), List.of(0.7),
                List.of(0.02), logT, logR);
        Files.createDirectories(dir.resolve("tables"));
        OpacityTableWriter.write(table, dir.resolve("tables/mine.txt"));
        Path grid = dir.resolve("g.yaml");
        Files.writeString(grid, GRID.formatted("tables/mine.txt"));
        GridSpec spec = new GridFileReader().read(grid).spec();
        String resolved = dir.resolve("tables/mine.txt").toString();
        assertThat(spec.physics().opacityTable()).isEqualTo(resolved);
        assertThat(spec.requests().iterator().next().physics().opacityTable()).isEqualTo(resolved);
        assertThat(GridHash.canonicalModels(spec)).contains("opacity_table=");
    }

    @Test
    void aMissingTableIsAProblemWithLineAndColumn() throws Exception {
        Path grid = dir.resolve("g.yaml");
        Files.writeString(grid, GRID.formatted("nowhere.txt"));
        assertThatThrownBy(() -> new GridFileReader().read(grid))
                .isInstanceOfSatisfying(GridFileException.class, e -> {
                    assertThat(e.problems()).singleElement().satisfies(p -> {
                        assertThat(p.line()).isEqualTo(4);
                        assertThat(p.kind()).isEqualTo(GridProblemKind.UNREADABLE_FILE);
                    });
                });
    }
}
