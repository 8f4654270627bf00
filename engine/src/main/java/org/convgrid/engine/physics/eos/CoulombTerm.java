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

    /** No correction (neutral gas or switched off). */
    void clear() {
        shift = shiftEta = shiftRho = shiftT = 0.0;
        pressure = pressureEta = pressureRho = pressureT = 0.0;
        energy = energyEta = energyT = 0.0;
    }

    /**
     * @param fd F_{-1/2}, F_{1/2}, F_{3/2}, their eta-derivatives and d^2F_{-1/2}/deta^2 ({@link FermiDirac})
     * @param rho g cm^-3
     * @param kT erg
     * @param yeFd free electrons per u
     * @param nuclei nuclei per u
     * @param chargeRatio z2, ion charge squared per free electron at full ionisation
     */
    void evaluate(double[] fd, double rho, double kT, double yeFd, double nuclei, double chargeRatio) {
        double theta = 0.5 * fd[0] / fd[1];
        double lnF1Eta = fd[4] / fd[1];
        double thetaEta = 0.5 * fd[3] / fd[1] - theta * lnF1Eta;
        double screening = chargeRatio + theta;
        double kappa2 = FOUR_PI_E2 * rho * yeFd * screening / (Constants.M_U * kT);
        double nNuc = rho * nuclei / Constants.M_U;
        double g32 = Math.sqrt(3.0) * kappa2 * Math.sqrt(kappa2) / (12.0 * Math.PI * nNuc);
        double gamma = Math.cbrt(g32 * g32);
        double uEx = CoulombPlasma.energy(gamma);
        double uExSlope = CoulombPlasma.energySlope(gamma);
        double lnGammaEta = lnF1Eta + thetaEta / screening;
        // d theta/d eta written with the identity dF_{1/2}/d eta = F_{-1/2}/2, as in the closed form of d.
        double thetaSlope = 0.5 * fd[3] / fd[1] - theta * theta;
        double thetaSlopeEta = 0.5 * fd[6] / fd[1] - 0.5 * fd[3] * lnF1Eta / fd[1] - 2.0 * theta * thetaEta;
        // d ln Gamma/d ln n_e at fixed T (d eta/d ln n_e = 1/theta).
        double dm1 = thetaSlope / (theta * screening);
        double d = 1.0 + dm1;
        double dEta = thetaSlopeEta / (theta * screening) - dm1 * (thetaEta / theta + thetaEta / screening);

        double perElectron = nuclei / yeFd;
        shift = perElectron * uEx * d;
        shiftEta = -shift * lnF1Eta + perElectron * (uExSlope * lnGammaEta * d + uEx * dEta);
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
