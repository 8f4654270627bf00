package org.convgrid.engine.physics;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;

/**
 * The standard physics bundle of each (options, surface composition) line, built once per instance and shared
 * between threads, so the atmosphere nodes one model integrates serve every later model of the line. A bundle's
 * answers never change (its atmosphere nodes are filled in on first use, each a pure function of its point), so
 * which thread builds or fills one changes no result. One instance per run: nothing is cached across runs.
 */
public final class PhysicsBundles {

    private final Map<Line, PhysicsSet> bundles = new ConcurrentHashMap<>();

    /** {@link StandardPhysics#create(PhysicsOptions, Composition)}, built on first use. */
    public PhysicsSet of(PhysicsOptions options, Composition surfaceComposition) {
        return bundles.computeIfAbsent(new Line(options, surfaceComposition),
                line -> StandardPhysics.create(line.options(), line.composition()));
    }

    private record Line(PhysicsOptions options, Composition composition) {
    }
}
