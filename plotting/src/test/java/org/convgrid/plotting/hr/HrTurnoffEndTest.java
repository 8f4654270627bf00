package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.plotting.MapEntry;
import org.convgrid.plotting.RunData;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.TestTracks;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.convgrid.plotting.tracks.TrackedModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An isochrone old enough that the upper grid masses are past the main sequence ends at the slice's turn-off model
 * when the transition refinement found it, and says it stops below the turn-off when it did not. The synthetic rows
 * ({@link TestRuns}: main-sequence lifetime 10 Gyr M^-2.5) put the 4 Gyr turn-off at 1.4427 Msun, between the grid's
 * 1.4 (on the main sequence) and 1.5 Msun (past it); no physics is under test here.
 */
class HrTurnoffEndTest {

    private static final double[] MASSES = TestRuns.masses(0.8, 2.0, 13);
    private static final double[] AGES = {0.0, 4.0};

    /** The grid: 0.8-2.0 Msun every 0.1 at Z = 0.02, at the ZAMS and 4 Gyr (1.5-2.0 Msun past the main sequence). */
    private static List<CatalogueRow> grid() {
        return TestRuns.rows(MASSES, new double[] {0.02}, AGES);
    }

    /** A refinement model of the 4 Gyr slice (grid age index 1). */
    private static CatalogueRow refined(int counter, double mass) {
        return TestRuns.row(RefinedModelIds.of("p0-z00-m000-a01", counter), mass, 0.02, 4.0, false);
    }

    /**
     * The grid with a refined turn-off bracket, 1.4375 (on the main sequence, lifetime 4.04 Gyr) to 1.44375 Msun
     * (past it, 3.99 Gyr), and a refinement model at a core-onset bracket and one at the ZAMS, which stay off the
     * lines.
     */
    private static List<CatalogueRow> refinedRows() {
        List<CatalogueRow> rows = new ArrayList<>(grid());
        rows.add(refined(0, 1.45));
        rows.add(refined(1, 1.425));
        rows.add(refined(2, 1.4375));
        rows.add(refined(3, 1.44375));
        rows.add(refined(4, 1.15));
        rows.add(TestRuns.row(RefinedModelIds.of("p0-z00-m000-a00", 0), 0.95, 0.02, 0.0, false));
        return rows;
    }

    /** The diagram with a track per grid mass, so that it has isochrones. */
    private static HrDiagramData diagram(List<CatalogueRow> rows) throws Exception {
        List<TrackedModel> tracked = new ArrayList<>();
        for (CatalogueRow r : rows.subList(0, MASSES.length)) {
            Track t = new Track(Track.trackIdOf(r.modelId()), TrackReader.read(new java.io.StringReader(
                    TestTracks.text(r.massMsun(), r.zInit(), 10))));
            tracked.add(new TrackedModel(new TrackOrigin(t.trackId(), r.massMsun(), r.zInit(), PhysicsKey.of(r)), t));
        }
        return HrDiagram.build(PhysicsKey.of(rows.get(0)), rows, tracked);
    }

    private static HrDiagramData.ZeroAgeLine isochroneOf(HrDiagramData data, double ageGyr) {
        return data.isochrones().stream().filter(l -> l.age() == ageGyr).findFirst().orElseThrow();
    }

    @Test
    void theOldIsochroneEndsAtTheRefinementsTurnoffModel() throws Exception {
        HrDiagramData data = diagram(refinedRows());
        HrDiagramData.ZeroAgeLine old = isochroneOf(data, 4.0);
        assertThat(old.end()).isEqualTo(IsochroneEnd.AT_TURNOFF_MODEL);
        // the grid's 1.2 Msun failed at 4 Gyr (TestRuns); 1.5-2.0 are past the main sequence
        assertThat(old.points()).extracting(HrPoint::massMsun)
                .containsExactly(0.8, 0.9, 1.0, 1.1, 1.3, 1.4, 1.4375);
        assertThat(old.points().get(old.points().size() - 1).modelId()).isEqualTo("p0-z00-r002-a01");
        assertThat(data.turnoffModels()).extracting(HrPoint::modelId).containsExactly("p0-z00-r002-a01");
        // the other refinement models stay small and pale, on no line; the turn-off model is not among them
        assertThat(data.refinementPoints()).extracting(HrPoint::massMsun).containsExactlyInAnyOrder(0.95, 1.425, 1.15);
        HrDiagramData.ZeroAgeLine zams = isochroneOf(data, 0.0);
        assertThat(zams.end()).isEqualTo(IsochroneEnd.ALL_ON_MAIN_SEQUENCE);
        assertThat(zams.points()).extracting(HrPoint::massMsun).doesNotContain(0.95).endsWith(2.0);
    }

    @Test
    void massLabelsNameGridMassesEvenOnALineThatEndsAtTheTurnoffModel() throws Exception {
        // without the zero-age models the youngest line is the 4 Gyr one, which ends at the refinement's 1.4375 Msun
        List<CatalogueRow> rows = refinedRows().stream().filter(r -> r.ageGyr() > 0).toList();
        HrDiagramData data = diagram(rows);
        assertThat(data.zeroAgeLines()).singleElement().satisfies(l -> assertThat(l.points())
                .extracting(HrPoint::massMsun).endsWith(1.4375));
        assertThat(data.massLabels()).isNotEmpty().noneMatch(p -> RefinedModelIds.isRefined(p.modelId()));
    }

    @Test
    void theChartMarksTheTurnoffModelAndItsLabelNamesIt() throws Exception {
        HrDiagramData data = diagram(refinedRows());
        StyledChart chart = HrDiagramRenderer.render(data);
        assertThat(chart.getSeriesMap()).containsKey(HrDiagramRenderer.TURNOFF_LABEL);
        assertThat(HrDiagramRenderer.notes(data, chart)).contains(HrDiagramRenderer.TURNOFF_NOTE)
                .noneMatch(n -> n.endsWith(HrDiagramRenderer.BELOW_TURNOFF_NOTE_END));
        // old isochrones part at the bright end: the 4 Gyr label goes beside the turn-off model now
        assertThat(HrDiagramRenderer.labels(data, chart)).filteredOn(l -> l.text().equals("4 Gyr"))
                .singleElement().satisfies(l -> assertThat(l.point().modelId()).isEqualTo("p0-z00-r002-a01"));
    }

    @Test
    void withoutRefinementTheIsochroneStopsAtTheLastGridMassAndTheNoteSaysSo() throws Exception {
        HrDiagramData data = diagram(grid());
        HrDiagramData.ZeroAgeLine old = isochroneOf(data, 4.0);
        assertThat(old.end()).isEqualTo(IsochroneEnd.BELOW_TURNOFF);
        assertThat(old.points()).extracting(HrPoint::massMsun).endsWith(1.4);
        assertThat(data.turnoffModels()).isEmpty();
        StyledChart chart = HrDiagramRenderer.render(data);
        assertThat(chart.getSeriesMap()).doesNotContainKey(HrDiagramRenderer.TURNOFF_LABEL);
        assertThat(HrDiagramRenderer.notes(data, chart)).doesNotContain(HrDiagramRenderer.TURNOFF_NOTE)
                .contains("The isochrone of 4 Gyr stops" + HrDiagramRenderer.BELOW_TURNOFF_NOTE_END);
    }

    @Test
    void aGridModelIsTheTurnoffModelWhenEveryNewModelCameOutPastTheMainSequence() throws Exception {
        List<CatalogueRow> rows = new ArrayList<>(grid());
        rows.add(refined(0, 1.45));
        rows.add(refined(1, 1.44375));
        HrDiagramData data = diagram(rows);
        HrDiagramData.ZeroAgeLine old = isochroneOf(data, 4.0);
        assertThat(old.end()).isEqualTo(IsochroneEnd.AT_TURNOFF_MODEL);
        assertThat(old.points()).extracting(HrPoint::massMsun).endsWith(1.3, 1.4);
        assertThat(data.turnoffModels()).extracting(HrPoint::modelId).containsExactly("p0-z00-m006-a01");
        assertThat(HrDiagramRenderer.notes(data, HrDiagramRenderer.render(data)))
                .contains(HrDiagramRenderer.TURNOFF_NOTE);
    }

    @Test
    void theReportCaptionNamesTheTurnoffModel(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = refinedRows();
        TestRuns.write(dir, rows);
        TestTracks.write(dir, rows.subList(0, MASSES.length * AGES.length), 10);
        MapEntry hr = RunMaps.plan(RunData.read(dir)).stream().filter(e -> e.fileName().startsWith("hr_"))
                .findFirst().orElseThrow();
        // drawn small: 1.425, 1.15 and the zero-age 0.95 Msun; not drawn: the two new models past the main
        // sequence (1.45, 1.44375), the grid's 1.5-2.0 Msun past it at 4 Gyr and its failed 1.2 Msun
        assertThat(hr.caption()).contains("the 19 grid models (7 more, past the main sequence or failed, not "
                + "drawn)", "the 3 other models the transition refinement added near the transition masses (2 more, "
                + "past the main sequence or failed, not drawn)",
                "Hollow markers: the turn-off model the isochrones end at");
    }
}
