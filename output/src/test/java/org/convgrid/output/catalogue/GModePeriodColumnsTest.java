package org.convgrid.output.catalogue;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.profile.ProfileMeta;
import org.junit.jupiter.api.Test;

/**
 * The catalogue's {@code buoyancy_period_pi0_s} and {@code period_spacing_l1_s} are the very doubles the profile's meta
 * carries for the same model (and {@code star} prints: it reads the outcome's Pi_0, StarCommand), written in the
 * catalogue's seven significant digits; empty where there is no g-mode cavity or no model. Pi_0 = 2 pi^2 / (integral
 * of N dr / r), Delta Pi_1 = Pi_0 / sqrt(2) (Tassoul 1980, ApJS 43, 469; from memory).
 */
class GModePeriodColumnsTest {

    private static GridRequests.Answer solve(double massMsun, Age age) {
        ModelRequest request = new ModelRequest("pi0", massMsun * Constants.M_SUN, 0.02, 0.2771, age,
                PhysicsOptions.DEFAULT);
        return new GridRequests(StarTrackSink.NONE, MainSequenceEvolver.Settings.DEFAULT).answers(List.of(request))
                .get(0);
    }

    private static List<String> periodCells(CatalogueRow row) {
        int pi0 = CatalogueColumns.HEADER.indexOf(CatalogueColumns.BUOYANCY_PERIOD_PI0_S);
        return CatalogueWriter.cells(row).subList(pi0, pi0 + 2);
    }

    private static void assertSameAsTheProfileMeta(GridRequests.Answer answer) {
        CatalogueRow row = OutcomeRows.toRow(answer.outcome());
        Map<String, Object> meta = ProfileMeta.of(answer.outcome().request(), answer.model(), false, "t", "c")
                .entries();
        double pi0 = (Double) meta.get(ProfileMeta.BUOYANCY_PERIOD_PI0_S);
        double spacing = (Double) meta.get(ProfileMeta.PERIOD_SPACING_L1_S);
        assertThat(row.buoyancyPeriodPi0S()).isEqualTo(pi0);
        assertThat(row.periodSpacingL1S()).isEqualTo(spacing);
        assertThat(((ModelOutcome.Solved) answer.outcome()).seismic().buoyancyTravelTime()).isEqualTo(pi0);
        assertThat(periodCells(row)).containsExactly(CsvNumbers.format(pi0), CsvNumbers.format(spacing));
    }

    @Test
    void anEvolvedStarsCellsAreItsProfilesMetaValues() {
        // 1.5 Msun at 1 Gyr from birth: Pi_0 4195 s (README, measured with star --profile)
        assertSameAsTheProfileMeta(solve(1.5, new Age.SinceBirth(1.0 * Constants.GYR)));
    }

    @Test
    void aZeroAgeStarsCellsAreItsProfilesMetaValues() {
        // the zero-age path builds its outcome elsewhere (ZeroAgeRequests)
        assertSameAsTheProfileMeta(solve(1.5, new Age.SinceZeroAge(0.0)));
    }

    @Test
    void aFullyConvectiveStarHasEmptyCellsAndNoMetaKeys() {
        GridRequests.Answer answer = solve(0.2, new Age.SinceZeroAge(0.0));
        CatalogueRow row = OutcomeRows.toRow(answer.outcome());
        assertThat(row.structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        assertThat(periodCells(row)).containsExactly("", "");
        assertThat(ProfileMeta.of(answer.outcome().request(), answer.model(), false, "t", "c").entries())
                .doesNotContainKeys(ProfileMeta.BUOYANCY_PERIOD_PI0_S, ProfileMeta.PERIOD_SPACING_L1_S);
    }

    @Test
    void aModelThatIsNotOkHasEmptyCells() {
        ModelRequest request = new ModelRequest("failed", 1.5 * Constants.M_SUN, 0.02, 0.2771,
                new Age.SinceZeroAge(0.0), PhysicsOptions.DEFAULT);
        CatalogueRow row = OutcomeRows.toRow(new ModelOutcome.Failed(request, ModelStatus.NOT_CONVERGED, "no", 3));
        assertThat(periodCells(row)).containsExactly("", "");
    }

    @Test
    void theTwoColumnsFollowIronAndReadBackAsWritten() throws Exception {
        int iron = CatalogueColumns.HEADER.indexOf("fe_h_dex");
        assertThat(CatalogueColumns.HEADER.subList(iron, iron + 3))
                .containsExactly("fe_h_dex", "buoyancy_period_pi0_s", "period_spacing_l1_s");
        CatalogueRow row = OutcomeRows.toRow(solve(1.5, new Age.SinceZeroAge(0.0)).outcome());
        StringBuilder text = new StringBuilder();
        try (CatalogueWriter writer = CatalogueWriter.startingWithHeader(text)) {
            writer.write(row);
        }
        CatalogueRow back = CatalogueReader.read(new java.io.StringReader(text.toString())).get(0);
        assertThat(periodCells(back)).isEqualTo(periodCells(row));
        assertThat(text.toString()).contains("{name: buoyancy_period_pi0_s, unit: 's', datatype: float64, "
                + "description: 'buoyancy travel time Pi_0");
    }
}
