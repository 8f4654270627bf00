package org.convgrid.plotting.trend;

import java.util.List;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.zones.TransitionMarker;

/**
 * Everything the transition-mass chart shows.
 *
 * @param physics the physics of every slice shown
 * @param metallicities every Z of these slices, increasing (including those where no transition was found)
 * @param series one series per (transition, age, method), ages increasing, fully convective limit first
 * @param windows the transient core windows of these slices
 * @param caveats sentences the chart prints beside the plot about what some of its values mean
 */
public record TransitionTrendData(PhysicsKey physics, List<Double> metallicities, List<Series> series,
                                  List<TransientWindow> windows, List<String> caveats) {

    public TransitionTrendData {
        metallicities = List.copyOf(metallicities);
        series = List.copyOf(series);
        windows = List.copyOf(windows);
        caveats = List.copyOf(caveats);
    }

    /** Data without caveats. */
    public TransitionTrendData(PhysicsKey physics, List<Double> metallicities, List<Series> series,
                               List<TransientWindow> windows) {
        this(physics, metallicities, series, windows, List.of());
    }

    /**
     * One transition at one age across metallicity.
     *
     * @param kind which transition
     * @param ageGyr the age, Gyr
     * @param method how these masses were found: a refined value is never joined to one read off the grid
     * @param points the slices where the grid brackets the transition, increasing Z
     */
    public record Series(TransitionMarker.Kind kind, double ageGyr, TransitionMethod method, List<TrendPoint> points) {
        public Series {
            points = List.copyOf(points);
        }
    }
}
