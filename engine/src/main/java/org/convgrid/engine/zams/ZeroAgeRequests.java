package org.convgrid.engine.zams;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.batch.ModelOutcome;
import org.convgrid.engine.batch.ModelRequest;
import org.convgrid.engine.batch.ModelStatus;
import org.convgrid.engine.batch.PhysicsOptions;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;

/**
 * Solves grid requests with zero-age models: each chunk walks its masses in order on a fresh {@link ZamsTrack},
 * so every model after the first is seeded by homology from its converged neighbours and the chunk's answer
 * depends on the chunk alone. Requests at ages above zero are answered with a failed row that says so, since
 * evolution in age is not part of the engine yet.
 *
 * <p>Thread-safe: the physics bundle of each (options, composition) line is built once per instance (its
 * atmosphere table is the costly part) and shared between threads; the bundles are immutable.
 */
public final class ZeroAgeRequests implements ChunkSolver {

    /** status_detail of a request for an age above zero. */
    public static final String NO_EVOLUTION = "evolution in age is not available yet: only zero-age models (age 0)";

    private final Map<Line, PhysicsSet> physics = new ConcurrentHashMap<>();

    @Override
    public List<ModelOutcome> solve(List<ModelRequest> chunk) {
        List<ModelOutcome> outcomes = new ArrayList<>(chunk.size());
        if (chunk.isEmpty()) {
            return outcomes;
        }
        ModelRequest first = chunk.get(0);
        Composition composition = initialComposition(first);
        PhysicsSet set = physics.computeIfAbsent(new Line(first.physics(), composition),
                line -> StandardPhysics.create(line.options(), line.composition()));
        ZamsTrack track = new ZamsTrack(new ZamsBuilder(set), composition);
        for (ModelRequest request : chunk) {
            if (request.age() != 0.0) {
                outcomes.add(new ModelOutcome(request, ModelStatus.FAILED, NO_EVOLUTION, null, null, 0));
                continue;
            }
            outcomes.add(outcome(request, track.solve(request.mass())));
        }
        return outcomes;
    }

    /** Homogeneous initial composition: X = 1 - Y - Z, metals scaled solar. */
    public static Composition initialComposition(ModelRequest request) {
        double z = request.initialMetals();
        return Composition.scaledSolar(1.0 - request.initialHelium() - z, z);
    }

    /** The catalogue outcome of one zero-age result. */
    public static ModelOutcome outcome(ModelRequest request, ZamsResult result) {
        if (result.converged()) {
            var model = result.model().model();
            return new ModelOutcome(request, ModelStatus.OK, "", model.global(), model.convection(),
                    result.iterations());
        }
        return new ModelOutcome(request, ModelStatus.NOT_CONVERGED, result.failure().toString(), null, null,
                result.iterations());
    }

    private record Line(PhysicsOptions options, Composition composition) {
    }
}
