package org.convgrid.engine.birth;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.LaneEmden;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.PolytropicProfile;
import org.convgrid.engine.units.Constants;

/**
 * The first guess of a start model: an n = 1.5 polytrope (a fully convective ideal-gas star, Chandrasekhar 1939,
 * An Introduction to the Study of Stellar Structure, ch. IV) with the radius that gives the requested central
 * temperature, T_c = (mu m_u/k) P_c/rho_c, ideal-gas temperatures, a surface at {@link #GUESS_EFFECTIVE_TEMPERATURE}
 * (the Hayashi track of young low-mass stars lies near 4000 K; common practice, only a guess) and L(m)
 * proportional to the integral of T dm, as homologous contraction releases energy in proportion to c_P T.
 * Only a starting point for the relaxation. Immutable and thread-safe.
 */
final class HayashiGuess {

    /** Effective temperature of the guess, K. */
    static final double GUESS_EFFECTIVE_TEMPERATURE = 4000.0;
    /** m/M of the innermost mesh point. */
    static final double CENTRAL_MASS_FRACTION = 1.0e-6;

    private static final LaneEmden N15 = LaneEmden.solve(1.5);

    private final int points;

    HayashiGuess(int points) {
        this.points = points;
    }

    /**
     * @param mass g
     * @param composition homogeneous composition
     * @param centralTemperature K
     */
    ModelState guess(double mass, Composition composition, double centralTemperature) {
        double n = 1.5;
        double xi1 = N15.firstZero();
        double omega = N15.massConstant();
        double mu = 4.0 / (3.0 + 5.0 * composition.x() - composition.z());
        // from P_c = K rho_c^(1+1/n) with the polytrope's mass and radius: T_c = G M mu m_u xi1 / ((n + 1) omega k R)
        double radius = Constants.G * mass * mu * Constants.M_U * xi1 / ((n + 1.0) * omega * Constants.K_B
                * centralTemperature);
        double lum = 4.0 * Math.PI * radius * radius * Constants.SIGMA_SB * Math.pow(GUESS_EFFECTIVE_TEMPERATURE, 4);
        double rhoC = mass / (4.0 * Math.PI * radius * radius * radius) * xi1 * xi1 * xi1 / omega;
        double alpha = radius / xi1;
        PolytropicProfile profile = PolytropicProfile.of(N15, points, CENTRAL_MASS_FRACTION,
                Math.min(0.5, GUESS_EFFECTIVE_TEMPERATURE / centralTemperature));
        // contraction releases energy roughly where the gas is hot: a source proportional to T
        return profile.state(mass, alpha, rhoC, centralTemperature, 1.0, lum, composition);
    }
}
