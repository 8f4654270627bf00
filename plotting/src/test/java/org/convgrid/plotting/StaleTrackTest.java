package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.plotting.report.ReportPage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A track file left by another grid can carry the id of one of this catalogue's stars (ids come from grid indices)
 * while being of another mass: it must never be drawn as that star.
 */
class StaleTrackTest {

    @Test
    void aTrackWhoseIdMatchesButWhoseMassDoesNotIsNeitherChartedNorDrawnInTheHrDiagram(@TempDir Path dir)
            throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(new double[] {1.0, 2.0}, new double[] {0.014}, new double[] {0, 1});
        TestRuns.write(dir, rows);
        TestTracks.write(dir, rows, 30);
        String twoSolarMasses = Track.trackIdOf(rows.stream().filter(r -> r.massMsun() == 2.0).findFirst()
                .orElseThrow().modelId());
        // the same id, written by an earlier grid whose star of that index had 1.6 Msun
        Files.writeString(dir.resolve("tracks/" + twoSolarMasses + ".csv"), TestTracks.text(1.6, 0.014, 30));

        RunData run = RunData.read(dir);

        assertThat(run.tracks()).hasSize(2);
        assertThat(run.trackedModels()).extracting(t -> t.origin().massMsun()).containsExactly(1.0);
        assertThat(RunMaps.plan(run)).extracting(MapEntry::fileName).anyMatch(f -> f.startsWith("zones-age_m1_"))
                .noneMatch(f -> f.startsWith("zones-age_m2_") || f.startsWith("zones-age_m1.6_"));
        RunMaps.drawAll(run, dir, java.util.Set.of());
        assertThat(Files.readString(ReportPage.write(dir)))
                .contains("1 track file in tracks/ matches no catalogue model (by id and mass) and is not charted");
    }

    @Test
    void aTrackGivesBackItsMassFromItsSurfaceGravityAndRadius(@TempDir Path dir) throws Exception {
        Path file = Files.createDirectories(dir.resolve("tracks")).resolve("p0-z00-m003.csv");
        Files.writeString(file, TestTracks.text(0.85, 0.02, 5));

        assertThat(TrackReader.read(file).massMsun()).hasValueCloseTo(0.85,
                org.assertj.core.data.Offset.offset(0.85 * 2e-6));
        assertThat(new Track("empty", List.of()).massMsun()).isEmpty();
    }
}
