package org.convgrid.engine.batch;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.convgrid.engine.birth.Phase;
import org.convgrid.engine.birth.TrackPoint;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.AgeOrigin;
import org.convgrid.engine.request.LifeStage;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.TrackSink;
import org.convgrid.engine.physics.PhysicsBundles;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ModelSeismicScales;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsLadder;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZamsTrack;
import org.convgrid.engine.zams.ZeroAgeRequests;

/**
 * Solves grid requests at any age. A chunk walks its masses in order on a fresh {@link ZamsTrack} (each zero-age model
 * seeded by homology from its converged neighbours; in a chunk of several masses the first from the two rungs of the
 * line's shared {@link ZamsLadder} next to it); the requests of one mass (consecutive in a chunk) are answered by
 * one {@link MainSequenceEvolver} run from that zero-age model, stopped at the largest requested age, with a step
 * landing exactly on every requested age (no interpolation). Age 0 is the zero-age model itself; ages are {@link
 * Age.SinceZeroAge} in s. Ages beyond core-hydrogen exhaustion are {@link ModelStatus#PAST_MAIN_SEQUENCE} with the
 * exhaustion age in the detail; a failed evolution leaves the ages it did not reach {@link ModelStatus#NOT_CONVERGED}.
 * Each star with an age above zero hands its track to the {@link StarTrackSink}.
 *
 * <p>Requests counted from birth ({@link Age.SinceBirth}, or fractions with origin {@link AgeOrigin#BIRTH}) are
 * answered by {@link BirthAges}: one evolution from the pre-main-sequence start model per star, landing on every
 * requested age, with the phase and surface lithium of each answer and the star's life events handed to the sink.
 *
 * <p>When a star's request ages are {@link Age.MainSequenceFraction}s, they are fractions f of its main-sequence
 * lifetime: the star is first evolved to core-hydrogen exhaustion ({@link LifetimeSearch}) to find t_MS, then evolved
 * again from its zero-age model landing exactly on every t = f t_MS (f = 1: the exhaustion age, X_c = 1e-4 by default,
 * to within the second run's steps); the outcomes carry the request with t in s. The track handed over is the second
 * run's, and the iteration counts are those of the second run. A star whose lifetime cannot be found (evolution failed,
 * or X_c still above the end value at the age limit, as for stars below about 0.9 Msun with the default 20 Gyr) answers
 * its non-zero fractions {@link ModelStatus#NOT_CONVERGED} with age NaN and the reason.
 *
 * <p>An outcome depends only on its chunk, never on threads. Thread-safe: the physics bundle of each (options,
 * composition) line is built once per instance and shared; the bundles are immutable.
 */
public final class GridRequests implements ChunkSolver {

    /**
     * One answer with its model.
     *
     * @param outcome the catalogue outcome
     * @param model the model at the requested age, null unless the outcome is OK
     */
    public record Answer(ModelOutcome outcome, StellarModel model) {
    }

    /**
     * Zero-age ladders kept besides those of the chunks named ahead ({@link #groundwork}) that have not run yet, which
     * are all kept, however many chunks the scheduler has in flight (threads times its window per thread).
     */
    public static final int LADDERS_KEPT = 8;

    private final PhysicsBundles physics = new PhysicsBundles();
    /**
     * Ladders of the lines whose chunks were named ahead and have not run yet, and of the {@link #LADDERS_KEPT} lines
     * most recently asked for besides (a line's rungs are up to ~20 whole models); a line evicted and asked for again
     * rebuilds the same rungs, so eviction costs time, never a result.
     */
    private final LadderCache<Line, ZamsLadder> ladders = new LadderCache<>(LADDERS_KEPT);
    private final StarTrackSink tracks;
    private final ModelSink models;
    private final MainSequenceEvolver.Settings settings;

    /**
     * @param tracks receives the track of every star evolved beyond age 0, with phases, lithium and life events
     * @param settings time-step settings; {@code maxAge} caps the ages answered (older ones fail)
     */
    public GridRequests(StarTrackSink tracks, MainSequenceEvolver.Settings settings) {
        this(tracks, ModelSink.NONE, settings);
    }

    /**
     * @param tracks receives the track of every star evolved beyond age 0, with phases, lithium and life events
     * @param models receives the model behind every OK outcome (profiles)
     * @param settings time-step settings; {@code maxAge} caps the ages answered (older ones fail)
     */
    public GridRequests(StarTrackSink tracks, ModelSink models, MainSequenceEvolver.Settings settings) {
        this.tracks = tracks;
        this.models = models;
        this.settings = settings;
    }

    /**
     * @param tracks receives the evolution steps of every star evolved beyond age 0
     * @param settings time-step settings; {@code maxAge} caps the ages answered (older ones fail)
     */
    public GridRequests(TrackSink tracks, MainSequenceEvolver.Settings settings) {
        this(StarTrackSink.stepsOnly(tracks), settings);
    }

    /** Default time steps ({@link MainSequenceEvolver.Settings#DEFAULT}). */
    public GridRequests(TrackSink tracks) {
        this(tracks, MainSequenceEvolver.Settings.DEFAULT);
    }

    @Override
    public List<ModelOutcome> solve(List<ModelRequest> chunk) {
        List<Answer> answers = answers(chunk);
        for (int i = 0; i < answers.size(); i++) {
            if (answers.get(i).model() != null && answers.get(i).outcome() instanceof ModelOutcome.Solved) {
                // the outcome's request: a main-sequence fraction resolved to the age it stands for
                models.accept(answers.get(i).outcome().request(), answers.get(i).model());
            }
        }
        return answers.stream().map(Answer::outcome).toList();
    }

    /** As {@link #solve}, keeping the models (for profiles). */
    public List<Answer> answers(List<ModelRequest> chunk) {
        List<Answer> out = new ArrayList<>(chunk.size());
        if (chunk.isEmpty()) {
            return out;
        }
        ModelRequest first = chunk.get(0);
        Composition composition = ZeroAgeRequests.initialComposition(first);
        Line line = Line.of(first);
        try {
            answerStars(chunk, first, line, composition, out);
        } finally {
            // the chunk has taken its ladder, or failed before: either way it no longer waits for it
            if (opensLadder(chunk)) {
                ladders.taken(line);
            }
        }
        return out;
    }

    /** The answers of the chunk's stars into {@code out}, in order. */
    private void answerStars(List<ModelRequest> chunk, ModelRequest first, Line line, Composition composition,
                             List<Answer> out) {
        // the zero-age line is opened by the first star that needs it: stars from birth start elsewhere
        PhysicsSet set = null;
        ZamsTrack track = null;
        int start = 0;
        while (start < chunk.size()) {
            int end = start + 1;
            while (end < chunk.size() && chunk.get(end).mass() == chunk.get(start).mass()) {
                end++;
            }
            List<ModelRequest> star = chunk.subList(start, end);
            if (star.get(0).age().origin() == AgeOrigin.BIRTH) {
                out.addAll(star.get(0).age() instanceof Age.MainSequenceFraction
                        ? BirthAges.fractions(this, star) : BirthAges.answers(this, star, settings));
            } else {
                ZamsResult zeroAge;
                try {
                    if (track == null) {
                        set = physics.of(first.physics(), composition);
                        ZamsBuilder builder = new ZamsBuilder(set);
                        track = new ZamsTrack(builder, composition,
                                severalMasses(chunk) ? ladderOf(line, builder, composition) : null);
                    }
                    zeroAge = track.solve(star.get(0).mass());
                } catch (ConvgridException e) {
                    if (e.kind().isUsageError()) {
                        throw e;
                    }
                    // the physics could not answer while this star's zero-age model was built (an equation of
                    // state or opacity table out of its range): its rows fail with the reason, the chunk's other
                    // stars go on (the whole chunk failed before), and `star` gets the row a grid gets
                    String detail = "zero-age model not built: " + e.getMessage();
                    star.forEach(q -> out.add(new Answer(failed(q, ModelStatus.FAILED, detail), null)));
                    start = end;
                    continue;
                }
                out.addAll(star.get(0).age() instanceof Age.MainSequenceFraction
                        ? FractionAges.answers(this, set, star, zeroAge)
                        : star(set, star, zeroAge, settings));
            }
            start = end;
        }
    }

    /**
     * The rungs of the line's {@link ZamsLadder} the chunk's first zero-age star starts from, anchor first: what
     * {@link #answers} would build on first use, so built ahead they change nothing but when the chunk can start.
     * None for a chunk of one mass (it keeps its own cold start) or of stars from birth alone.
     */
    @Override
    public List<SharedStep> groundwork(List<ModelRequest> chunk) {
        if (!opensLadder(chunk)) {
            return List.of();
        }
        ModelRequest first = chunk.get(0);
        Composition composition = ZeroAgeRequests.initialComposition(first);
        double mass = chunk.stream().filter(r -> r.age().origin() != AgeOrigin.BIRTH).mapToDouble(ModelRequest::mass)
                .findFirst().orElseThrow();
        Line line = Line.of(first);
        List<SharedStep> steps = new ArrayList<>();
        for (int index : ZamsLadder.rungsFor(mass)) {
            steps.add(new SharedStep(new LineRung(line, index), () -> {
                PhysicsSet set = physics.of(first.physics(), composition);
                ladderOf(line, new ZamsBuilder(set), composition).startFor(ZamsLadder.rungMass(index));
            }));
        }
        // built ahead, the ladder stays until this chunk has taken it (answers), however many lines are in flight
        ladders.awaiting(line);
        return steps;
    }

    /** A line of constant physics and initial composition. */
    private record Line(PhysicsOptions physics, double metals, double helium) {

        static Line of(ModelRequest request) {
            return new Line(request.physics(), request.initialMetals(), request.initialHelium());
        }
    }

    /** One rung (signed index, 0 the anchor) of the ladder of a line. */
    private record LineRung(Line line, int index) {
    }

    /**
     * Whether the chunk starts its zero-age stars from the line's ladder: several masses, at least one of them counted
     * from the zero-age main sequence.
     */
    private static boolean opensLadder(List<ModelRequest> chunk) {
        return severalMasses(chunk) && chunk.stream().anyMatch(r -> r.age().origin() != AgeOrigin.BIRTH);
    }

    /**
     * Whether a chunk holds more than one mass: a grid line, where the ladder's rungs are shared by its chunks. A single
     * mass (one star, a line of one mass) keeps its own cold start, which costs less than the rungs out to its mass.
     * Depends on the chunk alone, so on the grid alone.
     */
    private static boolean severalMasses(List<ModelRequest> chunk) {
        return chunk.stream().mapToDouble(ModelRequest::mass).distinct().count() > 1;
    }

    /** The zero-age ladder of a line, shared by all its chunks (a rung is the same whoever builds it). */
    private ZamsLadder ladderOf(Line line, ZamsBuilder builder, Composition composition) {
        return ladders.ladder(line, () -> new ZamsLadder(builder, composition));
    }

    /**
     * The answers for the requests of one star (one mass, ages since the zero-age main sequence), in their order;
     * an age of another kind is answered {@link ModelStatus#FAILED}.
     *
     * @param base the evolution settings, before stopping at the oldest requested age
     */
    List<Answer> star(PhysicsSet set, List<ModelRequest> star, ZamsResult zeroAge, MainSequenceEvolver.Settings base) {
        List<Answer> out = new ArrayList<>(star.size());
        for (ModelRequest r : star) {
            if (!(r.age() instanceof Age.SinceZeroAge)) {
                String detail = "age " + r.age() + " of " + r.modelId() + " mixes age kinds within one star";
                return star.stream().map(q -> new Answer(failed(q, ModelStatus.FAILED, detail), null)).toList();
            }
        }
        double oldest = star.stream().mapToDouble(GridRequests::seconds).max().orElse(0.0);
        if (!zeroAge.converged() || oldest <= 0.0) {
            for (ModelRequest r : star) {
                ModelOutcome zams = ZeroAgeRequests.outcome(r, zeroAge);
                out.add(seconds(r) <= 0.0 || !zeroAge.converged() ? new Answer(zams, modelOf(zeroAge))
                        : new Answer(failed(r, ModelStatus.NOT_CONVERGED, "no zero-age model to evolve"), null));
            }
            return out;
        }
        double[] ages = star.stream().mapToDouble(GridRequests::seconds).toArray();
        EvolutionResult result;
        try {
            result = new MainSequenceEvolver(set, stoppingAt(base, oldest)).evolve(zeroAge.model().model(), ages);
        } catch (ConvgridException e) {
            for (ModelRequest r : star) {
                out.add(seconds(r) <= 0.0 ? new Answer(ZeroAgeRequests.outcome(r, zeroAge), modelOf(zeroAge))
                        : new Answer(failed(r, ModelStatus.NOT_CONVERGED, "evolution failed: " + e.getMessage()),
                        null));
            }
            return out;
        }
        tracks.accept(star.get(0), result.steps().stream()
                .map(s -> new TrackPoint(s, Phase.MAIN_SEQUENCE, Double.NaN, Double.NaN, Double.NaN)).toList(), null);
        for (int i = 0; i < star.size(); i++) {
            out.add(answer(star.get(i), result.models().get(i), result, zeroAge.iterations(),
                    LifeStage.MAIN_SEQUENCE_UNTRACED));
        }
        return out;
    }

    /**
     * The answer for one requested age of an evolution.
     *
     * @param startIterations Newton iterations spent on the first model of the evolution
     * @param stage the phase and surface lithium of the answer's model
     */
    Answer answer(ModelRequest request, AgedModel aged, EvolutionResult result, int startIterations,
                  LifeStage stage) {
        if (aged.status() == ModelStatus.OK) {
            StellarModel m = aged.model();
            // the edge the evolution's overshoot mixes the core to, from this model's zones (as the next step would)
            double mixedTop = request.physics().overshootScheme().model(request.physics().overshoot())
                    .mixedCoreTop(m.profile()) / request.mass();
            return new Answer(new ModelOutcome.Solved(request, m.global(), m.convection(),
                    startIterations + iterationsUpTo(result, aged.age()), stage, mixedTop, ModelSeismicScales.of(m)),
                    m);
        }
        String detail = aged.detail();
        if (aged.status() == ModelStatus.PAST_MAIN_SEQUENCE && Double.isFinite(result.exhaustionAge())) {
            // the evolution's clock starts where the request's age does: say which, as a zams-origin age and one
            // since birth differ by the pre-main sequence
            detail = String.format(Locale.ROOT, "core hydrogen exhausted (X_c < %.1e) at %.4g Gyr %s",
                    settings.endCentralHydrogen(), result.exhaustionAge() / Constants.GYR,
                    request.age().origin() == AgeOrigin.BIRTH ? "since birth" : "since the zero-age main sequence");
        }
        return new Answer(failed(request, aged.status(), detail), null);
    }

    /** Newton iterations of every step up to and including {@code age}: the cost of reaching it. */
    private static int iterationsUpTo(EvolutionResult result, double age) {
        int sum = 0;
        for (EvolutionStep s : result.steps()) {
            if (s.age() <= age) {
                sum += s.iterations();
            }
        }
        return sum;
    }

    /** The settings stopped at the oldest requested age (no steps beyond what the catalogue asks for). */
    static MainSequenceEvolver.Settings stoppingAt(MainSequenceEvolver.Settings s, double oldest) {
        return new MainSequenceEvolver.Settings(s.maxCentralHydrogenChange(), s.exhaustionFraction(),
                s.maxLuminosityChange(), s.maxGrowth(), s.endCentralHydrogen(), Math.min(oldest, s.maxAge()),
                s.stepBudget(), s.retryBudget());
    }

    /** The time-step settings given at construction. */
    MainSequenceEvolver.Settings settings() {
        return settings;
    }

    /** The receiver of the tracks. */
    StarTrackSink tracks() {
        return tracks;
    }

    /** The shared physics bundle of some options and composition. */
    PhysicsSet physicsOf(PhysicsOptions options, Composition composition) {
        return physics.of(options, composition);
    }

    static StellarModel modelOf(ZamsResult r) {
        return r.converged() ? r.model().model() : null;
    }

    /** A request answered without a model of its own: its iteration count is not applicable. */
    static ModelOutcome failed(ModelRequest r, ModelStatus status, String detail) {
        return new ModelOutcome.Failed(r, status, detail, ModelOutcome.NO_MODEL_SOLVED);
    }

    /** The age of a request known to be counted from the zero-age main sequence, s. */
    private static double seconds(ModelRequest r) {
        return ((Age.SinceZeroAge) r.age()).seconds();
    }

}
