package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.convgrid.grids.ModelIdFormat;
import org.convgrid.output.RunLayout;
import org.convgrid.output.transitions.RefinedModelIds;
import org.junit.jupiter.api.Test;

/**
 * The names {@code run --force}, the track reader and merge take for convgrid's own files ({@link RunLayout}) are
 * exactly those the id makers give ({@link ModelIdFormat}, {@link RefinedModelIds}), at any width: RunLayout cannot see
 * ModelIdFormat, so this is where the two are tied.
 */
class RunFileNamesTest {

    private static final RunLayout LAYOUT = new RunLayout(Path.of("/runs/d"));

    @Test
    void everyTrackAndProfileNameTheIdMakersGiveIsConvgrids() {
        for (ModelIdFormat format : new ModelIdFormat[] {ModelIdFormat.forAxes(1, 3, 10, 3),
                ModelIdFormat.forAxes(12, 150, 2000, 101)}) {
            String modelId = format.modelId(0, 2, 9, 1);
            String trackId = ModelIdFormat.trackIdOf(modelId);
            String refinedId = RefinedModelIds.of(modelId, 1234);
            String refinedTrackId = ModelIdFormat.trackIdOf(refinedId);
            assertThat(RunLayout.isTrackFile(LAYOUT.trackFile(trackId))).as(trackId).isTrue();
            assertThat(RunLayout.isTrackFile(LAYOUT.trackZonesFile(trackId))).as(trackId).isTrue();
            assertThat(RunLayout.isTrackFile(LAYOUT.trackFile(refinedTrackId))).as(refinedTrackId).isTrue();
            assertThat(RunLayout.isTrackFile(LAYOUT.trackZonesFile(refinedTrackId))).isTrue();
            assertThat(RunLayout.isProfileFile(LAYOUT.profileFile(modelId))).as(modelId).isTrue();
            assertThat(RunLayout.isProfileFile(LAYOUT.profileFile(refinedId))).as(refinedId).isTrue();
            // a model id is no track name, a track id no profile name
            assertThat(RunLayout.isTrackFile(LAYOUT.trackFile(modelId))).isFalse();
            assertThat(RunLayout.isProfileFile(LAYOUT.profileFile(trackId))).isFalse();
        }
    }

    @Test
    void aUsersTablesBesideThemAreNot() {
        for (String name : new String[] {"my-track.csv", "my-track.zones.csv", "p0-z00-m000-fit.csv",
                "p0-z00-m000.csv.bak", "P0-Z00-M000.csv", "p0-z00-m000.zones.txt", "notes.csv"}) {
            assertThat(RunLayout.isTrackFile(Path.of("/runs/d/tracks", name))).as(name).isFalse();
            assertThat(RunLayout.isProfileFile(Path.of("/runs/d/profiles", name))).as(name).isFalse();
        }
    }
}
