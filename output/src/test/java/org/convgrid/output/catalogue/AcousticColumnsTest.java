package org.convgrid.output.catalogue;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.batch.StarTrackSink;
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
 * The catalogue's {@code large_separation_uhz}, {@code surface_cz_base_acoustic_depth_s} and
 * {@code he_ii_ionisation_acoustic_depth_s} follow the g-mode scales, are the very doubles
 * the profile's meta carries for the same model, and are empty where they have no meaning. Delta nu = 1 / (2 T), T the
 * acoustic radius (Tassoul 1980, ApJS 43, 469; from memory).
 */
class AcousticColumnsTest {

    private static GridRequests.Answer solve(double massMsun, Age age) {
        ModelRequest request = new ModelRequest("dnu", massMsun * Constants.M_SUN, 0.02, 0.2771, age,
                PhysicsOptions.DEFAULT);
        return new GridRequests(StarTrackSink.NONE, MainSequenceEvolver.Settings.DEFAULT).answers(List.of(request))
                .get(0);
    }

    /** The row's cells of the p-mode scales: Delta nu, the surface zone's depth, the helium dip's depth. */
    private static List<String> acousticCells(CatalogueRow row) {
        int first = CatalogueColumns.HEADER.indexOf(CatalogueColumns.LARGE_SEPARATION_UHZ);
        return CatalogueWriter.cells(row).subList(first, first + 3);
    }

    private static Map<String, Object> meta(GridRequests.Answer answer) {
        return ProfileMeta.of(answer.outcome().request(), answer.model(), false, "t", "c").entries();
    }

    @Test
    void theThreeColumnsFollowTheGModeScales() {
        List<String> header = CatalogueColumns.HEADER;
        int spacing = header.indexOf("period_spacing_l1_s");
        assertThat(header.subList(spacing, spacing + 4)).containsExactly("period_spacing_l1_s",
                "large_separation_uhz", "surface_cz_base_acoustic_depth_s", "he_ii_ionisation_acoustic_depth_s");
    }

    @Test
    void anEvolvedSunLikeStarsCellsAreItsProfilesMetaValues() throws Exception {
        GridRequests.Answer answer = solve(1.0, new Age.SinceBirth(4.57 * Constants.GYR));
        CatalogueRow row = OutcomeRows.toRow(answer.outcome());
        Map<String, Object> meta = meta(answer);
        double largeSeparation = (Double) meta.get(ProfileMeta.LARGE_SEPARATION_UHZ);
        double depth = (Double) meta.get(ProfileMeta.SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S);
        double helium = (Double) meta.get(ProfileMeta.HE_II_IONISATION_ACOUSTIC_DEPTH_S);
        assertThat(row.largeSeparationUhz()).isEqualTo(largeSeparation);
        assertThat(row.surfaceCzBaseAcousticDepthS()).isEqualTo(depth);
        assertThat(row.heIiIonisationAcousticDepthS()).isEqualTo(helium);
        assertThat(acousticCells(row)).containsExactly(CsvNumbers.format(largeSeparation), CsvNumbers.format(depth),
                CsvNumbers.format(helium));
        // a Sun-like star at the Sun's age (mixing length 1.8, R = 1.014 Rsun): 138.7 microHz, near the Sun's observed
        // ~135 microHz (Kjeldsen & Bedding 1995, A&A 293, 87; from memory); its envelope base at 2095 s is a
        // non-regression value (measured 2026-12-05), for no published depth is measured from the photosphere
        assertThat(largeSeparation).isBetween(133.0, 145.0);
        assertThat(depth).isCloseTo(2095.3, org.assertj.core.api.Assertions.within(5.0));
        StringBuilder text = new StringBuilder();
        try (CatalogueWriter writer = CatalogueWriter.startingWithHeader(text)) {
            writer.write(row);
        }
        CatalogueRow back = CatalogueReader.read(new java.io.StringReader(text.toString())).get(0);
        assertThat(acousticCells(back)).isEqualTo(acousticCells(row));
        assertThat(text.toString()).contains("{name: large_separation_uhz, unit: 'uHz', datatype: float64, "
                + "description: 'asymptotic large frequency separation");
    }

    @Test
    void aThinSurfaceZoneHasItsDepthWhereTheEnvelopeColumnsAreEmpty() {
        // 2 Msun at zero age: its hydrogen-ionisation zone holds far below the 1e-6 of the mass an envelope needs
        GridRequests.Answer answer = solve(2.0, new Age.SinceZeroAge(0.0));
        CatalogueRow row = OutcomeRows.toRow(answer.outcome());
        assertThat(row.envCzBaseRadiusFrac()).isNaN();
        assertThat(acousticCells(row)).allSatisfy(cell -> assertThat(cell).isNotEmpty());
        assertThat(meta(answer)).containsKeys(ProfileMeta.LARGE_SEPARATION_UHZ,
                ProfileMeta.SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S, ProfileMeta.HE_II_IONISATION_ACOUSTIC_DEPTH_S);
    }

    @Test
    void aFullyConvectiveStarHasNeitherGlitchDepth() {
        GridRequests.Answer answer = solve(0.3, new Age.SinceZeroAge(0.0));
        CatalogueRow row = OutcomeRows.toRow(answer.outcome());
        // no base to its one zone, so no depth; and no helium dip where our equation of state leaves its regime
        assertThat(acousticCells(row).get(0)).isNotEmpty();
        assertThat(acousticCells(row).subList(1, 3)).containsExactly("", "");
        assertThat(meta(answer)).containsKey(ProfileMeta.LARGE_SEPARATION_UHZ).doesNotContainKeys(
                ProfileMeta.SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S, ProfileMeta.HE_II_IONISATION_ACOUSTIC_DEPTH_S);
    }

    @Test
    void aModelThatIsNotOkHasEmptyCells() {
        ModelRequest request = new ModelRequest("failed", 1.0 * Constants.M_SUN, 0.02, 0.2771,
                new Age.SinceZeroAge(0.0), PhysicsOptions.DEFAULT);
        CatalogueRow row = OutcomeRows.toRow(new ModelOutcome.Failed(request, ModelStatus.NOT_CONVERGED, "no", 3));
        assertThat(acousticCells(row)).containsExactly("", "", "");
    }
}
