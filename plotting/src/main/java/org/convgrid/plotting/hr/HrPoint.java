package org.convgrid.plotting.hr;

import org.convgrid.engine.convection.StructureClass;

/**
 * One model in the HR diagram.
 *
 * @param modelId the catalogue's model id
 * @param massMsun total mass, solar masses
 * @param zInit initial metal mass fraction
 * @param ageGyr age, Gyr
 * @param logTeff log10 of the effective temperature in K
 * @param logL log10 of L / L_sun
 * @param structureClass the model's convective layout
 */
public record HrPoint(String modelId, double massMsun, double zInit, double ageGyr, double logTeff, double logL,
                      StructureClass structureClass) {
}
