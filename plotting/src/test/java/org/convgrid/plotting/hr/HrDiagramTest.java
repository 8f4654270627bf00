package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackStep;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.TestTracks;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.convgrid.plotting.tracks.TrackedModel;
import org.junit.jupiter.api.Test;

class HrDiagramTest {

    private final List<CatalogueRow> rows = TestRuns.demoRows();
    private final HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows);

    @Test
    void everyUsableModelIsAPointWithItsClass() {
        List<CatalogueRow> ok = rows.stream().filter(CatalogueRow::isOk).toList();
        assertThat(data.points()).hasSize(ok.size());
        assertThat(ok.size()).isLessThan(rows.size());
        CatalogueRow first = ok.get(0);
        HrPoint p = data.points().get(0);
        assertThat(p.modelId()).isEqualTo(first.modelId());
        assertThat(p.logTeff()).isCloseTo(Math.log10(first.teffK()), within(1e-12));
        assertThat(p.logL()).isCloseTo(Math.log10(first.luminosityLsun()), within(1e-12));
        assertThat(p.structureClass()).isEqualTo(first.structureClass());
    }

    @Test
    void oneZeroAgeLinePerMetallicityInMassOrder() {
        assertThat(data.zeroAgeLines()).extracting(HrDiagramData.ZeroAgeLine::zInit)
                .containsExactly(0.004, 0.014, 0.02);
        assertThat(data.zeroAgeLines()).allSatisfy(line -> {
            assertThat(line.age()).isZero();
            assertThat(line.points()).hasSize(39).isSortedAccordingTo(
                    java.util.Comparator.comparingDouble(HrPoint::massMsun));
            assertThat(line.points()).allSatisfy(p -> assertThat(p.ageGyr()).isZero());
        });
        assertThat(data.ages()).containsExactly(0.0, 1.0, 4.57);
    }

    @Test
    void aFewRoundMassesAreLabelled() {
        assertThat(data.massLabels()).extracting(HrPoint::massMsun).containsExactly(0.1, 0.2, 0.5, 1.0, 1.5, 2.0);
        assertThat(data.massLabels()).allSatisfy(p -> assertThat(p.zInit()).isEqualTo(0.014));
    }

    @Test
    void tracksAndIsochronesOnlyWithTracks() throws Exception {
        assertThat(data.tracks()).isEmpty();
        assertThat(data.isochrones()).isEmpty();
        List<CatalogueRow> small = TestRuns.rows(new double[] {0.5, 1.0, 2.0}, new double[] {0.014},
                new double[] {0, 1});
        List<TrackedModel> tracked = new java.util.ArrayList<>();
        for (CatalogueRow r : small.subList(0, 3)) {
            Track t = new Track(Track.trackIdOf(r.modelId()), TrackReader.read(new java.io.StringReader(
                    TestTracks.text(r.massMsun(), r.zInit(), 10))));
            tracked.add(new TrackedModel(new TrackOrigin(t.trackId(), r.massMsun(), r.zInit(), PhysicsKey.of(r)), t));
        }
        HrDiagramData withTracks = HrDiagram.build(PhysicsKey.of(small.get(0)), small, tracked);
        assertThat(withTracks.tracks()).extracting(HrDiagramData.TrackLine::massMsun).containsExactly(0.5, 1.0, 2.0);
        HrDiagramData.TrackLine sun = withTracks.tracks().get(1);
        TrackStep last = tracked.get(1).track().steps().get(10);
        assertThat(sun.logL()).hasSize(11);
        assertThat(sun.logL().get(10)).isCloseTo(Math.log10(last.luminosityLsun()), within(1e-12));
        assertThat(sun.logTeff().get(10)).isCloseTo(Math.log10(last.teffK()), within(1e-12));
        // Isochrones at both ages, the usable models of that age in mass order (TestRuns fails 1 Msun at 1 Gyr).
        assertThat(withTracks.isochrones()).extracting(HrDiagramData.ZeroAgeLine::age).containsExactly(0.0, 1.0);
        assertThat(withTracks.isochrones().get(0).points()).extracting(HrPoint::massMsun)
                .containsExactly(0.5, 1.0, 2.0);
        assertThat(withTracks.isochrones().get(1).points()).extracting(HrPoint::massMsun).containsExactly(0.5, 2.0);
        assertThat(HrDiagram.build(new PhysicsKey(2.0, 0.0, OvershootScheme.STEP,
                null, 1.0), small, tracked).tracks()).isEmpty();
    }
}
