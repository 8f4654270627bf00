package org.convgrid.plotting.kippenhahn;

import java.util.List;
import org.convgrid.plotting.tracks.TrackOrigin;

/**
 * Everything a zones-against-age chart shows for one track.
 *
 * @param origin mass, Z and physics of the track
 * @param ageMin age of the first step, Gyr
 * @param ageMax age of the last step, Gyr (the last step only closes the previous one's rectangles)
 * @param zones one rectangle per convective interval of every step but the last, in step order
 * @param burning one rectangle per step (but the last) that gives a hydrogen-burning region, in step order
 * @param notes caveats to print on the chart
 */
public record KippenhahnData(TrackOrigin origin, double ageMin, double ageMax, List<AgeRect> zones,
                             List<AgeRect> burning, List<String> notes) {

    public KippenhahnData {
        zones = List.copyOf(zones);
        burning = List.copyOf(burning);
        notes = List.copyOf(notes);
    }
}
