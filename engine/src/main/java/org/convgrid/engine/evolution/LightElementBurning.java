package org.convgrid.engine.evolution;

import org.convgrid.engine.state.Composition;

/**
 * Destruction of deuterium by d(p,g)3He and of 7Li by 7Li(p,a)4He over one step. Each is one proton capture at
 * a rate linear in the fragile species' own abundance, dX_i/dt = -lambda_i X_i with lambda_i = rho Y_p
 * N_A&lt;sigma v&gt;_i (Clayton 1968, Principles of Stellar Evolution and Nucleosynthesis, ch. 5), and the
 * protons are in such excess that lambda_i stays constant over a step; so the step is solved exactly,
 * X_i(t + dt) = X_i(t) exp(-lambda_i dt), however many e-folds it spans. The rate of a mixed zone is the
 * mass-weighted mean of its points' rates, which the caller passes in. Mass moves with the mass numbers, 2 + 1
 * -&gt; 3 and 7 + 1 -&gt; 4 + 4, so the sum of the fractions is unchanged. Stateless.
 *
 * <p>Over a step the rate does change: in a convective envelope lambda_Li is the zone's mean of a rate that rises
 * steeply with temperature (~T^18 near 3e6 K) at the zone's base, and the base moves during the step; a rate taken
 * at one instant of the step (its start) is first order in dt. {@link #corrected} therefore re-burns each point
 * with the trapezoid mean of the rates of the start-of-step and end-of-step models, each with its own mixed zones,
 * exp(-(lambda_start + lambda_end) dt / 2): second order in dt. Deuterium and 7Li are traces whose burning does
 * not change the structure by more than the solver's tolerance, so the correction is made on the converged
 * end-of-step model without solving again.
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
            burnDeuterium(x, deuteriumRate / d * dt);
        }
        double li = x[MassFractions.LI7];
        if (li > 0.0 && lithiumRate < 0.0) {
            burnLithium(x, lithiumRate / li * dt);
        }
    }

    /**
     * {@link #burn} with the destruction rates given per unit abundance, lambda_i = -(dX_i/dt)/X_i (as {@link
     * LightElementRates} holds them): the exponent is -lambda_i dt itself, not lambda_i X_i dt divided by X_i again,
     * so the exact step stays exact to the last bit.
     *
     * @param deuteriumLambda lambda_D, s^-1 (not negative)
     * @param lithiumLambda lambda_Li, s^-1 (not negative)
     * @param dt step, s
     */
    static void burnPerUnitAbundance(double[] x, double deuteriumLambda, double lithiumLambda, double dt) {
        if (x[MassFractions.H2] > 0.0 && deuteriumLambda > 0.0) {
            burnDeuterium(x, -deuteriumLambda * dt);
        }
        if (x[MassFractions.LI7] > 0.0 && lithiumLambda > 0.0) {
            burnLithium(x, -lithiumLambda * dt);
        }
    }

    /** Multiplies the deuterium of x by exp(exponent), 1H and 3He taking up the mass moved. */
    private static void burnDeuterium(double[] x, double exponent) {
        burnTrace(x, MassFractions.H2, exponent, HYDROGEN_PER_DEUTERIUM, 1, HELIUM3_PER_DEUTERIUM);
    }

    /** Multiplies the 7Li of x by exp(exponent), 1H and 4He taking up the mass moved. */
    private static void burnLithium(double[] x, double exponent) {
        burnTrace(x, MassFractions.LI7, exponent, HYDROGEN_PER_LITHIUM, 2, HELIUM4_PER_LITHIUM);
    }

    /**
     * Multiplies x[trace] by exp(exponent); per unit mass burnt, 1H (x[0]) loses {@code hydrogenPerTrace} and the
     * product x[product] gains {@code productPerTrace} (the mass numbers of one proton capture).
     */
    private static void burnTrace(double[] x, int trace, double exponent, double hydrogenPerTrace, int product,
                                  double productPerTrace) {
        double abundance = x[trace];
        double burnt = abundance * -Math.expm1(exponent);
        x[trace] = abundance - burnt;
        x[0] -= hydrogenPerTrace * burnt;
        x[product] += productPerTrace * burnt;
    }

    /**
     * The end-of-step compositions {@code end} re-burnt from the rates {@code used} (those the step's
     * {@link #burn} applied, per point) to the trapezoid mean of {@code atStart} and {@code atEnd}: each species
     * times exp(-((lambda_start + lambda_end)/2 - lambda_used) dt), with the mass that this burns (or gives
     * back) moved with the mass numbers as in {@link #burn}. Other operators applied to the step (mixing,
     * settling) multiply the traces' abundances and commute with this factor.
     *
     * @param dt step, s
     * @return the corrected compositions (a new array)
     */
    static Composition[] corrected(Composition[] end, LightElementRates used, LightElementRates atStart,
                                   LightElementRates atEnd, double dt) {
        Composition[] out = new Composition[end.length];
        for (int k = 0; k < end.length; k++) {
            if (!(end[k].h2() > 0.0) && !(end[k].li7() > 0.0)) {
                // nothing to re-burn (on the main sequence a third of the points, the interior): the same object
                out[k] = end[k];
                continue;
            }
            if (k > 0 && end[k] == end[k - 1] && sameRates(used, k) && sameRates(atStart, k) && sameRates(atEnd, k)) {
                // a point of the same mixed zone (one composition, one mean rate): the same answer, and the same
                // object, so that the zone's points keep sharing one composition as the burning left them (1 Msun
                // main sequence: ~280 compositions and mass-fraction arrays fewer a step; thread CPU unchanged
                // within the measurement's +-1 %)
                out[k] = out[k - 1];
                continue;
            }
            double[] x = MassFractions.of(end[k]);
            if (x[MassFractions.H2] > 0.0) {
                double extra = 0.5 * (atStart.deuterium()[k] + atEnd.deuterium()[k]) - used.deuterium()[k];
                burnDeuterium(x, -extra * dt);
            }
            if (x[MassFractions.LI7] > 0.0) {
                double extra = 0.5 * (atStart.lithium()[k] + atEnd.lithium()[k]) - used.lithium()[k];
                burnLithium(x, -extra * dt);
            }
            out[k] = MassFractions.composition(x);
        }
        return out;
    }

    /** Whether point k has the rates of point k - 1. */
    private static boolean sameRates(LightElementRates rates, int k) {
        return rates.deuterium()[k] == rates.deuterium()[k - 1] && rates.lithium()[k] == rates.lithium()[k - 1];
    }
}
