package org.convgrid.engine.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class ConstantsTest {

    @Test
    void nominalSolarValuesAreMutuallyConsistent() {
        // Teff from the nominal L and R is 5772.0 K (IAU 2015 Resolution B3; Prša et al. 2016, AJ 152, 41).
        double teff = Math.pow(Constants.L_SUN / (4 * Math.PI * Constants.R_SUN * Constants.R_SUN
                * Constants.SIGMA_SB), 0.25);
        assertThat(teff).isCloseTo(5772.0, within(0.5));
    }

    @Test
    void solarMassFollowsFromTheNominalMassParameter() {
        // M = GM/G = 1.98841e30 kg with CODATA 2018 G (derived; IAU 2015 Resolution B3 GM).
        assertThat(Constants.M_SUN).isCloseTo(1.98841e33, within(1e28));
    }

    @Test
    void radiationConstantMatchesCodata() {
        // a = 4 sigma / c = 7.565733e-15 erg cm^-3 K^-4 (derived from CODATA 2018 exact constants).
        assertThat(Constants.A_RAD).isCloseTo(7.565733e-15, within(1e-21));
    }

    @Test
    void solarSurfaceGravity() {
        // log g = 4.4381 from the nominal GM and R (derived; IAU 2015 Resolution B3).
        assertThat(Math.log10(Constants.GM_SUN / (Constants.R_SUN * Constants.R_SUN))).isCloseTo(4.4381, within(1e-4));
    }
}
