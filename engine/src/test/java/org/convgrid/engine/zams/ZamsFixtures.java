package org.convgrid.engine.zams;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Shared, lazily built physics and zero-age tracks for the solver tests: building an atmosphere table costs a
 * few seconds per composition, so each composition is set up once per test JVM.
 */
final class ZamsFixtures {

    /** Protosolar GS98 composition: X = 0.7062, Z = 0.0188 (Asplund, Amarsi &amp; Grevesse 2021, Table 4). */
    static final Composition PROTOSOLAR = Composition.scaledSolar(0.7062, 0.0188);

    private static final Map<Composition, PhysicsSet> PHYSICS = new ConcurrentHashMap<>();
    private static final Map<Composition, ZamsTrack> TRACKS = new ConcurrentHashMap<>();

    private ZamsFixtures() {
    }

    static PhysicsSet physics(Composition composition) {
        return PHYSICS.computeIfAbsent(composition, c -> StandardPhysics.create(PhysicsOptions.DEFAULT, c));
    }

    /** A track shared by the tests of one composition (models are reused as homology seeds). */
    static synchronized ZamsModel model(Composition composition, double massInSun) {
        ZamsTrack track = TRACKS.computeIfAbsent(composition,
                c -> new ZamsTrack(new ZamsBuilder(physics(c)), c));
        ZamsResult result = track.solve(massInSun * Constants.M_SUN);
        if (!result.converged()) {
            throw new AssertionError("no zero-age model of " + massInSun + " Msun: " + result.failure());
        }
        return result.model();
    }

    /** Composition with helium Y = 0.2485 + 1.5 Z (the README's example grid relation). */
    static Composition withHeliumRelation(double z) {
        double y = 0.2485 + 1.5 * z;
        return Composition.scaledSolar(1.0 - y - z, z);
    }
}
