package org.convgrid.engine.structure;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;

/**
 * Solves the structure equations for one composition profile by Henyey relaxation, starting from a guess on a
 * given mesh. Immutable and thread-safe (each call builds its own equations and scratch space).
 */
public final class StructureSolver {

    private final PhysicsSet physics;
    private final HenyeySolver.Settings settings;
    private final HenyeySolver henyey = new HenyeySolver();

    public StructureSolver(PhysicsSet physics, HenyeySolver.Settings settings) {
        this.physics = physics;
        this.settings = settings;
    }

    public StructureSolver(PhysicsSet physics) {
        this(physics, HenyeySolver.Settings.DEFAULT);
    }

    /**
     * The burning factor that makes the guess's nuclear luminosity equal its surface luminosity: the starting
     * point of the cold-start homotopy.
     */
    public double matchingBurningFactor(ModelState guess) {
        StructureEquations eq = new StructureEquations(guess.mesh(), guess.compositions(), physics,
                Math.abs(guess.surfaceLuminosity()), null, ExtraEnergy.NONE);
        double[] y = eq.unknowns(guess);
        eq.evaluate(y, new double[y.length], null);
        return guess.surfaceLuminosity() / eq.nuclearLuminosity();
    }

    public PhysicsSet physics() {
        return physics;
    }

    public HenyeySolver.Settings settings() {
        return settings;
    }

    /**
     * Relaxes {@code guess} (mesh and composition kept) to a solution in thermal equilibrium.
     *
     * @throws SolveFailedException with the report when the relaxation does not converge
     */
    public StellarModel relax(ModelState guess) {
        return relax(guess, ExtraEnergy.NONE, null, settings);
    }

    /**
     * Relaxes {@code guess} with an extra energy source and a composition-gradient term.
     *
     * @param nablaMu dln mu/dln P per point for the Ledoux criterion, null for none
     * @throws SolveFailedException with the report when the relaxation does not converge
     */
    public StellarModel relax(ModelState guess, ExtraEnergy extra, double[] nablaMu,
                              HenyeySolver.Settings solveSettings) {
        return relax(guess, extra, nablaMu, solveSettings, 1.0);
    }

    /**
     * As {@link #relax(ModelState, ExtraEnergy, double[], HenyeySolver.Settings)}, the first evaluation's
     * equation-of-state solve at each point started from {@code nearbyEos[k]} (one state per point of the guess's
     * mesh, e.g. the previous model's; null for a cold start). An evolution step's guess lies within a few per cent
     * of the previous model, whose degeneracy starts the neutrality solve one or two Newton steps from its root
     * instead of five to ten from the fully ionised guess. The converged model is the same to the solver's
     * tolerance, not bit for bit: the equation of state stops within its own tolerance of the root, at a point that
     * depends on where it started.
     *
     * @throws SolveFailedException with the report when the relaxation does not converge
     */
    public StellarModel relax(ModelState guess, ExtraEnergy extra, double[] nablaMu,
                              HenyeySolver.Settings solveSettings, EosState[] nearbyEos) {
        return relax(guess, extra, nablaMu, solveSettings, nearbyEos, null);
    }

    /**
     * As {@link #relax(ModelState, ExtraEnergy, double[], HenyeySolver.Settings, EosState[])}, the Jacobian's
     * equation-of-state second derivatives at each point started from {@code nearbyCurvature[k]} (e.g. the previous
     * model's on the same mesh; null for none), used while the point stays near where they were taken: they shape
     * the Newton iteration's rate only, so the converged model is the same to the solver's tolerance.
     *
     * @throws SolveFailedException with the report when the relaxation does not converge
     */
    public StellarModel relax(ModelState guess, ExtraEnergy extra, double[] nablaMu,
                              HenyeySolver.Settings solveSettings, EosState[] nearbyEos,
                              EosCurvature[] nearbyCurvature) {
        double scale = Math.abs(guess.surfaceLuminosity());
        StructureEquations eq = new StructureEquations(guess.mesh(), guess.compositions(), physics, scale,
                nablaMu, extra, 1.0, null);
        eq.startEquationOfStateNear(nearbyEos);
        eq.startCurvatureNear(nearbyCurvature);
        return solved(eq, guess, solveSettings);
    }

    /**
     * Relaxes with the nuclear energy generation multiplied by {@code burningFactor} (a cold-start homotopy
     * parameter; see {@link StructureEquations}); the result is a physical model only when it is one.
     *
     * @throws SolveFailedException with the report when the relaxation does not converge
     */
    public StellarModel relax(ModelState guess, ExtraEnergy extra, double[] nablaMu,
                              HenyeySolver.Settings solveSettings, double burningFactor) {
        return relax(guess, extra, nablaMu, solveSettings, burningFactor, null);
    }

    /**
     * Relaxes with the shell compositions recomputed from the trial state at every evaluation
     * ({@code compositionRule}; null keeps the guess's compositions).
     *
     * @throws SolveFailedException with the report when the relaxation does not converge
     */
    public StellarModel relax(ModelState guess, ExtraEnergy extra, double[] nablaMu,
                              HenyeySolver.Settings solveSettings, double burningFactor,
                              ShellComposition compositionRule) {
        return relax(guess, extra, nablaMu, solveSettings, burningFactor, compositionRule, null);
    }

    /**
     * As {@link #relax(ModelState, ExtraEnergy, double[], HenyeySolver.Settings, double, ShellComposition)}, the
     * first evaluation's equation-of-state solve at each point started from {@code nearbyEos[k]} (null: a cold
     * start), as {@link #relax(ModelState, ExtraEnergy, double[], HenyeySolver.Settings, EosState[])} does.
     *
     * @throws SolveFailedException with the report when the relaxation does not converge
     */
    public StellarModel relax(ModelState guess, ExtraEnergy extra, double[] nablaMu,
                              HenyeySolver.Settings solveSettings, double burningFactor,
                              ShellComposition compositionRule, EosState[] nearbyEos) {
        double scale = Math.abs(guess.surfaceLuminosity());
        StructureEquations eq = new StructureEquations(guess.mesh(), guess.compositions(), physics, scale,
                nablaMu, extra, burningFactor, compositionRule);
        eq.startEquationOfStateNear(nearbyEos);
        return solved(eq, guess, solveSettings);
    }

    private StellarModel solved(StructureEquations eq, ModelState guess, HenyeySolver.Settings solveSettings) {
        HenyeySolver.Result result = henyey.solve(eq, eq.unknowns(guess), solveSettings);
        if (!result.report().converged()) {
            throw new SolveFailedException("structure relaxation failed", result.report());
        }
        // the solver's last evaluation was at the returned state, so the scratch values describe it
        return StellarModel.of(eq, result.solution(), result.report(), physics);
    }
}
