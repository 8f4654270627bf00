package org.convgrid.engine.evolution;

import java.util.List;

import org.convgrid.engine.request.ModelRequest;

/**
 * Receives the evolution track of one star (one mass, composition and physics) as soon as it is computed.
 * Implementations must be thread-safe: chunks of a grid are evolved in parallel and call it concurrently, each
 * track exactly once per chunk solve.
 */
@FunctionalInterface
public interface TrackSink {

    /** Discards every track (zero-age runs, single models). */
    TrackSink NONE = (first, steps) -> { };

    /**
     * @param first the star's first request in grid order (its id, mass, composition and physics name the track)
     * @param steps every accepted step in increasing age, the zero-age model first
     */
    void accept(ModelRequest first, List<EvolutionStep> steps);
}
