package org.convgrid.engine.batch;

import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import java.util.List;

/**
 * Computes one chunk: consecutive requests of one line of constant composition and physics, in increasing mass
 * (all ages of a mass together). Each chunk starts from its own seed, so the result of a chunk does not depend on
 * which thread or which shard computes it. Implementations must be thread-safe.
 */
public interface ChunkSolver {

    /**
     * @param chunk requests in grid order
     * @return one outcome per request, in the same order; failures are outcomes with a status, not exceptions
     */
    List<ModelOutcome> solve(List<ModelRequest> chunk);

    /**
     * The shared work {@link #solve} of this chunk will use, as a chain in build order (each step needs the ones
     * before it), so that a scheduler can build it ahead, on other threads, while it has other work to give them,
     * and start the chunk when it is there instead of leaving a thread waiting for another that builds it. Only a
     * matter of time: the outcomes are the same whether or not the steps were run first. None by default.
     *
     * @param chunk requests in grid order
     */
    default List<SharedStep> groundwork(List<ModelRequest> chunk) {
        return List.of();
    }
}
