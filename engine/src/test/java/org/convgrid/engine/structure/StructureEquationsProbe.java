package org.convgrid.engine.structure;

import org.convgrid.engine.units.Constants;

public final class StructureEquationsProbe {
    public static void trace(org.convgrid.engine.physics.PhysicsSet physics, ModelState guess, int its, double step) {
        StructureEquations eq = new StructureEquations(guess.mesh(), guess.compositions(), physics,
                guess.surfaceLuminosity(), null, ExtraEnergy.NONE);
        double[] y = eq.unknowns(guess);
        HenyeySolver h = new HenyeySolver();
        int n = guess.size();
        for (int i = 0; i < its; i++) {
            HenyeySolver.Result r = h.solve(eq, y, new HenyeySolver.Settings(1e-8, step, 1));
            y = r.solution();
            System.out.printf("it %d %s | R=%.4f L=%.4e Tc=%.3e rhoc=%.3e Ts=%.0f%n", i, r.report(),
                    Math.exp(y[4 * (n - 1)]) / Constants.R_SUN, y[4 * n - 1] * guess.surfaceLuminosity() / Constants.L_SUN,
                    Math.exp(y[2]), Math.exp(y[1]), Math.exp(y[4 * n - 2]));
            if (r.report().converged()) {
                break;
            }
        }
    }
}
