package org.convgrid.engine.batch;

import java.util.List;

import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.birth.TrackPoint;
import org.convgrid.engine.evolution.TrackSink;
import org.convgrid.engine.request.ModelRequest;

/**
 * Receives the track of every star a chunk evolves: each step with its phase and surface lithium and, for a star
 * evolved from birth, the ages at which its life changed. Implementations must be thread-safe: chunks are solved in
 * parallel and call it concurrently, each star exactly once per chunk solve.
 */
@FunctionalInterface
public interface StarTrackSink {

    /** Discards every track. */
    StarTrackSink NONE = (first, points, events) -> { };

    /**
     * @param first the star's first request in grid order (its id, mass, composition and physics name the track)
     * @param points every accepted step in increasing age, the first model first; ages count from the requests'
     *               origin (birth, or the zero-age main sequence)
     * @param events the star's life events (s since birth) when it was evolved from birth; null for a star evolved
     *               from its zero-age model, whose pre-main sequence was not computed
     */
    void accept(ModelRequest first, List<TrackPoint> points, LifeEvents events);

    /** A sink that hands only the evolution steps on to {@code steps} (phases, lithium and events dropped). */
    static StarTrackSink stepsOnly(TrackSink steps) {
        return (first, points, events) -> steps.accept(first, points.stream().map(TrackPoint::step).toList());
    }
}
