package org.convgrid.engine.birth;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.state.Composition;

/**
 * Evolves a star of given mass, birth composition and physics from birth: the start model of
 * {@link StartModelBuilder} (age 0), then {@link MainSequenceEvolver} (pre-main-sequence limits until the
 * zero-age main sequence) to core-hydrogen exhaustion or the evolver's age limit, landing a step exactly on every
 * requested age. Records the phase and surface lithium of every step and the star's {@link LifeEvents}.
 * Immutable and thread-safe (each call has its own state); deterministic.
 */
public final class BirthEvolution {

    /**
     * m/M the top of a central convective zone must exceed to count as a core, unless told otherwise (the
     * catalogue's threshold belongs to the run and should be passed in).
     */
    public static final double DEFAULT_CORE_THRESHOLD = 1.0e-3;

    private final StartModelBuilder starts;
    private final MainSequenceEvolver evolver;
    private final double coreThreshold;

    public BirthEvolution(StartModelBuilder starts, MainSequenceEvolver evolver, double coreThreshold) {
        this.starts = starts;
        this.evolver = evolver;
        this.coreThreshold = coreThreshold;
    }

    /** Default start models and the given evolution settings. */
    public BirthEvolution(PhysicsSet physics, MainSequenceEvolver.Settings settings) {
        this(new StartModelBuilder(physics), new MainSequenceEvolver(physics, settings), DEFAULT_CORE_THRESHOLD);
    }

    /**
     * @param mass g
     * @param birth homogeneous birth composition ({@link org.convgrid.engine.state.BirthAbundances})
     * @param ages requested ages since birth, s (any order)
     * @throws org.convgrid.engine.error.ConvgridException when the start model cannot be built
     */
    public BirthTrack evolve(double mass, Composition birth, double[] ages) {
        StartModel start = starts.build(mass, birth);
        LifeRecorder recorder = new LifeRecorder(coreThreshold);
        EvolutionResult result = evolver.evolve(start.model(), ages, recorder);
        List<double[]> rows = recorder.rows();
        List<TrackPoint> points = new ArrayList<>(rows.size());
        for (int i = 0; i < rows.size(); i++) {
            double[] r = rows.get(i);
            points.add(new TrackPoint(result.steps().get(i), r[1] > 0.5 ? Phase.MAIN_SEQUENCE : Phase.PRE_MAIN_SEQUENCE,
                    r[2], r[3], r[4]));
        }
        return new BirthTrack(start, result, points,
                recorder.events().withCentralHydrogenExhausted(result.exhaustionAge()));
    }
}
