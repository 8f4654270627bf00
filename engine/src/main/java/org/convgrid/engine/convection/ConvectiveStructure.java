package org.convgrid.engine.convection;

import java.util.List;

/**
 * Where a model is convective, with the quantities the catalogue reports (README, "Catalogue").
 * A fully convective star has coreMassFraction = 1 and envelopeBaseMassFraction = 0.
 *
 * @param zones every convective zone, from the centre outwards
 * @param structureClass the convective layout
 * @param coreMassFraction m/M at the top of the convective core; 0 when there is none
 * @param envelopeBaseMassFraction m/M at the base of the convective envelope; 1 when there is none
 * @param envelopeBaseRadiusFraction r/R at the base of the convective envelope; 1 when there is none
 * @param envelopeMass mass of the convective envelope, g
 * @param turnoverTimeLocal envelope turnover time l_m/v_c half a pressure scale height above its base, no higher than
 *        its radial midpoint, at r = R/2 when fully convective ({@link ConvectiveZoneFinder}), s; NaN when none
 * @param turnoverTimeGlobal integral of dr/v_c across the envelope, s; NaN when none
 */
public record ConvectiveStructure(List<ConvectiveZone> zones, StructureClass structureClass,
                                  double coreMassFraction, double envelopeBaseMassFraction,
                                  double envelopeBaseRadiusFraction, double envelopeMass,
                                  double turnoverTimeLocal, double turnoverTimeGlobal) {

    public ConvectiveStructure {
        zones = List.copyOf(zones);
    }
}
