package org.convgrid.engine.physics.eos;

import org.convgrid.engine.units.Constants;

/**
 * Scratch of {@link PlasmaPoint}: the Coulomb correction of {@link StellarPlasmaEos} at one (eta, rho, T) and its
 * analytic partial derivatives in eta, ln rho and ln T. F_C = N_nuc kT f(Gamma) for an effective one-component
 * plasma whose Debye-Huckel limit is the full Debye-Huckel result, kappa^2 = (4 pi e^2/kT) n_e (z2 + theta_e)
 * (Landau &amp; Lifshitz, Statistical Physics, par. 78-79), with the ion term sum n_j Z_j^2 written as z2 n_e
 * (z2 fixed by the composition). F_C then
 * depends on the state only through n_e, so it shifts the electron chemical potential in the Saha balance by
 * mu_C = dF_C/dN_e, and P, u follow from F_C exactly. Since Gamma ~ kappa^2 n_nuc^(-2/3) and n_e ~ T^(3/2)
 * F_{1/2}(eta), d ln Gamma = d ln F_{1/2} + d ln(z2 + theta) + (1/2) d ln T - (2/3) d ln rho. Not thread-safe.
 */
final class CoulombTerm {

    private static final double FOUR_PI_E2 = 4.0 * Math.PI * Constants.E_CHARGE * Constants.E_CHARGE;
    private static final double TWO_THIRDS = 2.0 / 3.0;

    /** Shift of the electron chemical potential over kT, and its partials. */
    double shift;
    double shiftEta;
    double shiftRho;
    double shiftT;
    /** Pressure, dyn cm^-2, and its partials (d/d eta, d/d ln rho, d/d ln T). */
    double pressure;
    double pressureEta;
    double pressureRho;
    double pressureT;
    /** Specific energy, erg g^-1, and its partials in eta and ln T. */
    double energy;
    double energyEta;
    double energyT;

    /**
     * Gamma per free electron per u and per unit screening factor (z2 + theta) at the prepared (rho, T): with
     * Gamma^(3/2) = sqrt(3) kappa^3/(12 pi n_nuc), Gamma = kappa^2 (48 pi^2 n_nuc^2)^(-1/3), and kappa^2 is
     * 4 pi e^2 rho ye (z2 + theta)/(m_u kT); the rest is fixed for the whole neutrality solve at one point.
     */
    private double couplingFactor;

    /**
     * Sets the part of the coupling that depends on (rho, T) and the composition alone, once per point: the
     * neutrality solve then evaluates the term at several eta without a cube root each.
     *
     * @param rho g cm^-3
     * @param kT erg
     * @param nuclei nuclei per u
     */
    void prepare(double rho, double kT, double nuclei) {
        this.rho = rho;
        this.kT = kT;
        this.nuclei = nuclei;
        double nNuc = rho * nuclei / Constants.M_U;
        couplingFactor = FOUR_PI_E2 * rho / (Constants.M_U * kT) / Math.cbrt(48.0 * Math.PI * Math.PI * nNuc * nNuc);
    }

    /** The (rho, kT, nuclei per u) of the last {@link #prepare}, which {@link #evaluate} and completeState use. */
    private double rho;
    private double kT;
    private double nuclei;
    /** Whether the last call was {@link #evaluate} (not {@link #clear}), and what it leaves for completeState. */
    private boolean active;
    private double perElectron;
    private double uEx;
    private double uExSlope;
    private double lnGammaEta;
    private double d;
    private double dEta;

    /** No correction (neutral gas or switched off). */
    void clear() {
        active = false;
        shift = shiftEta = shiftRho = shiftT = 0.0;
        pressure = pressureEta = pressureRho = pressureT = 0.0;
        energy = energyEta = energyT = 0.0;
    }

    /**
     * The term at one eta, at the (rho, T) of the last {@link #prepare}.
     *
     * @param fd F_{-1/2}, F_{1/2}, F_{3/2}, their eta-derivatives and d^2F_{-1/2}/deta^2 ({@link FermiDirac})
     * @param yeFd free electrons per u
     * @param chargeRatio z2, ion charge squared per free electron at full ionisation
     */
    void evaluate(double[] fd, double yeFd, double chargeRatio) {
        // one division by each of F_{1/2}, theta and (z2 + theta); the rest are products with their reciprocals
        double perF1 = 1.0 / fd[1];
        double theta = 0.5 * fd[0] * perF1;
        double lnF1Eta = fd[4] * perF1;
        double halfF3 = 0.5 * fd[3] * perF1;
        double thetaEta = halfF3 - theta * lnF1Eta;
        double screening = chargeRatio + theta;
        double perScreening = 1.0 / screening;
        double perTheta = 1.0 / theta;
        // Gamma = (g32)^(2/3) with g32 = sqrt(3) kappa^3/(12 pi n_nuc), kappa^2 = 4 pi e^2 rho ye screening/(m_u kT)
        double gamma = couplingFactor * yeFd * screening;
        double uEx = CoulombPlasma.energy(gamma);
        double uExSlope = CoulombPlasma.energySlope(gamma);
        double lnGammaEta = lnF1Eta + thetaEta * perScreening;
        // d theta/d eta written with the identity dF_{1/2}/d eta = F_{-1/2}/2, as in the closed form of d.
        double thetaSlope = halfF3 - theta * theta;
        double thetaSlopeEta = 0.5 * fd[6] * perF1 - halfF3 * lnF1Eta - 2.0 * theta * thetaEta;
        // d ln Gamma/d ln n_e at fixed T (d eta/d ln n_e = 1/theta).
        double perThetaScreening = perTheta * perScreening;
        double dm1 = thetaSlope * perThetaScreening;
        double d = 1.0 + dm1;
        double dEta = thetaSlopeEta * perThetaScreening - dm1 * (thetaEta * perTheta + thetaEta * perScreening);

        double perElectron = nuclei / yeFd;
        shift = perElectron * uEx * d;
        shiftEta = -shift * lnF1Eta + perElectron * (uExSlope * lnGammaEta * d + uEx * dEta);
        // kept for completeState: the Newton iteration needs only the shift and its eta-slope
        active = true;
        this.perElectron = perElectron;
        this.uEx = uEx;
        this.uExSlope = uExSlope;
        this.lnGammaEta = lnGammaEta;
        this.d = d;
        this.dEta = dEta;
    }

    /**
     * The shift's partials in ln rho and ln T, and P, u with their partials, at the eta of the last
     * {@link #evaluate} (zero after {@link #clear}): once per solved point, not at every Newton step.
     */
    void completeState() {
        if (!active) {
            return;
        }
        shiftRho = shift - perElectron * uExSlope * TWO_THIRDS * d;
        shiftT = -1.5 * shift + perElectron * uExSlope * 0.5 * d;

        double perMass = kT / Constants.M_U * nuclei;
        double pFactor = d - TWO_THIRDS;
        pressure = rho * perMass * uEx * pFactor;
        pressureEta = rho * perMass * (uExSlope * lnGammaEta * pFactor + uEx * dEta);
        pressureRho = pressure - rho * perMass * uExSlope * TWO_THIRDS * pFactor;
        pressureT = pressure + rho * perMass * uExSlope * 0.5 * pFactor;

        double uFactor = 1.0 + 1.5 * (d - 1.0);
        energy = perMass * uEx * uFactor;
        energyEta = perMass * (uExSlope * lnGammaEta * uFactor + 1.5 * uEx * dEta);
        energyT = energy + perMass * uExSlope * 0.5 * uFactor;
    }
}
