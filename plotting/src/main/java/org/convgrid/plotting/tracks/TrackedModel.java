package org.convgrid.plotting.tracks;

import org.convgrid.output.track.Track;

/**
 * A track together with what it is of.
 *
 * @param origin mass, Z and physics, from the catalogue
 * @param track the evolution steps, from the track file
 */
public record TrackedModel(TrackOrigin origin, Track track) {
}
