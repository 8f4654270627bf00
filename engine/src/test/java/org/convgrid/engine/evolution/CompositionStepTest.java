package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.nuclear.BurningRate;
import org.convgrid.engine.physics.nuclear.HydrogenBurningNetwork;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class CompositionStepTest {

    private static final HydrogenBurningNetwork NETWORK = new HydrogenBurningNetwork();
    private static final Composition PROTOSOLAR = Composition.scaledSolar(0.7062, 0.0188);
    /** Heat per gram of hydrogen burnt to 4He by PP-I, erg/g: 26.20 MeV / (4 m_u) (derived). */
    private static final double E_H_PP1 = 26.20 * Constants.MEV / (4.0 * Constants.M_U);

    @Test
    void smallStepBurnsHydrogenAtTheRateSetByEps() {
        // solar-centre conditions, 3He and CN at equilibrium (Bahcall, Serenelli & Basu 2005 centre: T ~ 1.57e7 K,
        // rho ~ 150 g/cm3, X ~ 0.35; from memory, only the regime matters here)
        double rho = 150.0;
        double t = 1.57e7;
        Composition c = NETWORK.equilibrium(rho, t, Composition.scaledSolar(0.35, 0.0188));
        BurningRate burn = NETWORK.burn(rho, t, c);
        double dt = 1.0e6 * Constants.YEAR;
        Composition after = new CompositionStep(NETWORK).advance(rho, t, c, dt);
        // at constant eps, hydrogen is used at dX/dt = -eps/E_H with E_H = Q_eff/(4 m_u) (derived):
        // Q_eff = 26.20 MeV for PP-I, 25.65 PP-II, 25.03 CNO; the solar-centre mix lies within ~3 % of PP-I
        double expected = -burn.eps() * dt / E_H_PP1;
        assertThat(after.h1() - c.h1()).isCloseTo(expected, within(0.03 * Math.abs(expected)));
        // a small step of the implicit method agrees with the explicit rate to first order
        assertThat(after.h1() - c.h1()).isCloseTo(burn.dh1Dt() * dt, within(1e-3 * Math.abs(expected)));
        assertThat(sum(after)).isCloseTo(1.0, within(1e-12));
    }

    @Test
    void longStepFollowsTheAnalyticSolutionOfASecondOrderReaction() {
        // synthetic network dX/dt = -k X^2, helium receives the mass: exact X(t) = X0/(1 + k X0 t) (calculus)
        double k = 1.0e-17;
        NuclearNetwork quadratic = new NuclearNetwork() {
            @Override
            public BurningRate burn(double density, double temperature, Composition c) {
                double r = k * c.h1() * c.h1();
                return new BurningRate(0, 0, 0, 0, 0, -r, 0, r, 0, 0, 0);
            }

            @Override
            public Composition equilibrium(double density, double temperature, Composition c) {
                return c;
            }
        };
        double dt = 1.0 / (k * PROTOSOLAR.h1()); // X halves
        Composition after = new CompositionStep(quadratic).advance(1.0, 1.0e7, PROTOSOLAR, dt);
        double exact = PROTOSOLAR.h1() / 2.0;
        // backward Euler with sub-steps of <= 0.005 in X: first-order error ~ dX/2 * relative curvature
        assertThat(after.h1()).isCloseTo(exact, within(0.01 * exact));
        assertThat(after.he4()).isCloseTo(PROTOSOLAR.he4() + PROTOSOLAR.h1() - after.h1(), within(1e-12));
    }

    @Test
    void stepOfSeveralChangeLimitsIsSplitWithoutRejectedSubsteps() {
        // synthetic network burning hydrogen to helium at a constant rate c: backward Euler is exact for it, and a
        // step changing X by 2.5 MAX_SUBSTEP_CHANGE needs three sub-steps; sized from the explicit change, none is
        // tried and rejected (halving from the whole step would try dt, dt/2, dt/4, ...)
        double c = 1.0e-16;
        int[] calls = {0};
        NuclearNetwork constant = new NuclearNetwork() {
            @Override
            public BurningRate burn(double density, double temperature, Composition composition) {
                calls[0]++;
                return new BurningRate(0, 0, 0, 0, 0, -c, 0, c, 0, 0, 0);
            }

            @Override
            public Composition equilibrium(double density, double temperature, Composition composition) {
                return composition;
            }
        };
        double dt = 2.5 * CompositionStep.MAX_SUBSTEP_CHANGE / c;
        Composition after = new CompositionStep(constant).advance(1.0, 1.0e7, PROTOSOLAR, dt);
        assertThat(after.h1()).isCloseTo(PROTOSOLAR.h1() - c * dt, within(1e-12));
        // per sub-step: its start's rates (but the first's), 6 differences for the Jacobian, the rates at the
        // first iterate; before them the light elements' rates and the start's rates with the Jacobian
        int perSubstep = 1 + MassFractions.BURNING + 1;
        assertThat(calls[0]).isLessThanOrEqualTo(2 + 3 * perSubstep);
    }

    @Test
    void exhaustionNeverGoesNegativeAndConservesMass() {
        // a hot CNO-burning point run for three times the hydrogen lifetime X0 E_H/eps
        double rho = 10.0;
        double t = 3.0e7;
        Composition c = NETWORK.equilibrium(rho, t, PROTOSOLAR);
        double lifetime = c.h1() * E_H_PP1 / NETWORK.burn(rho, t, c).eps();
        Composition after = new CompositionStep(NETWORK).advance(rho, t, c, 3.0 * lifetime);
        assertThat(after.h1()).isBetween(0.0, 1e-3);
        for (double x : MassFractions.of(after)) {
            assertThat(x).isGreaterThanOrEqualTo(0.0);
        }
        assertThat(sum(after)).isCloseTo(1.0, within(1e-12));
        // the metals only change form: C + N + O (number of nuclei, counted by mass number) is conserved
        assertThat(after.c12() / 12 + after.n14() / 14 + after.o16() / 16)
                .isCloseTo(c.c12() / 12 + c.n14() / 14 + c.o16() / 16, within(1e-10));
        assertThat(after.otherMetals()).isEqualTo(c.otherMetals());
    }

    @Test
    void coolShellIsUnchanged() {
        Composition after = new CompositionStep(NETWORK).advance(1e-3, 1.0e5, PROTOSOLAR, Constants.GYR);
        assertThat(after.h1()).isCloseTo(PROTOSOLAR.h1(), within(1e-14));
    }

    private static double sum(Composition c) {
        double s = 0;
        for (double x : MassFractions.of(c)) {
            s += x;
        }
        return s;
    }
}
