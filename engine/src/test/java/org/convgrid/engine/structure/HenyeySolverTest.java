package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.PolytropicGuess;
import org.junit.jupiter.api.Test;

class HenyeySolverTest {

    private static final Composition SOLAR = Composition.scaledSolar(0.70, 0.02);

    @Test
    void anExhaustedBudgetThrowsWithADiagnosableReport() {
        PhysicsSet physics = StandInPhysics.create(1.8);
        ModelState guess = new PolytropicGuess(200).guess(Constants.M_SUN, SOLAR);
        StructureSolver solver = new StructureSolver(physics, HenyeySolver.Settings.DEFAULT.withIterationBudget(2));

        SolveFailedException e = catchThrowableOfType(SolveFailedException.class, () -> solver.relax(guess));

        assertThat(e.kind()).isEqualTo(ErrorKind.NOT_CONVERGED);
        assertThat(e.report().reason()).isEqualTo(StopReason.ITERATION_BUDGET);
        assertThat(e.report().iterations()).isEqualTo(2);
        assertThat(e.report().lastCorrection()).isGreaterThan(HenyeySolver.DEFAULT_TOLERANCE);
        assertThat(e.report().worstPoint()).isBetween(0, 199);
        assertThat(e.report().worstUnknown()).isIn("ln r", "ln rho", "ln T", "L / L_scale");
        assertThat(e.getMessage()).contains("at mesh point " + e.report().worstPoint());
    }

    @Test
    void physicsThatRejectsEveryStateEndsTheSolveInsteadOfLooping() {
        PhysicsSet good = StandInPhysics.create(1.8);
        EquationOfState rejecting = new EquationOfState() {
            @Override
            public EosState atDensity(double rho, double t, Composition c) {
                throw new ConvgridException(ErrorKind.OFF_TABLE, "no EOS here", "eos", rho, t);
            }

            @Override
            public EosState atPressure(double p, double t, Composition c) {
                throw new ConvgridException(ErrorKind.OFF_TABLE, "no EOS here", "eos", p, t);
            }
        };
        PhysicsSet broken = new PhysicsSet(rejecting, good.opacity(), good.nuclear(), good.convection(),
                good.criterion(), good.surface(), 0.0);
        ModelState guess = new PolytropicGuess(100).guess(Constants.M_SUN, SOLAR);

        SolveFailedException e = catchThrowableOfType(SolveFailedException.class,
                () -> new StructureSolver(broken).relax(guess));

        assertThat(e.report().reason()).isEqualTo(StopReason.BAD_STATE);
        assertThat(e.report().detail()).contains("no EOS here");
    }

    @Test
    void nearTheSolutionTheFactorisedJacobianIsReusedAndTheSolutionIsTheSame() {
        // an n = 1.5 polytrope relaxed once, then restarted from that solution shifted by 1e-4 in every unknown:
        // the first correction is below the reuse threshold, so the later iterations are chord steps
        int points = 400;
        double n = 1.5;
        double rhoC = 80.0;
        PolytropicProfile profile = PolytropicProfile.of(LaneEmden.solve(n), points, 1.0e-9, 1.0e-6);
        MassMesh mesh = profile.mesh(Constants.M_SUN);
        PolytropeEquations eq = new PolytropeEquations(mesh, n, rhoC, rhoC * Math.pow(1.0e-6, n));
        double alpha = Math.cbrt(Constants.M_SUN / (4 * Math.PI * rhoC * profile.massConstant()));
        double lnK = Math.log(alpha * alpha * 4 * Math.PI * Constants.G / ((n + 1) * Math.pow(rhoC, 1 / n - 1)));
        double[] y = new double[3 * points];
        for (int k = 0; k < points; k++) {
            y[3 * k] = Math.log(alpha * profile.xi(k));
            y[3 * k + 1] = Math.log(rhoC * Math.pow(profile.theta(k), n));
            y[3 * k + 2] = lnK;
        }
        HenyeySolver solver = new HenyeySolver();
        double[] solution = solver.solve(eq, y, HenyeySolver.Settings.DEFAULT).solution();
        double[] shifted = solution.clone();
        for (int i = 0; i < shifted.length; i++) {
            shifted[i] += 1.0e-4;
        }
        int[] evaluations = new int[2];
        DifferenceSystem counting = new DifferenceSystem() {
            @Override
            public int points() {
                return eq.points();
            }

            @Override
            public int variables() {
                return eq.variables();
            }

            @Override
            public int centralConditions() {
                return eq.centralConditions();
            }

            @Override
            public void evaluate(double[] state, double[] residual, BandMatrix jacobian) {
                evaluations[jacobian == null ? 0 : 1]++;
                eq.evaluate(state, residual, jacobian);
            }
        };

        HenyeySolver.Result again = solver.solve(counting, shifted, HenyeySolver.Settings.DEFAULT);

        assertThat(again.report().converged()).as(again.report().toString()).isTrue();
        // the start state's Jacobian only: every later evaluation was a chord step's, and the converged
        // correction was not applied (no evaluation after it)
        assertThat(evaluations[1]).isEqualTo(1);
        assertThat(evaluations[0]).isEqualTo(again.report().iterations() - 1);
        for (int i = 0; i < solution.length; i++) {
            assertThat(again.solution()[i]).isCloseTo(solution[i], within(HenyeySolver.DEFAULT_TOLERANCE));
        }
    }

    @Test
    void aRelaxationThatCannotMeetItsBudgetIsGivenUpOnlyWhenAskedTo() {
        HenyeySolver.Settings seeded = HenyeySolver.Settings.DEFAULT.withIterationBudget(25).withGiveUpRate(2.0);
        // 25 - 1 - 8 = 16 iterations to work off the correction at 2 per iteration: up to 32
        assertThat(HenyeySolver.hopeless(33.0, Double.POSITIVE_INFINITY, 1, seeded)).isTrue();
        assertThat(HenyeySolver.hopeless(31.0, Double.POSITIVE_INFINITY, 1, seeded)).isFalse();
        // grown to more than twice the smallest correction before it
        assertThat(HenyeySolver.hopeless(8.1, 4.0, 3, seeded)).isTrue();
        assertThat(HenyeySolver.hopeless(7.9, 4.0, 3, seeded)).isFalse();
        // near the solution never, even past the iterations kept for the end
        assertThat(HenyeySolver.hopeless(0.9, 0.1, 24, seeded)).isFalse();
        assertThat(HenyeySolver.hopeless(1.1, 1.0, 18, seeded)).isTrue();
        // by default a relaxation runs out its budget
        assertThat(HenyeySolver.hopeless(1.0e6, 1.0, 24, HenyeySolver.Settings.DEFAULT)).isFalse();

        // opt-in only: a relaxation from the polytropic guess wanders (the correction grows again after 30
        // iterations) and still converges within the default budget, so only seeded relaxations are given up
        PhysicsSet physics = StandInPhysics.create(1.8);
        ModelState guess = new PolytropicGuess(200).guess(Constants.M_SUN, SOLAR);
        assertThat(new StructureSolver(physics).relax(guess).report().converged()).isTrue();
        SolveFailedException e = catchThrowableOfType(SolveFailedException.class, () -> new StructureSolver(physics,
                HenyeySolver.Settings.DEFAULT.withGiveUpRate(2.0)).relax(guess));
        assertThat(e.report().reason()).isEqualTo(StopReason.ITERATION_BUDGET);
        assertThat(e.report().detail()).startsWith("given up");
    }
}
