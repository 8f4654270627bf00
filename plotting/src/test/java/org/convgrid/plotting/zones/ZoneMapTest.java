package org.convgrid.plotting.zones;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueZone;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.TestRuns;
import org.junit.jupiter.api.Test;

class ZoneMapTest {

    private final List<CatalogueRow> rows = TestRuns.demoRows();
    private final List<TransitionRow> transitions = TransitionFinder.withDefaults().find(rows);

    @Test
    void shadedIntervalsInMassAreExactlyTheCatalogueZones() {
        for (TransitionRow t : transitions) {
            ZoneMapData map = ZoneMap.inMass(t.slice(), rows, t);
            for (CatalogueRow r : rows.stream().filter(r -> Slice.of(r).equals(t.slice())).toList()) {
                List<ZoneRect> mine = map.rects().stream().filter(z -> z.modelId().equals(r.modelId())).toList();
                if (r.isOk()) {
                    assertThat(mine.stream().map(z -> new Span(z.lo(), z.hi())).toList())
                            .as(r.modelId()).isEqualTo(r.convZones());
                } else {
                    assertThat(mine).singleElement().satisfies(z -> {
                        assertThat(z.kind()).isEqualTo(r.status() == ModelStatus.PAST_MAIN_SEQUENCE
                                ? ZoneKind.PAST_MAIN_SEQUENCE : ZoneKind.NO_RESULT);
                        assertThat(z.lo()).isZero();
                        assertThat(z.hi()).isEqualTo(1.0);
                    });
                }
            }
            long zonesInSlice = rows.stream().filter(r -> Slice.of(r).equals(t.slice()))
                    .mapToLong(r -> r.isOk() ? r.convZones().size() : 1).sum();
            assertThat(map.rects()).hasSize((int) zonesInSlice);
        }
    }

    @Test
    void markedTransitionMassesAreThoseOfTheTransitionsFile() {
        for (TransitionRow t : transitions) {
            ZoneMapData map = ZoneMap.inMass(t.slice(), rows, t);
            assertThat(map.markers()).extracting(TransitionMarker::kind).containsExactly(
                    TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT, TransitionMarker.Kind.CONV_CORE_ONSET);
            assertThat(map.markers().get(0).massMsun()).isEqualTo(t.fullyConvective().massMsun());
            assertThat(map.markers().get(0).bracket()).isEqualTo(t.fullyConvective().bracket());
            assertThat(map.markers().get(1).massMsun()).isEqualTo(t.convCoreOnset().massMsun());
        }
        // The synthetic run puts the limit near 0.35 Msun and the onset near 1.1 Msun at Z = 0.014.
        TransitionRow solar = transitions.stream().filter(t -> t.slice().zInit() == 0.014).findFirst().orElseThrow();
        assertThat(solar.fullyConvective().massMsun()).isEqualTo(0.35);
        assertThat(solar.convCoreOnset().massMsun()).isEqualTo(1.1);
    }

    @Test
    void columnsMeetAtGeometricMidpointsAndTileTheAxis() {
        double[] edges = ZoneMap.columnEdges(new double[] {0.1, 0.4, 1.6});
        assertThat(edges[1]).isCloseTo(0.2, within(1e-12));
        assertThat(edges[2]).isCloseTo(0.8, within(1e-12));
        assertThat(edges[0]).isCloseTo(0.05, within(1e-12));
        assertThat(edges[3]).isCloseTo(3.2, within(1e-12));
        TransitionRow t = transitions.get(0);
        ZoneMapData map = ZoneMap.inMass(t.slice(), rows, t);
        assertThat(map.rects()).allSatisfy(z -> {
            assertThat(z.left()).isLessThan(z.massMsun());
            assertThat(z.right()).isGreaterThan(z.massMsun());
        });
        assertThat(map.massMin()).isLessThan(0.1);
        assertThat(map.massMax()).isGreaterThan(2.0);
    }

    @Test
    void radiusMapDrawsEveryZoneOfTheZoneListCoresAndShellsIncluded() {
        for (TransitionRow t : transitions) {
            ZoneMapData map = ZoneMap.inRadius(t.slice(), rows, t, Map.of());
            assertThat(map.axis()).isEqualTo(ZoneAxis.RADIUS_FRACTION);
            assertThat(map.notes()).isEmpty();
            for (CatalogueRow r : rows.stream().filter(r -> Slice.of(r).equals(t.slice()) && r.isOk()).toList()) {
                assertThat(map.rects().stream().filter(z -> z.modelId().equals(r.modelId()))
                        .map(z -> new Span(z.lo(), z.hi())).toList()).as(r.modelId()).isEqualTo(r.zones().stream()
                        .map(z -> new Span(z.radiusFracInner(), z.radiusFracOuter())).toList());
            }
        }
        // the synthetic run has cores above ~1.1 Msun: the r/R map must show them, not only envelopes
        TransitionRow solar = transitions.stream().filter(t -> t.slice().zInit() == 0.014).findFirst().orElseThrow();
        assertThat(ZoneMap.inRadius(solar.slice(), rows, solar, Map.of()).rects()).extracting(ZoneRect::kind)
                .contains(ZoneKind.CORE, ZoneKind.ENVELOPE, ZoneKind.WHOLE_STAR);
    }

    @Test
    void bothMapsNameAZoneAsTheZoneListDoes() {
        // a central zone below the core threshold and a thin surface zone are shells in zones.csv (README, "Zones");
        // the central one is named for what it is, a small central zone, never "convective shell" (a reader took the
        // label at the centre for a mistake); an envelope may end a hair below r/R = 1
        CatalogueRow base = rows.stream().filter(r -> r.isOk() && r.massMsun() == 1.0).findFirst().orElseThrow();
        CatalogueRow listed = base.withZones(List.of(
                new CatalogueZone(CatalogueZone.ZoneKind.SHELL, 0.0, 0.0002, 0.0, 0.02),
                new CatalogueZone(CatalogueZone.ZoneKind.SHELL, 0.4, 0.5, 0.3, 0.35),
                new CatalogueZone(CatalogueZone.ZoneKind.ENVELOPE, 0.97, 1.0, 0.72, 0.999995)));
        Slice slice = Slice.of(listed);
        for (ZoneMapData map : List.of(ZoneMap.inMass(slice, List.of(listed), null),
                ZoneMap.inRadius(slice, List.of(listed), null, Map.of()))) {
            assertThat(map.rects()).extracting(ZoneRect::kind).as(map.axis().stem())
                    .containsExactly(ZoneKind.SMALL_CENTRAL, ZoneKind.SHELL, ZoneKind.ENVELOPE);
        }
        assertThat(ZoneKind.SMALL_CENTRAL.label()).isEqualTo("small central convective zone\n(below the core threshold)")
                .doesNotContain("shell");
    }

    @Test
    void aZoneKindTooThinToSeeLeavesTheLegendForANote() {
        CatalogueRow base = rows.stream().filter(r -> r.isOk() && r.massMsun() == 1.0).findFirst().orElseThrow();
        // a central shell below the core threshold holds under a thousandth of the mass: no pixel in m/M
        CatalogueRow tiny = base.withZones(List.of(
                new CatalogueZone(CatalogueZone.ZoneKind.SHELL, 0.0, 0.0002, 0.0, 0.02),
                new CatalogueZone(CatalogueZone.ZoneKind.ENVELOPE, 0.97, 1.0, 0.72, 1.0)));
        var inMass = ZoneMapRenderer.render(ZoneMap.inMass(Slice.of(tiny), List.of(tiny), null));
        assertThat(inMass.getSeriesMap()).containsKey(ZoneKind.ENVELOPE.label())
                .doesNotContainKey(ZoneKind.SMALL_CENTRAL.label()).doesNotContainKey(ZoneKind.SHELL.label());
        // in r/R the same zone is 0.02 of the radius: drawn and in the legend, not as a shell
        var inRadius = ZoneMapRenderer.render(ZoneMap.inRadius(Slice.of(tiny), List.of(tiny), null, Map.of()));
        assertThat(inRadius.getSeriesMap()).containsKey(ZoneKind.SMALL_CENTRAL.label())
                .doesNotContainKey(ZoneKind.SHELL.label());
        assertThat(ZoneMapRenderer.tooThinNote(ZoneKind.SHELL)).contains("convective shells", "too thin");
        assertThat(ZoneMapRenderer.tooThinNote(ZoneKind.SMALL_CENTRAL))
                .isEqualTo("Some small central convective zones (below the core threshold), listed in zones.csv, are "
                        + "too thin to show here.");
    }

    @Test
    void aModelTheZoneListLeavesOutFallsBackToItsProfileThenToTheCatalogueAndSaysSo() {
        TransitionRow t = transitions.get(1);
        List<CatalogueRow> unlisted = rows.stream().map(r -> r.withZones(List.of())).toList();
        List<CatalogueRow> slice = unlisted.stream().filter(r -> Slice.of(r).equals(t.slice()) && r.isOk()).toList();
        Map<String, List<Span>> fromProfiles = new java.util.HashMap<>();
        slice.forEach(r -> fromProfiles.put(r.modelId(), List.of(new Span(0, 0.1), new Span(0.8, 1))));
        ZoneMapData profiled = ZoneMap.inRadius(t.slice(), unlisted, t, fromProfiles);
        assertThat(profiled.notes()).isEmpty();
        assertThat(profiled.rects().stream().filter(z -> z.kind() == ZoneKind.CORE)).hasSize(slice.size());

        ZoneMapData fromColumns = ZoneMap.inRadius(t.slice(), unlisted, t, Map.of());
        assertThat(fromColumns.notes()).containsExactly(ZoneMap.NO_ZONE_LIST_NOTE);
        CatalogueRow cored = slice.stream().filter(r -> Double.isFinite(r.coreCzRadiusFrac())
                && Double.isFinite(r.envCzBaseRadiusFrac())).findFirst().orElseThrow();
        assertThat(fromColumns.rects().stream().filter(z -> z.modelId().equals(cored.modelId()))
                .map(z -> new Span(z.lo(), z.hi())).toList())
                .containsExactly(new Span(0.0, cored.coreCzRadiusFrac()), new Span(cored.envCzBaseRadiusFrac(), 1.0));
    }

    @Test
    void zoneKindsFollowWhereTheZoneLies() {
        assertThat(ZoneKind.of(0, 1)).isEqualTo(ZoneKind.WHOLE_STAR);
        assertThat(ZoneKind.of(0, 0.1)).isEqualTo(ZoneKind.CORE);
        assertThat(ZoneKind.of(0.7, 1)).isEqualTo(ZoneKind.ENVELOPE);
        assertThat(ZoneKind.of(0.3, 0.4)).isEqualTo(ZoneKind.SHELL);
        // the first step of a 2.4 Msun track from birth: one zone up to m/M 0.9999986 (r/R 0.998), the star but for
        // its atmosphere, had been drawn as a convective core filling the star
        assertThat(ZoneKind.of(0, 0.9999986)).isEqualTo(ZoneKind.WHOLE_STAR);
    }
}
