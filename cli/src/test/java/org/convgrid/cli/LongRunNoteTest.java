package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.grids.GridSpec;
import org.convgrid.grids.yaml.GridFileReader;
import org.junit.jupiter.api.Test;

/**
 * A run that check's rough rule expects to last an hour or more says so when it starts (a grid
 * estimated at 22 h by check had started without a word); a short one, or a resume with little left, does not.
 */
class LongRunNoteTest {

    private static GridSpec grid(String masses, String ages) {
        return new GridFileReader().parse("g.yaml", """
                mass: MASSES
                metallicity: {z: [0.01, 0.02, 0.03], y: [0.27, 0.28, 0.29]}
                age: AGES
                """.replace("MASSES", masses).replace("AGES", ages));
    }

    @Test
    void aLongGridFromBirthGivesItsHoursAndHowToStopAndContinue() {
        // 3 Z x 2001 masses evolved from birth to 5 Gyr: 6003 stars at ~0.8 s x 1.9 each, ~1.3 h on 2 threads
        GridSpec big = grid("{from: 0.3, to: 1.3, step: 0.0005}", "{gyr: [1, 5]}");
        String note = RunCommand.longRunNote(big, big.count(), big.count(), 2);

        assertThat(note).startsWith("; expected to take about ").contains(" h ")
                .endsWith("(check's rough estimate; Ctrl-C stops it and --resume continues it)");
    }

    @Test
    void aShortGridOrASmallRemainderSaysNothing() {
        GridSpec demo = grid("{from: 0.2, to: 2.0, step: 0.2}", "{myr: [20, 150, 600]}");
        GridSpec big = grid("{from: 0.3, to: 1.3, step: 0.0005}", "{gyr: [1, 5]}");

        assertThat(RunCommand.longRunNote(demo, demo.count(), demo.count(), 2)).isEmpty();
        assertThat(RunCommand.longRunNote(big, 10, big.count(), 2)).isEmpty();
        assertThat(RunCommand.longRunNote(big, 0, big.count(), 2)).isEmpty();
    }
}
