package org.convgrid.cli;

import java.util.List;
import org.convgrid.engine.overshoot.MassRampedStepOvershoot;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.words.MessageNumbers;

/**
 * A warning when uniform overshoot reaches evolved stars of {@value MassRampedStepOvershoot#RAMP_START_MSUN} Msun
 * or less: there it keeps alive, for Gyr, the small convective cores that out-of-equilibrium 3He and 12C burning make
 * early on (README, "Overshoot"), and the mass-ramped profile gives such stars none. Printed on stderr by
 * {@code check}, {@code run} and {@code star} like {@link TestedRange}'s lines, even with {@code --quiet}; never an
 * error. Zero-age models are not evolved, so overshoot does not touch them.
 */
final class OvershootAdvice {

    private OvershootAdvice() {
    }

    /** The warning for a grid, or none. */
    static List<String> warnings(GridSpec grid) {
        if (grid.physics().overshootScheme() != OvershootScheme.STEP || !grid.ages().evolves()) {
            return List.of();
        }
        double length = grid.physics().overshoots().stream().mapToDouble(Double::doubleValue).max().orElse(0.0);
        List<Double> low = grid.massesMsun().stream()
                .filter(m -> m <= MassRampedStepOvershoot.RAMP_START_MSUN).toList();
        if (!(length > 0.0) || low.isEmpty()) {
            return List.of();
        }
        String masses = low.size() == 1 ? MessageNumbers.format(low.get(0)) + " Msun"
                : MessageNumbers.format(low.get(0)) + "-" + MessageNumbers.format(low.get(low.size() - 1)) + " Msun";
        return List.of(line("reaches stars of " + masses, "overshoot: {profile: "
                + MassRampedStepOvershoot.LABEL + ", length_hp: L}"));
    }

    /** The warning for one star, or none. */
    static List<String> warnings(double massMsun, Age age, PhysicsOptions physics) {
        if (physics.overshootScheme() != OvershootScheme.STEP || !(physics.overshoot() > 0.0) || age.isZeroAge()
                || massMsun > MassRampedStepOvershoot.RAMP_START_MSUN) {
            return List.of();
        }
        return List.of(line("on a " + MessageNumbers.format(massMsun) + " Msun star",
                "--overshoot-profile " + MassRampedStepOvershoot.LABEL));
    }

    private static String line(String where, String remedy) {
        return "convgrid: warning: uniform overshoot " + where + ": at or below "
                + MessageNumbers.format(MassRampedStepOvershoot.RAMP_START_MSUN) + " Msun it keeps the small "
                + "convective cores of the early main sequence alive for Gyr (README, Overshoot); " + remedy
                + " gives such stars no overshoot";
    }
}
