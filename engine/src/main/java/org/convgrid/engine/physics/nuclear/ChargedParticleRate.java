package org.convgrid.engine.physics.nuclear;

import org.convgrid.engine.units.Constants;

/**
 * Thermally averaged rate N_A&lt;sigma v&gt; of a non-resonant charged-particle reaction from its astrophysical
 * S-factor, by the Gamow-peak (saddle-point) integration.
 *
 * <p>With the Gamow energy {@code E_G = 2 mu m_u c^2 (pi alpha Z1 Z2)^2}, the peak sits at
 * {@code E_0 = (E_G (kT)^2 / 4)^(1/3)} and {@code tau = 3 E_0/kT}; then
 * {@code N_A<sigma v> = C S_eff tau^2 exp(-tau) / (mu Z1 Z2)} with
 * {@code C = 4 N_A^2 m_u (2/3) 3^(-3/2) / (pi alpha c m_u^2)}, about 4.339e8 for S in MeV b (derived here from
 * CODATA 2018 constants; the textbook values are tau = 4.2487 (Z1^2 Z2^2 mu/T9)^(1/3) and 4.339e8, e.g.
 * Clayton 1968, Principles of Stellar Evolution and Nucleosynthesis, ch. 4). The effective S-factor carries the
 * corrections of Fowler, Caughlan &amp; Zimmerman 1967 (ARA&amp;A 5, 525):
 * {@code S_eff = S(0) [1 + 5/(12 tau) + (S'/S)(E_0 + 35 kT/36) + (S''/2S)(E_0^2 + 89 E_0 kT/36)]}.
 *
 * <p>Valid while E_0 is well below the first resonance, i.e. for hydrogen burning up to T ~ 1e8 K.
 * Immutable and thread-safe; no allocation per evaluation.
 */
public final class ChargedParticleRate {

    /** kT in MeV at T9 = 1 (k_B 1e9 K / 1 MeV). */
    static final double KT_MEV_AT_T9 = Constants.K_B * 1.0e9 / Constants.MEV;
    /** Fine-structure constant e^2/(hbar c). */
    static final double FINE_STRUCTURE = Constants.E_CHARGE * Constants.E_CHARGE / (Constants.HBAR * Constants.C);
    /** m_u c^2 in MeV, from the cgs constants so that every coefficient uses one edition of CODATA. */
    static final double MU_C2_MEV = Constants.M_U * Constants.C * Constants.C / Constants.MEV;

    /** tau = GAMOW_TAU (Z1^2 Z2^2 mu / T9)^(1/3): 3 (pi^2 alpha^2 m_u c^2 / (2 kT(T9=1)))^(1/3), about 4.2487. */
    public static final double GAMOW_TAU = 3.0 * Math.cbrt(
            Math.PI * Math.PI * FINE_STRUCTURE * FINE_STRUCTURE * MU_C2_MEV / (2.0 * KT_MEV_AT_T9));

    /** N_A&lt;sigma v&gt; = RATE_PREFACTOR S[MeV b] tau^2 exp(-tau)/(mu Z1 Z2) in cm^3 mol^-1 s^-1; about 4.339e8. */
    public static final double RATE_PREFACTOR = 4.0 * (2.0 / 3.0) * Math.pow(3.0, -1.5)
            * (Constants.MEV * 1.0e-24) * Constants.N_A / Constants.M_U
            / (Math.PI * FINE_STRUCTURE * Constants.C);

    /**
     * Below this exponent (screening minus tau) the rate is taken as zero: e^-708 is the smallest exponential in the
     * normal range of a double, and the rates it gives (below ~1e-290 cm^3 mol^-1 s^-1, e.g. 3He + 3He at 5000 K)
     * are hundreds of orders of magnitude below any rate that matters, while arithmetic on the subnormal numbers
     * they produce downstream is some hundred times slower than on normal ones.
     */
    static final double MIN_EXPONENT = -708.0;

    /** The bracket's rational coefficients, as products (a division per use was a tenth of a burn). */
    private static final double ONE_THIRD = 1.0 / 3.0;
    private static final double FIVE_TWELFTHS = 5.0 / 12.0;
    private static final double FIVE_THIRTYSIXTHS = 5.0 / 36.0;
    private static final double THIRTYFIVE_THIRTYSIXTHS = 35.0 / 36.0;
    private static final double EIGHTYNINE_THIRTYSIXTHS = 89.0 / 36.0;
    private static final double FIVE_THIRDS_OF_89_36THS = 5.0 / 3.0 * 89.0 / 36.0;

    private final String name;
    private final int z1;
    private final int z2;
    private final double reducedMass;
    private final double sZero;
    private final double slope;
    private final double halfCurvature;
    private final double tauCoefficient;
    private final double prefactor;

    /**
     * @param name reaction label, e.g. "14N(p,g)15O"
     * @param z1 charge of the first nucleus
     * @param z2 charge of the second nucleus
     * @param reducedMass reduced mass, atomic mass units
     * @param sZero S(0), MeV b
     * @param slope S'(0)/S(0), MeV^-1
     * @param curvature S''(0)/S(0), MeV^-2
     */
    public ChargedParticleRate(String name, int z1, int z2, double reducedMass, double sZero, double slope,
                               double curvature) {
        if (z1 < 1 || z2 < 1 || !(reducedMass > 0.0) || !(sZero > 0.0)) {
            throw new IllegalArgumentException("bad reaction data for " + name);
        }
        this.name = name;
        this.z1 = z1;
        this.z2 = z2;
        this.reducedMass = reducedMass;
        this.sZero = sZero;
        this.slope = slope;
        this.halfCurvature = 0.5 * curvature;
        this.tauCoefficient = GAMOW_TAU * Math.cbrt((double) z1 * z1 * z2 * z2 * reducedMass);
        this.prefactor = RATE_PREFACTOR * sZero / (reducedMass * z1 * z2);
    }

    /**
     * @param t9 temperature in units of 1e9 K
     * @param cbrtT9 its cube root (passed in because one burn shares it between all reactions)
     * @return N_A&lt;sigma v&gt;, cm^3 mol^-1 s^-1, unscreened
     */
    public double rate(double t9, double cbrtT9) {
        return rate(t9, cbrtT9, 0.0);
    }

    /**
     * The rate times a screening factor exp(screeningExponent), folded into one exponential.
     *
     * @param t9 temperature in units of 1e9 K
     * @param cbrtT9 its cube root
     * @param screeningExponent H = ln f
     * @return f N_A&lt;sigma v&gt;, cm^3 mol^-1 s^-1
     */
    public double rate(double t9, double cbrtT9, double screeningExponent) {
        double tau = tauCoefficient / cbrtT9;
        double exponent = screeningExponent - tau;
        return exponent < MIN_EXPONENT ? 0.0 : prefactor * correction(tau, t9) * tau * tau * Math.exp(exponent);
    }

    /** d ln(N_A&lt;sigma v&gt;)/d ln T at the given temperature (same arguments as {@link #rate}). */
    public double dlnRateDlnT(double t9, double cbrtT9) {
        double tau = tauCoefficient / cbrtT9;
        return slope(tau, t9, correction(tau, t9));
    }

    /**
     * {@link #rate(double, double, double)} into {@code out[0]} and {@link #dlnRateDlnT} into {@code out[1]}, with
     * tau and the S-factor bracket evaluated once (the same values to the last bit).
     */
    public void rateAndSlope(double t9, double cbrtT9, double screeningExponent, double[] out) {
        double tau = tauCoefficient / cbrtT9;
        double bracket = correction(tau, t9);
        double exponent = screeningExponent - tau;
        out[0] = exponent < MIN_EXPONENT ? 0.0 : prefactor * bracket * tau * tau * Math.exp(exponent);
        out[1] = slope(tau, t9, bracket);
    }

    /** d ln rate/d ln T given tau and the bracket at this temperature. */
    private double slope(double tau, double t9, double bracket) {
        double kt = KT_MEV_AT_T9 * t9;
        double e0 = tau * kt * ONE_THIRD;
        // tau ~ T^(-1/3), E_0 ~ T^(2/3), kT ~ T: differentiate the bracket term by term.
        double dBracket = FIVE_THIRTYSIXTHS / tau
                + slope * (2.0 / 3.0 * e0 + THIRTYFIVE_THIRTYSIXTHS * kt)
                + halfCurvature * (4.0 / 3.0 * e0 * e0 + FIVE_THIRDS_OF_89_36THS * e0 * kt);
        return (tau - 2.0) * ONE_THIRD + dBracket / bracket;
    }

    /** S_eff/S(0), the bracket of Fowler, Caughlan &amp; Zimmerman 1967. */
    double correction(double tau, double t9) {
        double kt = KT_MEV_AT_T9 * t9;
        double e0 = tau * kt * ONE_THIRD;
        return 1.0 + FIVE_TWELFTHS / tau + slope * (e0 + THIRTYFIVE_THIRTYSIXTHS * kt)
                + halfCurvature * (e0 * e0 + EIGHTYNINE_THIRTYSIXTHS * e0 * kt);
    }

    /** tau at T9 = 1: the coefficient of T9^(-1/3) in the exponent. */
    public double tauCoefficient() {
        return tauCoefficient;
    }

    public String name() {
        return name;
    }

    public int z1() {
        return z1;
    }

    public int z2() {
        return z2;
    }

    public double reducedMass() {
        return reducedMass;
    }

    /** S(0), MeV b. */
    public double sZero() {
        return sZero;
    }

    @Override
    public String toString() {
        return name + " (S(0) = " + sZero + " MeV b)";
    }
}
