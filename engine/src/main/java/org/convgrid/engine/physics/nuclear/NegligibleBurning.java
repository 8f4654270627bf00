package org.convgrid.engine.physics.nuclear;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Where hydrogen burning releases no energy that matters: gas too cool for any reaction of the network to overcome
 * its Coulomb barrier. Charged-particle rates fall as exp(-3 E_0/kT) with the Gamow peak's E_0 ~ T^(1/3) (Clayton
 * 1968, Principles of Stellar Evolution and Nucleosynthesis, ch. 4), so below some temperature every rate is
 * negligible; taking the energy generation there as zero, instead of evaluating nine screened reactions, is common
 * practice (no single source). {@link HydrogenBurningNetwork#energy} does so (the structure equations' call); the
 * composition rates ({@link HydrogenBurningNetwork#burn}) are always evaluated when asked for, and the network
 * states their bound ({@link #RATE_BOUND}, {@link HydrogenBurningNetwork#rateBound}) for a caller that can tell when
 * they cannot matter (the composition step). Why: in a contracting pre-main-sequence star and in the envelope of
 * every star about half of the mesh points are that cool (1 Msun, Z = 0.02: 137 of the start model's 250 points, 116-171 of 250-300
 * before the ZAMS, 234-240 of 500 on the main sequence), and the network was 10-13 % of the CPU of the
 * pre-main-sequence steps.
 *
 * <p>The bound: at density up to {@link #MAX_DENSITY} and temperature up to the floor (the lower {@link
 * #DEUTERIUM_FLOOR} where the composition holds deuterium, whose d(p,g) capture has the lowest barrier and burns from
 * ~1e6 K; {@link #FLOOR} elsewhere), {@link HydrogenBurningNetwork}'s energy generation is below {@link
 * #EPS_BOUND} for X 0.5-0.8, Z up to 0.06, 3He up to 1e-3, deuterium up to 1e-4 and 7Li up to 1e-7 (its largest
 * there, just below the floors at 1 g cm^-3, X = 0.8 and Z = 0.06: 6.6e-13 erg g^-1 s^-1 without deuterium,
 * 3.0e-14 with it; {@code NegligibleBurningTest}).
 * Over a whole star of 100 Msun that is at most 2e23 erg s^-1, 5e-11 of the Sun's luminosity; the cool layers hold a
 * small part of the mass, so the structure equations' luminosity moves by far less than their tolerance. Denser cool
 * gas (where screening grows strong) is never skipped. Pure and thread-safe (constants only).
 */
public final class NegligibleBurning {

    /** Upper bound of the network's energy generation wherever {@link #at} holds, erg g^-1 s^-1. */
    public static final double EPS_BOUND = 1.0e-12;
    /**
     * Upper bound of every composition rate |dX_i/dt| of the network wherever {@link #at} holds, s^-1, from
     * {@link #EPS_BOUND}: each reaction k (r_k moles per gram per second) releases Q_k and changes a mass fraction by
     * at most c_k r_k, c_k the largest mass-number coefficient of its rates in {@link HydrogenBurningNetwork#burn}
     * (p+p 3, 3He+3He 6, 3He+4He 4, 12C+p 14, 14N+p 14, 16O+p 16, d+p 3, 7Li+p 8), so every |dX_i/dt| is at most
     * max_k (c_k/Q_k) eps / (N_A MeV). The largest c_k/Q_k is the 16O leak's, 16 / 3.554 MeV (the others 0.45, 0.47,
     * 0.31, 1.27, 1.00, 0.55, 0.46 per MeV); derived, from the rates as the network writes them (4.7e-30 s^-1).
     */
    public static final double RATE_BOUND = 16.0 / ReactionEnergy.O16_TO_N14 * EPS_BOUND
            / (Constants.N_A * Constants.MEV);
    /** Highest density at which burning is taken as negligible, g cm^-3. */
    public static final double MAX_DENSITY = 1.0;
    /** Temperature below which burning is negligible where the composition holds no deuterium, K. */
    public static final double FLOOR = 5.0e5;
    /** Temperature below which burning is negligible where the composition holds deuterium, K. */
    public static final double DEUTERIUM_FLOOR = 1.0e5;

    private NegligibleBurning() {
    }

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param composition mass fractions
     * @return whether the network's energy generation here is below {@link #EPS_BOUND}, so it may be taken as zero
     */
    public static boolean at(double density, double temperature, Composition composition) {
        double floor = composition.h2() > 0.0 ? DEUTERIUM_FLOOR : FLOOR;
        return temperature < floor && density <= MAX_DENSITY;
    }
}
