package org.convgrid.plotting.tracks;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.output.track.Track;
import org.convgrid.plotting.label.PhysicsKey;
import org.junit.jupiter.api.Test;

class AgeChartSelectionTest {

    private static final PhysicsKey PHYSICS = new PhysicsKey(PhysicsOptions.DEFAULT.mixingLength(),
            PhysicsOptions.DEFAULT.overshoot(), OvershootScheme.STEP, PhysicsOptions.DEFAULT.criterion(), 1.0);

    private static List<TrackedModel> tracks(int masses, int metallicities) {
        List<TrackedModel> out = new ArrayList<>();
        for (int iz = 0; iz < metallicities; iz++) {
            for (int im = 0; im < masses; im++) {
                String id = String.format("p0-z%03d-m%04d", iz, im);
                out.add(new TrackedModel(new TrackOrigin(id, Math.round((0.1 + 0.01 * im) * 1e6) / 1e6, 0.001 * iz, PHYSICS),
                        new Track(id, List.of())));
            }
        }
        return out;
    }

    @Test
    void aSmallRunChartsSixSpreadMassesPerMetallicity() {
        AgeChartSelection s = AgeChartSelection.of(tracks(20, 3), List.of());
        assertThat(s.chosen()).hasSize(3 * AgeChartSelection.MASSES_PER_GROUP);
        // lowest and highest mass of each metallicity are always among them
        assertThat(s.chosen()).extracting(t -> t.origin().massMsun()).contains(0.1, 0.29);
        assertThat(s.describe()).startsWith("18 of the run's 60 tracks are charted");
    }

    @Test
    void tenThousandTracksGiveABoundedNumberOfCharts() {
        AgeChartSelection s = AgeChartSelection.of(tracks(100, 100), List.of());
        assertThat(s.chosen()).hasSizeLessThanOrEqualTo(AgeChartSelection.MAX_CHARTS).isNotEmpty();
        assertThat(s.available()).isEqualTo(10_000);
    }

    @Test
    void namedMassesPickTheNearestTrackOfEveryMetallicity() {
        AgeChartSelection s = AgeChartSelection.of(tracks(20, 2), List.of(0.2, 0.251));
        assertThat(s.chosen()).extracting(t -> t.origin().massMsun()).containsExactly(0.2, 0.25, 0.2, 0.25);
        assertThat(s.describe()).contains("age_charts_for_masses_msun", "0.2, 0.251");
    }

    @Test
    void spreadKeepsTheEnds() {
        assertThat(AgeChartSelection.spread(List.of(1, 2, 3, 4, 5, 6, 7, 8, 9, 10), 4)).containsExactly(1, 4, 7, 10);
        assertThat(AgeChartSelection.spread(List.of(1, 2), 4)).containsExactly(1, 2);
    }
}
