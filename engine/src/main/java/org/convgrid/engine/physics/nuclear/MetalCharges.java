package org.convgrid.engine.physics.nuclear;

import org.convgrid.engine.state.Element;
import org.convgrid.engine.state.MetalMixture;

/**
 * Charge sums of the "other metals" (everything but C, N, O) per unit mass fraction, for screening and
 * electron counts; full ionization assumed.
 *
 * @param chargeSquaredPlusChargePerMass sum (Z^2 + Z)/A weighted by mass within the other metals, mol g^-1
 * @param chargePerMass sum Z/A weighted by mass within the other metals, mol g^-1
 */
public record MetalCharges(double chargeSquaredPlusChargePerMass, double chargePerMass) {

    /** From the proportions of a metal mixture, leaving out C, N and O (carried separately by the composition). */
    public static MetalCharges of(MetalMixture mixture) {
        double mass = 0.0;
        double zeta = 0.0;
        double charge = 0.0;
        for (int i = 0; i < mixture.elements().size(); i++) {
            Element e = mixture.elements().get(i);
            if (e.symbol().equals("C") || e.symbol().equals("N") || e.symbol().equals("O")) {
                continue;
            }
            double w = mixture.massFractionOfZ(i);
            mass += w;
            zeta += w * (e.charge() * (double) e.charge() + e.charge()) / e.massAmu();
            charge += w * e.charge() / e.massAmu();
        }
        if (mass <= 0.0) {
            // No other metals listed: use the typical Z/A = 1/2 of an intermediate-mass nucleus (Z ~ 12).
            return new MetalCharges(6.5, 0.5);
        }
        return new MetalCharges(zeta / mass, charge / mass);
    }
}
