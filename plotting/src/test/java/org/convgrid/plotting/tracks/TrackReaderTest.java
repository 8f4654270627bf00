package org.convgrid.plotting.tracks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.Span;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackStep;
import org.convgrid.plotting.TestTracks;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TrackReaderTest {

    @Test
    void readsEveryStepAndIgnoresExtraColumns() throws Exception {
        List<TrackStep> steps = TrackReader.read(new StringReader(TestTracks.text(1.0, 0.014, 20)));
        assertThat(steps).hasSize(21);
        TrackStep first = steps.get(0);
        assertThat(first.ageGyr()).isZero();
        assertThat(first.hasSurface()).isTrue();
        assertThat(first.convZones()).hasSize(2).startsWith(new Span(0, 0.04));
        assertThat(first.burningZone()).isEqualTo(new Span(0, 0.45));
        assertThat(steps).isSortedAccordingTo(java.util.Comparator.comparingDouble(TrackStep::ageGyr));
    }

    @Test
    void columnsInAnyOrderAndOptionalOnesMayBeMissing() throws Exception {
        String text = "extra,central_cz_top_mass_frac,env_cz_base_mass_frac,age_gyr,burning_inner_mass_frac,"
                + "burning_outer_mass_frac\n" + "x,0.2,0.9,0.5,,\n" + "y,,,1.5,0,0.1\n";
        List<TrackStep> steps = TrackReader.read(new StringReader(text));
        assertThat(steps.get(0).ageGyr()).isEqualTo(0.5);
        assertThat(steps.get(0).convZones()).containsExactly(new Span(0, 0.2), new Span(0.9, 1));
        assertThat(steps.get(0).burningZone()).isNull();
        assertThat(steps.get(0).teffK()).isNaN();
        assertThat(steps.get(0).hasSurface()).isFalse();
        assertThat(steps.get(1).convZones()).isEmpty();
        assertThat(steps.get(1).burningZone()).isEqualTo(new Span(0, 0.1));
    }

    @Test
    void missingAgeColumnOrBadCellIsAFormatError() {
        assertThatThrownBy(() -> TrackReader.read(new StringReader("central_cz_top_mass_frac\n1.0\n")))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("age_gyr");
        assertThatThrownBy(() -> TrackReader.read(new StringReader("age_gyr,central_cz_top_mass_frac\n1,a.b\n")))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("central_cz_top_mass_frac");
        // the packed zone lists of earlier runs are refused with the way out
        assertThatThrownBy(() -> TrackReader.read(new StringReader("age_gyr,conv_zones_mass_frac\n1,0-0.2\n")))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("run the grid again");
    }

    @Test
    void readAllNamesTracksByFileAndSortsThem(@TempDir Path dir) throws Exception {
        assertThat(TrackReader.readAll(dir.resolve("tracks"))).isEmpty();
        Path tracks = Files.createDirectories(dir.resolve("tracks"));
        Files.writeString(tracks.resolve("p0-z00-m001.csv"), TestTracks.text(2.0, 0.014, 5));
        Files.writeString(tracks.resolve("p0-z00-m000.csv"), TestTracks.text(1.0, 0.014, 5));
        Files.writeString(tracks.resolve("notes.txt"), "not a track");
        // a user's own table beside convgrid's is not read as a track (it failed the run: "misses the column")
        Files.writeString(tracks.resolve("my-track.csv"), "mass,teff\n1.0,5772\n");
        assertThat(TrackReader.readAll(tracks)).extracting(Track::trackId).containsExactly("p0-z00-m000",
                "p0-z00-m001");
        assertThat(Track.trackIdOf("p0-z01-m009-a02")).isEqualTo("p0-z01-m009");
    }
}
