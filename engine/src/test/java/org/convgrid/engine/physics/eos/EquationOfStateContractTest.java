package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * Properties every {@link EquationOfState} must have: thermodynamic consistency (Maxwell relation), reported
 * derivatives equal to finite differences of P and u, exact inversion, and the thermodynamic identities (Cox &amp;
 * Giuli 1968; Kippenhahn, Weigert &amp; Weiss 2012, ch. 4 and 6).
 * Subclasses supply the implementation and the states to probe.
 */
abstract class EquationOfStateContractTest {

    /** Centred-difference step in ln rho and ln T. */
    static final double STEP = 1.0e-4;

    record Point(double density, double temperature, Composition composition) {
    }

    protected abstract EquationOfState eos();

    /** States to probe; the default covers a solar envelope base, the solar centre and a hot massive core. */
    protected List<Point> points() {
        Composition sun = Composition.scaledSolar(0.70, 0.02);
        return List.of(new Point(0.2, 2.2e6, sun), new Point(152.9, 1.567e7, Composition.scaledSolar(0.346, 0.0188)),
                new Point(5.0, 3.0e7, sun), new Point(1.0e-3, 2.0e7, sun));
    }

    /** Relative tolerance of the Maxwell-relation check (finite differences of a converged solve). */
    protected double maxwellTolerance() {
        return 1.0e-6;
    }

    @Test
    void satisfiesTheMaxwellRelation() {
        // (du/dln rho)_T = (P/rho)(1 - chi_T): follows from dF = -S dT - P dV (Kippenhahn, Weigert & Weiss 2012,
        // ch. 4); holds for any consistent free energy, so it tests P and u together.
        for (Point p : points()) {
            EosState s = at(p, 1.0, 1.0);
            double dudlnrho = (at(p, Math.exp(STEP), 1.0).internalEnergy()
                    - at(p, Math.exp(-STEP), 1.0).internalEnergy()) / (2.0 * STEP);
            double expected = s.pressure() / s.density() * (1.0 - s.chiT());
            assertThat(dudlnrho).as("du/dln rho at %s", p)
                    .isCloseTo(expected, within(maxwellTolerance() * s.pressure() / s.density()));
        }
    }

    @Test
    void reportedDerivativesMatchFiniteDifferences() {
        // Definitions of chi_rho, chi_T and c_V (standard definitions, Cox & Giuli 1968), checked by centred
        // differences.
        for (Point p : points()) {
            EosState s = at(p, 1.0, 1.0);
            double chiRho = Math.log(at(p, Math.exp(STEP), 1.0).pressure() / at(p, Math.exp(-STEP), 1.0).pressure())
                    / (2.0 * STEP);
            EosState hot = at(p, 1.0, Math.exp(STEP));
            EosState cold = at(p, 1.0, Math.exp(-STEP));
            double chiT = Math.log(hot.pressure() / cold.pressure()) / (2.0 * STEP);
            double cv = (hot.internalEnergy() - cold.internalEnergy()) / (hot.temperature() - cold.temperature());
            assertThat(s.chiRho()).as("chiRho at %s", p).isCloseTo(chiRho, within(1e-5 * chiRho));
            assertThat(s.chiT()).as("chiT at %s", p).isCloseTo(chiT, within(1e-5 * Math.max(chiT, 1.0)));
            assertThat(s.cv()).as("cv at %s", p).isCloseTo(cv, within(1e-5 * cv));
        }
    }

    @Test
    void obeysTheAdiabaticIdentities() {
        // nabla_ad = (Gamma_1 - chi_rho)/(Gamma_1 chi_T), c_P > c_V (exact identities, Cox & Giuli 1968; derived).
        for (Point p : points()) {
            EosState s = at(p, 1.0, 1.0);
            assertThat(s.nablaAd()).isCloseTo((s.gamma1() - s.chiRho()) / (s.gamma1() * s.chiT()), within(1e-12));
            assertThat(s.cp()).isGreaterThan(s.cv());
            assertThat(s.pressure()).isPositive();
            assertThat(s.gasPressureFraction()).isBetween(0.0, 1.0);
            assertThat(s.mu()).isPositive();
        }
    }

    @Test
    void pressureInversionRecoversTheDensity() {
        for (Point p : points()) {
            EosState s = at(p, 1.0, 1.0);
            EosState back = eos().atPressure(s.pressure(), p.temperature(), p.composition());
            assertThat(back.density()).as("density at %s", p).isCloseTo(p.density(), within(1e-10 * p.density()));
        }
    }

    @Test
    void rejectsNonPhysicalInput() {
        Composition sun = Composition.scaledSolar(0.7, 0.02);
        assertThatThrownBy(() -> eos().atDensity(-1.0, 1e6, sun)).isInstanceOf(ConvgridException.class);
        assertThatThrownBy(() -> eos().atDensity(1.0, Double.NaN, sun)).isInstanceOf(ConvgridException.class);
        // Radiation alone at 1e7 K is 2.5e13 dyn cm^-2; a smaller total pressure has no solution.
        assertThatThrownBy(() -> eos().atPressure(1.0e12, 1e7, sun)).isInstanceOf(ConvgridException.class);
    }

    private EosState at(Point p, double densityFactor, double temperatureFactor) {
        return eos().atDensity(p.density() * densityFactor, p.temperature() * temperatureFactor, p.composition());
    }
}
