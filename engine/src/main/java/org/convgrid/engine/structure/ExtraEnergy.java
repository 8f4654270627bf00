package org.convgrid.engine.structure;

import org.convgrid.engine.physics.eos.EosState;

/**
 * An energy source per unit mass besides nuclear burning, added to dL/dm: for evolution the gravothermal term
 * eps_grav = -du/dt - P dv/dt (Kippenhahn, Weigert &amp; Weiss 2012, ch. 4), computed from the previous time
 * step's state of the shell and the trial state. Implementations must be smooth in the state and
 * thread-safe. The solver uses {@link #withSlopes} when it gives derivatives; otherwise it differentiates
 * {@link #at} numerically (which costs two more equation-of-state calls per point and iteration).
 */
public interface ExtraEnergy {

    /** No extra source: the thermal-equilibrium (zero-age) case. */
    ExtraEnergy NONE = new ExtraEnergy() {
        @Override
        public double at(int shell, EosState state) {
            return 0.0;
        }

        @Override
        public Rate withSlopes(int shell, EosState state) {
            return Rate.ZERO;
        }
    };

    /**
     * The source and its logarithmic derivatives.
     *
     * @param value erg g^-1 s^-1
     * @param dLnRho d value / d ln rho at fixed T, erg g^-1 s^-1
     * @param dLnT d value / d ln T at fixed rho, erg g^-1 s^-1
     */
    record Rate(double value, double dLnRho, double dLnT) {
        public static final Rate ZERO = new Rate(0.0, 0.0, 0.0);
    }

    /**
     * @param shell mesh point index
     * @param state trial thermodynamic state of that point
     * @return erg g^-1 s^-1
     */
    double at(int shell, EosState state);

    /**
     * The value of {@link #at} with its derivatives with respect to the point's ln rho and ln T, or null when
     * this source has no analytic derivatives (the default). The value must equal {@code at(shell, state)}; the
     * derivatives need only be accurate enough for Newton's method (they set its convergence rate, not the
     * solution).
     */
    default Rate withSlopes(int shell, EosState state) {
        return null;
    }
}
