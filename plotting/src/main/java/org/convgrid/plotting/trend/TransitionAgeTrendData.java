package org.convgrid.plotting.trend;

import java.util.List;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.zones.TransitionMarker;

/**
 * Everything the transition-mass-against-age chart shows.
 *
 * @param physics the physics of every slice shown
 * @param ages every age of these slices, Gyr, increasing
 * @param metallicities every Z of these slices, increasing
 * @param series one series per (transition, Z), Z increasing, fully convective limit first
 */
public record TransitionAgeTrendData(PhysicsKey physics, List<Double> ages, List<Double> metallicities,
                                     List<Series> series) {

    public TransitionAgeTrendData {
        ages = List.copyOf(ages);
        metallicities = List.copyOf(metallicities);
        series = List.copyOf(series);
    }

    /**
     * One transition at one metallicity across age.
     *
     * @param kind which transition
     * @param zInit initial metal mass fraction
     * @param method how these masses were found: a refined value is never joined to one read off the grid
     * @param points the ages where the grid brackets the transition, increasing age
     */
    public record Series(TransitionMarker.Kind kind, double zInit, TransitionMethod method, List<AgePoint> points) {
        public Series {
            points = List.copyOf(points);
        }
    }
}
