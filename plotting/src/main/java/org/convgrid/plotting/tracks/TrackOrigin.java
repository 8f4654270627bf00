package org.convgrid.plotting.tracks;

import org.convgrid.plotting.label.PhysicsKey;


/**
 * What a track is of, read from the first catalogue row that shares its id prefix (the track file itself carries no mass,
 * Z or physics).
 *
 * @param trackId the track id
 * @param massMsun total mass, solar masses
 * @param zInit initial metal mass fraction
 * @param physics the physics combination
 */
public record TrackOrigin(String trackId, double massMsun, double zInit, PhysicsKey physics) {
}
