package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class ElectronConductionTest extends OpacityContractTest {

    @Override
    Opacity opacity() {
        return new ElectronConduction();
    }

    @Test
    void stronglyDegenerateLimitIsYakovlevUrpin() {
        // Yakovlev & Urpin 1980, Sov. Astron. 24, 303 (from memory): K = pi^2 k^2 T n_e/(3 m_e nu),
        // nu = 4 Z e^4 m_e Lambda/(3 pi hbar^3); pure helium, rho = 1e5, T = 1e6 (E_F/kT ~ 3e2).
        Composition he = Composition.scaledSolar(0.0, 0.0);
        double rho = 1e5;
        double t = 1e6;
        double ne = rho * Constants.N_A * 0.5;
        double ni = rho * Constants.N_A * 0.25;
        double e2 = Constants.E_CHARGE * Constants.E_CHARGE;
        double gamma = 4.0 * e2 / (Math.cbrt(3.0 / (4.0 * Math.PI * ni)) * Constants.K_B * t);
        double lambda = Math.log(Math.cbrt(2.0 * Math.PI * 2.0 / 3.0) * Math.sqrt(1.5 + 3.0 / gamma));
        double nu = 4.0 * 2.0 * e2 * e2 * Constants.M_E * lambda / (3.0 * Math.PI * Math.pow(Constants.HBAR, 3));
        double cond = Math.PI * Math.PI * Constants.K_B * Constants.K_B * t * ne / (3.0 * Constants.M_E * nu);
        double expected = 4.0 * Constants.A_RAD * Constants.C * t * t * t / (3.0 * rho * cond);
        double k = new ElectronConduction().rosselandMean(rho, t, he).kappa();
        assertThat(k / expected).isCloseTo(1.0, within(0.01));
    }

    @Test
    void negligibleAtTheSolarCentre() {
        // Conduction is a small correction on the main sequence (from memory): at the solar centre
        // kappa_cond must exceed the radiative ~1.2 cm^2/g (OPAL, from memory) by a factor > 100.
        double k = new ElectronConduction().rosselandMean(150, 1.57e7, Composition.scaledSolar(0.35, 0.02)).kappa();
        assertThat(k).isGreaterThan(120.0);
    }
}
