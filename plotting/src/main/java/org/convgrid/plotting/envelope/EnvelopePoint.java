package org.convgrid.plotting.envelope;

/**
 * One model on an envelope-mass chart.
 *
 * @param modelId the catalogue's model id
 * @param massMsun total mass, solar masses
 * @param teffK effective temperature, K
 * @param envelopeMassMsun {@code env_cz_mass_msun}: the mass of the surface convective zone, solar masses (positive;
 *     the whole star when it is fully convective)
 * @param fullyConvective whether the model is fully convective
 */
public record EnvelopePoint(String modelId, double massMsun, double teffK, double envelopeMassMsun,
                            boolean fullyConvective) {
}
