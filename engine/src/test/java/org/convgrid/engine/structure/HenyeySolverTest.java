package org.convgrid.engine.structure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

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
        assertThat(e.report().worstVariable()).isBetween(0, 3);
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
}
