package org.convgrid.cli;

import java.util.List;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.refine.MassLine;
import org.convgrid.engine.refine.MassLineFactory;
import org.convgrid.engine.units.Constants;

/**
 * Refinement lines answered by {@link FakeChunkSolver}'s made-up structure (fully convective below 0.375 Msun, a
 * convective core from 1.225 Msun), each request as a chunk of its own; masses listed in {@code failingMsun} (to
 * 1e-9 Msun) fail. Counts the models it is asked for.
 */
final class FakeMassLines implements MassLineFactory {

    final AtomicInteger solved = new AtomicInteger();
    private final FakeChunkSolver solver = FakeChunkSolver.fast();
    private final Set<Double> failingMsun;

    FakeMassLines(Set<Double> failingMsun) {
        this.failingMsun = Set.copyOf(failingMsun);
    }

    @Override
    public MassLine open(PhysicsOptions physics, double initialMetals, double initialHelium) {
        return request -> {
            solved.incrementAndGet();
            double msun = request.mass() / Constants.M_SUN;
            if (failingMsun.stream().anyMatch(m -> Math.abs(m - msun) < 1e-9)) {
                return new ModelOutcome.Failed(request, ModelStatus.NOT_CONVERGED, "fake line gave up", 30);
            }
            return solver.solve(List.of(request)).get(0);
        };
    }
}
