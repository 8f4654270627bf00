package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.plotting.hr.HrDiagram;
import org.convgrid.plotting.hr.HrDiagramData;
import org.convgrid.plotting.hr.HrPoint;
import org.convgrid.plotting.label.AgeGroups;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.report.ReportPage;
import org.convgrid.plotting.zones.ZoneMap;
import org.convgrid.plotting.zones.ZoneMapData;
import org.convgrid.plotting.zones.ZoneRect;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The charts of a grid whose ages are fractions of each star's main-sequence lifetime: three masses, two fractions,
 * one Z, so every model is at an age in Gyr of its own. Grouped by that age, each chart held one star.
 */
class MsFractionChartsTest {

    private static final double[] MASSES = {1.2, 1.5, 2.0};
    private static final double[] FRACTIONS = {0.25, 0.75};
    private static final double Z = 0.014;
    private static final String GRID_TEXT = "title: Fraction survey\nmass: {values: [1.2, 1.5, 2.0]}\n"
            + "metallicity: {z: [0.014]}\nage: {ms_fraction: [0.25, 0.75]}\n";

    /** Grid order (Z, mass, age), each star at its fraction of the fixture's main-sequence lifetime. */
    private static List<CatalogueRow> rows() {
        List<CatalogueRow> rows = new ArrayList<>();
        for (int im = 0; im < MASSES.length; im++) {
            double lifetimeGyr = 10.0 * Math.pow(MASSES[im], -2.5);
            for (int ia = 0; ia < FRACTIONS.length; ia++) {
                rows.add(TestRuns.row(String.format("p0-z00-m%03d-a%02d", im, ia), MASSES[im], Z,
                        FRACTIONS[ia] * lifetimeGyr, false));
            }
        }
        return rows;
    }

    @Test
    void theRunIsGroupedByTheGridsFractions(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, rows(), GRID_TEXT);
        AgeGroups groups = RunData.read(dir).ageGroups();
        assertThat(groups.byFraction()).isTrue();
        assertThat(rows()).extracting(groups::keyOf).containsExactly(0.25, 0.75, 0.25, 0.75, 0.25, 0.75);
        assertThat(groups.name(0.5)).isEqualTo("MS fraction 0.5");
        assertThat(groups.keyOf("p0-z00-m000-a07", 1.0)).as("an index off the grid's list").isNaN();
        assertThat(RunData.read(TestRuns.write(dir.resolve("gyr"), TestRuns.demoRows())).ageGroups().byFraction())
                .isFalse();
    }

    @Test
    void oneZoneMapPerFractionHoldsAllItsMasses(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, rows(), GRID_TEXT);
        List<MapEntry> plan = RunMaps.plan(RunData.read(dir));
        assertThat(plan.stream().filter(e -> e.section().equals(MapEntry.ZONES_MASS))).extracting(MapEntry::fileName)
                .containsExactly("zones-mass_z0.014_msf0.25_a1.8_ov0_schwarzschild.png",
                        "zones-mass_z0.014_msf0.75_a1.8_ov0_schwarzschild.png");
        assertThat(plan.stream().filter(e -> e.section().equals(MapEntry.ZONES_RADIUS))).extracting(MapEntry::fileName)
                .containsExactly("zones-radius_z0.014_msf0.25_a1.8_ov0_schwarzschild.png",
                        "zones-radius_z0.014_msf0.75_a1.8_ov0_schwarzschild.png");
        assertThat(plan).filteredOn(e -> e.section().equals(MapEntry.ZONES_MASS))
                .allSatisfy(e -> assertThat(e.caption()).contains("main-sequence fraction").doesNotContain("Myr"));
        for (int ia = 0; ia < FRACTIONS.length; ia++) {
            String agePart = String.format("-a%02d", ia);
            List<CatalogueRow> members = rows().stream().filter(r -> r.modelId().endsWith(agePart)).toList();
            ZoneMapData map = ZoneMap.inMassAtFraction(FRACTIONS[ia], members);
            assertThat(map.rects().stream().map(ZoneRect::massMsun).distinct().sorted())
                    .containsExactly(1.2, 1.5, 2.0);
            assertThat(map.age()).isEqualTo("main-sequence fraction " + (ia == 0 ? "0.25" : "0.75"));
            assertThat(map.markers()).isEmpty();
        }
        // every chart of the plan draws (a chart that throws would be a failure here)
        assertThat(RunMaps.drawAll(dir).failures()).isEmpty();
    }

    @Test
    void theHrDiagramHasOneLinePerFraction() {
        List<CatalogueRow> rows = rows();
        HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows, List.of(), id -> TrackTimeline.UNKNOWN,
                new AgeGroups(List.of(0.25, 0.75)));
        assertThat(data.ages()).containsExactly(0.25, 0.75);
        assertThat(data.isochrones()).extracting(HrDiagramData.ZeroAgeLine::age).containsExactly(0.25, 0.75);
        assertThat(data.isochrones()).allSatisfy(line -> assertThat(line.points()).extracting(HrPoint::massMsun)
                .containsExactly(1.2, 1.5, 2.0));
        // the lowest fraction's line carries the mass labels, at every mass near a labelled one, and with fewer than
        // three such at the line's ends too (HrDiagram.FEWEST_MASS_LABELS): 1.2 Msun besides 1.5 and 2
        assertThat(data.zeroAgeLines()).singleElement().satisfies(line -> assertThat(line.points()).hasSize(3));
        assertThat(data.massLabels()).extracting(HrPoint::massMsun).containsExactly(1.2, 1.5, 2.0);
    }

    @Test
    void theReportSaysWhyTheTransitionMassesAreLeftOut(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, rows(), GRID_TEXT);
        List<MapEntry> plan = RunMaps.plan(RunData.read(dir));
        assertThat(plan).extracting(MapEntry::section).doesNotContain(MapEntry.TRENDS, MapEntry.TRENDS_AGE,
                MapEntry.TURNOVER);
        assertThat(plan).filteredOn(e -> e.section().equals(MapEntry.HR)).singleElement()
                .satisfies(e -> assertThat(e.caption()).contains("equal main-sequence fraction"));
        String html = Files.readString(ReportPage.write(dir), StandardCharsets.UTF_8);
        assertThat(html).contains("main-sequence lifetime, so the stars of one fraction are each at their own age")
                .doesNotContain("<th>fully convective up to");
    }
}
