package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.DifferenceJacobian;
import org.convgrid.engine.structure.ExtraEnergy;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StructureEquations;
import org.convgrid.engine.structure.StructureSolver;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The analytic derivatives of eps_grav against central differences, at the model one evolution step (1e8 yr)
 * after the 1 Msun zero-age model, where eps_grav is non-zero everywhere. Differences through the real
 * equation of state are the reference (common practice for checking a Newton Jacobian). The analytic slopes
 * come from thermodynamic identities of the conservative form (c_V, chi_rho, chi_T); the tolerances, in units of
 * c_P T/dt, are those set for the earlier c_P T form (1e-4 radiative, 3e-3 in the ionisation zones), which the
 * conservative slopes also meet.
 */
class GravothermalEnergyTest {

    private static final double STEP = 1.0e8 * Constants.YEAR;
    /** Step of the central differences in ln rho, ln T (relative for L). */
    private static final double H = 1.0e-5;
    /** Allowed error of the slopes, in units of c_P T/dt, in radiative points. */
    private static final double RADIATIVE_TOLERANCE = 1.0e-4;
    /** The same in convective points (ionisation zones). */
    private static final double CONVECTIVE_TOLERANCE = 3.0e-3;

    private static PhysicsSet physics;
    private static GravothermalEnergy grav;
    private static StellarModel stepped;

    @BeforeAll
    static void oneStep() {
        physics = EvolutionFixtures.physics(EvolutionFixtures.SOLAR);
        StellarModel zeroAge = EvolutionFixtures.zeroAge(EvolutionFixtures.SOLAR, 1.0).model();
        StepStart start = StepStart.of(zeroAge);
        CompositionStep network = new CompositionStep(physics.nuclear());
        Composition[] comp = new Composition[start.state().size()];
        for (int k = 0; k < comp.length; k++) {
            comp[k] = network.advance(start.density()[k], start.temperature()[k], start.state().composition(k),
                    STEP);
        }
        grav = GravothermalEnergy.since(start, STEP);
        stepped = new StructureSolver(physics).relax(start.state().withCompositions(comp), grav, null,
                HenyeySolver.Settings.DEFAULT);
    }

    @Test
    void slopesMatchDifferencesThroughTheEquationOfState() {
        var p = stepped.profile();
        for (int k = 0; k < p.size(); k += 10) {
            double rho = p.density(k);
            double t = p.temperature(k);
            Composition c = stepped.state().composition(k);
            EosState s = physics.eos().atDensity(rho, t, c);
            ExtraEnergy.Rate rate = grav.withSlopes(k, s);
            double dRho = (grav.at(k, physics.eos().atDensity(rho * Math.exp(H), t, c))
                    - grav.at(k, physics.eos().atDensity(rho * Math.exp(-H), t, c))) / (2.0 * H);
            double dT = (grav.at(k, physics.eos().atDensity(rho, t * Math.exp(H), c))
                    - grav.at(k, physics.eos().atDensity(rho, t * Math.exp(-H), c))) / (2.0 * H);
            double scale = s.cp() * t / STEP;
            double tolerance = (p.convective(k) ? CONVECTIVE_TOLERANCE : RADIATIVE_TOLERANCE) * scale;
            assertThat(rate.value()).isEqualTo(grav.at(k, s));
            // eps_grav is non-zero at every point after the step (the star contracts and heats)
            assertThat(Math.abs(rate.value())).isGreaterThan(1.0e-6 * scale);
            assertThat(rate.dLnRho()).as("d eps_grav/dln rho at point %d", k).isCloseTo(dRho, within(tolerance));
            assertThat(rate.dLnT()).as("d eps_grav/dlnT at point %d", k).isCloseTo(dT, within(tolerance));
        }
    }

    @Test
    void twoStepFormExtrapolatesToTheEndOfTheStepWithItsSlopes() {
        // the backward differentiation formula of order two (Hairer, Norsett & Wanner 1993, ch. III.5): after a
        // step of the same length its weight is c = 1/2, eps = 3/2 eps_now - 1/2 eps_before, and the slopes are
        // those of the one-step quotient times 3/2
        var p = stepped.profile();
        double[] now = grav.oneStepRates(p);
        double[] before = new double[now.length];
        for (int k = 0; k < before.length; k++) {
            before[k] = 0.7 * now[k] + 1.0e-3 * k;
        }
        GravothermalEnergy two = grav.withEarlierStep(before, STEP);
        for (int k = 0; k < p.size(); k += 10) {
            Composition c = stepped.state().composition(k);
            EosState s = physics.eos().atDensity(p.density(k), p.temperature(k), c);
            // the profile's P and u against a fresh equation-of-state call: a difference of nearly equal energies
            assertThat(grav.at(k, s)).isCloseTo(now[k], within(1.0e-6 * Math.abs(now[k])));
            ExtraEnergy.Rate one = grav.withSlopes(k, s);
            ExtraEnergy.Rate rate = two.withSlopes(k, s);
            assertThat(rate.value()).isEqualTo(two.at(k, s));
            assertThat(rate.value()).isCloseTo(1.5 * one.value() - 0.5 * before[k],
                    within(1.0e-12 * Math.abs(one.value()) + 1.0e-12 * Math.abs(before[k])));
            assertThat(rate.dLnRho()).isCloseTo(1.5 * one.dLnRho(), within(1.0e-12 * Math.abs(one.dLnRho())));
            assertThat(rate.dLnT()).isCloseTo(1.5 * one.dLnT(), within(1.0e-12 * Math.abs(one.dLnT())));
        }
    }

    @Test
    void structureJacobianWithEpsGravMatchesDifferencesOfTheResiduals() {
        ModelState state = stepped.state();
        int n = state.size();
        StructureEquations eq = new StructureEquations(state.mesh(), state.compositions(), physics,
                state.surfaceLuminosity(), null, grav);
        double[] y = eq.unknowns(state);
        DifferenceJacobian check = DifferenceJacobian.at(eq, y);
        int checkedEnergy = 0;
        for (int k = 0; k < n; k += 23) {
            EosState s = physics.eos().atDensity(Math.exp(y[eq.column(k, 1)]), Math.exp(y[eq.column(k, 2)]),
                    state.composition(k));
            double gravScale = s.cp() * s.temperature() / STEP;
            double tolerance = stepped.profile().convective(k) ? CONVECTIVE_TOLERANCE : RADIATIVE_TOLERANCE;
            for (int j = 0; j < 4; j++) {
                int col = eq.column(k, j);
                double h = j == 3 ? H * Math.max(Math.abs(y[col]), 1.0e-3) : H;
                double[] fd = check.column(col, h);
                for (int row = check.firstRow(col); row <= check.lastRow(col); row++) {
                    double analytic = check.analytic().get(row, col);
                    // every entry, against the largest of its row (one-sided differences in convective points)
                    assertThat(analytic).as("row %d, point %d, unknown %d", row, k, j)
                            .isCloseTo(fd[row], within(1.0e-5 * check.rowScale(row)));
                    // energy rows in ln rho and ln T, where eps_grav enters: against the eps_grav term itself
                    // (dm/(2 L_scale) c_P T/dt), which is ~1e-3 and less of the row's largest entry
                    if (isEnergyRowOfInterval(row, n) && (j == 1 || j == 2) && touches(row, k)) {
                        int interval = (row - eq.centralConditions()) / 4;
                        double e = 0.5 * state.mesh().intervalMass(interval) / state.surfaceLuminosity();
                        assertThat(analytic).as("energy row %d, point %d, unknown %d", row, k, j)
                                .isCloseTo(fd[row], within(tolerance * e * gravScale));
                        checkedEnergy++;
                    }
                }
            }
        }
        assertThat(checkedEnergy).isGreaterThan(80);
    }

    private static boolean isEnergyRowOfInterval(int row, int points) {
        return row >= 2 && row < 2 + 4 * (points - 1) && (row - 2) % 4 == 2;
    }

    /** Whether the interval of this energy row has point k at one of its ends. */
    private static boolean touches(int row, int k) {
        int interval = (row - 2) / 4;
        return interval == k || interval == k - 1;
    }
}
