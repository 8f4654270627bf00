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
 * The catalogue's {@code large_separation_uhz} and {@code env_cz_base_acoustic_depth_s} come last, are the very doubles
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

    private static List<String> lastTwoCells(CatalogueRow row) {
        List<String> cells = CatalogueWriter.cells(row);
        return cells.subList(cells.size() - 2, cells.size());
    }

    private static Map<String, Object> meta(GridRequests.Answer answer) {
        return ProfileMeta.of(answer.outcome().request(), answer.model(), false, "t", "c").entries();
    }

    @Test
    void theTwoColumnsComeLast() {
        List<String> header = CatalogueColumns.HEADER;
        assertThat(header.subList(header.size() - 3, header.size())).containsExactly("period_spacing_l1_s",
                "large_separation_uhz", "env_cz_base_acoustic_depth_s");
    }

    @Test
    void anEvolvedSunLikeStarsCellsAreItsProfilesMetaValues() throws Exception {
        GridRequests.Answer answer = solve(1.0, new Age.SinceBirth(4.57 * Constants.GYR));
        CatalogueRow row = OutcomeRows.toRow(answer.outcome());
        Map<String, Object> meta = meta(answer);
        double largeSeparation = (Double) meta.get(ProfileMeta.LARGE_SEPARATION_UHZ);
        double depth = (Double) meta.get(ProfileMeta.ENV_CZ_BASE_ACOUSTIC_DEPTH_S);
        assertThat(row.largeSeparationUhz()).isEqualTo(largeSeparation);
        assertThat(row.envCzBaseAcousticDepthS()).isEqualTo(depth);
        assertThat(lastTwoCells(row)).containsExactly(CsvNumbers.format(largeSeparation), CsvNumbers.format(depth));
        // a Sun-like star at the Sun's age (mixing length 1.8, R = 1.014 Rsun): 138.7 microHz and 2095 s (measured
        // 2026-12-05), against the Sun's observed ~135 microHz (Kjeldsen & Bedding 1995, A&A 293, 87; from memory)
        assertThat(largeSeparation).isBetween(133.0, 145.0);
        assertThat(depth).isBetween(1900.0, 2300.0);
        StringBuilder text = new StringBuilder();
        try (CatalogueWriter writer = CatalogueWriter.startingWithHeader(text)) {
            writer.write(row);
        }
        CatalogueRow back = CatalogueReader.read(new java.io.StringReader(text.toString())).get(0);
        assertThat(lastTwoCells(back)).isEqualTo(lastTwoCells(row));
        assertThat(text.toString()).contains("{name: large_separation_uhz, unit: 'uHz', datatype: float64, "
                + "description: 'asymptotic large frequency separation");
    }

    @Test
    void aStarWithoutAnEnvelopeHasASeparationButNoDepth() {
        GridRequests.Answer answer = solve(2.0, new Age.SinceZeroAge(0.0));
        CatalogueRow row = OutcomeRows.toRow(answer.outcome());
        assertThat(lastTwoCells(row).get(0)).isNotEmpty();
        assertThat(lastTwoCells(row).get(1)).isEmpty();
        assertThat(meta(answer)).containsKey(ProfileMeta.LARGE_SEPARATION_UHZ)
                .doesNotContainKey(ProfileMeta.ENV_CZ_BASE_ACOUSTIC_DEPTH_S);
    }

    @Test
    void aModelThatIsNotOkHasEmptyCells() {
        ModelRequest request = new ModelRequest("failed", 1.0 * Constants.M_SUN, 0.02, 0.2771,
                new Age.SinceZeroAge(0.0), PhysicsOptions.DEFAULT);
        CatalogueRow row = OutcomeRows.toRow(new ModelOutcome.Failed(request, ModelStatus.NOT_CONVERGED, "no", 3));
        assertThat(lastTwoCells(row)).containsExactly("", "");
    }
}
