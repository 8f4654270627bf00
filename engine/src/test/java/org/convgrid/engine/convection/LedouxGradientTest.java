package org.convgrid.engine.convection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class LedouxGradientTest {

    @Test
    void idealGasWithRadiationUsesDeltaFromBeta() {
        // Kippenhahn, Weigert & Weiss 2012, ch. 6: phi = 1, delta = (4 - 3 beta)/beta for ideal gas + radiation.
        double beta = 0.8;
        double delta = (4.0 - 3.0 * beta) / beta;
        assertThat(LedouxGradient.ledoux(0.35, 1.0, delta, 0.1)).isCloseTo(0.35 + 0.1 / 2.0, within(1e-15));
    }

    @Test
    void criteriaAgreeWithoutMolecularWeightGradient() {
        // With nabla_mu = 0 Ledoux reduces to Schwarzschild (KWW 2012 ch. 6).
        for (StabilityCriterion c : StabilityCriterion.values()) {
            assertThat(LedouxGradient.stabilityGradient(c, 0.4, 1.0, 1.0, 0.0)).isEqualTo(0.4);
        }
        assertThat(LedouxGradient.stabilityGradient(StabilityCriterion.LEDOUX, 0.4, 1.0, 1.0, 0.05))
                .isGreaterThan(LedouxGradient.stabilityGradient(StabilityCriterion.SCHWARZSCHILD, 0.4, 1, 1, 0.05));
    }
}
