package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Grids that leave a chart without data (every model past the main sequence, one model, a slice with no usable
 * model, one mass) get every chart that has something to show and, for the others, a plain-English line, never a
 * message from the chart library. The synthetic rows (TestRuns) end the main sequence at 10 Gyr M^-2.5.
 */
class NothingToDrawTest {

    private static DrawnMaps draw(Path dir, double[] masses, double[] zs, double[] ages) throws Exception {
        TestRuns.write(dir, TestRuns.rows(masses, zs, ages));
        return RunMaps.drawAll(dir);
    }

    private static List<String> names(DrawnMaps drawn) {
        return drawn.written().stream().map(p -> p.getFileName().toString()).toList();
    }

    @Test
    void everyModelPastTheMainSequenceSkipsTheHrDiagramAndTheTrendsInPlainWords(@TempDir Path dir) throws Exception {
        DrawnMaps drawn = draw(dir, new double[] {1.0, 1.5, 2.0}, new double[] {0.01, 0.02}, new double[] {30, 40});
        assertThat(drawn.failures()).extracting(DrawnMaps.ChartFailure::describe).containsExactly(
                "chart hr_a1.8_ov0_schwarzschild.png not drawn: nothing to draw: no model of \u03b1 = 1.8, "
                        + "Schwarzschild, no overshoot is usable (status ok with L and Teff); the catalogue has "
                        + "1 not_converged, 11 past_main_sequence",
                "chart transitions-vs-z_a1.8_ov0_schwarzschild.png not drawn: nothing to draw: the models bracket "
                        + "no transition mass in any slice (transitions.csv has none found; one written before the "
                        + "main-sequence turn-off was added lacks it: convgrid transitions RUN_DIR adds it)",
                "chart transitions-vs-age_a1.8_ov0_schwarzschild.png not drawn: nothing to draw: the models bracket "
                        + "no transition mass in any slice (transitions.csv has none found; one written before the "
                        + "main-sequence turn-off was added lacks it: convgrid transitions RUN_DIR adds it)");
        // the zone maps still say, in grey, that these models are past the main sequence
        assertThat(names(drawn)).contains("zones-mass_z0.02_age30gyr_a1.8_ov0_schwarzschild.png");
    }

    @Test
    void theReviewersGridOfOneModelPastTheMainSequenceNamesNoJavaInternals(@TempDir Path dir) throws Exception {
        DrawnMaps drawn = draw(dir, new double[] {1.0}, new double[] {0.02}, new double[] {20});
        assertThat(drawn.failures()).isNotEmpty().allSatisfy(f -> assertThat(f.reason())
                .startsWith("nothing to draw: ").doesNotContain("java", "null", "Exception", "XYStyler"));
    }

    @Test
    void oneUsableModelIsDrawnOnEveryChart(@TempDir Path dir) throws Exception {
        DrawnMaps drawn = draw(dir, new double[] {1.0}, new double[] {0.02}, new double[] {1});
        assertThat(names(drawn)).contains("hr_a1.8_ov0_schwarzschild.png",
                "zones-mass_z0.02_age1gyr_a1.8_ov0_schwarzschild.png");
        assertThat(drawn.failures()).extracting(DrawnMaps.ChartFailure::fileName)
                .containsExactly("transitions-vs-z_a1.8_ov0_schwarzschild.png");
    }

    @Test
    void aSliceWithoutUsableModelsLeavesTheOtherSlicesCharts(@TempDir Path dir) throws Exception {
        DrawnMaps drawn = draw(dir, new double[] {0.2, 0.5, 1.2}, new double[] {0.01, 0.02}, new double[] {0, 20});
        assertThat(drawn.failures()).isEmpty();
        assertThat(names(drawn)).contains("hr_a1.8_ov0_schwarzschild.png", "transitions-vs-z_a1.8_ov0_schwarzschild.png",
                "transitions-vs-age_a1.8_ov0_schwarzschild.png", "zones-mass_z0.02_age20gyr_a1.8_ov0_schwarzschild.png");
    }

    @Test
    void oneMassAtSeveralAgesAndMetallicitiesDrawsItsModels(@TempDir Path dir) throws Exception {
        DrawnMaps drawn = draw(dir, new double[] {0.5}, new double[] {0.01, 0.02}, new double[] {0, 1, 2});
        assertThat(names(drawn)).contains("hr_a1.8_ov0_schwarzschild.png",
                "zones-radius_z0.01_age2gyr_a1.8_ov0_schwarzschild.png");
        assertThat(drawn.failures()).allSatisfy(f -> assertThat(f.reason()).startsWith("nothing to draw: "));
    }
}
