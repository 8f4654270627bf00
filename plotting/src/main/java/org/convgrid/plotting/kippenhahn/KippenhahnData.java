package org.convgrid.plotting.kippenhahn;

import java.util.List;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.plotting.tracks.TrackOrigin;

/**
 * Everything a zones-against-age chart shows for one track.
 *
 * @param origin mass, Z and physics of the track
 * @param ageMin age of the first step, Gyr
 * @param ageMax age of the last step, Gyr (the last step only closes the previous one's rectangles)
 * @param zones one rectangle per convective interval of every step but the last, in step order
 * @param burning one rectangle per step (but the last) that gives a nuclear-burning region and, when the track
 *     says, draws at least 1 % of L from it, in step order
 * @param notes caveats to print on the chart
 * @param timeline whether the track starts at birth and where it reaches the zero-age main sequence
 */
public record KippenhahnData(TrackOrigin origin, double ageMin, double ageMax, List<AgeRect> zones,
                             List<AgeRect> burning, List<String> notes, TrackTimeline timeline) {

    /** A surface convection zone holding less than this share of the mass is thin: the depth chart shows it. */
    public static final double THIN_ENVELOPE_MASS_FRAC = 0.02;

    /**
     * Whether a depth chart would show more: some step has a convective envelope (reaching the surface, not the
     * centre) thinner than {@link #THIN_ENVELOPE_MASS_FRAC} in m/M that the depth coordinate can show.
     */
    public boolean hasThinEnvelope() {
        return zones.stream().anyMatch(r -> r.kind() == org.convgrid.plotting.zones.ZoneKind.ENVELOPE
                && r.hi() - r.lo() < THIN_ENVELOPE_MASS_FRAC && ZoneCoordinate.SURFACE_DEPTH.shows(r.lo(), r.hi()));
    }

    public KippenhahnData {
        zones = List.copyOf(zones);
        burning = List.copyOf(burning);
        notes = List.copyOf(notes);
        java.util.Objects.requireNonNull(timeline, "timeline");
    }
}
