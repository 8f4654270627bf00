package org.convgrid.engine.batch;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;

import org.convgrid.engine.birth.BirthEvolution;
import org.convgrid.engine.birth.BirthTrack;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.birth.Phase;
import org.convgrid.engine.birth.StartModelBuilder;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.LifetimeSearch;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.LifeStage;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/**
 * Answers one star (one mass of a chunk) whose ages count from birth: one {@link BirthEvolution} from the
 * pre-main-sequence start model, stopped at the oldest requested age and landing on every one of them; each answer
 * carries its phase and surface lithium, and the track goes to the sink with the star's life events. The birth
 * composition is {@link BirthAbundances} at X = 1 - Y - Z. Main-sequence fractions with origin birth are resolved
 * first: a run from birth to core-hydrogen exhaustion gives the zero-age arrival t_ZAMS and the exhaustion age, so
 * f asks for t_ZAMS + f t_MS since birth (t_MS counted from the ZAMS). Stateless.
 */
final class BirthAges {

    /** m/M a central zone's top must exceed to be a core in the life events: the run's one core threshold. */
    private static final double CORE_THRESHOLD = ConvectiveZoneFinder.DEFAULT_MIN_CORE_MASS_FRACTION;

    /** The zero-age and core-hydrogen exhaustion ages of an evolution from birth, s since birth. */
    private record MainSequence(double zamsAge, double exhaustionAge) {
    }

    private BirthAges() {
    }

    /**
     * @param star the requests of one star, every age {@link Age.SinceBirth}
     * @param base evolution settings before stopping at the oldest requested age
     */
    static List<GridRequests.Answer> answers(GridRequests solver, List<ModelRequest> star,
                                             MainSequenceEvolver.Settings base) {
        return answers(solver, star, base, null);
    }

    /**
     * @param mainSequence when not null, the zero-age and exhaustion ages, s since birth, of another evolution of
     *                     the same star that the ages were measured against (main-sequence fractions): the life events
     *                     and the answers' phases take them, so that a fraction-0 row lies at {@code zams_myr} and is
     *                     on the main sequence. The two evolutions' steps differ, and where the arrival follows a
     *                     dip after a peak of L_nuc/L their own ZAMS ages differed by a few per cent (for
     *                     1.5 Msun, Z = 0.02, decaying overshoot 0.02, row at 22.93 Myr, zams_myr 22.38)
     */
    private static List<GridRequests.Answer> answers(GridRequests solver, List<ModelRequest> star,
                                                     MainSequenceEvolver.Settings base, MainSequence mainSequence) {
        double[] ages = new double[star.size()];
        for (int i = 0; i < ages.length; i++) {
            ModelRequest r = star.get(i);
            if (!(r.age() instanceof Age.SinceBirth since) || !(since.seconds() >= 0.0)) {
                return failedAll(star, ModelStatus.FAILED,
                        "age " + r.age() + " of " + r.modelId() + " is not a time since birth");
            }
            ages[i] = since.seconds();
        }
        double oldest = java.util.Arrays.stream(ages).max().orElse(0.0);
        ModelRequest first = star.get(0);
        Composition birth = birthComposition(first);
        PhysicsSet set = solver.physicsOf(first.physics(), birth);
        BirthTrack track;
        try {
            track = evolution(set, GridRequests.stoppingAt(base, oldest)).evolve(first.mass(), birth, ages);
        } catch (ConvgridException e) {
            return failedAll(star, ModelStatus.NOT_CONVERGED, "evolution from birth failed: " + e.getMessage());
        }
        LifeEvents events = mainSequence == null ? track.events()
                : track.events().withMainSequence(mainSequence.zamsAge(), mainSequence.exhaustionAge());
        solver.tracks().accept(first, track.points(), events);
        EvolutionResult result = track.result();
        List<GridRequests.Answer> out = new ArrayList<>(star.size());
        for (int i = 0; i < star.size(); i++) {
            AgedModel aged = track.models().get(i);
            boolean young = mainSequence == null ? track.phaseAt(aged.age()) == Phase.PRE_MAIN_SEQUENCE
                    : !(aged.age() >= mainSequence.zamsAge());
            LifeStage stage = new LifeStage(young, track.surfaceLithiumAt(aged));
            out.add(solver.answer(star.get(i), aged, result, track.start().iterations(), stage));
        }
        return out;
    }

    /**
     * @param star the requests of one star, every age a {@link Age.MainSequenceFraction} with origin birth
     */
    static List<GridRequests.Answer> fractions(GridRequests solver, List<ModelRequest> star) {
        for (ModelRequest r : star) {
            double f = r.age() instanceof Age.MainSequenceFraction m && m.origin() == AgeOrigin.BIRTH
                    ? m.fraction() : Double.NaN;
            if (!(f >= 0.0 && f <= 1.0)) {
                return failedAll(star, ModelStatus.FAILED, String.format(Locale.ROOT,
                        "age %s of %s is not a main-sequence fraction in [0, 1] from birth", r.age(), r.modelId()));
            }
        }
        ModelRequest first = star.get(0);
        Composition birth = birthComposition(first);
        PhysicsSet set = solver.physicsOf(first.physics(), birth);
        BirthTrack life;
        try {
            life = evolution(set, solver.settings()).evolve(first.mass(), birth, new double[0]);
        } catch (ConvgridException e) {
            return failedAll(star, ModelStatus.NOT_CONVERGED,
                    "evolution from birth to core-hydrogen exhaustion failed: " + e.getMessage());
        }
        double zams = life.events().zeroAgeMainSequence();
        double exhaustion = life.result().exhaustionAge();
        if (!Double.isFinite(zams) || !Double.isFinite(exhaustion)) {
            String reason = unknownLifetime(life.result(), Double.isFinite(zams), solver.settings().maxAge());
            return Double.isFinite(zams) ? zeroFractionsOnly(solver, star, zams, reason)
                    : failedAll(star, ModelStatus.NOT_CONVERGED, reason);
        }
        List<ModelRequest> sinceBirth = star.stream().map(r -> r.withAge(new Age.SinceBirth(
                zams + fractionOf(r) * (exhaustion - zams)))).toList();
        return answers(solver, sinceBirth, LifetimeSearch.landing(solver.settings()),
                new MainSequence(zams, exhaustion));
    }

    /**
     * A star that reached the zero-age main sequence but whose lifetime is unknown (a 0.8 Msun star at Z = 0.014 has
     * not exhausted its core hydrogen by the 20 Gyr limit): fraction 0 is the zero-age main sequence all the same, so
     * those rows get that model (from an evolution from birth to it, with its track and life events); every other
     * fraction fails with the reason.
     */
    private static List<GridRequests.Answer> zeroFractionsOnly(GridRequests solver, List<ModelRequest> star,
                                                               double zams, String reason) {
        List<ModelRequest> zeros = star.stream().filter(r -> fractionOf(r) == 0.0)
                .map(r -> r.withAge(new Age.SinceBirth(zams))).toList();
        if (zeros.isEmpty()) {
            return failedAll(star, ModelStatus.NOT_CONVERGED, reason);
        }
        Iterator<GridRequests.Answer> solved = answers(solver, zeros, LifetimeSearch.landing(solver.settings()),
                new MainSequence(zams, Double.NaN)).iterator();
        List<GridRequests.Answer> out = new ArrayList<>(star.size());
        for (ModelRequest r : star) {
            out.add(fractionOf(r) == 0.0 ? solved.next() : new GridRequests.Answer(GridRequests.failed(
                    r.withAge(new Age.SinceBirth(Double.NaN)), ModelStatus.NOT_CONVERGED, reason), null));
        }
        return out;
    }

    private static double fractionOf(ModelRequest r) {
        return ((Age.MainSequenceFraction) r.age()).fraction();
    }

    /**
     * Why a track from birth gives no main-sequence lifetime. An evolution that failed says where and why (a
     * 1.3 Msun star with decaying overshoot had run out of steps at 4.6 Gyr, X_c = 0.005, and the row said
     * "not exhausted within 20.00 Gyr of birth (FAILED)"); one that reached the age limit says that limit.
     */
    static String unknownLifetime(EvolutionResult result, boolean zamsReached, double maxAge) {
        String lifetime = zamsReached ? "main-sequence lifetime unknown: " : "the zero-age main sequence was not "
                + "reached from birth: ";
        return lifetime + switch (result.end()) {
            case FAILED -> "the evolution stopped before core-hydrogen exhaustion (" + result.detail() + ")";
            case HYDROGEN_EXHAUSTED -> "the core's hydrogen ran out before nuclear burning supplied 99 % of the "
                    + "luminosity for good";
            default -> String.format(Locale.ROOT, "core hydrogen not exhausted within %.4g Gyr of birth, the "
                    + "evolution's age limit", maxAge / Constants.GYR);
        };
    }

    /** The homogeneous birth composition of a request: X = 1 - Y - Z with deuterium, 3He and lithium. */
    static Composition birthComposition(ModelRequest r) {
        return BirthAbundances.of(1.0 - r.initialHelium() - r.initialMetals(), r.initialMetals());
    }

    private static BirthEvolution evolution(PhysicsSet set, MainSequenceEvolver.Settings settings) {
        return new BirthEvolution(new StartModelBuilder(set), new MainSequenceEvolver(set, settings), CORE_THRESHOLD);
    }

    /** Every request failed with one reason; a fraction's age becomes an unknown time since birth. */
    private static List<GridRequests.Answer> failedAll(List<ModelRequest> star, ModelStatus status, String detail) {
        return star.stream().map(r -> new GridRequests.Answer(GridRequests.failed(
                r.age() instanceof Age.SinceBirth ? r : r.withAge(new Age.SinceBirth(Double.NaN)), status, detail),
                null)).toList();
    }
}
