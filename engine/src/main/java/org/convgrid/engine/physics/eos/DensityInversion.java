package org.convgrid.engine.physics.eos;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * Solves P(rho, T) = P_target for rho by Newton's method in ln rho with the slope chi_rho, safeguarded by a
 * bracket that shrinks with every evaluation (bisection when a Newton step leaves it).
 */
final class DensityInversion {

    /** Iteration budget of the inversion. */
    static final int BUDGET = 60;
    /** Convergence: |d ln rho| below this (the EOS's own solve noise is ~1e-12 in ln P). */
    static final double TOLERANCE = 1.0e-11;
    /** Largest Newton step in ln rho. */
    private static final double MAX_STEP = 3.0;

    private DensityInversion() {
    }

    /** The forward equation of state at fixed temperature and composition, as a function of ln rho. */
    interface Isotherm {
        EosState at(double lnRho);
    }

    /** @param eos the forward equation of state along the isotherm at {@code temperature} (K) */
    static EosState invert(Isotherm eos, double pressure, double temperature, double densityGuess) {
        double target = Math.log(pressure);
        double lnRho = Math.log(densityGuess);
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        double step = Double.NaN;
        for (int i = 0; i < BUDGET; i++) {
            EosState s = eos.at(lnRho);
            double mismatch = Math.log(s.pressure()) - target;
            if (mismatch > 0.0) {
                hi = Math.min(hi, lnRho);
            } else {
                lo = Math.max(lo, lnRho);
            }
            step = s.chiRho() > 0.0 ? -mismatch / s.chiRho() : -Math.signum(mismatch);
            step = Math.max(-MAX_STEP, Math.min(MAX_STEP, step));
            double next = lnRho + step;
            if (Math.abs(step) < TOLERANCE) {
                // Converged; tested before the bracket because a step below one ulp leaves next on its edge.
                return Math.abs(mismatch) < 1e-13 ? s : eos.at(next);
            }
            if (!(next > lo && next < hi) && Double.isFinite(lo) && Double.isFinite(hi)) {
                next = 0.5 * (lo + hi);
            }
            lnRho = next;
        }
        throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                "density for P = %s dyn cm^-2, T = %s K not found in %d iterations (last rho %s g cm^-3, step %s)",
                pressure, temperature, BUDGET, Math.exp(lnRho), step), pressure, temperature, BUDGET, step);
    }
}
