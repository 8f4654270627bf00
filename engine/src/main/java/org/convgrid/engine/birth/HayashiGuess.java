package org.convgrid.engine.birth;

import org.convgrid.engine.convection.ConvectiveTransport;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.atmosphere.SurfaceCondition;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.LaneEmden;
import org.convgrid.engine.structure.LayerGradient;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.PolytropicProfile;
import org.convgrid.engine.units.Constants;

/**
 * The first guess of a start model: an n = 1.5 polytrope (a fully convective ideal-gas star, Chandrasekhar 1939,
 * An Introduction to the Study of Stellar Structure, ch. IV) with the radius that gives the requested central
 * temperature, T_c = (mu m_u/k) P_c/rho_c, ideal-gas temperatures, a surface at {@link #GUESS_EFFECTIVE_TEMPERATURE}
 * (the Hayashi track of young low-mass stars lies near 4000 K; common practice, only a guess) and L(m)
 * proportional to the integral of T dm, as homologous contraction releases energy in proportion to c_P T.
 *
 * <p>Its outer layers are those of a convective envelope below the physics' atmosphere: the last
 * {@link #ENVELOPE_POINTS} mesh points lie evenly in ln(1 - m/M) from the polytrope's outermost interior point to
 * where the pressure is {@link #OUTER_PRESSURE_EXCESS} above the atmosphere's, with P = P_atm + G M^2 (1 - m/M) /
 * (4 pi R^4) (hydrostatic equilibrium at r = R) and T integrated from the atmosphere's fitting point inward with
 * dln T = nabla dln P, nabla the physics' own ({@link LayerGradient}): the convective gradient of its
 * {@link ConvectiveTransport} where the radiative one (with the guess's luminosity) exceeds nabla_ad, else the
 * radiative one. It replaces the polytrope's
 * temperature wherever it is hotter. The bare polytrope (1 Msun, Z = 0.02) has its last interior point at
 * m/M = 1 - 6e-5 with 4300 K and its surface density 4 e-folds above the relaxed model's, which has 15 000 K there
 * and 113 of its 500 points further out (hydrogen ionisation and the atmosphere): relaxing it took 26 Newton
 * iterations and a remesh pass 23 more, with the relaxation aid (with the physics it failed). An adiabatic envelope
 * (nabla_ad throughout) took 20 with the physics and 3 after its remesh: it lacks the superadiabatic layer below
 * the photosphere, where convection in the thin gas carries the flux only with nabla well above nabla_ad, and the
 * relaxation built that layer; with it the first relaxation takes 4 (measured; whole start models 1 Msun 31 -> 15
 * iterations, 3 Msun 31 -> 19, 10 Msun 54 -> 40 at Z = 0.02; 0.5-10 Msun at Z 0.004-0.04 save 4-16 each,
 * 0.2-0.3 Msun 0-2, Z = 1e-4 0-1; 0.1-0.15 Msun at Z >= 0.004 cost 0-7 more). Only a starting point for the
 * relaxation.
 * Immutable and thread-safe.
 */
final class HayashiGuess {

    /** Effective temperature of the guess, K. */
    static final double GUESS_EFFECTIVE_TEMPERATURE = 4000.0;
    /** m/M of the innermost mesh point. */
    static final double CENTRAL_MASS_FRACTION = 1.0e-6;
    /** Mesh points of the envelope (of the planner's 500, the relaxed models have ~110 in the same layers). */
    static final int ENVELOPE_POINTS = 80;
    /**
     * The envelope's last point below the surface: P this fraction above the atmosphere's. The remesh passes keep
     * the outermost interval, and tracks from birth depend on it: with 0.01 (1 - m/M = 7e-9 at 0.5 Msun) the
     * 0.5 Msun, Z = 0.02 track took 88 steps to 100 Myr instead of 89 and its energy closure moved 0.98 -> 1.005 %,
     * the 1 Msun surface lithium at 1 Gyr 10^-0.94 -> 10^-0.86. At 4e-4 the point lies where the relaxed models of the
     * bare polytrope had it (2.5e-10, was 2.6e-10) and those tracks are unchanged (measured).
     */
    static final double OUTER_PRESSURE_EXCESS = 4.0e-4;
    /** Integration steps of the envelope's temperature between two mesh points. */
    static final int ENVELOPE_SUBSTEPS = 4;

    private static final LaneEmden N15 = LaneEmden.solve(1.5);

    private final int points;
    private final PhysicsSet physics;
    /** The envelope's dln T/dln P (the birth composition is homogeneous). */
    private final LayerGradient gradient;

    /**
     * @param points mesh points, more than {@link #ENVELOPE_POINTS} + 10
     * @param physics its equation of state and atmosphere shape the envelope
     */
    HayashiGuess(int points, PhysicsSet physics) {
        if (points < ENVELOPE_POINTS + 10) {
            throw new IllegalArgumentException("need at least " + (ENVELOPE_POINTS + 10) + " points, got " + points);
        }
        this.points = points;
        this.physics = physics;
        this.gradient = new LayerGradient(physics);
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
        // the polytrope's own surface point is replaced by the envelope
        PolytropicProfile profile = PolytropicProfile.of(N15, points - ENVELOPE_POINTS + 1, CENTRAL_MASS_FRACTION,
                Math.min(0.5, GUESS_EFFECTIVE_TEMPERATURE / centralTemperature));
        // contraction releases energy roughly where the gas is hot: a source proportional to T
        ModelState polytrope = profile.state(mass, alpha, rhoC, centralTemperature, 1.0, lum, composition);
        return withEnvelope(polytrope, mass, radius, composition);
    }

    private ModelState withEnvelope(ModelState polytrope, double mass, double radius, Composition composition) {
        SurfaceCondition atmosphere = physics.surface().at(GUESS_EFFECTIVE_TEMPERATURE,
                Constants.G * mass / (radius * radius), composition);
        double surfacePressure = Math.exp(atmosphere.lnPressure());
        // dP/d(1 - m/M) = G M^2/(4 pi r^4) at r = R
        double pressureScale = Constants.G * mass * mass / (4.0 * Math.PI * Math.pow(radius, 4));
        int kept = polytrope.size() - 1;
        MassMesh inner = polytrope.mesh();
        double[] q = new double[points];
        double[] e = new double[points];
        double[] lnR = new double[points];
        double[] lnRho = new double[points];
        double[] lnT = new double[points];
        double[] lum = new double[points];
        Composition[] comp = new Composition[points];
        for (int k = 0; k < kept; k++) {
            q[k] = inner.fraction(k);
            e[k] = inner.exteriorFraction(k);
            lnR[k] = polytrope.lnRadius(k);
            lnRho[k] = polytrope.lnDensity(k);
            lnT[k] = polytrope.lnTemperature(k);
            lum[k] = polytrope.luminosity(k);
        }
        double join = e[kept - 1];
        double outermost = Math.min(0.1 * join, OUTER_PRESSURE_EXCESS * surfacePressure / pressureScale);
        for (int i = 1; i <= ENVELOPE_POINTS; i++) {
            int k = kept - 1 + i;
            e[k] = i == ENVELOPE_POINTS ? 0.0 : join * Math.pow(outermost / join, i / (ENVELOPE_POINTS - 1.0));
            q[k] = 1.0 - e[k];
            lnR[k] = polytrope.lnRadius(kept);
            lum[k] = polytrope.surfaceLuminosity();
        }
        // the envelope's gradient from the atmosphere's fitting point inward, until the polytrope is the hotter
        double lnP = atmosphere.lnPressure();
        double lnTa = atmosphere.lnTemperature();
        double surfaceLum = polytrope.surfaceLuminosity();
        for (int k = points - 1; k >= 0; k--) {
            double lnPk = Math.log(surfacePressure + pressureScale * e[k]);
            for (int sub = 0; sub < ENVELOPE_SUBSTEPS && lnPk > lnP; sub++) {
                double step = (lnPk - lnP) / (ENVELOPE_SUBSTEPS - sub);
                // the structure equations' gradient at m = M, r = R and the guess's surface luminosity
                EosState layer = physics.eos().atPressure(Math.exp(lnP), Math.exp(lnTa), composition);
                lnTa += step * gradient.nabla(layer, composition, mass, radius, surfaceLum);
                lnP += step;
            }
            if (k < kept && lnTa <= lnT[k]) {
                break;
            }
            EosState gas = physics.eos().atPressure(Math.exp(lnP), Math.exp(lnTa), composition);
            lnT[k] = lnTa;
            lnRho[k] = Math.log(gas.density());
        }
        java.util.Arrays.fill(comp, composition);
        return new ModelState(MassMesh.ofFractions(mass, q, e), comp, lnR, lnRho, lnT, lum);
    }
}
