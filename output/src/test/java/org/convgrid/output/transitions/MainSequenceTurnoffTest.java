package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;
import static org.convgrid.output.transitions.TransitionFinderTest.failedAt;
import static org.convgrid.output.transitions.TransitionFinderTest.ok;
import static org.convgrid.output.transitions.TransitionFinderTest.pastAt;
import static org.convgrid.output.transitions.TransitionFinderTest.row;

import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.junit.jupiter.api.Test;

/**
 * The turn-off read off synthetic catalogues (statuses only; no physics): bracket, reported end, empty cells, the
 * widened bracket and the note for models on the main sequence above ones past it.
 */
class MainSequenceTurnoffTest {

    private static final StructureClass FC = StructureClass.FULLY_CONVECTIVE;
    private static final StructureClass ENV = StructureClass.CONV_ENVELOPE;

    private final TransitionFinder finder = TransitionFinder.withDefaults();

    private TransitionRow find(CatalogueRow... rows) {
        return finder.find(List.of(rows)).get(0);
    }

    @Test
    void theHighestMassStillOnTheMainSequenceIsTheLowerEndOfItsBracket() {
        TransitionRow t = find(ok(0.2, FC, 1), ok(0.75, ENV, 0), ok(0.8, ENV, 0), pastAt(0.85), pastAt(0.9));
        assertThat(t.turnoff().bracket()).isEqualTo(new Span(0.8, 0.85));
        // reported at the lower end, as the fully convective limit is: the last mass still in the state
        assertThat(t.turnoff().massMsun()).isEqualTo(0.8);
        assertThat(t.turnoff().skippedInBracket()).isZero();
        assertThat(t.notes().split("; ")).containsExactly("no convective core at any usable mass",
                "0.85-0.9 Msun past the main sequence (not searched)");
        assertThat(t.method()).isEqualTo(TransitionMethod.GRID);
    }

    @Test
    void aSliceWhollyOnTheMainSequenceHasNoTurnoffAndNoNoteAboutIt() {
        TransitionRow t = find(ok(0.2, FC, 1), ok(0.4, ENV, 0), ok(1.0, ENV, 0));
        assertThat(t.turnoff()).isEqualTo(TransitionEstimate.NONE);
        assertThat(t.notes()).doesNotContain("turn-off");
    }

    @Test
    void aSliceWhollyPastTheMainSequenceHasNoTurnoffAndSaysWhy() {
        TransitionRow t = find(pastAt(1.5), pastAt(2.0));
        assertThat(t.turnoff().found()).isFalse();
        assertThat(t.turnoff().massMsun()).isNaN();
        assertThat(t.notes()).contains("no usable model in this slice", "no turn-off: no model on the main sequence");
    }

    @Test
    void failedAndUnconvergedModelsBetweenWidenTheBracketAndAreNamed() {
        TransitionRow t = find(ok(0.2, FC, 1), ok(0.8, ENV, 0), failedAt(0.85),
                row(0.02, 0.9, ENV, 0.0, ModelStatus.NOT_CONVERGED), pastAt(0.95));
        assertThat(t.turnoff().bracket()).isEqualTo(new Span(0.8, 0.95));
        assertThat(t.turnoff().massMsun()).isEqualTo(0.8);
        assertThat(t.turnoff().skippedInBracket()).isEqualTo(2);
        assertThat(t.notes().split("; ")).contains(
                "turn-off bracket widened past 1 model that did not converge and 1 failed model");
    }

    @Test
    void modelsOnTheMainSequenceAbovePastOnesAreNotedAndTheHighestCrossingIsReported() {
        // should not happen (a heavier star lives shorter); the notes say where, the table takes the highest crossing
        TransitionRow t = find(ok(0.2, FC, 1), ok(0.8, ENV, 0), pastAt(0.85), failedAt(0.9), ok(0.95, ENV, 0),
                ok(1.0, ENV, 0), pastAt(1.05));
        assertThat(t.turnoff().bracket()).isEqualTo(new Span(1.0, 1.05));
        assertThat(t.turnoff().crossings()).containsExactly(new Span(0.8, 0.85), new Span(0.85, 0.95),
                new Span(1.0, 1.05));
        assertThat(t.notes().split("; ")).contains("main sequence status changes 3 times with mass: 0.95-1 Msun "
                + "on the main sequence above models past it (the turn-off is read at the highest crossing)");
    }

    @Test
    void onlyMainSequenceModelsAbovePastOnesGiveNoTurnoffAndSaySo() {
        TransitionRow t = find(pastAt(0.8), ok(0.85, ENV, 0));
        assertThat(t.turnoff().found()).isFalse();
        assertThat(t.notes()).contains("no turn-off: models on the main sequence only above ones past it",
                "0.85 Msun on the main sequence above models past it");
    }

    @Test
    void aTurnoffBracketEndingAtARefinementModelMakesTheRowRefined() {
        TransitionRow t = find(row("p0-z00-m000-a03", 0.02, 0.2, FC, 1, ModelStatus.OK),
                row("p0-z00-m012-a03", 0.02, 0.8, ENV, 0, ModelStatus.OK),
                row("p0-z00-r000-a03", 0.02, 0.8125, ENV, 0, ModelStatus.PAST_MAIN_SEQUENCE),
                row("p0-z00-m013-a03", 0.02, 0.85, ENV, 0, ModelStatus.PAST_MAIN_SEQUENCE));
        assertThat(t.turnoff().bracket()).isEqualTo(new Span(0.8, 0.8125));
        assertThat(t.method()).isEqualTo(TransitionMethod.REFINED);
    }
}
