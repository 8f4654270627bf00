package org.convgrid.plotting.zones;

/**
 * One shaded rectangle of a zone map: one convective interval of one model, spanning that model's mass column.
 *
 * @param modelId the catalogue's model id
 * @param massMsun the model's total mass, solar masses
 * @param left left edge of the mass column (geometric midpoint to the lower neighbour), solar masses
 * @param right right edge of the mass column, solar masses
 * @param lo lower end of the interval, in the map's fractional coordinate
 * @param hi upper end of the interval
 * @param kind what the interval is
 */
public record ZoneRect(String modelId, double massMsun, double left, double right, double lo, double hi,
                       ZoneKind kind) {
}
