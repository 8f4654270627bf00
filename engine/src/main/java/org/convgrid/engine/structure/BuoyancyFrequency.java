package org.convgrid.engine.structure;

import org.convgrid.engine.convection.LedouxGradient;
import org.convgrid.engine.convection.MuGradient;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.units.Constants;

/**
 * The squared buoyancy (Brunt-Vaisala) frequency of a solved model, in its general form N^2 = (g^2 rho / P) (chi_T /
 * chi_rho) (nabla_ad - nabla + B), g = G m / r^2 (Unno et al. 1989, "Nonradial Oscillations of Stars", 2nd ed.; Aerts,
 * Christensen-Dalsgaard &amp; Kurtz 2010, "Asteroseismology", ch. 3; both from memory, equation numbers not checked).
 * chi_T, chi_rho and nabla_ad are the equation of state's at each point, nabla the gradient the solver used there
 * (radiative, or the mixing-length one where convective), and B the Ledoux criterion's own composition term ({@link
 * LedouxGradient#compositionTerm}), phi = 1, with its nabla_mu's mu (of the fully ionised composition) and intervals,
 * taken to the points by their harmonic mean ({@link MuGradient#harmonicMeanOf}): zero at a mixed zone's edge point,
 * no sign change across a composition step, and smooth where the profile is smooth (centred differences put 1e-5 to
 * 1e-3 s^-2 on the edge points of a 1.4 Msun star's convective core and shell; the criterion's minmod rule read the
 * Sun's core 1-4 % low, with a kink). For an ideal gas with radiation this is the familiar (g^2 rho / P) (chi_T /
 * chi_rho) (nabla_ad - nabla) + (g^2 rho / P) nabla_mu. Convective points are written as computed (about zero,
 * slightly negative where superadiabatic), not clamped. Stateless.
 */
public final class BuoyancyFrequency {

    private BuoyancyFrequency() {
    }

    /**
     * N^2 at one point.
     *
     * @param gravity g = G m / r^2, cm s^-2
     * @param density g cm^-3
     * @param pressure dyn cm^-2
     * @param chiT (dlnP/dlnT) at fixed rho
     * @param chiRho (dlnP/dln rho) at fixed T
     * @param nablaAd adiabatic gradient
     * @param nabla actual gradient dlnT/dlnP
     * @param compositionTerm the Ledoux term B
     * @return N^2, s^-2 (negative where the layer is unstable)
     */
    public static double squared(double gravity, double density, double pressure, double chiT, double chiRho,
                                 double nablaAd, double nabla, double compositionTerm) {
        return gravity * gravity * density / pressure * (chiT / chiRho) * (nablaAd - nabla + compositionTerm);
    }

    /**
     * N^2 at every point of a model, centre to surface, s^-2. A point at r = 0 (none of our meshes has one: the
     * innermost lies at m/M ~ 1e-6) would get 0, the limit of g^2 there.
     */
    public static double[] squaredOf(StellarModel model) {
        StellarProfile p = model.profile();
        int n = p.size();
        double[] lnPressure = new double[n];
        for (int k = 0; k < n; k++) {
            lnPressure[k] = Math.log(p.pressure(k));
        }
        double[] nablaMu = MuGradient.harmonicMeanOf(model.state().compositions(), lnPressure);
        double[] out = new double[n];
        for (int k = 0; k < n; k++) {
            double r = p.radius(k);
            if (r == 0.0) {
                continue;
            }
            EosState s = p.eosState(k);
            double b = LedouxGradient.compositionTerm(LayerGradient.IDEAL_GAS_PHI, s.delta(), nablaMu[k]);
            out[k] = squared(Constants.G * p.mass(k) / (r * r), p.density(k), p.pressure(k), s.chiT(), s.chiRho(),
                    s.nablaAd(), p.nabla(k), b);
        }
        return out;
    }
}
