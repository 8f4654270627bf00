package org.convgrid.output.profile;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.request.SeismicScales;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;

class ProfileRoundTripTest {

    /** An illustrative star (a Sun-like model), not computed values. */
    private static final ProfileMeta ILLUSTRATIVE_META = new ProfileMeta("illustrative", Constants.M_SUN,
            Constants.R_SUN, Constants.L_SUN, 5772.0, 4.57, "birth", 0.02, 0.27, PhysicsOptions.DEFAULT, false,
            "1.2.3", "unknown", new SeismicScales(2216.9, 3529.3, 2086.3, 630.0));

    /** The ECSV header describes the columns the name row lists, in its order: two lists kept in step by hand. */
    @Test
    void theDescribedColumnsAreTheHeader() {
        assertThat(ProfileColumns.DESCRIBED).extracting(org.convgrid.output.EcsvColumn::name)
                .containsExactlyElementsOf(ProfileColumns.HEADER);
    }

    @Test
    void writesHeaderAndShellsAndReadsThemBack() throws IOException {
        // illustrative shells (centre and surface of a Sun-like model), not computed values
        List<ProfileRow> shells = List.of(
                new ProfileRow(0.0, 0.0, 2.34e17, 1.57e7, 150.0, 0.0, 1.2, 17.5, 0.39, 0.40, 0.38, false, 0.0, 0.0,
                        1.66, 5.1e7, 0.35, 0.86, 1.0e-6, 0.0, 1.0),
                new ProfileRow(1.0, 1.0, 1.1e5, 5772.0, 2.0e-7, Constants.L_SUN, 0.35, 0.0, 0.2, 0.18, 3.5, true,
                        1.5e5, 6.96e10, 1.6, 9.4e5, 0.74, 1.25, 2.9e-5, -3.2e-4, 3.25e-11));
        StringBuilder out = new StringBuilder();
        ProfileWriter.write(ILLUSTRATIVE_META, shells, out);
        String[] lines = out.toString().lines().filter(l -> !l.startsWith("#")).toArray(String[]::new);
        assertThat(lines[0]).isEqualTo(String.join(",", ProfileColumns.HEADER));
        assertThat(lines[1]).isEqualTo("0.0,0.0,2.34e+17,1.57e+07,150.0,0.0,1.2,17.5,0.39,0.4,0.38,0,0.0,0.0,1.66,5.1e+07,0.35,"
                + "0.86,1.0e-06,0.0,1.0");
        assertThat(lines[2]).isEqualTo("1.0,1.0,110000.0,5772.0,2.0e-07,1.0,0.35,0.0,0.2,0.18,3.5,1,150000.0,6.96e+10,1.6,940000.0,0.74,"
                + "1.25,2.9e-05,-0.00032,3.25e-11");
        List<ProfileRow> back = ProfileReader.read(new StringReader(out.toString()));
        assertThat(back.get(0)).isEqualTo(shells.get(0));
        assertThat(back.get(1).buoyancySquared()).isEqualTo(-3.2e-4);
        assertThat(back.get(1).helium3()).isEqualTo(2.9e-5);
        assertThat(back.get(1).mu()).isEqualTo(1.25);
        assertThat(back.get(1).luminosity()).isCloseTo(Constants.L_SUN, within(1e-12 * Constants.L_SUN));
        assertThat(back.get(1).convective()).isTrue();
        // the surface's mass coordinate keeps its digits in (M - m)/M, not in m/M
        assertThat(back.get(1).exteriorMassFrac()).isEqualTo(3.25e-11);
    }

    @Test
    void aProfileWrittenBeforeTheAcousticColumnsReadsWithThemNaN() throws IOException {
        String older = String.join(",", ProfileColumns.REQUIRED) + "\n"
                + "0.0,0.0,2.34e+17,1.57e+07,150.0,0.0,1.2,17.5,0.39,0.4,0.38,0,0.0\n";
        ProfileRow centre = ProfileReader.read(new StringReader(older)).get(0);
        assertThat(centre.temperature()).isEqualTo(1.57e7);
        assertThat(centre.gamma1()).isNaN();
        assertThat(centre.soundSpeed()).isNaN();
        assertThat(centre.buoyancySquared()).isNaN();
    }

    @Test
    void aProfileWrittenBeforeTheBuoyancyColumnsKeepsItsAcousticOnesAndReadsTheNewOnesNaN() throws IOException {
        // the header of the profiles written between radius_cm and buoyancy_n2_cgs
        List<String> header = ProfileColumns.HEADER.subList(0, ProfileColumns.HEADER.indexOf(ProfileColumns.MU));
        String older = String.join(",", header) + "\n"
                + "0.0,0.0,2.34e+17,1.57e+07,150.0,0.0,1.2,17.5,0.39,0.4,0.38,0,0.0,0.0,1.66,5.1e+07,0.35\n";
        ProfileRow centre = ProfileReader.read(new StringReader(older)).get(0);
        assertThat(centre.gamma1()).isEqualTo(1.66);
        assertThat(centre.soundSpeed()).isEqualTo(5.1e7);
        assertThat(centre.hydrogen()).isEqualTo(0.35);
        assertThat(centre.mu()).isNaN();
        assertThat(centre.helium3()).isNaN();
        assertThat(centre.buoyancySquared()).isNaN();
        assertThat(centre.exteriorMassFrac()).isNaN();
    }

    /** The header's meta mapping, as a YAML reader (astropy's) sees it. */
    @SuppressWarnings("unchecked")
    private static Map<String, Object> metaOf(String text) {
        String yaml = String.join("\n", text.lines().takeWhile(l -> l.startsWith("#")).skip(2)
                .map(l -> l.substring(2)).toList());
        return (Map<String, Object>) ((Map<String, Object>) new Load(LoadSettings.builder().build())
                .loadFromString(yaml)).get("meta");
    }

    @Test
    void theBuoyancyPeriodAndTheDipoleSpacingReadBackExactlyAfterTheKeysProfilesHadBefore() throws IOException {
        StringBuilder out = new StringBuilder();
        ProfileWriter.write(ILLUSTRATIVE_META, List.of(), out);
        Map<String, Object> meta = metaOf(out.toString());
        assertThat(meta.get(ProfileMeta.BUOYANCY_PERIOD_PI0_S)).isEqualTo(2216.9);
        // Delta Pi_1 = Pi_0 / sqrt(1 * 2) (Tassoul 1980; Aerts, Christensen-Dalsgaard & Kurtz 2010, ch. 3; from memory)
        assertThat(meta.get(ProfileMeta.PERIOD_SPACING_L1_S)).isEqualTo(2216.9 / Math.sqrt(2.0));
        // the earlier keys keep their order; the g-mode two follow them, then the p-mode two
        List<String> keys = new ArrayList<>(meta.keySet());
        assertThat(keys.subList(keys.size() - 6, keys.size())).containsExactly(ProfileMeta.TOOL_COMMIT,
                ProfileMeta.BUOYANCY_PERIOD_PI0_S, ProfileMeta.PERIOD_SPACING_L1_S, ProfileMeta.LARGE_SEPARATION_UHZ,
                ProfileMeta.SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S, ProfileMeta.HE_II_IONISATION_ACOUSTIC_DEPTH_S);
    }

    @Test
    void theLargeSeparationIsHalfTheInverseAcousticRadiusInMicrohertz() throws IOException {
        StringBuilder out = new StringBuilder();
        ProfileWriter.write(ILLUSTRATIVE_META, List.of(), out);
        Map<String, Object> meta = metaOf(out.toString());
        // Delta nu = 1 / (2 T) (Tassoul 1980, ApJS 43, 469; from memory): T = 3529.3 s gives 141.671 microHz
        assertThat((Double) meta.get(ProfileMeta.LARGE_SEPARATION_UHZ)).isCloseTo(141.67115, within(1e-4));
        assertThat(meta.get(ProfileMeta.SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S)).isEqualTo(2086.3);
        assertThat(meta.get(ProfileMeta.HE_II_IONISATION_ACOUSTIC_DEPTH_S)).isEqualTo(630.0);
    }

    @Test
    void aStarWithoutAGModeCavityLeavesBothKeysOut() throws IOException {
        ProfileMeta fullyConvective = new ProfileMeta("illustrative", 0.2 * Constants.M_SUN, 0.2 * Constants.R_SUN,
                0.005 * Constants.L_SUN, 3200.0, 1.0, "birth", 0.02, 0.27, PhysicsOptions.DEFAULT, false, "1.2.3",
                "unknown", new SeismicScales(Double.NaN, 1500.0, Double.NaN, Double.NaN));
        StringBuilder out = new StringBuilder();
        ProfileWriter.write(fullyConvective, List.of(), out);
        Map<String, Object> meta = metaOf(out.toString());
        assertThat(meta).doesNotContainKeys(ProfileMeta.BUOYANCY_PERIOD_PI0_S, ProfileMeta.PERIOD_SPACING_L1_S);
        assertThat(meta).containsKey(ProfileMeta.TOOL_COMMIT);
        // its p modes have a cavity, the whole star, but its one zone has no base to leave a glitch
        assertThat(meta).containsKey(ProfileMeta.LARGE_SEPARATION_UHZ)
                .doesNotContainKey(ProfileMeta.SURFACE_CZ_BASE_ACOUSTIC_DEPTH_S);
    }
}
