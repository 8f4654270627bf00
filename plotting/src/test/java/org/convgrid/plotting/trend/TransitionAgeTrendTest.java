package org.convgrid.plotting.trend;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.zones.TransitionMarker;
import org.junit.jupiter.api.Test;

class TransitionAgeTrendTest {

    @Test
    void oneSeriesPerTransitionAndZWithTheFileValues() {
        List<CatalogueRow> rows = TestRuns.demoRows();
        List<TransitionRow> transitions = TransitionFinder.withDefaults().find(rows);
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), transitions);
        assertThat(data.ages()).containsExactly(0.0, 1.0, 4.57);
        assertThat(data.series()).extracting(TransitionAgeTrendData.Series::zInit)
                .containsExactly(0.004, 0.014, 0.02, 0.004, 0.014, 0.02, 0.004, 0.014, 0.02);
        // fully convective limit, core onset, then the turn-off (the synthetic run's oldest stars are past the main
        // sequence at the top of each Z)
        assertThat(data.series()).extracting(TransitionAgeTrendData.Series::kind).containsSubsequence(
                TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT, TransitionMarker.Kind.CONV_CORE_ONSET,
                TransitionMarker.Kind.MAIN_SEQUENCE_TURNOFF);
        assertThat(data.series().get(0).kind()).isEqualTo(TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT);
        for (TransitionAgeTrendData.Series s : data.series()) {
            assertThat(s.points()).extracting(AgePoint::ageGyr).isSorted();
            for (AgePoint p : s.points()) {
                TransitionRow t = transitions.stream().filter(r -> r.slice().zInit() == s.zInit()
                        && r.slice().ageGyr() == p.ageGyr()).findFirst().orElseThrow();
                var estimate = switch (s.kind()) {
                    case FULLY_CONVECTIVE_LIMIT -> t.fullyConvective();
                    case CONV_CORE_ONSET -> t.convCoreOnset();
                    case MAIN_SEQUENCE_TURNOFF -> t.turnoff();
                    case LITHIUM_DEPLETION_BOUNDARY -> t.lithiumDepletion().boundary();
                };
                assertThat(p.massMsun()).isEqualTo(estimate.massMsun());
                assertThat(p.bracket()).isEqualTo(estimate.bracket());
            }
        }
    }

    @Test
    void onsetsAboveCoresTooCoolForTheCnoCycleGetACaveat() {
        List<CatalogueRow> rows = TestRuns.demoRows();
        // the finder's rows without notes (its own name the synthetic Z = 0.004 cores, whose 15 MK centres get
        // under 1 % from the CNO cycle at that Z)
        List<TransitionRow> plain = TransitionFinder.withDefaults().find(rows).stream()
                .map(t -> new TransitionRow(t.slice(), t.yInit(), t.fullyConvective(), t.convCoreOnset(),
                        t.transientCore(), t.method(), t.toleranceMsun(), "")).toList();
        assertThat(TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), plain).caveats()).isEmpty();
        // the note TransitionFinder writes for a young slice's 3He-driven cores, given to one slice with an onset
        TransitionRow onset = plain.stream().filter(t -> t.convCoreOnset().found()).findFirst().orElseThrow();
        List<TransitionRow> noted = plain.stream().map(t -> t != onset ? t
                : new TransitionRow(t.slice(), t.yInit(), t.fullyConvective(), t.convCoreOnset(), t.transientCore(),
                        t.method(), t.toleranceMsun(), "the cores at 0.4-0.8 Msun sit in centres where the CNO cycle gives under 1 % of the energy, "
                        + TransitionFinder.COOL_CORES_WORDS + ": out-of-equilibrium burning drives them")).toList();
        List<String> caveats = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), noted).caveats();
        assertThat(caveats).hasSize(1);
        assertThat(caveats.get(0)).startsWith(TransitionAgeTrend.CAVEAT_START + String.format(java.util.Locale.ROOT, "%.3f",
                onset.convCoreOnset().massMsun())).contains("too cool for the CNO cycle");
        // a young slice's cool cores are 12C-driven before the zero-age main sequence: the caveat names both fuels
        // (it said "3He-driven" alone, which pre-main-sequence cores contradict)
        assertThat(caveats.get(0)).contains(TransitionFinder.COOL_CORES_CAUSE).doesNotContain("3He-driven");
        // the chart against Z says the same
        assertThat(TransitionTrend.build(PhysicsKey.of(rows.get(0)), noted).caveats()).isEqualTo(caveats);
        assertThat(TransitionTrend.build(PhysicsKey.of(rows.get(0)), plain).caveats()).isEmpty();
    }

    @Test
    void refinedAndGridValuesAreNeverOneSeries() {
        List<CatalogueRow> rows = TestRuns.demoRows();
        List<TransitionRow> grid = TransitionFinder.withDefaults().find(rows);
        // the zero-age slices refined, the later ones read off the grid: the case that once drew a false trend
        List<TransitionRow> mixed = grid.stream().map(t -> t.slice().ageGyr() == 0.0
                ? new TransitionRow(t.slice(), t.yInit(), t.fullyConvective(), t.convCoreOnset(), t.transientCore(),
                        TransitionMethod.REFINED, 0.002, t.notes())
                : t).toList();
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), mixed);
        assertThat(data.series()).allSatisfy(s -> assertThat(s.points()).allSatisfy(p ->
                assertThat(p.ageGyr() == 0.0).isEqualTo(s.method() == TransitionMethod.REFINED)));
        assertThat(data.series()).filteredOn(s -> s.method() == TransitionMethod.REFINED).isNotEmpty()
                .allSatisfy(s -> assertThat(s.points()).hasSize(1));
        TransitionTrendData byZ = TransitionTrend.build(PhysicsKey.of(rows.get(0)), mixed);
        assertThat(byZ.series()).allSatisfy(s -> assertThat(s.method())
                .isEqualTo(s.ageGyr() == 0.0 ? TransitionMethod.REFINED : TransitionMethod.GRID));
        // a refined value carries its tolerance to its label, a grid value none
        assertThat(data.series()).allSatisfy(s -> assertThat(s.points()).allSatisfy(p ->
                assertThat(Double.isFinite(p.toleranceMsun())).isEqualTo(s.method() == TransitionMethod.REFINED)));
    }

    @Test
    void agesFromBirthThatSpanDecadesGetALogarithmicAxisAndZeroAgesALinearOne() {
        PhysicsKey p = new PhysicsKey(1.8, 0.0, OvershootScheme.STEP, null, 1.0);
        assertThat(new TransitionAgeTrendData(p, List.of(0.01, 0.15, 0.6), List.of(0.02), List.of(), List.of())
                .logAges()).isTrue();
        assertThat(new TransitionAgeTrendData(p, List.of(0.0, 1.0, 4.57), List.of(0.02), List.of(), List.of())
                .logAges()).isFalse();
        assertThat(new TransitionAgeTrendData(p, List.of(1.0, 4.57), List.of(0.02), List.of(), List.of())
                .logAges()).isFalse();
    }

    @Test
    void transientWindowsAreKeptPerSlice() {
        List<CatalogueRow> rows = TestRuns.demoRows();
        List<TransitionRow> grid = TransitionFinder.withDefaults().find(rows);
        TransitionRow first = grid.get(0);
        List<TransitionRow> withWindow = grid.stream().map(t -> t == first ? new TransitionRow(t.slice(), t.yInit(),
                t.fullyConvective(), t.convCoreOnset(), new Span(0.36, 0.44), t.method(), t.toleranceMsun(),
                t.notes()) : t).toList();
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), withWindow);
        assertThat(data.windows()).containsExactly(new TransientWindow(first.slice().zInit(),
                first.slice().ageGyr(), new Span(0.36, 0.44)));
    }

    @Test
    void windowsTheNotesNameAboveTheReportedOneAreDrawnToo() {
        // notes as the finder writes them for a window hidden behind one coreless model (as in the demo's Z = 0.014,
        // 600 Myr slice), given to the first slice of a synthetic run: every window must reach the chart
        List<CatalogueRow> rows = TestRuns.demoRows();
        List<TransitionRow> grid = TransitionFinder.withDefaults().find(rows);
        TransitionRow first = grid.get(0);
        String notes = "convective core changes 7 times with mass; the lowest window of cores is the transient one, "
                + "others at 0.326562-0.575, 0.7 Msun";
        List<TransitionRow> withWindows = grid.stream().map(t -> t == first ? new TransitionRow(t.slice(), t.yInit(),
                t.fullyConvective(), t.convCoreOnset(), new Span(0.3140625, 0.3234375), t.method(),
                t.toleranceMsun(), notes) : t).toList();
        double z = first.slice().zInit();
        double age = first.slice().ageGyr();
        assertThat(TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), withWindows).windows()).containsExactly(
                new TransientWindow(z, age, new Span(0.3140625, 0.3234375)),
                new TransientWindow(z, age, new Span(0.326562, 0.575)), new TransientWindow(z, age, new Span(0.7, 0.7)));
        assertThat(TransitionTrend.build(PhysicsKey.of(rows.get(0)), withWindows).windows()).hasSize(3);
    }

    @Test
    void theAgesWhoseLithiumBoundaryLiesBelowTheGridAreNamedWhereTheLineStops() {
        // synthetic lithium (invented, the shape of young tracks): at 0.02 Gyr the stars below 0.3 Msun keep it and
        // 0.3-1 Msun have burnt it; at 0.15 and 0.6 Gyr every star below 1 Msun has burnt it
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.1, 2.0, 12), new double[] {0.008, 0.02},
                new double[] {0.02, 0.15, 0.6}).stream().map(r -> r.toBuilder().surfaceLiRel(
                        r.massMsun() >= 1.0 ? 0.6 : r.ageGyr() < 0.05 && r.massMsun() < 0.3 ? 0.9 : 1e-4).build())
                .toList();
        List<TransitionRow> transitions = TransitionFinder.withDefaults().find(rows);
        TransitionAgeTrendData data = TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), transitions);
        assertThat(data.series()).anyMatch(s -> s.kind() == TransitionMarker.Kind.LITHIUM_DEPLETION_BOUNDARY);
        // both Z at both ages: the ages once
        assertThat(data.caveats()).contains("Lithium depletion boundary below the lowest mass at 150 Myr, 600 Myr: "
                + "every star there has burnt 99 % of its lithium.");
        // a chart that draws no boundary says nothing about one
        List<TransitionRow> old = transitions.stream().filter(t -> t.slice().ageGyr() > 0.1).toList();
        assertThat(TransitionAgeTrend.build(PhysicsKey.of(rows.get(0)), old).caveats())
                .noneMatch(c -> c.startsWith("Lithium"));
    }
}
