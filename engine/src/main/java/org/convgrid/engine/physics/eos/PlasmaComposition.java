package org.convgrid.engine.physics.eos;

import org.convgrid.engine.state.Composition;

/**
 * The composition-dependent constants of {@link StellarPlasmaEos}, computed once per composition: particles per
 * atomic mass unit of every species, nuclei, electrons at full ionisation and the Coulomb charge ratio. A pure
 * function of (elements, composition), immutable (the array is never handed out for writing), hence safe to share
 * between threads and to reuse for any later call with an equal composition.
 */
final class PlasmaComposition {

    final Composition composition;
    /** H, He, then the metals of {@link PlasmaElements}, particles per u; read-only. */
    final double[] abundance;
    /** Nuclei per u. */
    final double nuclei;
    /** Electrons per u at full ionisation. */
    final double yeMax;
    /** sum a Z^2 / sum a Z at full ionisation: ion charge-squared per free electron in the Coulomb term. */
    final double chargeRatio;

    PlasmaComposition(PlasmaElements el, Composition composition) {
        this.composition = composition;
        abundance = new double[2 + el.metalCount];
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
}
