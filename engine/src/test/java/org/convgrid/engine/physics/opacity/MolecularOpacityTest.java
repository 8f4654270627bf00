package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class MolecularOpacityTest extends OpacityContractTest {

    @Override
    Opacity opacity() {
        return new MolecularOpacity();
    }

    @Test
    void followsTheBellAndLinMoleculesRowWellBelowDissociation() {
        // Bell & Lin 1994, ApJ 427, 987, molecules row kappa = 1e-8 rho^(2/3) T^3 (as tabulated by Keith & Wardle
        // 2014, MNRAS 440, 89, Table 1). At 2000 K the cut-off factor is 1/(1 + 0.5^8) = 0.9961.
        double k = new MolecularOpacity().rosselandMean(1e-6, 2000, Composition.scaledSolar(0.7, 0.02)).kappa();
        assertThat(k).isCloseTo(1e-8 * 1e-4 * 8e9 * 0.9961, within(1e-5 * k));
    }

    @Test
    void bellAndLinHandOverToHMinusNear4000KWhereOurCutoffActs() {
        // Bell & Lin 1994 transition molecules -> H^- scattering row (1e-36 rho^(1/3) T^10):
        // T = (1e-8/1e-36 rho^(2/3 - 1/3))^(1/7) = 1e4 rho^(1/21) (rule of Keith & Wardle 2014; derived):
        // 3728 K at rho = 1e-9, 5179 K at rho = 1e-6. Our cut-off temperature must lie in that band.
        double low = Math.pow(1e-8 / 1e-36 * Math.pow(1e-9, 1.0 / 3.0), 1.0 / 7.0);
        double high = Math.pow(1e-8 / 1e-36 * Math.pow(1e-6, 1.0 / 3.0), 1.0 / 7.0);
        assertThat(low).isCloseTo(3728, within(2.0));
        assertThat(high).isCloseTo(5179, within(2.0));
        assertThat(MolecularOpacity.DISSOCIATION_TEMPERATURE).isBetween(low, high);
    }
}
