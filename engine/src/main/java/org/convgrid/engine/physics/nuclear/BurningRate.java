package org.convgrid.engine.physics.nuclear;

/**
 * Nuclear energy generation at one point and the composition rates it implies.
 *
 * @param eps total energy generation net of neutrino losses, erg g^-1 s^-1
 * @param epsPp from the pp chains, erg g^-1 s^-1
 * @param epsCno from the CNO cycle, erg g^-1 s^-1
 * @param dlnEpsDlnRho (dln eps/dln rho) at fixed T
 * @param dlnEpsDlnT (dln eps/dln T) at fixed rho
 * @param dh1Dt rate of change of the 1H mass fraction, s^-1
 * @param dhe3Dt of 3He, s^-1
 * @param dhe4Dt of 4He, s^-1
 * @param dc12Dt of 12C, s^-1
 * @param dn14Dt of 14N, s^-1
 * @param do16Dt of 16O, s^-1
 * @param dh2Dt of deuterium, s^-1 (its burning is part of dh1Dt, dhe3Dt and epsPp too)
 * @param dli7Dt of 7Li, s^-1 (its burning is part of dh1Dt, dhe4Dt and epsPp too)
 */
public record BurningRate(double eps, double epsPp, double epsCno, double dlnEpsDlnRho, double dlnEpsDlnT,
                          double dh1Dt, double dhe3Dt, double dhe4Dt, double dc12Dt, double dn14Dt,
                          double do16Dt, double dh2Dt, double dli7Dt) {

    /** A rate of a network that follows no deuterium or 7Li. */
    public BurningRate(double eps, double epsPp, double epsCno, double dlnEpsDlnRho, double dlnEpsDlnT,
                       double dh1Dt, double dhe3Dt, double dhe4Dt, double dc12Dt, double dn14Dt, double do16Dt) {
        this(eps, epsPp, epsCno, dlnEpsDlnRho, dlnEpsDlnT, dh1Dt, dhe3Dt, dhe4Dt, dc12Dt, dn14Dt, do16Dt, 0.0, 0.0);
    }
}
