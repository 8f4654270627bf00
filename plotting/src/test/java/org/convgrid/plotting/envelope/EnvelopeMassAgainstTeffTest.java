package org.convgrid.plotting.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.StyledChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Which models the envelope-mass chart draws and which it leaves out. The rows are TestRuns' synthetic ones (fully
 * convective below 0.35 Msun at Z = 0.014, no envelope from 1.5 Msun, the 0.3 Msun model of Z = 0.004 at 1 Gyr not
 * converged). Nothing here is physics under test: the chart only carries the catalogue's values.
 */
class EnvelopeMassAgainstTeffTest {

    private static final double[] MASSES = {0.2, 0.3, 0.5, 1.0, 1.8};

    private static List<CatalogueRow> rows() {
        List<CatalogueRow> rows = new ArrayList<>(TestRuns.rows(MASSES, new double[] {0.004, 0.014},
                new double[] {0, 1}));
        // a refinement model near a transition: left out, as on the turnover charts
        rows.add(rows.get(7).toBuilder().modelId("p0-z01-r000-a00").massMsun(0.36).build());
        return rows;
    }

    @Test
    void eachAgeIsALineOfTheGridModelsWithAnEnvelopeByMass() {
        List<CatalogueRow> rows = rows();
        EnvelopeMassData data = EnvelopeMassAgainstTeff.build(PhysicsKey.of(rows.get(0)), 0.014, rows);
        assertThat(data.ages()).containsExactly(0.0, 1.0);
        assertThat(data.lines()).hasSize(2);
        for (EnvelopeMassData.AgeLine line : data.lines()) {
            // 1.8 Msun has no envelope; the refinement model is left out
            assertThat(line.points()).extracting(EnvelopePoint::massMsun).containsExactly(0.2, 0.3, 0.5, 1.0);
            assertThat(line.points()).allSatisfy(p -> assertThat(p.envelopeMassMsun()).isPositive());
            // the whole star is the envelope of a fully convective one
            assertThat(line.points().get(0).fullyConvective()).isTrue();
            assertThat(line.points().get(0).envelopeMassMsun()).isEqualTo(0.2);
            assertThat(line.points().get(3).fullyConvective()).isFalse();
        }
        assertThat(data.withoutEnvelope()).isEqualTo(2);
        assertThat(data.pastMainSequence()).isZero();
        // the model of Z = 0.004 that did not converge is not drawn
        EnvelopeMassData poor = EnvelopeMassAgainstTeff.build(PhysicsKey.of(rows.get(0)), 0.004, rows);
        assertThat(poor.lines().get(1).points()).extracting(EnvelopePoint::massMsun).doesNotContain(0.3);
    }

    @Test
    void modelsPastTheMainSequenceOrWithoutATemperatureAreCountedApart() {
        List<CatalogueRow> rows = new ArrayList<>(rows());
        // at 4.57 Gyr TestRuns puts 1.8 Msun past the main sequence (its lifetime 2.3 Gyr); a row without a Teff is
        // neither drawn nor counted as a hot star without an envelope
        rows.addAll(TestRuns.rows(MASSES, new double[] {0.014}, new double[] {4.57}));
        rows.add(rows.get(8).toBuilder().modelId("p0-z01-m009-a00").massMsun(0.9).teffK(Double.NaN).build());
        EnvelopeMassData data = EnvelopeMassAgainstTeff.build(PhysicsKey.of(rows.get(0)), 0.014, rows);
        assertThat(data.pastMainSequence()).isEqualTo(1);
        assertThat(data.withoutEnvelope()).isEqualTo(2);
        assertThat(data.lines().get(0).points()).extracting(EnvelopePoint::massMsun).doesNotContain(0.9);
    }

    @Test
    void drawsAPngWithTheHotterStarsLeft(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = rows();
        EnvelopeMassData data = EnvelopeMassAgainstTeff.build(PhysicsKey.of(rows.get(0)), 0.014, rows);
        StyledChart chart = EnvelopeMassRenderer.render(data);
        // XChart cannot reverse an axis: x is -Teff, so the hottest star (1 Msun) lies left of the coolest (0.2)
        double[] x = chart.getSeriesMap().get(org.convgrid.plotting.label.SliceLabels.age(0.0)).getXData();
        EnvelopeMassData.AgeLine zeroAge = data.lines().get(0);
        assertThat(x[3]).isLessThan(x[0]);
        assertThat(-x[3]).isEqualTo(zeroAge.points().get(3).teffK());
        // and its labels are written without the sign
        assertThat(chart.getStyler().getxAxisTickLabelsFormattingFunction().apply(-6000.0)).isEqualTo("6000");
        Path png = dir.resolve("envelope.png");
        ChartFiles.writePng(chart, png);
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(ChartStyle.WIDTH);
    }
}
