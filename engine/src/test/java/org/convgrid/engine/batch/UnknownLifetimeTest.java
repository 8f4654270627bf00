package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * The reason an {@code ms_fraction} star gets no ages: what the evolution from birth actually did. Wording, no
 * physics (no published source applies).
 */
class UnknownLifetimeTest {

    private static EvolutionResult ended(EvolutionResult.EndReason end, String detail) {
        return new EvolutionResult(List.of(), List.of(), end, 4.612 * Constants.GYR, Double.NaN, detail);
    }

    @Test
    void aFailedEvolutionSaysWhereItStoppedNotTheAgeLimit() {
        String detail = "budget used: 4000 steps, 2 retries, at age 4.612 Gyr, X_c = 0.00520";
        String reason = BirthAges.unknownLifetime(ended(EvolutionResult.EndReason.FAILED, detail), true,
                20.0 * Constants.GYR);
        assertThat(reason).isEqualTo("main-sequence lifetime unknown: the evolution stopped before core-hydrogen "
                + "exhaustion (" + detail + ")");
    }

    @Test
    void anExhaustionWithoutALastingArrivalSaysSo() {
        // possible since a crossing of L_nuc/L = 0.99 can be undone (ZeroAgeArrival)
        assertThat(BirthAges.unknownLifetime(ended(EvolutionResult.EndReason.HYDROGEN_EXHAUSTED, ""), false,
                20.0 * Constants.GYR)).isEqualTo("the zero-age main sequence was not reached from birth: the core's "
                + "hydrogen ran out before nuclear burning supplied 99 % of the luminosity for good");
    }

    @Test
    void anEvolutionThatReachedTheAgeLimitSaysTheLimit() {
        String reason = BirthAges.unknownLifetime(ended(EvolutionResult.EndReason.AGE_LIMIT, ""), true,
                20.0 * Constants.GYR);
        assertThat(reason).isEqualTo("main-sequence lifetime unknown: core hydrogen not exhausted within 20.00 Gyr of "
                + "birth, the evolution's age limit");
        assertThat(BirthAges.unknownLifetime(ended(EvolutionResult.EndReason.AGE_LIMIT, ""), false,
                20.0 * Constants.GYR)).startsWith("the zero-age main sequence was not reached from birth: core");
    }
}
