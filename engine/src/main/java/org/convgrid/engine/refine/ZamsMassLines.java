package org.convgrid.engine.refine;

import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.physics.PhysicsBundles;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsTrack;
import org.convgrid.engine.zams.ZeroAgeRequests;

/**
 * The production lines: each line is a fresh {@link ZamsTrack}, so every model after the first is seeded by
 * homology from the nearest converged models of the line, as in a grid chunk. The composition is homogeneous
 * and scaled solar, X = 1 - Y - Z, as for grid models ({@link ZeroAgeRequests#initialComposition}). Requests at
 * ages above zero are answered with a failed outcome: refinement builds zero-age models only.
 *
 * <p>Thread-safe: the physics bundles are shared through {@link PhysicsBundles}.
 */
public final class ZamsMassLines implements MassLineFactory {

    private final PhysicsBundles physics = new PhysicsBundles();

    @Override
    public MassLine open(PhysicsOptions options, double initialMetals, double initialHelium) {
        Composition composition = ZeroAgeRequests.initialComposition(initialMetals, initialHelium);
        PhysicsSet set = physics.of(options, composition);
        ZamsTrack track = new ZamsTrack(new ZamsBuilder(set), composition);
        return request -> !request.age().isZeroAge()
                ? new ModelOutcome.Failed(request, ModelStatus.FAILED, ZeroAgeRequests.NO_EVOLUTION,
                        ModelOutcome.NO_MODEL_SOLVED)
                : ZeroAgeRequests.outcome(request, track.solve(request.mass()));
    }

}
