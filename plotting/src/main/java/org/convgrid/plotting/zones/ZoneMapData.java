package org.convgrid.plotting.zones;

import java.util.List;
import org.convgrid.output.transitions.Slice;

/**
 * Everything a zone map shows, independent of how it is drawn.
 *
 * @param slice the metallicity, age and physics of the map; its age is NaN on a map of one main-sequence fraction,
 *     whose stars each have their own age
 * @param age the map's age in words, for its title: {@code 150 Myr}, {@code main-sequence fraction 0.25}
 * @param axis the vertical coordinate
 * @param rects every convective interval of every model (and one NO_RESULT column per unusable model); radiative
 *     parts are simply absent
 * @param markers the transition masses found for this slice
 * @param massMin left edge of the lowest mass column, solar masses
 * @param massMax right edge of the highest mass column, solar masses
 * @param notes caveats to show on the chart (for example what the catalogue cannot tell), may be empty
 */
public record ZoneMapData(Slice slice, String age, ZoneAxis axis, List<ZoneRect> rects, List<TransitionMarker> markers,
                          double massMin, double massMax, List<String> notes) {

    public ZoneMapData {
        rects = List.copyOf(rects);
        markers = List.copyOf(markers);
        notes = List.copyOf(notes);
    }
}
