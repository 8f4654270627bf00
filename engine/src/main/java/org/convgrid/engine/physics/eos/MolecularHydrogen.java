package org.convgrid.engine.physics.eos;

import org.convgrid.engine.units.Constants;

/**
 * Dissociation equilibrium of molecular hydrogen, H2 = 2 H, for cool envelopes and
 * photospheres of M dwarfs. Law of mass action with ideal-gas partition functions:
 * <pre>
 *   n_H^2 / n_H2 = K(T) = (pi m_H k T/h^2)^(3/2) (U_H^2/U_H2) exp(-D0/kT)
 * </pre>
 * (reduced mass m_H/2; U_H = 2, the electron spin; U_H2 = U_rot U_vib with the rigid-rotor high-temperature
 * limit U_rot = T/(2 theta_rot), symmetry number 2, and the harmonic oscillator U_vib = 1/(1 - exp(-theta_vib/T))
 * counted from v = 0, so D0 is the dissociation energy from the ground vibrational level). The internal energy of
 * a molecule above its ground level is kT (rotation) + k theta_vib/(exp(theta_vib/T) - 1) (vibration), and
 * T dlnU_H2/dT = 1 + (theta_vib/T)/(exp(theta_vib/T) - 1) is the same thing divided by kT, as consistency demands.
 *
 * <p>Data (Huber &amp; Herzberg 1979, Constants of Diatomic Molecules; from memory): D0 = 4.478 eV,
 * B_e = 60.85 cm^-1 (theta_rot = hcB/k = 87.6 K), omega_e = 4401 cm^-1 (theta_vib = 6332 K). The rigid-rotor,
 * harmonic U_H2 is too small by tens of per cent above ~3000 K (rotation-vibration coupling, anharmonicity), which
 * makes K too large by the same factor: dissociation is placed a few per cent too low in temperature.
 */
final class MolecularHydrogen {

    /** Dissociation energy from v = 0, eV (Huber &amp; Herzberg 1979; from memory; checked in tests). */
    static final double DISSOCIATION_ENERGY_EV = 4.478;
    /** Rotational temperature, K. */
    static final double THETA_ROT = 87.6;
    /** Vibrational temperature, K. */
    static final double THETA_VIB = 6332.0;
    /** Mass of the hydrogen atom, g (1H atomic mass, CODATA/AME). */
    static final double ATOM_MASS = Constants.MASS_H1_AMU * Constants.M_U;
    /**
     * Temperature scale of the switch-off S(T) = exp(-(T/T_s)^4), K. Our choice, not physics: it stands in for the
     * pressure dissociation of H2 (not modelled) so that no molecules survive in hot dense envelopes; it changes K
     * by less than 3 % below 4000 K (6 % at 5000 K). S is part of the molecule's partition function, so its energy carries
     * kT T dlnS/dT and P, u stay consistent.
     */
    static final double SWITCH_TEMPERATURE = 1.0e4;
    /** Above this temperature molecules are ignored (S &lt; 1e-100 there). */
    static final double MAX_TEMPERATURE = 4.0e4;

    private static final double TRANSLATIONAL = Math.PI * ATOM_MASS * Constants.K_B / (Constants.H * Constants.H);

    private static final double LN_FOUR = Math.log(4.0);

    private MolecularHydrogen() {
    }

    /** ln K(T), K = n_H^2/n_H2 in cm^-3. */
    static double lnDissociationConstant(double temperature) {
        double lnTranslational = 1.5 * Math.log(TRANSLATIONAL * temperature);
        double lnRot = Math.log(temperature / (2.0 * THETA_ROT));
        // ln(1 - e^-v) with v >= THETA_VIB/MAX_TEMPERATURE = 0.16: 1 - e^-v >= 0.15 loses no digits, so the
        // intrinsic log serves (log1p is a native call on this JDK, several times slower)
        double lnVib = -Math.log(1.0 - Math.exp(-THETA_VIB / temperature));
        return lnTranslational + LN_FOUR - lnRot - lnVib
                - DISSOCIATION_ENERGY_EV * Constants.EV / (Constants.K_B * temperature);
    }

    /** ln K(T) of the EOS: the ideal-gas constant divided by the switch-off S(T). */
    static double lnSwitchedConstant(double temperature) {
        return lnDissociationConstant(temperature) + switchExponent(temperature);
    }

    /**
     * n_H/K of {@link #lnSwitchedConstant} (the pairing of the equation of state), for {@code atoms} hydrogen nuclei
     * per cm^3, as a product with one exponential instead of the four logarithms of ln K: K = 4 (pi m_H k T/h^2)^(3/2)
     * (2 theta_rot/T) (1 - e^-v) e^(-D0/kT) e^((T/T_s)^4), v = theta_vib/T, the same constant (rounding apart).
     *
     * @param atoms hydrogen nuclei per cm^3
     * @param vibration e^v, {@link #vibrationalFactor}
     */
    static double pairing(double atoms, double temperature, double vibration) {
        double translational = TRANSLATIONAL * temperature;
        double rotation = temperature / (2.0 * THETA_ROT);
        return atoms * rotation * vibration
                / (4.0 * translational * Math.sqrt(translational) * (vibration - 1.0))
                * Math.exp(DISSOCIATION_ENERGY_EV * Constants.EV / (Constants.K_B * temperature)
                        - switchExponent(temperature));
    }

    /**
     * e^v with v = theta_vib/T, the one exponential that the vibrational share, the energy slope and
     * {@link #pairing} share: a caller that needs several of them computes it once and passes it on.
     */
    static double vibrationalFactor(double temperature) {
        return Math.exp(THETA_VIB / temperature);
    }

    /** Internal (rotation + vibration) energy of one molecule above its ground level, erg, ideal gas. */
    static double internalEnergy(double temperature) {
        return internalEnergy(temperature, vibrationalShare(temperature));
    }

    /**
     * v/(e^v - 1) with v = THETA_VIB/T, the vibrational term that the energy, its slope and the slope of the
     * constant share: a caller that needs several of them computes it once and passes it on.
     */
    static double vibrationalShare(double temperature) {
        return vibrationalShare(temperature, vibrationalFactor(temperature));
    }

    /** As {@link #vibrationalShare(double)}, with {@link #vibrationalFactor} already known. */
    static double vibrationalShare(double temperature, double vibration) {
        // e^v - 1 with v >= 0.16 where the equation of state asks (below MAX_TEMPERATURE): no digits lost that
        // matter, and the intrinsic exp is several times cheaper than the native expm1 of this JDK
        return THETA_VIB / temperature / (vibration - 1.0);
    }

    private static double internalEnergy(double temperature, double share) {
        return Constants.K_B * temperature * (1.0 + share);
    }

    /**
     * d ln K/d ln T of {@link #lnSwitchedConstant}: 3/2 - 1 (translation, rotation) - (theta_vib/T)/(exp(theta_vib/T)
     * - 1) (vibration) + D0/kT + 4 (T/T_s)^4 (switch-off). Equals (3/2 kT - E_m)/kT with E_m the molecule's energy
     * {@link #switchedInternalEnergy} - D0 (van 't Hoff: the reaction energy of H2 = 2 H at fixed volume).
     */
    static double lnSwitchedConstantSlope(double temperature) {
        return lnSwitchedConstantSlope(temperature, vibrationalShare(temperature));
    }

    /** As {@link #lnSwitchedConstantSlope(double)}, with {@link #vibrationalShare} already known. */
    static double lnSwitchedConstantSlope(double temperature, double share) {
        return 0.5 - share + DISSOCIATION_ENERGY_EV * Constants.EV / (Constants.K_B * temperature)
                + 4.0 * switchExponent(temperature);
    }

    /**
     * d/d ln T of {@link #switchedInternalEnergy}, erg: kT (1 + v^2 e^v/(e^v - 1)^2 - 20 (T/T_s)^4), v = theta_vib/T
     * (rotation, the harmonic-oscillator heat capacity, and the switch-off term).
     */
    static double switchedInternalEnergySlope(double temperature) {
        double vibration = vibrationalFactor(temperature);
        return switchedInternalEnergySlope(temperature, vibrationalShare(temperature, vibration), vibration);
    }

    /**
     * As {@link #switchedInternalEnergySlope(double)}, with {@link #vibrationalFactor} and {@link #vibrationalShare}
     * already known.
     */
    static double switchedInternalEnergySlope(double temperature, double share, double vibration) {
        return Constants.K_B * temperature * (1.0 + share * share * vibration - 20.0 * switchExponent(temperature));
    }

    /** Internal energy including the switch-off term kT T dlnS/dT = -4 kT (T/T_s)^4, erg. */
    static double switchedInternalEnergy(double temperature) {
        return switchedInternalEnergy(temperature, vibrationalShare(temperature));
    }

    /** As {@link #switchedInternalEnergy(double)}, with {@link #vibrationalShare} already known. */
    static double switchedInternalEnergy(double temperature, double share) {
        return internalEnergy(temperature, share) - 4.0 * Constants.K_B * temperature * switchExponent(temperature);
    }

    private static double switchExponent(double temperature) {
        double w = temperature / SWITCH_TEMPERATURE;
        double w2 = w * w;
        return w2 * w2;
    }
}
