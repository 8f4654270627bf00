package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class LightElementBurningTest {

    private static final HydrogenBurningNetwork NETWORK = new HydrogenBurningNetwork();

    @Test
    void exactDecayOverManyLifetimesConservesMass() {
        Composition birth = BirthAbundances.of(0.70, 0.02);
        double rho = 0.05;
        double t = 1.3e6;
        double lambda = -NETWORK.burn(rho, t, birth).dh2Dt() / birth.h2();
        double dt = 5.0 / lambda;
        Composition after = new CompositionStep(NETWORK).advance(rho, t, birth, dt);
        // dX_D/dt = -lambda X_D at fixed rho, T, X_p (Clayton 1968, ch. 5): e^-5 left after five lifetimes
        assertThat(after.h2() / birth.h2()).isCloseTo(Math.exp(-5.0), within(1.0e-3 * Math.exp(-5.0)));
        // mass moves 2 + 1 -> 3: 3He gains 3/2 of the deuterium burnt
        double burnt = birth.h2() - after.h2();
        assertThat(after.he3() - birth.he3()).isCloseTo(1.5 * burnt, within(1.0e-3 * burnt));
        double sum = after.h1() + after.he3() + after.he4() + after.z() + after.h2();
        assertThat(sum).isCloseTo(1.0, within(1.0e-12));
    }

    @Test
    void mixedZoneUsesTheMassWeightedRate() {
        Composition birth = BirthAbundances.of(0.70, 0.02);
        double[] rho = {2.0, 1.0};
        double[] temp = {4.0e6, 2.0e6};
        double[] w = {1.0, 3.0};
        double l0 = -NETWORK.burn(rho[0], temp[0], birth).dli7Dt() / birth.li7();
        double l1 = -NETWORK.burn(rho[1], temp[1], birth).dli7Dt() / birth.li7();
        double dt = 1.0e5 * Constants.YEAR;
        Composition after = new CompositionStep(NETWORK).advanceMixed(rho, temp, w, birth, dt);
        double mean = (w[0] * l0 + w[1] * l1) / (w[0] + w[1]);
        assertThat(after.li7() / birth.li7()).isCloseTo(Math.exp(-mean * dt), within(1.0e-6));
    }
}
