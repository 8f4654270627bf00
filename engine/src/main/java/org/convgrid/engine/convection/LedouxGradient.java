package org.convgrid.engine.convection;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * The gradient that nabla_rad is compared with to decide convective instability (Kippenhahn, Weigert &amp;
 * Weiss 2012, ch. 6): nabla_ad for Schwarzschild, nabla_L = nabla_ad + (phi/delta) nabla_mu for Ledoux
 * (Ledoux 1947, ApJ 105, 305), with phi = (dln rho/dln mu) at fixed P, T and delta = -(dln rho/dln T) at
 * fixed P, mu. For an ideal gas with radiation phi = 1 and delta = (4 - 3 beta)/beta.
 */
public final class LedouxGradient {

    private LedouxGradient() {
    }

    /**
     * @param nablaAd adiabatic gradient
     * @param phi (dln rho/dln mu) at fixed P and T, positive
     * @param delta -(dln rho/dln T) at fixed P and mu, positive
     * @param nablaMu dln mu/dln P (positive where mu increases inwards)
     * @return nabla_L (nabla_ad where nabla_mu = 0, whatever delta)
     */
    public static double ledoux(double nablaAd, double phi, double delta, double nablaMu) {
        if (nablaMu == 0.0) {
            return nablaAd;
        }
        return nablaAd + compositionTerm(phi, delta, nablaMu);
    }

    /**
     * The composition term (phi/delta) nabla_mu by which nabla_L exceeds nabla_ad. It is also the composition
     * (Ledoux) term B of the buoyancy frequency, -(1/chi_T) sum_i (dlnP/dlnX_i)_{rho,T} dlnX_i/dlnP (Unno et al.
     * 1989, "Nonradial Oscillations of Stars", 2nd ed.; from memory, equation number not checked), where the
     * composition enters P through mu alone: then (dlnP/dln mu)_{rho,T} = -phi chi_rho, delta = chi_T/chi_rho, and
     * B = phi nabla_mu chi_rho/chi_T = (phi/delta) nabla_mu.
     *
     * @param phi (dln rho/dln mu) at fixed P and T, positive
     * @param delta -(dln rho/dln T) at fixed P and mu, positive
     * @param nablaMu dln mu/dln P
     * @return (phi/delta) nabla_mu
     * @throws ConvgridException OUT_OF_RANGE when delta is not positive
     */
    public static double compositionTerm(double phi, double delta, double nablaMu) {
        if (!(delta > 0.0)) {
            throw new ConvgridException(ErrorKind.OUT_OF_RANGE, "delta must be > 0 for the Ledoux gradient, got "
                    + delta, "delta", delta, 0.0, Double.POSITIVE_INFINITY);
        }
        return phi * nablaMu / delta;
    }

    /**
     * The stability gradient under a criterion: nabla_ad (Schwarzschild) or nabla_L (Ledoux).
     *
     * @see #ledoux(double, double, double, double)
     */
    public static double stabilityGradient(StabilityCriterion criterion, double nablaAd, double phi, double delta,
                                           double nablaMu) {
        return switch (criterion) {
            case SCHWARZSCHILD -> nablaAd;
            case LEDOUX -> ledoux(nablaAd, phi, delta, nablaMu);
        };
    }
}
