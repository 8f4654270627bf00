package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class MolecularHydrogenTest {

    private static final StellarPlasmaEos EOS = new StellarPlasmaEos();
    private static final Composition SUN = Composition.scaledSolar(0.70, 0.02);
    private static final double KJ_PER_MOL_PER_EV = 96.485332;

    @Test
    void dissociationEnergyMatchesTheStandardEnthalpyOfAtomicHydrogen() {
        // Delta_f H(H, 298.15 K) = 52.103 kcal/mol (Cox, Wagman & Medvedev 1984, CODATA Key Values, as listed in
        // the NIST Chemistry WebBook), so D(298) = 2 x 218.00 kJ/mol; back to 0 K with H(298) - H(0) = 5/2 RT =
        // 6.197 kJ/mol per H atom (exact, ideal monatomic gas) and 8.468 kJ/mol for H2 (JANAF, Chase 1998; from
        // memory): D0 = 436.00 - 12.39 + 8.47 = 432.07 kJ/mol (derived).
        double d298 = 2.0 * 52.103 * 4.184;
        double d0 = d298 - 2.0 * 6.197 + 8.468;
        assertThat(MolecularHydrogen.DISSOCIATION_ENERGY_EV).isCloseTo(d0 / KJ_PER_MOL_PER_EV, within(0.003));
    }

    @Test
    void equilibriumConstantMatchesJanafFormationConstantsOfAtomicHydrogen() {
        // log10 Kf(H) = log10[(p_H/1 bar)/(p_H2/1 bar)^(1/2)] = -2.78 at 2000 K and -0.80 at 3000 K (JANAF tables,
        // Chase 1998, 4th ed.; from memory, so 0.1 dex). Kp(H2 = 2H) = K kT/1 bar = Kf^2.
        double[][] janaf = {{2000.0, -2.78}, {3000.0, -0.80}};
        for (double[] row : janaf) {
            double t = row[0];
            double kp = Math.exp(MolecularHydrogen.lnDissociationConstant(t)) * Constants.K_B * t / 1.0e6;
            assertThat(0.5 * Math.log10(kp)).as("T = %s K", t).isCloseTo(row[1], within(0.1));
        }
    }

    @Test
    void halfDissociationPointFollowsTheMassActionLaw() {
        // Derived: with a fraction f of H nuclei in molecules (no ions), n_H = (1 - f) n, n_H2 = f n/2, so
        // n_H^2/n_H2 = 2 (1 - f)^2 n/f = K. f = 1/2 at n_Htot = K. Pick rho for that at 3000 K, X = 0.70.
        double t = 3000.0;
        // the EOS's constant includes the switch-off factor (0.8 % at 3000 K)
        double k = Math.exp(MolecularHydrogen.lnSwitchedConstant(t));
        double rho = k * Constants.M_U * Constants.MASS_H1_AMU / 0.70;
        assertThat(EOS.molecularHydrogenFraction(rho, t, SUN)).isCloseTo(0.5, within(1e-3));
        // hot and dilute: atomic; cold: molecular
        assertThat(EOS.molecularHydrogenFraction(1e-9, 6000.0, SUN)).isLessThan(1e-4);
        assertThat(EOS.molecularHydrogenFraction(1e-6, 1000.0, SUN)).isGreaterThan(0.999);
    }

    @Test
    void coldMolecularGasHasTheDiatomicMeanWeightAndAdiabaticGradient() {
        // Derived: X = 0.70 all in H2 and neutral He (Y = 0.28): 1/mu = X/2.016 + Y/4.003 + Z/16 (Z = 0.02, mostly
        // CNO) = 0.3472 + 0.0700 + 0.0013, mu = 2.39. nabla_ad = k/c_P per particle: H2 c_P = 7/2 k (rotation excited, vibration frozen at 700 K
        // adds 0.01 k), He 5/2 k, so nabla_ad = 0.422/(0.347 x 3.51 + 0.070 x 2.5 + 0.001 x 2.5) = 0.298.
        EosState s = EOS.atDensity(1.0e-7, 700.0, SUN);
        assertThat(s.mu()).isCloseTo(2.39, within(0.01));
        assertThat(s.nablaAd()).isCloseTo(0.298, within(0.006));
    }

    @Test
    void dissociationZoneLowersTheAdiabaticGradient() {
        // Like an ionisation zone (Kippenhahn, Weigert & Weiss 2012, ch. 14): the dissociation energy, ~9 kT per
        // atom at 3000 K, makes c_P large and nabla_ad well below both the molecular 0.29 and the atomic 0.4.
        double t = 3000.0;
        double rho = Math.exp(MolecularHydrogen.lnDissociationConstant(t)) * Constants.M_U / 0.70;
        assertThat(EOS.atDensity(rho, t, SUN).nablaAd()).isLessThan(0.2);
        // 4500 K, 1e-8 g cm^-3: molecules (~2e-4) and ions (~1e-5) both rare, nabla_ad of the atomic gas
        assertThat(EOS.atDensity(1e-8, 4500.0, SUN).nablaAd()).isCloseTo(0.4, within(0.01));
    }

    @Test
    void temperatureSlopesAreTheDerivativesAndObeyVanTHoff() {
        // Numerical check of the analytic slopes used by the EOS's partial derivatives, and the van 't Hoff
        // identity d ln K/d ln T = (3/2 kT - E_m)/kT for H2 = 2 H at fixed volume (E_m = internal energy - D0;
        // derived from K = n_H^2/n_H2 with the partition functions above).
        double h = 1e-5;
        for (double t : new double[] {600.0, 2000.0, 3000.0, 6000.0, 1.5e4, 3.9e4}) {
            double up = t * Math.exp(h);
            double down = t * Math.exp(-h);
            double lnK = (MolecularHydrogen.lnSwitchedConstant(up) - MolecularHydrogen.lnSwitchedConstant(down))
                    / (2 * h);
            double slope = MolecularHydrogen.lnSwitchedConstantSlope(t);
            assertThat(slope).as("d ln K/d ln T at %s K", t).isCloseTo(lnK, within(1e-6 * Math.abs(slope)));
            double e = (MolecularHydrogen.switchedInternalEnergy(up) - MolecularHydrogen.switchedInternalEnergy(down))
                    / (2 * h);
            double eSlope = MolecularHydrogen.switchedInternalEnergySlope(t);
            assertThat(eSlope).as("dE/d ln T at %s K", t).isCloseTo(e, within(1e-6 * Math.abs(eSlope)));
            double kT = Constants.K_B * t;
            double moleculeEnergy = MolecularHydrogen.switchedInternalEnergy(t)
                    - MolecularHydrogen.DISSOCIATION_ENERGY_EV * Constants.EV;
            assertThat(slope).isCloseTo((1.5 * kT - moleculeEnergy) / kT, within(1e-12 * Math.abs(slope)));
        }
    }

    @Test
    void pairingIsTheDensityOverTheSwitchedConstant() {
        // Derived: the product form of the pairing is n/K with K = e^(lnSwitchedConstant), the same constant written
        // without logarithms, so the two agree to rounding (ln K reaches ~100 at 500 K, hence 1e-13 relative).
        for (double t : new double[] {500.0, 1000.0, 3000.0, 5000.0, 1.2e4, 3.99e4}) {
            for (double atoms : new double[] {1.0e8, 1.0e17, 1.0e24}) {
                double expected = Math.exp(Math.log(atoms) - MolecularHydrogen.lnSwitchedConstant(t));
                double pairing = MolecularHydrogen.pairing(atoms, t, MolecularHydrogen.vibrationalFactor(t));
                assertThat(pairing).as("n = %s cm^-3, T = %s K", atoms, t)
                        .isCloseTo(expected, within(1e-13 * expected));
            }
        }
    }
}
