package org.convgrid.engine.batch;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.convgrid.engine.evolution.LifetimeSearch;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZeroAgeRequests;

/**
 * Answers one star whose request ages are fractions of its main-sequence lifetime ({@link Age.MainSequenceFraction}):
 * finds the lifetime, resolves every fraction f to t = f t_MS (s) and lets {@link GridRequests} land on those ages.
 * Stateless.
 */
final class FractionAges {

    private FractionAges() {
    }

    static List<GridRequests.Answer> answers(GridRequests solver, PhysicsSet set, List<ModelRequest> star,
                                             ZamsResult zeroAge) {
        for (ModelRequest r : star) {
            double f = fraction(r);
            if (!(f >= 0.0 && f <= 1.0)) {
                String detail = String.format(Locale.ROOT, "age %s of %s is not a main-sequence fraction in [0, 1]",
                        f, r.modelId());
                return star.stream().map(q -> new GridRequests.Answer(
                        GridRequests.failed(withAge(q, Double.NaN), ModelStatus.FAILED, detail), null)).toList();
            }
        }
        double top = star.stream().mapToDouble(FractionAges::fraction).max().orElse(0.0);
        if (!zeroAge.converged() || top <= 0.0) {
            // Nothing to evolve: every age is the ZAMS, or there is no zero-age model (non-zero fractions fail).
            List<ModelRequest> zeroOrUnknown = star.stream()
                    .map(r -> withAge(r, fraction(r) == 0.0 ? 0.0 : Double.NaN)).toList();
            return solver.star(set, zeroOrUnknown, zeroAge, solver.settings());
        }
        LifetimeSearch.Lifetime life = LifetimeSearch.find(set, zeroAge.model().model(), solver.settings());
        if (!life.found()) {
            List<GridRequests.Answer> out = new ArrayList<>(star.size());
            for (ModelRequest r : star) {
                out.add(fraction(r) == 0.0
                        ? new GridRequests.Answer(ZeroAgeRequests.outcome(r, zeroAge), GridRequests.modelOf(zeroAge))
                        : new GridRequests.Answer(GridRequests.failed(withAge(r, Double.NaN),
                                ModelStatus.NOT_CONVERGED, life.reason()), null));
            }
            return out;
        }
        List<ModelRequest> inSeconds = star.stream().map(r -> withAge(r, fraction(r) * life.age())).toList();
        return solver.star(set, inSeconds, zeroAge, LifetimeSearch.landing(solver.settings()));
    }

    /** The fraction a request asks for; NaN for an age of another kind (answered as not a fraction). */
    private static double fraction(ModelRequest r) {
        return r.age() instanceof Age.MainSequenceFraction f ? f.fraction() : Double.NaN;
    }

    private static ModelRequest withAge(ModelRequest r, double age) {
        return r.withAge(new Age.SinceZeroAge(age));
    }
}
