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

    @Test
    void stepPerUnitAbundanceIsTheExactDecayToTheBit() {
        // dX_i/dt = -lambda_i X_i at constant lambda_i: X_i(dt) = X_i e^(-lambda_i dt) (Clayton 1968, ch. 5); with
        // lambda_D dt = 0.5 and lambda_Li dt = 3 exact in binary, the step is that value with no rounding of its own
        double[] x = MassFractions.of(BirthAbundances.of(0.70, 0.02));
        double d = x[MassFractions.H2];
        double li = x[MassFractions.LI7];
        LightElementBurning.burnPerUnitAbundance(x, 0.25, 1.5, 2.0);
        assertThat(x[MassFractions.H2]).isEqualTo(d - d * -Math.expm1(-0.5));
        assertThat(x[MassFractions.LI7]).isEqualTo(li - li * -Math.expm1(-3.0));
        // no rate, nothing burnt
        double[] same = MassFractions.of(BirthAbundances.of(0.70, 0.02));
        double[] before = same.clone();
        LightElementBurning.burnPerUnitAbundance(same, 0.0, 0.0, 1.0e15);
        assertThat(same).isEqualTo(before);
    }

    @Test
    void trapezoidCorrectionMovesMassWithTheMassNumbers() {
        Composition birth = BirthAbundances.of(0.70, 0.02);
        double dt = 1.0e13;
        double[] x = MassFractions.of(birth);
        // burnt first with the start rates (2e-14 and 1e-13 s^-1), then corrected to the mean with the end rates
        LightElementBurning.burnPerUnitAbundance(x, 2.0e-14, 1.0e-13, dt);
        LightElementRates start = new LightElementRates(new double[] {2.0e-14}, new double[] {1.0e-13});
        LightElementRates end = new LightElementRates(new double[] {6.0e-14}, new double[] {3.0e-13});
        Composition after = LightElementBurning.corrected(new Composition[] {MassFractions.composition(x)}, start,
                start, end, dt)[0];
        // exact decay at the trapezoid mean rate: e^-0.4 and e^-2 of the birth abundance
        assertThat(after.h2() / birth.h2()).isCloseTo(Math.exp(-0.4), within(1.0e-12));
        assertThat(after.li7() / birth.li7()).isCloseTo(Math.exp(-2.0), within(1.0e-12));
        // d + p -> 3He (2 + 1 -> 3), 7Li + p -> 2 4He (7 + 1 -> 8)
        double d = birth.h2() - after.h2();
        double li = birth.li7() - after.li7();
        assertThat(after.he3() - birth.he3()).isCloseTo(1.5 * d, within(1.0e-12 * d));
        // (4He and 1H differences to the rounding of fractions of order one)
        assertThat(after.he4() - birth.he4()).isCloseTo(8.0 / 7.0 * li, within(3.0e-16));
        assertThat(birth.h1() - after.h1()).isCloseTo(0.5 * d + li / 7.0, within(3.0e-16));
        double[] sum = MassFractions.of(after);
        assertThat(java.util.Arrays.stream(sum).sum()).isCloseTo(1.0, within(1.0e-15));
        // the same rates at both ends: nothing changes
        Composition same = LightElementBurning.corrected(new Composition[] {after}, end, end, end, dt)[0];
        assertThat(same).isEqualTo(after);
    }

    @Test
    void trapezoidInTimeIsSecondOrderWhereTheStartRateIsFirst() {
        // a rate rising as e^(t/tau), like the envelope base heating up: exact X(T)/X(0) = e^-(lambda0 tau (e^(T/tau)
        // - 1)); the start rate alone errs ~dt (halving the step halves the error), the trapezoid ~dt^2 (a quarter)
        double lambda0 = 1.0e-13;
        double tau = 3.0e13;
        double span = 6.0e13;
        double exact = Math.log(Math.exp(-lambda0 * tau * Math.expm1(span / tau)));
        double[] first = new double[2];
        double[] second = new double[2];
        for (int level = 0; level < 2; level++) {
            int steps = 8 << level;
            double dt = span / steps;
            double[] plain = MassFractions.of(BirthAbundances.of(0.70, 0.02));
            double[] x = plain.clone();
            double li0 = x[MassFractions.LI7];
            for (int i = 0; i < steps; i++) {
                double a = lambda0 * Math.exp(i * dt / tau);
                double b = lambda0 * Math.exp((i + 1) * dt / tau);
                LightElementBurning.burnPerUnitAbundance(plain, 0.0, a, dt);
                LightElementBurning.burnPerUnitAbundance(x, 0.0, a, dt);
                LightElementRates atStart = new LightElementRates(new double[] {0.0}, new double[] {a});
                LightElementRates atEnd = new LightElementRates(new double[] {0.0}, new double[] {b});
                x = MassFractions.of(LightElementBurning.corrected(new Composition[] {MassFractions.composition(x)},
                        atStart, atStart, atEnd, dt)[0]);
            }
            first[level] = Math.abs(Math.log(plain[MassFractions.LI7] / li0) - exact);
            second[level] = Math.abs(Math.log(x[MassFractions.LI7] / li0) - exact);
        }
        assertThat(first[0] / first[1]).isBetween(1.7, 2.3);
        assertThat(second[0] / second[1]).isBetween(3.7, 4.3);
        assertThat(second[0]).isLessThan(0.1 * first[0]);
    }
}
