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
 * @param series one series per (transition, Z, method), Z increasing, fully convective limit first
 * @param windows the transient core windows of these slices
 * @param caveats sentences the chart prints beside the plot about what some of its values mean
 */
public record TransitionAgeTrendData(PhysicsKey physics, List<Double> ages, List<Double> metallicities,
                                     List<Series> series, List<TransientWindow> windows, List<String> caveats) {

    public TransitionAgeTrendData {
        ages = List.copyOf(ages);
        metallicities = List.copyOf(metallicities);
        series = List.copyOf(series);
        windows = List.copyOf(windows);
        caveats = List.copyOf(caveats);
    }

    /** Data without caveats. */
    public TransitionAgeTrendData(PhysicsKey physics, List<Double> ages, List<Double> metallicities,
                                  List<Series> series, List<TransientWindow> windows) {
        this(physics, ages, metallicities, series, windows, List.of());
    }

    /**
     * Whether the ages call for a logarithmic axis: all above zero and spanning at least a decade (ages from birth,
     * where the pre-main sequence takes Myr and the main sequence Gyr).
     */
    public boolean logAges() {
        return !ages.isEmpty() && ages.get(0) > 0.0 && ages.get(ages.size() - 1) / ages.get(0) >= 10.0;
    }

    /**
     * One transition at one metallicity across age.
     *
     * @param kind which transition
     * @param zInit initial metal mass fraction
     * @param method how these masses were found: a refined value is never joined to one read off the grid
     * @param points the ages where the models bracket the transition, increasing age
     */
    public record Series(TransitionMarker.Kind kind, double zInit, TransitionMethod method, List<AgePoint> points) {
        public Series {
            points = List.copyOf(points);
        }
    }
}
