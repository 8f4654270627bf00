package org.convgrid.engine.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The calibrated Sun of the standard physics (GN93 Z/X = 0.0245 in the present envelope, the mixture of the OPAL
 * tables; 4.57 Gyr; helium and metals settling with thermal diffusion), computed once (19 evolutions; 50 s
 * measured on 2 cores under a load average of ~10) and shared by every check. Each check names its literature
 * source beside it.
 */
class SolarCalibrationTest {

    private static CalibratedSun sun;

    @BeforeAll
    static void calibrateOnce() {
        sun = new SolarCalibration(CalibrationSettings.DEFAULT).calibrate();
    }

    @Test
    void matchesTheNominalRadiusAndLuminosity() {
        // IAU 2015 Resolution B3 nominal R_sun and L_sun (Prša et al. 2016, AJ 152, 41), to 1e-4 relative
        assertThat(Math.abs(sun.radiusResidual())).isLessThanOrEqualTo(1e-4);
        assertThat(Math.abs(sun.luminosityResidual())).isLessThanOrEqualTo(1e-4);
        var g = sun.sun().solved().global();
        assertThat(g.radius() / Constants.R_SUN).isCloseTo(1.0, within(1e-4));
        assertThat(g.luminosity() / Constants.L_SUN).isCloseTo(1.0, within(1e-4));
        assertThat(sun.sun().status()).isEqualTo(ModelStatus.OK);
        assertThat(sun.sun().request().age()).isEqualTo(new Age.SinceZeroAge(4.57 * Constants.GYR));
    }

    @Test
    void endsWithTheStatedMetalsToHydrogenRatioInTheEnvelope() {
        // Grevesse & Noels 1993 Z/X = 0.0245 (as listed in Asplund, Amarsi & Grevesse 2021, A&A 653, A141, Table 4)
        // is the present surface value; with settling the initial
        // ratio is higher, by ~10-15 % in standard solar models with diffusion (0.0266 against 0.0231 for GS98,
        // Asplund, Amarsi & Grevesse 2021, Table 4). Measured: 0.0275, +12 %
        assertThat(sun.envelopeMetalsToHydrogen()).isCloseTo(0.0245,
                within(SolarCalibration.RATIO_TOLERANCE * 0.0245 * 1.0001));
        double x = 1.0 - sun.helium() - sun.metals();
        assertThat(sun.metals() / x).isCloseTo(sun.initialMetalsToHydrogen(), within(1e-12));
        assertThat(sun.initialMetalsToHydrogen()).isBetween(0.0245 * 1.05, 0.0245 * 1.2);
        assertThat(sun.sun().request().initialMetals()).isEqualTo(sun.metals());
    }

    @Test
    void theEnvelopeHeliumIsTheHelioseismicOne() {
        // Basu & Antia 2004 (ApJ 606, L85): present surface Y = 0.2485 +- 0.0034 from helioseismology; the issue's
        // range 0.2485 +- 0.01 allows for the model's physics. The envelope lost helium to settling (Bahcall &
        // Pinsonneault 1995: ~0.03 in Y, from memory; BS05(OP), Bahcall, Serenelli & Basu 2005, envelope Y 0.2425 in
        // their model table; ours 0.022)
        assertThat(sun.envelopeHelium()).isBetween(0.2485 - 0.01, 0.2485 + 0.01);
        assertThat(sun.helium() - sun.envelopeHelium()).isBetween(0.01, 0.04);
    }

    @Test
    void mixingLengthLiesInThePublishedRange() {
        // Trampedach et al. 2014 (1.76), Magic, Weiss & Asplund 2015, A&A 573, A89 (1.98), Joyce &
        // Tayar 2023 review (1.6-2.2); range widened to 1.5-2.3 for our mixing-length variant. Measured 2.092 with
        // settling, the default Krishna Swamy atmosphere and the low-temperature tables of Ferguson et al. 2005 (1.782
        // with the analytic cool opacity, 0.3-0.5 dex lower in the outer layers)
        assertThat(sun.mixingLength()).isBetween(1.5, 2.3);
    }

    @Test
    void envelopeBaseLiesNearWhereHelioseismologyPutsIt() {
        // Basu & Antia 1997, MNRAS 287, 189: r_cz/R = 0.713 +- 0.001; the range 0.708-0.718 allows for the model's
        // physics. Measured 0.7174 (calibrated each time; 0.7175 before the low-temperature tables became the
        // default): 0.7205 before the Planck-Larkin weight of hydrogen's bound
        // state in the equation of state (-0.0016: the deep envelope fully ionised, its pressure within 0.1 % of the
        // standard solar model's there) and the screened potential's Coulomb logarithm in the settling (-0.0014:
        // helium settles ~16 % faster); without settling the base lies at 0.730 (before both)
        assertThat(sun.envelopeBaseRadiusFraction()).isBetween(0.708, 0.718);
    }

    @Test
    void centreMatchesTheStandardSolarModel() {
        // Bahcall, Serenelli & Basu 2005, ApJ 621, L85, BS05(OP): T_c = 1.567e7 K, rho_c = 152.9 g cm^-3; the
        // issue's ranges 1.5 % and 5 %. Measured: T_c 1.5568e7 K (-0.6 %), rho_c 148.78 (-2.7 %)
        assertThat(sun.centralTemperature()).isCloseTo(1.567e7, withinPercentage(1.5));
        assertThat(sun.centralDensity()).isCloseTo(152.9, withinPercentage(5));
    }

    @Test
    void zeroAgeSunWasAboutSeventyPercentAsBright() {
        // Sackmann, Boothroyd & Kraemer 1993, ApJ 418, 457: zero-age L ~ 0.70 L_now (0.68-0.72 among models);
        // Gough 1981, Sol. Phys. 74, 21: 0.714
        assertThat(sun.zeroAgeLuminosity() / sun.sun().solved().global().luminosity()).isBetween(0.66, 0.74);
    }

    @Test
    void exhaustsItsCoreHydrogenAtNineToTwelveGyr() {
        // Sackmann, Boothroyd & Kraemer 1993, ApJ 418, 457: core-hydrogen exhaustion at ~10-11 Gyr
        assertThat(sun.exhaustionAge() / Constants.GYR).isBetween(9.0, 12.0);
    }

    @Test
    void initialHeliumIsThatOfCalibratedSolarModels() {
        // Serenelli & Basu 2010, ApJ 719, 865: Y_ini = 0.278 +- 0.006; Sackmann et al. 1993: 0.274; loose (our
        // settling is slower than theirs, which lowers Y_ini)
        assertThat(sun.helium()).isBetween(0.26, 0.30);
    }

    @Test
    void freezesTheCalibratedValues() {
        // non-regression (this code, standard physics with settling and thermal diffusion, GN93 Z/X, default
        // steps): alpha 2.0919, Y 0.2751, Z 0.01944 (initial Z/X 0.02756), r_cz 0.7172, T_c 1.5568e7 K, rho_c
        // 148.66, L0/L 0.723, lifetime 9.477 Gyr, envelope Y 0.2530. Re-frozen when the radiative atmosphere points
        // above the envelope were mixed with it (AtmosphereMixing): with settling they had kept the unsettled birth
        // gas (Z/X 0.0276 against the envelope's 0.0245) in the photosphere; alpha 2.0972 -> 2.0919, r_cz 0.7173 ->
        // 0.7172, the rest unchanged to the digits above (the values before that change, from the same code a day
        // earlier: alpha 2.0972, r_cz 0.7173, rho_c 148.66, lifetime 9.477). Frozen before when the low-temperature tables of
        // Ferguson et al. 2005 became the default opacity: alpha 1.7822 -> 2.0958 (the higher opacity of the outer
        // layers swells the envelope; a longer mixing length shrinks it back), the rest moved by at most 1e-4 in Y,
        // r_cz and Z/X and 0.002 Gyr in the lifetime. Before: alpha 1.7822, Y 0.2749, Z 0.01943 (initial Z/X
        // 0.02754), r_cz 0.7175, T_c 1.5569e7 K, rho_c 148.86, L0/L 0.724, lifetime 9.483 Gyr, envelope Y 0.2529.
        // Re-frozen after the Planck-Larkin hydrogen
        // weight in the equation of state (alone: alpha 1.7622, Y 0.2735, initial Z/X 0.02697, r_cz 0.7189, T_c
        // -0.86 %, lifetime 9.544, envelope Y 0.2543) and the screened potential's Coulomb logarithm in the settling;
        // before both: alpha 1.7594, Y 0.2738, initial Z/X 0.02700, r_cz 0.7205, T_c 1.5539e7 K, rho_c 148.56,
        // lifetime 9.538, envelope Y 0.2544. Before thermal diffusion, the metals' own diffusion coefficient and the
        // GN93 Z/X (GS98 Z/X 0.0231): alpha 1.7218, Y 0.2667, initial Z/X 0.02460, r_cz 0.7233, lifetime 9.626.
        // Frozen from our own run, last set 2026-12-04, not published values. Tolerances (our
        // choice, not derived from a measured convergence): a few times the smallest physics change recorded above
        // (1e-4 in Y, r_cz and Z/X, 0.002 Gyr), so that such changes pass and larger ones are re-frozen on purpose
        assertThat(sun.mixingLength()).isCloseTo(2.0919, within(0.005));
        assertThat(sun.helium()).isCloseTo(0.2751, within(0.0005));
        assertThat(sun.initialMetalsToHydrogen()).isCloseTo(0.02756, within(0.0001));
        assertThat(sun.envelopeBaseRadiusFraction()).isCloseTo(0.7172, within(0.001));
        assertThat(sun.envelopeHelium()).isCloseTo(0.2530, within(0.001));
        assertThat(sun.exhaustionAge() / Constants.GYR).isCloseTo(9.477, within(0.05));
        assertThat(sun.evolutions()).isLessThanOrEqualTo(3 * CalibrationSettings.DEFAULT.evolutionBudget());
    }

    @Test
    void aSpentBudgetIsReportedWithTheBestPoint() {
        var tight = new CalibrationSettings(4.57 * Constants.GYR, 0.0245, 1.8, 0.27, 1e-4, 1,
                CalibrationSettings.DEFAULT.evolution(), CalibrationSettings.DEFAULT.atmosphere(), false);
        assertThatThrownBy(() -> new SolarCalibration(tight).calibrate())
                .isInstanceOfSatisfying(ConvgridException.class, e -> {
                    assertThat(e.kind()).isEqualTo(ErrorKind.NOT_CONVERGED);
                    assertThat(e.parameters()).containsSubsequence("alpha", 1.8, "Y", 0.27);
                    assertThat(e.parameters()).contains("evolutions", 1);
                });
    }

    @Test
    void rejectsAnAgeBeyondThirteenGyr() {
        assertThatThrownBy(() -> CalibrationSettings.DEFAULT.withAge(14 * Constants.GYR))
                .isInstanceOfSatisfying(ConvgridException.class,
                        e -> assertThat(e.kind()).isEqualTo(ErrorKind.OUT_OF_RANGE));
    }
}
