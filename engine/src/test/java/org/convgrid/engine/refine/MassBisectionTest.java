package org.convgrid.engine.refine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.DoubleUnaryOperator;
import java.util.function.Function;
import java.util.function.Predicate;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/** The bisection's logic on a made-up line (fully convective below a chosen mass); no physics. */
class MassBisectionTest {

    private static final double MSUN = Constants.M_SUN;
    private static final double EDGE = 0.3456789 * MSUN;
    private static final Predicate<ModelOutcome.Solved> FULLY_CONVECTIVE =
            o -> o.convection().structureClass() == StructureClass.FULLY_CONVECTIVE;

    /** A line that is fully convective below {@code edge}, fails at the listed masses and records every request. */
    static final class StepLine implements MassLine {
        final List<Double> asked = new ArrayList<>();
        private final double edge;
        private final Set<Double> failing;

        StepLine(double edge, Set<Double> failing) {
            this.edge = edge;
            this.failing = failing;
        }

        @Override
        public ModelOutcome solve(ModelRequest r) {
            asked.add(r.mass());
            if (failing.contains(r.mass())) {
                return new ModelOutcome.Failed(r, ModelStatus.NOT_CONVERGED, "gave up\nat shell 3", 40);
            }
            boolean fc = r.mass() < edge;
            ConvectiveStructure c = new ConvectiveStructure(List.of(new ConvectiveZone(fc ? 0 : 0.6, 1, 0, 1)),
                    fc ? StructureClass.FULLY_CONVECTIVE : StructureClass.CONV_ENVELOPE, fc ? 1 : 0, fc ? 0 : 0.6,
                    0.7, 0.4 * r.mass(), 1, 1);
            // the bisection reads only the zones: the surface and centre are placeholders
            GlobalProperties g = new GlobalProperties(1.0, 1.0, 1.0, 1.0, 1.0, 1.0, 0.7);
            return new ModelOutcome.Solved(r, g, c, 5);
        }
    }

    private static ModelRequest request(double mass) {
        return new ModelRequest("x", mass, 0.02, 0.28, 0.0, PhysicsOptions.DEFAULT);
    }

    private static Refinement refine(StepLine line, double tolerance, double lo, double hi) {
        return new MassBisection(tolerance, DoubleUnaryOperator.identity())
                .refine(line, MassBisectionTest::request, lo, hi, FULLY_CONVECTIVE);
    }

    @Test
    void endsNarrowerThanTheToleranceAroundTheEdgeAndInsideTheGridBracket() {
        StepLine line = new StepLine(EDGE, Set.of());
        double tolerance = 0.002 * MSUN;
        Refinement r = refine(line, tolerance, 0.30 * MSUN, 0.40 * MSUN);
        assertThat(r.narrowEnough()).isTrue();
        assertThat(r.width()).isLessThan(tolerance);
        assertThat(r.lowMass()).isLessThan(EDGE).isGreaterThanOrEqualTo(0.30 * MSUN);
        assertThat(r.highMass()).isGreaterThanOrEqualTo(EDGE).isLessThanOrEqualTo(0.40 * MSUN);
        // 0.1 -> 0.05 -> ... -> 0.0015625 Msun: six halvings, the least that get below 0.002
        assertThat(r.newModels()).hasSize(6);
        // the ends first (lower, upper), so each midpoint has converged neighbours on both sides
        assertThat(line.asked.subList(0, 3)).containsExactly(0.30 * MSUN, 0.40 * MSUN, 0.5 * (0.30 * MSUN + 0.40 * MSUN));
    }

    @Test
    void withKnownEndsOnlyMidpointsAreAskedForAndTheAnswerIsTheSame() {
        StepLine recomputing = new StepLine(EDGE, Set.of());
        Refinement full = refine(recomputing, 0.002 * MSUN, 0.30 * MSUN, 0.40 * MSUN);
        StepLine trusting = new StepLine(EDGE, Set.of());
        Refinement known = new MassBisection(0.002 * MSUN, DoubleUnaryOperator.identity())
                .refineWithinKnownEnds(trusting, MassBisectionTest::request, 0.30 * MSUN, 0.40 * MSUN, FULLY_CONVECTIVE);
        assertThat(known.lowMass()).isEqualTo(full.lowMass());
        assertThat(known.highMass()).isEqualTo(full.highMass());
        assertThat(trusting.asked).doesNotContain(0.30 * MSUN, 0.40 * MSUN)
                .hasSize(recomputing.asked.size() - 2);
    }

    @Test
    void refiningTheRefinedBracketAgainAddsNothing() {
        double tolerance = 0.002 * MSUN;
        Refinement first = refine(new StepLine(EDGE, Set.of()), tolerance, 0.30 * MSUN, 0.40 * MSUN);
        Refinement again = refine(new StepLine(EDGE, Set.of()), tolerance, first.lowMass(), first.highMass());
        assertThat(again.newModels()).isEmpty();
        assertThat(again.lowMass()).isEqualTo(first.lowMass());
        assertThat(again.highMass()).isEqualTo(first.highMass());
    }

    @Test
    void aFailedMidpointStopsWithTheBracketAsItWasBeforeIt() {
        double first = 0.5 * (0.30 * MSUN + 0.40 * MSUN);
        double second = 0.5 * (0.30 * MSUN + first);
        StepLine line = new StepLine(EDGE, Set.of(second));
        Refinement r = refine(line, 0.002 * MSUN, 0.30 * MSUN, 0.40 * MSUN);
        assertThat(r.stop()).isEqualTo(BisectionStop.MODEL_NOT_USABLE);
        assertThat(r.stoppedAt()).isEqualTo(second);
        assertThat(r.detail()).contains("gave up");
        assertThat(r.lowMass()).isEqualTo(0.30 * MSUN);
        assertThat(r.highMass()).isEqualTo(first);
        assertThat(r.newModels()).extracting(ModelOutcome::status).containsExactly(ModelStatus.OK,
                ModelStatus.NOT_CONVERGED);
    }

    @Test
    void endsThatCannotBeRecomputedOrSitOnTheWrongSideStopBeforeAnyNewModel() {
        Refinement failedEnd = refine(new StepLine(EDGE, Set.of(0.40 * MSUN)), 0.002 * MSUN, 0.30 * MSUN,
                0.40 * MSUN);
        assertThat(failedEnd.stop()).isEqualTo(BisectionStop.END_NOT_USABLE);
        assertThat(failedEnd.stoppedAt()).isEqualTo(0.40 * MSUN);
        assertThat(failedEnd.newModels()).isEmpty();
        Refinement wrongSide = refine(new StepLine(0.29 * MSUN, Set.of()), 0.002 * MSUN, 0.30 * MSUN, 0.40 * MSUN);
        assertThat(wrongSide.stop()).isEqualTo(BisectionStop.END_DISAGREES);
        assertThat(wrongSide.stoppedAt()).isEqualTo(0.30 * MSUN);
        assertThat(wrongSide.newModels()).isEmpty();
    }

    @Test
    void midpointsAreRoundedToRepresentableMassesAndStopWhenNoneIsLeft() {
        double quantum = 0.01 * MSUN;
        DoubleUnaryOperator coarse = m -> Math.round(m / quantum) * quantum;
        StepLine line = new StepLine(EDGE, Set.of());
        Refinement r = new MassBisection(1e-6 * MSUN, coarse).refine(line, MassBisectionTest::request, 0.30 * MSUN,
                0.40 * MSUN, FULLY_CONVECTIVE);
        assertThat(r.stop()).isEqualTo(BisectionStop.RESOLUTION);
        assertThat(r.width()).isEqualTo(quantum, org.assertj.core.data.Offset.offset(1e-9 * quantum));
        assertThat(line.asked).allSatisfy(m -> assertThat(m / quantum).isCloseTo(Math.rint(m / quantum),
                org.assertj.core.data.Offset.offset(1e-9)));
    }

    @Test
    void aSideReadOffTheStatusLetsModelsPastTheMainSequenceMarkTheHighSide() {
        // a made-up turn-off: every mass from TURNOFF up comes back past the main sequence, a failed outcome
        double turnoff = 0.8123 * MSUN;
        double lo = 0.80 * MSUN;
        double first = 0.5 * (lo + 0.85 * MSUN);
        double second = 0.5 * (lo + first);
        double broken = 0.5 * (lo + second);
        List<Double> asked = new ArrayList<>();
        MassLine line = r -> {
            asked.add(r.mass());
            return r.mass() == broken ? new ModelOutcome.Failed(r, ModelStatus.NOT_CONVERGED, "gave up", 40)
                    : r.mass() >= turnoff ? new ModelOutcome.Failed(r, ModelStatus.PAST_MAIN_SEQUENCE, "X_c out", 0)
                    : new StepLine(0.0, Set.of()).solve(r);
        };
        Function<ModelOutcome, BracketSide> side = o -> switch (o.status()) {
            case OK -> BracketSide.LOW;
            case PAST_MAIN_SEQUENCE -> BracketSide.HIGH;
            default -> BracketSide.UNUSABLE;
        };
        MassBisection bisection = new MassBisection(0.002 * MSUN, DoubleUnaryOperator.identity());
        Refinement r = bisection.refineWithinKnownEndsBySide(line, MassBisectionTest::request, 0.80 * MSUN,
                0.85 * MSUN, side);
        // 0.825 past, 0.8125 past, then 0.80625 fails: the bracket stays 0.80-0.8125
        assertThat(asked).containsExactly(first, second, broken);
        assertThat(r.stop()).isEqualTo(BisectionStop.MODEL_NOT_USABLE);
        assertThat(r.lowMass()).isEqualTo(0.80 * MSUN);
        assertThat(r.highMass()).isEqualTo(second);

        StepLine onTheMainSequence = new StepLine(0.0, Set.of());
        MassLine cleanLine = q -> q.mass() >= turnoff
                ? new ModelOutcome.Failed(q, ModelStatus.PAST_MAIN_SEQUENCE, "", 0) : onTheMainSequence.solve(q);
        Refinement clean = bisection.refineWithinKnownEndsBySide(cleanLine, MassBisectionTest::request, 0.80 * MSUN,
                0.85 * MSUN, side);
        assertThat(clean.narrowEnough()).isTrue();
        assertThat(clean.lowMass()).isLessThan(turnoff);
        assertThat(clean.highMass()).isGreaterThanOrEqualTo(turnoff);
        assertThat(clean.width()).isLessThan(0.002 * MSUN);
    }

    @Test
    void refusesEmptyBracketsAndNonPositiveTolerances() {
        assertThatThrownBy(() -> new MassBisection(0.0, DoubleUnaryOperator.identity()))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> refine(new StepLine(EDGE, Set.of()), 1.0, 0.4 * MSUN, 0.3 * MSUN))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
