package org.convgrid.engine.evolution;

/**
 * Destruction of deuterium by d(p,g)3He and of 7Li by 7Li(p,a)4He over one step. Each is one proton capture at
 * a rate linear in the fragile species' own abundance, dX_i/dt = -lambda_i X_i with lambda_i = rho Y_p
 * N_A&lt;sigma v&gt;_i (Clayton 1968, Principles of Stellar Evolution and Nucleosynthesis, ch. 5), and the
 * protons are in such excess that lambda_i stays constant over a step; so the step is solved exactly,
 * X_i(t + dt) = X_i(t) exp(-lambda_i dt), however many e-folds it spans. The rate of a mixed zone is the
 * mass-weighted mean of its points' rates, which the caller passes in. Mass moves with the mass numbers, 2 + 1
 * -&gt; 3 and 7 + 1 -&gt; 4 + 4, so the sum of the fractions is unchanged. Stateless.
 */
final class LightElementBurning {

    /** Mass of 1H used per unit mass of deuterium burnt. */
    static final double HYDROGEN_PER_DEUTERIUM = 0.5;
    /** Mass of 3He made per unit mass of deuterium burnt. */
    static final double HELIUM3_PER_DEUTERIUM = 1.5;
    /** Mass of 1H used per unit mass of 7Li burnt. */
    static final double HYDROGEN_PER_LITHIUM = 1.0 / 7.0;
    /** Mass of 4He made per unit mass of 7Li burnt. */
    static final double HELIUM4_PER_LITHIUM = 8.0 / 7.0;

    private LightElementBurning() {
    }

    /**
     * Burns the deuterium and 7Li of {@code x} (the {@link MassFractions} array, changed in place).
     *
     * @param deuteriumRate dX_D/dt at the start of the step, s^-1 (not positive)
     * @param lithiumRate dX_Li/dt at the start of the step, s^-1 (not positive)
     * @param dt step, s
     */
    static void burn(double[] x, double deuteriumRate, double lithiumRate, double dt) {
        double d = x[MassFractions.H2];
        if (d > 0.0 && deuteriumRate < 0.0) {
            double burnt = d * -Math.expm1(deuteriumRate / d * dt);
            x[MassFractions.H2] = d - burnt;
            x[0] -= HYDROGEN_PER_DEUTERIUM * burnt;
            x[1] += HELIUM3_PER_DEUTERIUM * burnt;
        }
        double li = x[MassFractions.LI7];
        if (li > 0.0 && lithiumRate < 0.0) {
            double burnt = li * -Math.expm1(lithiumRate / li * dt);
            x[MassFractions.LI7] = li - burnt;
            x[0] -= HYDROGEN_PER_LITHIUM * burnt;
            x[2] += HELIUM4_PER_LITHIUM * burnt;
        }
    }
}
