package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class IdealGasRadiationEosTest extends EquationOfStateContractTest {

    private static final EquationOfState EOS = new IdealGasRadiationEos();
    private static final Composition SUN = Composition.scaledSolar(0.70, 0.02);

    @Override
    protected EquationOfState eos() {
        return EOS;
    }

    @Test
    void nablaAdIsTwoFifthsForGasAndOneQuarterForRadiation() {
        // Ideal monatomic gas nabla_ad = 0.4, radiation-dominated 0.25 (Kippenhahn, Weigert & Weiss 2012, ch. 13;
        // both limits derived).
        assertThat(EOS.atDensity(1.0, 1.0e4, SUN).nablaAd()).isCloseTo(0.4, within(1e-6));
        assertThat(EOS.atDensity(1.0e-12, 1.0e8, SUN).nablaAd()).isCloseTo(0.25, within(1e-5));
    }

    @Test
    void nablaAdAtBetaOneHalfMatchesTheClosedForm() {
        // nabla_ad = 2(4 - 3 beta)/(32 - 24 beta - 3 beta^2) = 0.2597 at beta = 0.5 (Kippenhahn, Weigert & Weiss
        // 2012, form from memory; re-derived).
        double t = 3.0e7;
        double prad = Constants.A_RAD * Math.pow(t, 4) / 3.0;
        EosState half = EOS.atPressure(2.0 * prad, t, SUN);
        assertThat(half.gasPressureFraction()).isCloseTo(0.5, within(1e-12));
        assertThat(half.nablaAd()).isCloseTo(2.0 * 2.5 / (32.0 - 12.0 - 0.75), within(1e-12));
        assertThat(half.nablaAd()).isCloseTo(0.2597, within(5e-5));
        // Gamma_1 = beta + (4-3beta)^2 (2/3)/(beta + 8(1-beta)) (Kippenhahn, Weigert & Weiss 2012, ch. 13; derived).
        assertThat(half.gamma1()).isCloseTo(0.5 + 6.25 * (2.0 / 3.0) / (0.5 + 4.0), within(1e-12));
    }

    @Test
    void meanMolecularWeightOfFullyIonisedMatter() {
        // mu = 4/(3 + 5X - Z) (full ionisation, standard; derived): 0.6173 at X=0.70, Z=0.02; 0.849 at X=0.346. That
        // formula takes A = 1 for hydrogen and Z/A = 1/2 for metals; with true atomic masses mu is ~0.7 % larger.
        assertThat(EOS.atDensity(1.0, 1e7, SUN).mu()).isCloseTo(0.6173, within(0.6173 * 0.01));
        assertThat(EOS.atDensity(1.0, 1e7, Composition.scaledSolar(0.346, 0.0188)).mu())
                .isCloseTo(0.849, within(0.849 * 0.01));
        // Exact with the masses used: 1/mu = 2 X/m_H + 3 Y/m_He for a metal-free mixture (derived).
        Composition hhe = Composition.scaledSolar(0.7, 0.0);
        assertThat(EOS.atDensity(1.0, 1e7, hhe).mu())
                .isCloseTo(1.0 / (1.4 / Constants.MASS_H1_AMU + 0.9 / Constants.MASS_HE4_AMU), within(1e-14));
    }
}
