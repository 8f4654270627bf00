package org.convgrid.engine.physics.eos;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Scratch space of one {@link StellarPlasmaEos} call: given (rho, T) and a trial degeneracy parameter eta, evaluates
 * the charge-neutrality residual and P, u in closed form. Not thread-safe; each call makes its own. Splitting
 * {@link #prepare} (all exponentials that depend on rho and T) from {@link #evaluate} (one exponential per trial
 * eta) keeps the Newton iteration cheap.
 */
final class PlasmaPoint {

    /** 4 pi (2 m_e k/h^2)^(3/2): n_e = this T^(3/2) F_{1/2}(eta) (formulas.md 1.3). */
    static final double ELECTRON_DENSITY_CONSTANT = 4.0 * Math.PI
            * Math.pow(2.0 * Constants.M_E * Constants.K_B / (Constants.H * Constants.H), 1.5);
    /** Limits that keep every Saha ratio K e^-eta finite (only reached far outside stellar conditions). */
    static final double ETA_LIMIT = 500.0;
    /**
     * Saha constants are stored relative to a reference eta, K' = K e^-eta_ref, clipped to e^(+-350), and
     * multiplied by e^(eta_ref - eta) clipped likewise: no overflow, and the clipping only touches ratios beyond
     * e^(+-300), which are saturated, as long as eta stays within ~300 of eta_ref (the solver re-references).
     */
    static final double LN_CLIP = 350.0;
    private static final double FOUR_PI_E2 = 4.0 * Math.PI * Constants.E_CHARGE * Constants.E_CHARGE;

    private final PlasmaElements el;
    private final boolean pressureIonisation;
    private final boolean coulomb;
    private final double[] abundance;
    private final double[] kFirst;
    private final double[] kInner;
    private final double[] xiNeutral;
    private final double[] xiInner;
    private final double[] fd = new double[3];

    double density;
    double lastEta;
    double temperature;
    private double kT;
    private double nuclei;
    private double yeMax;
    /** sum a Z^2 / sum a Z at full ionisation: ion charge-squared per free electron in the Coulomb term. */
    private double chargeRatio;
    private double nucleusDensity;
    private double kH;
    private double kHe0;
    private double kHe1;
    private double xiH;
    private double xiHe0;
    private double xiHe1;

    /** Outputs of {@link #evaluate}. */
    double residual;
    double residualSlope;
    double pressure;
    double energy;
    double electrons;
    double hydrogenIonised;
    double heliumSingle;
    double heliumDouble;

    PlasmaPoint(PlasmaElements el, boolean pressureIonisation, boolean coulomb, Composition composition) {
        this.el = el;
        this.pressureIonisation = pressureIonisation;
        this.coulomb = coulomb;
        abundance = new double[2 + el.metalCount];
        kFirst = new double[el.metalCount];
        kInner = new double[el.metalCount];
        xiNeutral = new double[el.metalCount];
        xiInner = new double[el.metalCount];
        el.abundances(composition, abundance);
        double sum = 0.0;
        for (double a : abundance) {
            sum += a;
        }
        nuclei = sum;
        yeMax = el.electronsFullyIonised(composition);
        double z2 = abundance[0] + 4.0 * abundance[1];
        for (int m = 0; m < el.metalCount; m++) {
            z2 += (double) el.charge[m] * el.charge[m] * abundance[2 + m];
        }
        chargeRatio = yeMax > 0.0 ? z2 / yeMax : 1.0;
    }

    double nuclei() {
        return nuclei;
    }

    double electronsFullyIonised() {
        return yeMax;
    }

    /** Reference eta of the stored Saha constants. */
    double reference;

    /** Computes every rho- and T-dependent Saha constant K (n_{r+1}/n_r = K e^-eta), relative to etaReference. */
    void prepare(double rho, double t, double etaReference) {
        reference = etaReference;
        density = rho;
        temperature = t;
        kT = Constants.K_B * t;
        nucleusDensity = pressureIonisation ? rho * nuclei / Constants.M_U : 0.0;
        xiH = el.hydrogenVolume * nucleusDensity;
        xiHe0 = el.heliumVolume0 * nucleusDensity;
        xiHe1 = el.heliumVolume1 * nucleusDensity;
        // Ground-state weights: U(HI) = 2, U(HII) = 1, U(HeI) = 1, U(HeII) = 2, U(HeIII) = 1 (formulas.md 1.4).
        kH = expK(Math.log(0.5) - el.hydrogenChi / kT + xiH);
        kHe0 = expK(Math.log(2.0) - el.heliumChi0 / kT + xiHe0 - xiHe1);
        kHe1 = expK(Math.log(0.5) - el.heliumChi1 / kT + xiHe1);
        for (int m = 0; m < el.metalCount; m++) {
            xiNeutral[m] = el.neutralVolume[m] * nucleusDensity;
            xiInner[m] = el.innerVolume[m] * nucleusDensity;
            kFirst[m] = expK(el.lnWeightRatio[m] - el.firstChi[m] / kT + xiNeutral[m]);
            kInner[m] = expK(-el.innerChi[m] / kT + xiInner[m]);
        }
    }

    /** Evaluates residual, its eta-slope, P, u and the free electrons at this eta for the prepared (rho, T). */
    void evaluate(double eta) {
        FermiDirac.all(eta, fd);
        double t = temperature;
        double rho = density;
        double t15 = t * Math.sqrt(t);
        double yeFd = ELECTRON_DENSITY_CONSTANT * t15 * fd[1] * Constants.M_U / rho;
        double theta = 0.5 * fd[0] / fd[1];
        double perMass = kT / Constants.M_U;

        // Coulomb free energy F_C = N_nuc kT f(Gamma) of an effective one-component plasma whose Debye-Huckel limit
        // is the full Debye-Huckel result, kappa^2 = (4 pi e^2/kT) n_e (z2 + theta_e) (formulas.md 1.7), with the
        // ion term sum n_j Z_j^2 written as z2 n_e (z2 fixed by the composition). F_C then depends on the state
        // only through n_e, so it shifts the electron chemical potential in the Saha balance by
        // mu_C = dF_C/dN_e, and P, u follow from F_C exactly: everything stays thermodynamically consistent.
        double coulombPressure = 0.0;
        double coulombEnergy = 0.0;
        double coulombShift = 0.0;
        if (coulomb && yeFd > 0.0) {
            double screening = chargeRatio + theta;
            double kappa2 = FOUR_PI_E2 * rho * yeFd * screening / (Constants.M_U * kT);
            double nNuc = rho * nuclei / Constants.M_U;
            double g32 = Math.sqrt(3.0) * kappa2 * Math.sqrt(kappa2) / (12.0 * Math.PI * nNuc);
            double uEx = CoulombPlasma.energy(Math.cbrt(g32 * g32));
            double thetaSlope = 0.5 * FermiDirac.minusHalfSlope(eta) / fd[1] - theta * theta;
            // d ln Gamma/d ln n_e at fixed T (d eta/d ln n_e = 1/theta).
            double d = 1.0 + thetaSlope / (theta * screening);
            coulombShift = nuclei / yeFd * uEx * d;
            coulombPressure = rho * perMass * nuclei * uEx * (d - 2.0 / 3.0);
            coulombEnergy = perMass * nuclei * uEx * (1.0 + 1.5 * (d - 1.0));
        }

        double x = Math.exp(Math.max(-LN_CLIP, Math.min(LN_CLIP, reference - eta - coulombShift)));
        double ye = 0.0;
        double spread = 0.0;
        double ionEnergy = 0.0;
        double excluded = 0.0;

        double r = kH * x;
        double f1 = r / (1.0 + r);
        double f0 = 1.0 / (1.0 + r);
        double a = abundance[0];
        ye += a * f1;
        spread += a * f0 * f1;
        ionEnergy += a * f1 * el.hydrogenChi;
        excluded += a * f0 * xiH;
        hydrogenIonised = f1;

        double r0 = kHe0 * x;
        double r01 = r0 * kHe1 * x;
        double h0;
        double h1;
        double h2;
        if (r01 < 1e300) {
            double norm = 1.0 / (1.0 + r0 + r01);
            h0 = norm;
            h1 = r0 * norm;
            h2 = r01 * norm;
        } else {
            h0 = 0.0;
            h1 = 1.0 / (kHe1 * x);
            h2 = 1.0 - h1;
        }
        a = abundance[1];
        double mean = h1 + 2.0 * h2;
        ye += a * mean;
        spread += a * (h1 + 4.0 * h2 - mean * mean);
        ionEnergy += a * (h1 * el.heliumChi0 + h2 * (el.heliumChi0 + el.heliumChi1));
        excluded += a * (h0 * xiHe0 + h1 * xiHe1);
        heliumSingle = h1;
        heliumDouble = h2;

        for (int m = 0; m < el.metalCount; m++) {
            a = abundance[2 + m];
            double rf = kFirst[m] * x;
            double g1 = rf / (1.0 + rf);
            double g0 = 1.0 / (1.0 + rf);
            double ri = kInner[m] * x;
            double y = ri / (1.0 + ri);
            int sites = el.charge[m] - 1;
            ye += a * (g1 + sites * y);
            spread += a * (g1 * g0 + sites * y * (1.0 - y));
            ionEnergy += a * (g1 * el.firstChi[m] + sites * y * el.innerChi[m]);
            excluded += a * (g0 * xiNeutral[m] + sites * (1.0 - y) * xiInner[m]);
        }

        ye = Math.max(ye, Double.MIN_NORMAL);
        residual = Math.log(yeFd) - Math.log(ye);
        // Exact without the Coulomb shift; with it, a good enough Newton slope (the shift varies slowly with eta).
        residualSlope = theta + spread / ye;
        electrons = yeFd;

        double electronPressure = (2.0 / 3.0) * ELECTRON_DENSITY_CONSTANT * kT * t15 * fd[2];
        double aT4 = Constants.A_RAD * t * t * t * t;
        pressure = rho * perMass * (nuclei + excluded) + electronPressure + aT4 / 3.0 + coulombPressure;
        energy = 1.5 * perMass * nuclei + 1.5 * electronPressure / rho + aT4 / rho + ionEnergy / Constants.M_U
                + coulombEnergy;
    }

    /** Radiation pressure a T^4/3 at the prepared temperature. */
    double radiationPressure() {
        return Constants.A_RAD * Math.pow(temperature, 4) / 3.0;
    }

    private double expK(double lnK) {
        return Math.exp(Math.max(-LN_CLIP, Math.min(LN_CLIP, lnK - reference)));
    }
}
