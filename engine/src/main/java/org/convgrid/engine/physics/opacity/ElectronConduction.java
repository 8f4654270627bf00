package org.convgrid.engine.physics.opacity;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Conductive opacity of electrons scattering on ions, {@code kappa_cond = 4 a c T^3/(3 rho K)} (Kippenhahn,
 * Weigert &amp; Weiss 2012, opacity chapter), with a thermal conductivity of Drude form
 * <pre>  K = (pi^2/3) k^2 T n_e /(m_e nu),   nu = 4 pi n_e Z_eff e^4 Lambda /(m_e^2 v^3),   v^2 = v_F^2 + 3kT/m_e</pre>
 * For strong degeneracy (v -&gt; v_F = hbar (3 pi^2 n_e)^(1/3)/m_e) this is exactly the Yakovlev &amp; Urpin 1980
 * (Sov. Astron. 24, 303) result {@code nu = 4 Z e^4 m_e Lambda/(3 pi hbar^3)} (non-relativistic: on the main
 * sequence x_F &lt;= 0.1, a &lt;= 1 % effect). Replacing v_F^2 by v_F^2 + 3kT/m_e blends smoothly into a
 * non-degenerate, Spitzer-like conductivity K ~ T^(5/2)/(Z Lambda) whose prefactor is right to a factor ~1.5
 * only; there conduction is many orders of magnitude weaker than radiation, so this does not matter.
 * Z_eff = &lt;Z^2&gt;/&lt;Z&gt;. Coulomb logarithm of Yakovlev &amp; Urpin 1980 without the relativistic term:
 * {@code Lambda = ln[(2 pi Z_eff/3)^(1/3) (1.5 + 3/Gamma)^(1/2)]}, Gamma = Z_eff^2 e^2/(a_i k T),
 * a_i = (3/(4 pi n_i))^(1/3); Lambda &gt;= 0.45 for all Gamma, so no floor is needed. Full ionization assumed.
 */
public final class ElectronConduction implements Opacity {

    private static final double KT_OVER_ME = Constants.K_B / Constants.M_E;
    private static final double FERMI_VELOCITY_COEFFICIENT = Constants.HBAR / Constants.M_E;
    private static final double E2 = Constants.E_CHARGE * Constants.E_CHARGE;
    /** kappa_cond = PREFACTOR Z_eff Lambda T^2/(rho v^3), from 4ac T^3/(3 rho K). */
    private static final double PREFACTOR = 16.0 * Constants.A_RAD * Constants.C * E2 * E2
            / (Math.PI * Constants.K_B * Constants.K_B * Constants.M_E);

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        return new AtComposition(composition).rosselandMean(density, temperature);
    }

    /** The charge moments and the terms made of them alone, which depend on the composition only, taken once. */
    @Override
    public OpacityAtComposition atComposition(Composition composition) {
        return new AtComposition(composition);
    }

    /** The conduction at one composition. Immutable. */
    private static final class AtComposition implements OpacityAtComposition {

        /** Free electrons per atomic mass unit. */
        private final double electrons;
        /** Ions per atomic mass unit. */
        private final double ions;
        /** Gamma T a_i = Z_eff^2 e^2/k. */
        private final double coupling;
        /** The composition's part of the Coulomb logarithm, ln(2 pi Z_eff/3)/3. */
        private final double lambdaCharge;
        /** PREFACTOR Z_eff. */
        private final double prefactor;

        AtComposition(Composition composition) {
            electrons = PlasmaMoments.electronsPerMass(composition);
            ions = PlasmaMoments.ionsPerMass(composition);
            double zEff = PlasmaMoments.chargeSquaredPerMass(composition) / electrons;
            coupling = zEff * zEff * E2;
            lambdaCharge = Math.log(2.0 * Math.PI * zEff / 3.0) / 3.0;
            prefactor = PREFACTOR * zEff;
        }

        @Override
        public OpacityValue rosselandMean(double density, double temperature) {
            double ne = density * Constants.N_A * electrons;
            double ni = density * Constants.N_A * ions;
            double kF = Math.cbrt(3.0 * Math.PI * Math.PI * ne);
            double vF2 = FERMI_VELOCITY_COEFFICIENT * FERMI_VELOCITY_COEFFICIENT * kF * kF;
            double v2 = vF2 + 3.0 * KT_OVER_ME * temperature;
            double fermiShare = vF2 / v2;
            double ionSphere = Math.cbrt(3.0 / (4.0 * Math.PI * ni));
            double gamma = coupling / (ionSphere * Constants.K_B * temperature);
            double lambda = lambdaCharge + 0.5 * Math.log(1.5 + 3.0 / gamma);
            double dLambdaDlnGamma = -1.0 / (gamma + 2.0);
            double kappa = prefactor * lambda * temperature * temperature / (density * v2 * Math.sqrt(v2));
            // ln Gamma ~ (1/3) ln rho - ln T; ln v^3 ~ fermiShare ln rho + 1.5 (1 - fermiShare) ln T
            double dRho = -1.0 - fermiShare + dLambdaDlnGamma / (3.0 * lambda);
            double dT = 2.0 - 1.5 * (1.0 - fermiShare) - dLambdaDlnGamma / lambda;
            return new OpacityValue(kappa, dRho, dT);
        }
    }
}
