package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.yaml.GridFileReader;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A grid that writes profiles has one per ok model: a resume cuts the catalogue back to the first star with a model
 * whose profile is missing (a full disk lets the sweep go on without it and fails the run only at its end, so the
 * resume must see it), and leaves alone a model that did not converge, which has none.
 */
class MissingProfilesTest {

    @TempDir
    Path dir;

    private static GridSpec grid() {
        return new GridFileReader().parse("g.yaml", """
            mass: {values: [1.0, 1.2, 1.4]}
            metallicity: {z: [0.02], y: [0.28]}
            age: {gyr: [0], origin: zams}
            output: {profiles: true}
            """);
    }

    private static CatalogueRow row(String id, double massMsun, ModelStatus status) {
        return CatalogueRow.builder(id, status).massMsun(massMsun).zInit(0.02).yInit(0.28).ageGyr(0.0).build();
    }

    @Test
    void aMissingProfileOfAnOkModelIsComputedAgainFromItsStar() throws Exception {
        RunDirectory run = new RunDirectory(dir);
        Files.createDirectories(run.layout().profiles());
        StringBuilder text = new StringBuilder();
        CatalogueWriter writer = CatalogueWriter.startingWithHeader(text, IronAbundance.DEFAULT);
        writer.writeAll(List.of(row("p0-z00-m000-a00", 1.0, ModelStatus.OK),
                row("p0-z00-m001-a00", 1.2, ModelStatus.NOT_CONVERGED), row("p0-z00-m002-a00", 1.4, ModelStatus.OK)));
        writer.flush();
        Files.writeString(run.catalogue(), text);
        Files.writeString(run.layout().profileFile("p0-z00-m000-a00"), "a profile");

        MissingStarFiles.Recomputed cut = MissingStarFiles.cutBackToFirstLacking(run, grid(), IronAbundance.DEFAULT);

        // the unconverged 1.2 Msun model has no profile and needs none; the 1.4 Msun one lacks its own
        assertThat(cut).isNotNull();
        assertThat(cut.droppedRows()).isEqualTo(1);
        assertThat(cut.example()).isEqualTo("p0-z00-m002, profiles/p0-z00-m002-a00.csv");
        assertThat(CatalogueReader.read(run.catalogue())).extracting(CatalogueRow::modelId)
                .containsExactly("p0-z00-m000-a00", "p0-z00-m001-a00");

        Files.writeString(run.layout().profileFile("p0-z00-m002-a00"), "a profile");
        assertThat(MissingStarFiles.cutBackToFirstLacking(run, grid(), IronAbundance.DEFAULT)).isNull();
    }
}
