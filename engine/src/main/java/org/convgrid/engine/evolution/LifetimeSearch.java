package org.convgrid.engine.evolution;

import java.util.Locale;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;

/**
 * Finds a star's main-sequence lifetime by evolving it to core-hydrogen exhaustion, and prepares the second run that
 * lands exactly on fractions of that lifetime (a request's main-sequence fraction age). Stateless and thread-safe.
 */
public final class LifetimeSearch {

    /**
     * The landing run stops at this fraction of the usual end X_c instead: its own steps differ from the first
     * run's, so it may cross X_c = 1e-4 a little before the interpolated exhaustion age, and f = 1 must still land.
     */
    static final double LANDING_END_FACTOR = 0.01;

    /**
     * @param age the exhaustion age, s (interpolated in ln X_c between the two steps around it); NaN when not found
     * @param reason why it was not found, empty when it was
     */
    public record Lifetime(double age, String reason) {
        public boolean found() {
            return Double.isFinite(age);
        }
    }

    private LifetimeSearch() {
    }

    /** Evolves {@code zeroAge} with {@code settings} (no requested ages) until exhaustion or the age limit. */
    public static Lifetime find(PhysicsSet set, StellarModel zeroAge, MainSequenceEvolver.Settings settings) {
        EvolutionResult r;
        try {
            r = new MainSequenceEvolver(set, settings).evolve(zeroAge, new double[0]);
        } catch (ConvgridException e) {
            return new Lifetime(Double.NaN, "evolution to core-hydrogen exhaustion failed: " + e.getMessage());
        }
        if (Double.isFinite(r.exhaustionAge())) {
            return new Lifetime(r.exhaustionAge(), "");
        }
        if (r.end() == EvolutionResult.EndReason.AGE_LIMIT) {
            return new Lifetime(Double.NaN, String.format(Locale.ROOT, "main-sequence lifetime unknown: core hydrogen "
                    + "not exhausted within the age limit of %.4g Gyr", settings.maxAge() / Constants.GYR));
        }
        return new Lifetime(Double.NaN, "evolution to core-hydrogen exhaustion failed: " + r.detail());
    }

    /** The settings of the landing run: the end X_c lowered by {@link #LANDING_END_FACTOR}, the rest unchanged. */
    public static MainSequenceEvolver.Settings landing(MainSequenceEvolver.Settings s) {
        return new MainSequenceEvolver.Settings(s.maxCentralHydrogenChange(), s.exhaustionFraction(),
                s.maxLuminosityChange(), s.maxGrowth(), LANDING_END_FACTOR * s.endCentralHydrogen(), s.maxAge(),
                s.stepBudget(), s.retryBudget());
    }
}
