package org.convgrid.output.profile;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.batch.StarTrackSink;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.structure.BuoyancyTravelTime;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;

/**
 * The profile file of a real model (the zero-age 1 Msun, Z = 0.02, from the production solver): every cell reads
 * back the double it was written from, and the ECSV header describes the columns and the star. For
 * asteroseismology seven digits were too few for differencing the columns (outer radii, mass continuity, dL/dm),
 * and nothing recorded which star a profile holds (oscillation codes need M and G to make frequencies dimensionless).
 */
class RealProfileFileTest {

    private static ModelRequest request;
    private static StellarModel model;
    private static List<ProfileRow> rows;
    private static String text;

    @BeforeAll
    static void solve() throws IOException {
        request = new ModelRequest("sun-zams", Constants.M_SUN, 0.02, 0.28, Age.ZERO_AGE, PhysicsOptions.DEFAULT);
        model = new GridRequests(StarTrackSink.NONE, MainSequenceEvolver.Settings.DEFAULT).answers(List.of(request))
                .get(0).model();
        rows = ProfileRows.of(model);
        StringBuilder out = new StringBuilder();
        ProfileWriter.write(ProfileMeta.of(request, model, false, "9.9.9", "abc123"), rows, out);
        text = out.toString();
    }

    @Test
    void everyCellReadsBackTheDoubleItWasWrittenFrom() {
        List<String> lines = text.lines().filter(l -> !l.startsWith("#")).toList();
        assertThat(lines.get(0)).isEqualTo(String.join(",", ProfileColumns.HEADER));
        assertThat(lines).hasSize(rows.size() + 1);
        int cells = 0;
        for (int k = 0; k < rows.size(); k++) {
            ProfileRow r = rows.get(k);
            double[] expected = {r.massFrac(), r.radiusFrac(), r.pressure(), r.temperature(), r.density(),
                r.luminosity() / Constants.L_SUN, r.opacity(), r.nuclearEnergy(), r.nabla(), r.nablaAd(), r.nablaRad(),
                r.convective() ? 1 : 0, r.convectiveVelocity(), r.radius(), r.gamma1(), r.soundSpeed(), r.hydrogen(),
                r.mu(), r.helium3(), r.buoyancySquared(), r.exteriorMassFrac()};
            String[] written = lines.get(k + 1).split(",", -1);
            assertThat(written).hasSameSizeAs(expected);
            for (int c = 0; c < expected.length; c++) {
                String column = ProfileColumns.HEADER.get(c);
                if (column.equals(ProfileColumns.CONVECTIVE)) {
                    // the one integer column stays as it was: 0 or 1
                    assertThat(written[c]).isEqualTo(r.convective() ? "1" : "0");
                } else {
                    assertThat(CsvNumbers.parse(written[c])).as("row %d, %s = %s", k, column, written[c])
                            .isEqualTo(expected[c]);
                }
                cells++;
            }
        }
        assertThat(cells).isEqualTo(rows.size() * ProfileColumns.HEADER.size());
        // the outer shells keep distinct radii and masses (seven digits gave radius steps of ~70 last-digit units)
        ProfileRow last = rows.get(rows.size() - 1);
        ProfileRow belowLast = rows.get(rows.size() - 2);
        assertThat(belowLast.massFrac()).isLessThan(1.0);
        assertThat(CsvNumbers.parse(CsvNumbers.formatRoundTrip(belowLast.massFrac()))).isLessThan(last.massFrac());
    }

    @Test
    void theHeaderIsEcsvDescribingEveryColumnAndTheStar() {
        List<String> header = text.lines().takeWhile(l -> l.startsWith("#")).toList();
        assertThat(header.get(0)).isEqualTo("# %ECSV 1.0");
        assertThat(header.get(1)).isEqualTo("# ---");
        String yaml = String.join("\n", header.subList(2, header.size()).stream().map(l -> l.substring(2)).toList());
        @SuppressWarnings("unchecked")
        Map<String, Object> parsed = (Map<String, Object>) new Load(LoadSettings.builder().build())
                .loadFromString(yaml);
        @SuppressWarnings("unchecked")
        List<Map<String, Object>> datatype = (List<Map<String, Object>>) parsed.get("datatype");
        assertThat(datatype.stream().map(c -> c.get("name")).toList()).isEqualTo(ProfileColumns.HEADER);
        assertThat(datatype).allSatisfy(c -> assertThat(c.get("description")).asString().isNotBlank());
        assertThat(datatype.get(ProfileColumns.HEADER.indexOf(ProfileColumns.CONVECTIVE)).get("datatype"))
                .isEqualTo("int64");
        assertThat(datatype.get(ProfileColumns.HEADER.indexOf(ProfileColumns.PRESSURE_CGS)).get("unit"))
                .isEqualTo("dyn / cm2");
        assertThat(parsed.get("delimiter")).isEqualTo(",");

        @SuppressWarnings("unchecked")
        Map<String, Object> meta = (Map<String, Object>) parsed.get("meta");
        int surface = model.profile().size() - 1;
        double mass = model.profile().mass(surface);
        double radius = model.profile().radius(surface);
        assertThat(meta.get(ProfileMeta.MODEL_ID)).isEqualTo("sun-zams");
        // M and R exactly as mass_frac and radius_frac were divided by, so m and r can be rebuilt to the last bit
        assertThat(meta.get(ProfileMeta.MASS_G)).isEqualTo(mass);
        assertThat(meta.get(ProfileMeta.RADIUS_CM)).isEqualTo(radius);
        assertThat(meta.get(ProfileMeta.LUMINOSITY_CGS)).isEqualTo(model.global().luminosity());
        assertThat(meta.get(ProfileMeta.MASS_MSUN)).isEqualTo(mass / Constants.M_SUN);
        assertThat(meta.get(ProfileMeta.TEFF_K)).isEqualTo(model.global().effectiveTemperature());
        assertThat(meta.get(ProfileMeta.AGE_GYR)).isEqualTo(0.0);
        assertThat(meta.get(ProfileMeta.AGE_ORIGIN)).isEqualTo("zams");
        assertThat(meta.get(ProfileMeta.X_INIT)).isEqualTo(1.0 - 0.28 - 0.02);
        assertThat(meta.get(ProfileMeta.Y_INIT)).isEqualTo(0.28);
        assertThat(meta.get(ProfileMeta.Z_INIT)).isEqualTo(0.02);
        assertThat(meta.get(ProfileMeta.MIXING_LENGTH)).isEqualTo(1.8);
        assertThat(meta.get(ProfileMeta.OVERSHOOT_HP)).isEqualTo(0.0);
        assertThat(meta.get(ProfileMeta.OVERSHOOT_PROFILE)).isEqualTo("uniform");
        assertThat(meta.get(ProfileMeta.OVERSHOOT_APPLIED)).isEqualTo(0.0);
        assertThat(meta.get(ProfileMeta.CRITERION)).isEqualTo("schwarzschild");
        assertThat(meta.get(ProfileMeta.ATMOSPHERE)).isEqualTo("krishna_swamy");
        assertThat(meta).doesNotContainKey(ProfileMeta.OPACITY_TABLE);
        assertThat(meta.get(ProfileMeta.SETTLING)).isEqualTo(false);
        // the constants the columns were made with (CODATA 2018 G; IAU 2015 nominal solar values, Prsa et al. 2016)
        assertThat(meta.get(ProfileMeta.GRAVITATIONAL_CONSTANT_CGS)).isEqualTo(6.6743e-8);
        assertThat(meta.get(ProfileMeta.SOLAR_MASS_G)).isEqualTo(Constants.M_SUN);
        assertThat(meta.get(ProfileMeta.SOLAR_RADIUS_CM)).isEqualTo(6.957e10);
        assertThat(meta.get(ProfileMeta.SOLAR_LUMINOSITY_CGS)).isEqualTo(3.828e33);
        assertThat(meta.get(ProfileMeta.TOOL_VERSION)).isEqualTo("9.9.9");
        assertThat(meta.get(ProfileMeta.TOOL_COMMIT)).isEqualTo("abc123");
        // the engine's Pi_0 of this very model, to the last bit, and its dipole spacing (definitions: Tassoul 1980;
        // Aerts, Christensen-Dalsgaard & Kurtz 2010, ch. 3; from memory)
        double pi0 = BuoyancyTravelTime.of(model);
        assertThat(meta.get(ProfileMeta.BUOYANCY_PERIOD_PI0_S)).isEqualTo(pi0);
        assertThat(meta.get(ProfileMeta.PERIOD_SPACING_L1_S)).isEqualTo(BuoyancyTravelTime.periodSpacing(pi0, 1));
    }

    @Test
    void theReaderSkipsTheHeaderAndReadsTheShellsBack() throws IOException {
        List<ProfileRow> back = ProfileReader.read(new StringReader(text));
        assertThat(back).hasSameSizeAs(rows);
        for (int k = 0; k < rows.size(); k++) {
            ProfileRow r = rows.get(k);
            ProfileRow b = back.get(k);
            // luminosity comes back through L/Lsun times Lsun; every other field is the written double itself
            assertThat(b).usingRecursiveComparison().ignoringFields("luminosity").isEqualTo(r);
            assertThat(b.luminosity()).isCloseTo(r.luminosity(), within(1e-15 * Math.abs(r.luminosity())));
        }
    }
}
