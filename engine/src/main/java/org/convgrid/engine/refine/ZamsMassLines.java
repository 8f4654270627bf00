package org.convgrid.engine.refine;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.convgrid.engine.batch.ModelOutcome;
import org.convgrid.engine.batch.ModelStatus;
import org.convgrid.engine.batch.PhysicsOptions;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsTrack;
import org.convgrid.engine.zams.ZeroAgeRequests;

/**
 * The production lines: each line is a fresh {@link ZamsTrack}, so every model after the first is seeded by
 * homology from the nearest converged models of the line, as in a grid chunk ({@link ZeroAgeRequests}). The
 * composition is homogeneous and scaled solar, X = 1 - Y - Z, as for grid models. Requests at ages above zero are
 * answered with a failed outcome (no evolution in age yet).
 *
 * <p>Thread-safe: the physics bundle of each (options, composition) is built once (its atmosphere table is the costly
 * part) and shared; bundles are immutable, so which thread builds one does not change any result.
 */
public final class ZamsMassLines implements MassLineFactory {

    private final Map<Line, PhysicsSet> physics = new ConcurrentHashMap<>();

    @Override
    public MassLine open(PhysicsOptions options, double initialMetals, double initialHelium) {
        Composition composition = Composition.scaledSolar(1.0 - initialHelium - initialMetals, initialMetals);
        PhysicsSet set = physics.computeIfAbsent(new Line(options, composition),
                line -> StandardPhysics.create(line.options(), line.composition()));
        ZamsTrack track = new ZamsTrack(new ZamsBuilder(set), composition);
        return request -> request.age() != 0.0
                ? new ModelOutcome(request, ModelStatus.FAILED, ZeroAgeRequests.NO_EVOLUTION, null, null, 0)
                : ZeroAgeRequests.outcome(request, track.solve(request.mass()));
    }

    private record Line(PhysicsOptions options, Composition composition) {
    }
}
