package org.convgrid.engine.physics;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.Composition;

/**
 * The standard physics bundle of each (options, surface composition) line, built once per instance (its
 * atmosphere table is the costly part) and shared between threads. Bundles are immutable, so which thread builds
 * one changes no result. One instance per run: nothing is cached across runs.
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
