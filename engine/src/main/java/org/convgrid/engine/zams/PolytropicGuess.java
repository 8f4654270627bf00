package org.convgrid.engine.zams;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.LaneEmden;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.PolytropicProfile;
import org.convgrid.engine.units.Constants;

/**
 * A cold-start guess for a main-sequence star: a polytrope (n = 3, or n = 1.5 below
 * {@link #FULLY_CONVECTIVE_GUESS_MASS}) scaled to a rough main-sequence radius and luminosity, ideal-gas
 * temperatures, and L(m) following eps ~ rho T^nu. The polytrope is cut where T falls to the guessed Teff.
 * Only a starting point for the Henyey relaxation. Immutable and thread-safe.
 */
public final class PolytropicGuess {

    /** Below this mass (Msun) the guess is an n = 1.5 polytrope, otherwise n = 3. */
    public static final double FULLY_CONVECTIVE_GUESS_MASS = 0.4;
    /** m/M of the innermost mesh point. */
    public static final double CENTRAL_MASS_FRACTION = 1.0e-6;

    private static final LaneEmden N15 = LaneEmden.solve(1.5);
    private static final LaneEmden N3 = LaneEmden.solve(3.0);

    private final int points;

    public PolytropicGuess(int points) {
        this.points = points;
    }

    /**
     * @param mass total mass, g
     * @param composition homogeneous composition
     */
    public ModelState guess(double mass, Composition composition) {
        double m = mass / Constants.M_SUN;
        LaneEmden le = m < FULLY_CONVECTIVE_GUESS_MASS ? N15 : N3;
        double n = le.index();
        double radius = Constants.R_SUN * (m < 1.0 ? Math.pow(m, 0.9) : Math.pow(m, 0.75));
        double lum = Constants.L_SUN * roughLuminosity(m);
        double teff = Math.pow(lum / (4 * Math.PI * radius * radius * Constants.SIGMA_SB), 0.25);
        double xi1 = le.firstZero();
        double omega = le.massConstant();
        double rhoC = mass / (4.0 * Math.PI * radius * radius * radius) * 3.0 * xi1 * xi1 * xi1 / (3.0 * omega);
        double alpha = radius / xi1;
        double k = 4.0 * Math.PI * Constants.G * alpha * alpha * Math.pow(rhoC, 1.0 - 1.0 / n) / (n + 1.0);
        double mu = 4.0 / (3.0 + 5.0 * composition.x() - composition.z());
        double tC = k * Math.pow(rhoC, 1.0 / n) * mu * Constants.M_U / Constants.K_B;
        PolytropicProfile profile = PolytropicProfile.of(le, points, CENTRAL_MASS_FRACTION,
                Math.min(0.5, teff / tC));
        double nu = m < 1.3 ? 4.0 : 16.0;
        return profile.state(mass, alpha, rhoC, tC, n + nu, lum, composition);
    }

    /**
     * A rough main-sequence mass-luminosity relation, L/Lsun for M/Msun (common textbook piecewise power law,
     * no single source; only a starting guess).
     */
    static double roughLuminosity(double m) {
        if (m < 0.43) {
            return 0.23 * Math.pow(m, 2.3);
        } else if (m < 2.0) {
            return Math.pow(m, 4.0);
        } else if (m < 55.0) {
            return 1.4 * Math.pow(m, 3.5);
        }
        return 32000.0 * m;
    }
}
