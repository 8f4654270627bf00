package org.convgrid.engine.evolution;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.convgrid.engine.batch.ModelOutcome;
import org.convgrid.engine.batch.ModelRequest;
import org.convgrid.engine.batch.ModelStatus;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZeroAgeRequests;

/**
 * Answers one star whose request ages are fractions of its main-sequence lifetime ({@link AgeMeaning#MS_FRACTION}):
 * finds the lifetime, resolves every fraction f to t = f t_MS (s) and lets {@link GridRequests} land on those ages.
 * Stateless.
 */
final class FractionAges {

    private FractionAges() {
    }

    static List<GridRequests.Answer> answers(GridRequests solver, PhysicsSet set, List<ModelRequest> star,
                                             ZamsResult zeroAge) {
        for (ModelRequest r : star) {
            if (!(r.age() >= 0.0 && r.age() <= 1.0)) {
                String detail = String.format(Locale.ROOT, "age %s of %s is not a main-sequence fraction in [0, 1]",
                        r.age(), r.modelId());
                return star.stream().map(q -> new GridRequests.Answer(
                        GridRequests.failed(withAge(q, Double.NaN), ModelStatus.FAILED, detail), null)).toList();
            }
        }
        double top = star.stream().mapToDouble(ModelRequest::age).max().orElse(0.0);
        if (!zeroAge.converged() || top <= 0.0) {
            // Nothing to evolve: every age is the ZAMS, or there is no zero-age model (non-zero fractions fail).
            return resolved(solver.star(set, star, zeroAge, solver.settings()), Double.NaN);
        }
        LifetimeSearch.Lifetime life = LifetimeSearch.find(set, zeroAge.model().model(), solver.settings());
        if (!life.found()) {
            List<GridRequests.Answer> out = new ArrayList<>(star.size());
            for (ModelRequest r : star) {
                out.add(r.age() == 0.0
                        ? new GridRequests.Answer(ZeroAgeRequests.outcome(r, zeroAge), GridRequests.modelOf(zeroAge))
                        : new GridRequests.Answer(GridRequests.failed(withAge(r, Double.NaN),
                                ModelStatus.NOT_CONVERGED, life.reason()), null));
            }
            return out;
        }
        List<ModelRequest> inSeconds = star.stream().map(r -> withAge(r, r.age() * life.age())).toList();
        return solver.star(set, inSeconds, zeroAge, LifetimeSearch.landing(solver.settings()));
    }

    /** The answers with their fraction ages turned into seconds: 0 stays 0, others become f t_MS. */
    private static List<GridRequests.Answer> resolved(List<GridRequests.Answer> answers, double lifetime) {
        return answers.stream().map(a -> {
            ModelOutcome o = a.outcome();
            double f = o.request().age();
            ModelRequest r = withAge(o.request(), f == 0.0 ? 0.0 : f * lifetime);
            return new GridRequests.Answer(new ModelOutcome(r, o.status(), o.statusDetail(), o.global(),
                    o.convection(), o.solverIterations()), a.model());
        }).toList();
    }

    private static ModelRequest withAge(ModelRequest r, double age) {
        return new ModelRequest(r.modelId(), r.mass(), r.initialMetals(), r.initialHelium(), age, r.physics());
    }
}
