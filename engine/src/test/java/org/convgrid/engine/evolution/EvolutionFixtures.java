package org.convgrid.engine.evolution;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.overshoot.ExponentialOvershoot;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsModel;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZamsTrack;

/** Physics and zero-age models shared by the evolution tests (the atmosphere table is built once per JVM). */
final class EvolutionFixtures {

    /** Z = 0.0188, Y = 0.275 (GS98 protosolar, Asplund, Amarsi &amp; Grevesse 2021, Table 4): X = 0.7062. */
    static final Composition SOLAR = Composition.scaledSolar(0.7062, 0.0188);

    private static final Map<Composition, PhysicsSet> PHYSICS = new ConcurrentHashMap<>();
    private static final Map<Composition, ZamsTrack> TRACKS = new ConcurrentHashMap<>();

    private EvolutionFixtures() {
    }

    static PhysicsSet physics(Composition c) {
        return PHYSICS.computeIfAbsent(c, x -> StandardPhysics.create(PhysicsOptions.DEFAULT, x));
    }

    /** The standard physics of {@code c} with another overshoot distance and stability criterion. */
    static PhysicsSet physics(Composition c, double overshootHp, StabilityCriterion criterion) {
        PhysicsSet p = physics(c);
        return new PhysicsSet(p.eos(), p.opacity(), p.nuclear(), p.convection(), criterion, p.surface(),
                overshootHp);
    }

    /** The standard physics of {@code c} with exponential overshoot of parameter {@code f}. */
    static PhysicsSet exponentialOvershoot(Composition c, double f) {
        PhysicsSet p = physics(c);
        return new PhysicsSet(p.eos(), p.opacity(), p.nuclear(), p.convection(), p.criterion(), p.surface(),
                new ExponentialOvershoot(f));
    }

    static synchronized ZamsModel zeroAge(Composition c, double massInSun) {
        ZamsTrack track = TRACKS.computeIfAbsent(c, x -> new ZamsTrack(new ZamsBuilder(physics(x)), x));
        ZamsResult r = track.solve(massInSun * Constants.M_SUN);
        if (!r.converged()) {
            throw new AssertionError("no zero-age model of " + massInSun + " Msun: " + r.failure());
        }
        return r.model();
    }
}
