package org.convgrid.plotting.turnover;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Which models the turnover-time chart draws and which it leaves out. The rows are TestRuns' synthetic ones (local
 * time 20 d / M, no time without a convective envelope, fully convective below 0.35 Msun at Z = 0.014, the 0.3 Msun
 * model of Z = 0.004 at 1 Gyr not converged); their global times are set here at three times the local one. Nothing
 * here is physics under test: the chart only carries the catalogue's values.
 */
class TurnoverAgainstMassTest {

    private static final double[] MASSES = {0.2, 0.3, 0.5, 1.0, 1.8};
    private static final double Z = 0.014;

    /** A copy of {@code r} with another id, global turnover time and mixing length. */
    static CatalogueRow copy(CatalogueRow r, String id, double globalDays, double mixingLength) {
        return r.toBuilder().modelId(id).mixingLength(mixingLength).turnoverTimeGlobalDays(globalDays).build();
    }

    /**
     * Grid rows at Z = 0.004 and 0.014, ages 0 and 1 Gyr, with global times; one 4.57 Gyr row at Z = 0.004 only; a
     * refinement model at Z = 0.014; the same grid under another mixing length.
     */
    static List<CatalogueRow> rows() {
        List<CatalogueRow> rows = new ArrayList<>();
        for (CatalogueRow r : TestRuns.rows(MASSES, new double[] {0.004, Z}, new double[] {0, 1})) {
            rows.add(copy(r, r.modelId(), 3 * r.turnoverTimeDays(), r.mixingLength()));
        }
        rows.add(TestRuns.row("p0-z00-m000-a02", 0.2, 0.004, 4.57, false));
        // the refinement's model near the fully convective limit, and the same grid under alpha = 2.0
        rows.add(copy(TestRuns.row("p0-z01-m000-a00", 0.34, Z, 0.0, false), "p0-z01-r000-a00", 900.0, 1.8));
        for (CatalogueRow r : TestRuns.rows(MASSES, new double[] {Z}, new double[] {0})) {
            rows.add(copy(r, r.modelId().replace("p0-", "p1-"), Double.NaN, 2.0));
        }
        return rows;
    }

    private static PhysicsKey defaultPhysics(List<CatalogueRow> rows) {
        return PhysicsKey.of(rows.get(0));
    }

    /**
     * ms_fraction grids: one age of the grid is another age in Gyr for every star, so lines by age would hold one
     * star each; no chart.
     */
    @Test
    void aGridOfMainSequenceFractionsGetsNoChart() {
        List<CatalogueRow> fractions = List.of(TestRuns.row("p0-z00-m000-a00", 1.0, Z, 0.0247, false),
                TestRuns.row("p0-z00-m001-a00", 1.1, Z, 0.0192, false),
                TestRuns.row("p0-z00-m000-a01", 1.0, Z, 4.96, false),
                TestRuns.row("p0-z00-m001-a01", 1.1, Z, 3.1, false));
        assertThat(TurnoverAgainstMass.eachStarItsOwnAge(fractions)).isTrue();
        assertThat(TurnoverAgainstMass.build(defaultPhysics(fractions), Z, fractions, List.of()).modelCount())
                .isZero();
        assertThat(TurnoverAgainstMass.eachStarItsOwnAge(rows())).isFalse();
    }

    /** A line that stops short because its highest masses are past the main sequence says so. */
    @Test
    void modelsPastTheMainSequenceAreCountedForTheNote() {
        // TestRuns' lifetimes are 10 M^-2.5 Gyr: at 4 Gyr 1.8 Msun (2.3 Gyr) is past it, 1 Msun (10 Gyr) is not
        List<CatalogueRow> rows = TestRuns.rows(MASSES, new double[] {Z}, new double[] {4.0});
        TurnoverData data = TurnoverAgainstMass.build(defaultPhysics(rows), Z, rows, List.of());
        assertThat(data.pastMainSequence()).isEqualTo(1);
        assertThat(org.convgrid.plotting.style.AgeLineWords.pastMainSequenceNote(1))
                .startsWith("1 model lies past the main sequence");
        assertThat(TurnoverAgainstMass.build(defaultPhysics(rows()), Z, rows(), List.of()).pastMainSequence()).isZero();
    }

    @Test
    void oneLinePerAgeOfTheGridsOkModelsWithATurnoverTime() {
        List<CatalogueRow> rows = rows();
        TurnoverData data = TurnoverAgainstMass.build(defaultPhysics(rows), Z, rows, List.of());
        assertThat(data.zInit()).isEqualTo(Z);
        // every grid age of the physics, also the one this Z lacks, so an age has one colour on every Z's chart
        assertThat(data.ages()).containsExactly(0.0, 1.0, 4.57);
        assertThat(data.lines()).extracting(TurnoverData.AgeLine::ageGyr).containsExactly(0.0, 1.0);
        // 1.8 Msun has no convective envelope, so no time; the refinement model at 0.34 and alpha = 2.0 are left out
        assertThat(data.lines()).allSatisfy(l -> assertThat(l.points()).extracting(TurnoverPoint::massMsun)
                .containsExactly(0.2, 0.3, 0.5, 1.0));
        assertThat(data.modelCount()).isEqualTo(8);
        TurnoverPoint sun = data.lines().get(0).points().get(3);
        CatalogueRow sunRow = rows.stream().filter(r -> r.modelId().equals(sun.modelId())).findFirst().orElseThrow();
        assertThat(sun.localDays()).isEqualTo(sunRow.turnoverTimeDays()).isEqualTo(20.0);
        assertThat(sun.globalDays()).isEqualTo(sunRow.turnoverTimeGlobalDays()).isEqualTo(60.0);
        assertThat(sun.hasGlobal()).isTrue();
        // fully convective below 0.35 Msun at this Z: drawn hollow
        assertThat(data.lines().get(0).points()).extracting(TurnoverPoint::fullyConvective)
                .containsExactly(true, true, false, false);
    }

    @Test
    void failedModelsAndModelsWithoutAGlobalTimeAreHandledApart() {
        List<CatalogueRow> rows = rows();
        TurnoverData poor = TurnoverAgainstMass.build(defaultPhysics(rows), 0.004, rows, List.of());
        // 0.3 Msun did not converge at 1 Gyr: that age's line skips it
        assertThat(poor.lines().get(1).points()).extracting(TurnoverPoint::massMsun).containsExactly(0.2, 0.5, 1.0);
        // the 4.57 Gyr row has a local time only: it is drawn, without a global point
        assertThat(poor.lines().get(2).points()).singleElement()
                .satisfies(p -> assertThat(p.hasGlobal()).isFalse());
        // another physics gets its own chart, of its own rows only
        PhysicsKey other = PhysicsKey.of(rows.get(rows.size() - 1));
        TurnoverData alpha2 = TurnoverAgainstMass.build(other, Z, rows, List.of());
        assertThat(alpha2.ages()).containsExactly(0.0);
        assertThat(alpha2.lines()).singleElement().satisfies(l -> assertThat(l.points())
                .allSatisfy(p -> assertThat(p.modelId()).startsWith("p1-")).hasSize(4));
        // a metallicity of the catalogue without envelopes (or absent) has nothing to draw
        assertThat(TurnoverAgainstMass.build(defaultPhysics(rows), 0.03, rows, List.of()).modelCount()).isZero();
    }

    @Test
    void theFullyConvectiveLimitsAreTheTransitionsOfTheSameSlices() {
        List<CatalogueRow> rows = rows();
        List<TransitionRow> transitions = TransitionFinder.withDefaults().find(rows);
        TurnoverData data = TurnoverAgainstMass.build(defaultPhysics(rows), Z, rows, transitions);
        List<TransitionRow> mine = transitions.stream().filter(t -> t.slice().zInit() == Z
                && PhysicsKey.of(t.slice()).equals(defaultPhysics(rows)) && t.fullyConvective().found()).toList();
        assertThat(mine).hasSize(2);
        assertThat(data.limits()).extracting(TurnoverData.FullyConvectiveLimit::ageGyr).containsExactly(0.0, 1.0);
        assertThat(data.limits()).extracting(TurnoverData.FullyConvectiveLimit::massMsun).containsExactlyElementsOf(
                mine.stream().map(t -> t.fullyConvective().massMsun()).toList());
        // the limit lies between the fully convective 0.3 Msun and the 0.5 Msun with a radiative core
        assertThat(data.limits()).allSatisfy(l -> assertThat(l.massMsun()).isBetween(0.3, 0.5));
    }

    @Test
    void rendersAPngWithOneLegendEntryPerAgeAndOneForEachLineKind(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = rows();
        TurnoverData data = TurnoverAgainstMass.build(defaultPhysics(rows), Z, rows,
                TransitionFinder.withDefaults().find(rows));
        StyledChart chart = TurnoverAgainstMassRenderer.render(data);
        assertThat(chart.getSeriesMap().values().stream().filter(s -> s.isShowInLegend()).map(s -> s.getName()))
                .containsExactly("ZAMS", "1 Gyr", TurnoverAgainstMassRenderer.LOCAL_LABEL,
                        TurnoverAgainstMassRenderer.GLOBAL_LABEL, org.convgrid.plotting.style.AgeLineWords.FULLY_CONVECTIVE_LABEL,
                        TurnoverAgainstMassRenderer.LIMIT_LABEL);
        assertThat(chart.getYAxisTitle()).contains("days");
        assertThat(chart.getStyler().isYAxisLogarithmic()).isTrue();
        // an age keeps its place in the palette on every Z's chart
        assertThat(TurnoverAgainstMassRenderer.colour(data, 1.0)).isEqualTo(ChartStyle.seriesColor(1));
        Path png = dir.resolve("turnover.png");
        ChartFiles.writePng(chart, png);
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(ChartStyle.WIDTH);
        assertThat(image.getHeight()).isEqualTo(ChartStyle.HEIGHT);
    }
}
