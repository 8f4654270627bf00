package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;
import static org.convgrid.output.transitions.TransitionFinderTest.ok;

import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;

/**
 * The mass above which every star has a convective core, and the transient window of small cores just above the
 * fully convective limit.
 */
class TransientCoreWindowTest {

    private static final StructureClass FC = StructureClass.FULLY_CONVECTIVE;
    private static final StructureClass ENV = StructureClass.CONV_ENVELOPE;
    private static final StructureClass BOTH = StructureClass.CONV_CORE_AND_ENVELOPE;

    private final TransitionFinder finder = TransitionFinder.withDefaults();

    @Test
    void aSmallCoreThatComesAndGoesIsTheWindowAndNotTheOnset() {
        // fully convective to 0.42, small cores 0.43-0.50, none 0.55-1.35, a core for good from 1.40
        TransitionRow t = finder.find(List.of(ok(0.42, FC, 1), ok(0.43, BOTH, 0.01), ok(0.50, BOTH, 0.004),
                ok(0.55, ENV, 0), ok(1.35, ENV, 0), ok(1.40, BOTH, 0.05), ok(1.6, BOTH, 0.1))).get(0);
        assertThat(t.fullyConvective().massMsun()).isEqualTo(0.42);
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(1.40);
        assertThat(t.convCoreOnset().bracket()).isEqualTo(new Span(1.35, 1.40));
        assertThat(t.transientCore()).isEqualTo(new Span(0.43, 0.50));
        assertThat(t.transientCoreCrossings()).containsExactly(new Span(0.42, 0.43), new Span(0.50, 0.55));
        assertThat(t.notes()).isEmpty();
    }

    @Test
    void aStarThatLeavesFullConvectionIntoALastingCoreHasNoWindow() {
        TransitionRow t = finder.find(List.of(ok(0.3, FC, 1), ok(0.35, BOTH, 0.02), ok(0.4, BOTH, 0.03))).get(0);
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(0.35);
        assertThat(t.convCoreOnset().bracket()).isEqualTo(t.fullyConvective().bracket());
        assertThat(t.transientCore()).isNull();
    }

    @Test
    void withoutCoresAtTheHighestMassesThereIsAWindowButNoOnset() {
        TransitionRow t = finder.find(List.of(ok(0.3, FC, 1), ok(0.35, BOTH, 0.02), ok(0.4, ENV, 0))).get(0);
        assertThat(t.convCoreOnset().found()).isFalse();
        assertThat(t.convCoreOnset().massMsun()).isNaN();
        assertThat(t.transientCore()).isEqualTo(new Span(0.35, 0.35));
        assertThat(t.notes()).contains(
                "no mass above which every star has a convective core: the highest usable masses have none");
    }

    @Test
    void aSecondWindowIsNotedAndTheLowestOneReported() {
        TransitionRow t = finder.find(List.of(ok(0.3, FC, 1), ok(0.35, BOTH, 0.02), ok(0.4, ENV, 0),
                ok(0.8, BOTH, 0.01), ok(0.9, ENV, 0), ok(1.3, BOTH, 0.05))).get(0);
        assertThat(t.transientCore()).isEqualTo(new Span(0.35, 0.35));
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(1.3);
        assertThat(t.notes()).contains("convective core changes 5 times with mass; the lowest window of cores is the "
                + "transient one, others at 0.8 Msun");
    }

    @Test
    void windowsHiddenBehindASingleCorelessModelAreNamed() {
        // as the demo grid's Z = 0.014 slice at 600 Myr: cores at 0.3141-0.3234, none at 0.325, cores again from
        // 0.3266 to 0.6531, then none until the lasting core
        TransitionRow t = finder.find(List.of(ok(0.31, FC, 1), ok(0.3141, BOTH, 0.01), ok(0.3234, BOTH, 0.01),
                ok(0.325, ENV, 0), ok(0.3266, BOTH, 0.02), ok(0.6531, BOTH, 0.01), ok(0.7, ENV, 0),
                ok(1.0, ENV, 0), ok(1.1, BOTH, 0.01), ok(1.15, ENV, 0), ok(1.3, BOTH, 0.05))).get(0);
        assertThat(t.transientCore()).isEqualTo(new Span(0.3141, 0.3234));
        assertThat(t.notes()).contains("others at 0.3266-0.6531, 1.1 Msun");
        TransitionRow noLastingCore = finder.find(List.of(ok(0.31, FC, 1), ok(0.3141, BOTH, 0.01),
                ok(0.325, ENV, 0), ok(0.3266, BOTH, 0.02), ok(0.7, ENV, 0))).get(0);
        assertThat(noLastingCore.notes()).contains("others at 0.3266 Msun");
        // read back for the charts, from the notes as written (other notes before and after them)
        assertThat(TransitionFinder.otherWindowsNoted(t.notes()))
                .containsExactly(new Span(0.3266, 0.6531), new Span(1.1, 1.1));
        assertThat(TransitionFinder.otherWindowsNoted(noLastingCore.notes())).containsExactly(new Span(0.3266, 0.3266));
        assertThat(TransitionFinder.otherWindowsNoted("unfinished slice: 8 of 10 masses computed; " + t.notes()
                + "; fully convective bracket widened past 1 failed model"))
                .containsExactly(new Span(0.3266, 0.6531), new Span(1.1, 1.1));
        assertThat(TransitionFinder.otherWindowsNoted("")).isEmpty();
        assertThat(TransitionFinder.otherWindowsNoted(null)).isEmpty();
        assertThat(TransitionFinder.otherWindowsNoted("x; the lowest window of cores is the transient one, others at "
                + ". Msun")).as("not a list of masses").isEmpty();
        TransitionRow oneWindow = finder.find(List.of(ok(0.3, FC, 1), ok(0.35, BOTH, 0.02), ok(0.4, ENV, 0),
                ok(1.3, BOTH, 0.05))).get(0);
        assertThat(oneWindow.transientCore()).isEqualTo(new Span(0.35, 0.35));
        assertThat(TransitionFinder.otherWindowsNoted(oneWindow.notes())).isEmpty();
    }

    @Test
    void coresBelowTheFullyConvectiveLimitAreNamedAndTheWindowAboveItReported() {
        // a Z = 0.02, 1.1 Gyr slice: fully convective at 0.33, cores at 0.33125-0.3375, fully convective
        // again at 0.33875 (the limit), coreless at 0.34, cores 0.34125-0.5047, none up to the lasting core; the
        // window was reported at 0.33125-0.3375, below the limit of the same row
        TransitionRow t = finder.find(List.of(ok(0.33, FC, 1), ok(0.33125, BOTH, 0.01), ok(0.3375, BOTH, 0.01),
                ok(0.33875, FC, 1), ok(0.34, ENV, 0), ok(0.34125, BOTH, 0.02), ok(0.5047, BOTH, 0.01),
                ok(0.7, ENV, 0), ok(1.3, BOTH, 0.05))).get(0);
        assertThat(t.fullyConvective().massMsun()).isEqualTo(0.33875);
        assertThat(t.transientCore()).isEqualTo(new Span(0.34125, 0.5047));
        assertThat(t.notes()).contains("the lowest window of cores above the fully convective limit is the transient "
                + "one, others at 0.33125-0.3375 Msun");
        assertThat(TransitionFinder.otherWindowsNoted(t.notes())).containsExactly(new Span(0.33125, 0.3375));
        // cores below the limit and none above it (the star above the limit goes straight into a lasting core): no
        // window, and the notes name the cores below
        TransitionRow onlyBelow = finder.find(List.of(ok(0.33, FC, 1), ok(0.33125, BOTH, 0.01), ok(0.33875, FC, 1),
                ok(0.34, BOTH, 0.02), ok(1.3, BOTH, 0.05))).get(0);
        assertThat(onlyBelow.fullyConvective().massMsun()).isEqualTo(0.33875);
        assertThat(onlyBelow.transientCore()).isNull();
        assertThat(onlyBelow.convCoreOnset().massMsun()).isEqualTo(0.34);
        assertThat(onlyBelow.notes()).contains("convective core changes 3 times with mass; cores below the fully "
                + "convective limit at 0.33125 Msun");
        assertThat(TransitionFinder.otherWindowsNoted(onlyBelow.notes())).isEmpty();
        // no fully convective model: the window wording stays the plain one
        TransitionRow noLimit = finder.find(List.of(ok(0.3, BOTH, 0.01), ok(0.32, ENV, 0), ok(0.35, BOTH, 0.02),
                ok(0.4, ENV, 0), ok(0.45, BOTH, 0.01), ok(0.5, ENV, 0), ok(1.3, BOTH, 0.05))).get(0);
        assertThat(noLimit.notes()).doesNotContain("above the fully convective limit");
    }

    @Test
    void aGridThatStartsInsideTheWindowDoesNotInventItsLowerEdge() {
        TransitionRow t = finder.find(List.of(ok(0.4, BOTH, 0.01), ok(0.5, ENV, 0), ok(1.3, BOTH, 0.05))).get(0);
        assertThat(t.transientCore()).isNull();
        assertThat(t.convCoreOnset().massMsun()).isEqualTo(1.3);
    }
}
