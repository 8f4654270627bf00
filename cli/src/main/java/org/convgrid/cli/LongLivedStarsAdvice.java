package org.convgrid.cli;

import java.util.List;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.words.MessageNumbers;

/**
 * A warning for {@code ms_fraction} grids with stars that may outlive the evolution's 20 Gyr age limit: such a
 * star has no main-sequence lifetime to take a fraction of, so every row of it but fraction 0 (its zero-age main
 * sequence, which is known) fails (a 0.7 Msun star at Z = 0.02 lost two of its three rows, and {@code check} had said
 * nothing). Printed on stderr by {@code check} and {@code run} like {@link TestedRange}'s lines; never an error.
 */
final class LongLivedStarsAdvice {

    /**
     * Below this mass a star may live longer than 20 Gyr on the main sequence. Measured (`star --age-gyr 19.99`,
     * 2026-12-05): 0.85 Msun exhausts its centre at 19.58 Gyr at Z = 0.02 and not within 20 Gyr at Z = 0.04; 0.9 Msun
     * at 15.47 and 17.60 Gyr. Metal-poor stars live shorter, so for them the warning may be too cautious.
     */
    static final double MAY_OUTLIVE_LIMIT_MSUN = 0.9;

    private LongLivedStarsAdvice() {
    }

    /** The warning for a grid, or none. */
    static List<String> warnings(GridSpec grid) {
        if (!grid.ages().fractions()) {
            return List.of();
        }
        List<Double> low = grid.massesMsun().stream().filter(m -> m < MAY_OUTLIVE_LIMIT_MSUN).toList();
        if (low.isEmpty()) {
            return List.of();
        }
        String masses = low.size() == 1 ? MessageNumbers.format(low.get(0)) + " Msun"
                : MessageNumbers.format(low.get(0)) + "-" + MessageNumbers.format(low.get(low.size() - 1)) + " Msun";
        return List.of("convgrid: warning: ms_fraction ages for stars of " + masses + ": below "
                + MessageNumbers.format(MAY_OUTLIVE_LIMIT_MSUN) + " Msun a star may stay on the main sequence beyond "
                + "the evolution's 20 Gyr age limit (0.85 Msun does at Z = 0.04), and then has no lifetime to take a "
                + "fraction of: its rows fail but for fraction 0, the zero-age main sequence; give such stars ages in "
                + "gyr or myr");
    }
}
