package org.convgrid.engine.units;

/**
 * Physical constants in cgs units, CODATA 2018 (Tiesinga, Mohr, Newell &amp; Taylor 2021, RMP 93, 025010),
 * and the IAU 2015 nominal solar values (IAU 2015 Resolutions B2 and B3; Prša et al. 2016, AJ 152, 41).
 * This is the only place where these numbers are written.
 */
public final class Constants {

    /** Newtonian constant of gravitation, cm^3 g^-1 s^-2 (CODATA 2018: 6.67430e-11 m^3 kg^-1 s^-2). */
    public static final double G = 6.67430e-8;
    /** Speed of light in vacuum, cm s^-1 (exact). */
    public static final double C = 2.99792458e10;
    /** Planck constant, erg s (exact). */
    public static final double H = 6.62607015e-27;
    /** Reduced Planck constant h/(2 pi), erg s. */
    public static final double HBAR = H / (2.0 * Math.PI);
    /** Boltzmann constant, erg K^-1 (exact). */
    public static final double K_B = 1.380649e-16;
    /** Electron mass, g (CODATA 2018; CODATA 2022 changed it, so the edition is pinned here). */
    public static final double M_E = 9.1093837015e-28;
    /** Atomic mass constant, g (CODATA 2018). */
    public static final double M_U = 1.66053906660e-24;
    /** Proton mass, g (CODATA 2018). */
    public static final double M_P = 1.67262192369e-24;
    /** Elementary charge, esu (CODATA 2018 e = 1.602176634e-19 C, times 10 c in esu per coulomb). */
    public static final double E_CHARGE = 1.602176634e-19 * 2.99792458e9;
    /** Avogadro constant, mol^-1 (exact). */
    public static final double N_A = 6.02214076e23;
    /** Electron volt, erg (exact). */
    public static final double EV = 1.602176634e-12;
    /** Mega electron volt, erg. */
    public static final double MEV = 1.0e6 * EV;
    /** Stefan-Boltzmann constant, erg cm^-2 s^-1 K^-4 (exact from h, k, c). */
    public static final double SIGMA_SB = 5.670374419e-5;
    /** Radiation density constant a = 4 sigma / c, erg cm^-3 K^-4 (derived, exact). */
    public static final double A_RAD = 4.0 * SIGMA_SB / C;
    /** Thomson cross-section, cm^2 (CODATA 2018: 6.6524587321e-29 m^2). */
    public static final double SIGMA_THOMSON = 6.6524587321e-25;
    /** Mass of the 1H atom, atomic mass units (AME 2020). */
    public static final double MASS_H1_AMU = 1.007825031898;
    /** Mass of the 4He atom, atomic mass units (AME 2020). */
    public static final double MASS_HE4_AMU = 4.002603254130;
    /** Atomic mass constant energy equivalent m_u c^2, MeV (CODATA 2018). */
    public static final double M_U_C2_MEV = 931.49410242;

    /** Nominal solar radius, cm (IAU 2015 B3: 6.957e8 m). */
    public static final double R_SUN = 6.957e10;
    /** Nominal solar luminosity, erg s^-1 (IAU 2015 B3: 3.828e26 W). */
    public static final double L_SUN = 3.828e33;
    /** Nominal solar effective temperature, K (IAU 2015 B3). */
    public static final double TEFF_SUN = 5772.0;
    /** Nominal solar mass parameter GM, cm^3 s^-2 (IAU 2015 B3: 1.3271244e20 m^3 s^-2). */
    public static final double GM_SUN = 1.3271244e26;
    /** Solar mass, g: GM_SUN / G (relative uncertainty 2.2e-5 from G). */
    public static final double M_SUN = GM_SUN / G;

    /** Seconds in one Julian year. */
    public static final double YEAR = 365.25 * 86400.0;
    /** Seconds in one gigayear (Julian). */
    public static final double GYR = 1.0e9 * YEAR;
    /** Seconds in one day. */
    public static final double DAY = 86400.0;

    private Constants() {
    }
}
