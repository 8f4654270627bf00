package org.convgrid.output.profile;

import java.util.List;
import org.convgrid.output.EcsvColumn;

/** The columns of a profile file (centre-to-surface rows): the only place their names and descriptions are spelled. */
public final class ProfileColumns {

    public static final String MASS_FRAC = "mass_frac";
    public static final String RADIUS_FRAC = "radius_frac";
    public static final String PRESSURE_CGS = "pressure_cgs";
    public static final String TEMP_K = "temp_k";
    public static final String DENSITY_CGS = "density_cgs";
    public static final String LUMINOSITY_LSUN = "luminosity_lsun";
    public static final String KAPPA_CGS = "kappa_cgs";
    public static final String EPS_NUC_CGS = "eps_nuc_cgs";
    public static final String NABLA = "nabla";
    public static final String NABLA_AD = "nabla_ad";
    public static final String NABLA_RAD = "nabla_rad";
    /** 1 where convective, 0 where radiative (numeric so that charts can plot it). */
    public static final String CONVECTIVE = "convective";
    public static final String CONV_VELOCITY_CGS = "conv_velocity_cgs";
    /** Radius in cm: r/R alone cannot be compared between models. */
    public static final String RADIUS_CM = "radius_cm";
    /** The first adiabatic exponent (d ln P / d ln rho at constant entropy), from the equation of state. */
    public static final String GAMMA1 = "gamma1";
    /** Adiabatic sound speed sqrt(Gamma1 P / rho), cm s^-1. */
    public static final String SOUND_SPEED_CGS = "sound_speed_cgs";
    /** Hydrogen mass fraction at the shell. */
    public static final String H_FRAC = "h_frac";
    /** Mean molecular weight (atomic mass units per free particle), from the equation of state. */
    public static final String MU = "mu";
    /** Helium-3 mass fraction at the shell. */
    public static final String HE3_FRAC = "he3_frac";
    /** Squared buoyancy (Brunt-Vaisala) frequency N^2, s^-2; negative where superadiabatic. */
    public static final String BUOYANCY_N2_CGS = "buoyancy_n2_cgs";
    /**
     * (M - m)/M, the mass above the shell over the star's: near the surface, where seismic work needs the mass
     * coordinate, mass_frac differs from 1 only in its last digits (down to ~1e-12 of the mass; it read 1 over the
     * outer few per cent of the radius when profiles had seven digits); this one keeps its relative precision there.
     */
    public static final String EXTERIOR_MASS_FRAC = "exterior_mass_frac";

    /** What separates the names in {@link #HEADER_NAMED}. */
    private static final String NAME_SEPARATOR = ", ";

    /**
     * The header, in order, as one text: a compile-time constant, so that annotations (the {@code star --profile}
     * help) can name every column and a new column reaches them without a second list to keep in step.
     */
    public static final String HEADER_NAMED = MASS_FRAC + NAME_SEPARATOR + RADIUS_FRAC + NAME_SEPARATOR
            + PRESSURE_CGS + NAME_SEPARATOR + TEMP_K + NAME_SEPARATOR + DENSITY_CGS + NAME_SEPARATOR
            + LUMINOSITY_LSUN + NAME_SEPARATOR + KAPPA_CGS + NAME_SEPARATOR + EPS_NUC_CGS + NAME_SEPARATOR
            + NABLA + NAME_SEPARATOR + NABLA_AD + NAME_SEPARATOR + NABLA_RAD + NAME_SEPARATOR + CONVECTIVE
            + NAME_SEPARATOR + CONV_VELOCITY_CGS + NAME_SEPARATOR + RADIUS_CM + NAME_SEPARATOR + GAMMA1
            + NAME_SEPARATOR + SOUND_SPEED_CGS + NAME_SEPARATOR + H_FRAC + NAME_SEPARATOR + MU + NAME_SEPARATOR
            + HE3_FRAC + NAME_SEPARATOR + BUOYANCY_N2_CGS + NAME_SEPARATOR + EXTERIOR_MASS_FRAC;

    /** The header, in order: {@link #HEADER_NAMED}, the one list of the columns. */
    public static final List<String> HEADER = List.of(HEADER_NAMED.split(NAME_SEPARATOR));

    private static final String REAL = "float64";

    /**
     * Every column with its astropy unit, ECSV datatype and one-line description, in {@link #HEADER} order: the
     * profile's ECSV header.
     */
    public static final List<EcsvColumn> DESCRIBED = List.of(
            new EcsvColumn(MASS_FRAC, "", REAL, "m/M: mass inside the shell over the total mass (meta mass_g)"),
            new EcsvColumn(RADIUS_FRAC, "", REAL, "r/R: radius over the photospheric radius (meta radius_cm)"),
            new EcsvColumn(PRESSURE_CGS, "dyn / cm2", REAL, "total pressure, gas and radiation"),
            new EcsvColumn(TEMP_K, "K", REAL, "temperature"),
            new EcsvColumn(DENSITY_CGS, "g / cm3", REAL, "density"),
            new EcsvColumn(LUMINOSITY_LSUN, "solLum", REAL,
                    "luminosity through the shell over meta solar_luminosity_cgs"),
            new EcsvColumn(KAPPA_CGS, "cm2 / g", REAL, "Rosseland mean opacity"),
            new EcsvColumn(EPS_NUC_CGS, "erg / (g s)", REAL, "nuclear energy generation rate"),
            new EcsvColumn(NABLA, "", REAL, "actual temperature gradient d ln T / d ln P"),
            new EcsvColumn(NABLA_AD, "", REAL, "adiabatic temperature gradient"),
            new EcsvColumn(NABLA_RAD, "", REAL, "radiative temperature gradient"),
            new EcsvColumn(CONVECTIVE, "", "int64",
                    "1 where convectively unstable under the model's criterion, 0 where radiative"),
            new EcsvColumn(CONV_VELOCITY_CGS, "cm / s", REAL, "mixing-length convective velocity; 0 where radiative"),
            new EcsvColumn(RADIUS_CM, "cm", REAL, "radius"),
            new EcsvColumn(GAMMA1, "", REAL,
                    "first adiabatic exponent (d ln P / d ln rho)_s, from the equation of state"),
            new EcsvColumn(SOUND_SPEED_CGS, "cm / s", REAL, "adiabatic sound speed sqrt(gamma1 P / rho)"),
            new EcsvColumn(H_FRAC, "", REAL, "hydrogen mass fraction"),
            new EcsvColumn(MU, "", REAL, "mean molecular weight, atomic mass units per free particle"),
            new EcsvColumn(HE3_FRAC, "", REAL, "helium-3 mass fraction"),
            new EcsvColumn(BUOYANCY_N2_CGS, "1 / s2", REAL,
                    "squared buoyancy frequency N^2; negative where superadiabatic"),
            new EcsvColumn(EXTERIOR_MASS_FRAC, "", REAL, "(M - m)/M: mass above the shell over the total mass"));

    /**
     * The columns added after the first profiles, in the order they came: profiles written before a column existed
     * lack it, and read it as NaN.
     */
    public static final List<String> OPTIONAL = List.of(RADIUS_CM, GAMMA1, SOUND_SPEED_CGS, H_FRAC, MU, HE3_FRAC,
            BUOYANCY_N2_CGS, EXTERIOR_MASS_FRAC);

    /** The columns every readable profile has: all but the {@link #OPTIONAL} ones. */
    public static final List<String> REQUIRED = HEADER.subList(0, HEADER.size() - OPTIONAL.size());

    private ProfileColumns() {
    }
}
