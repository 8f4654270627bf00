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
 * error. Zero-age models are not evolved, so overshoot does not touch them. Also a warning for decaying overshoot
 * longer than {@link #MAX_TRIED_DECAYING_LENGTH}.
 */
final class OvershootAdvice {

    private OvershootAdvice() {
    }

    /**
     * Decaying overshoot lengths f above this stop some evolutions near the zero-age main sequence with their
     * step retries spent (measured, Z = 0.02: 1.5 Msun at f = 0.04; 1 and 1.5 Msun at 0.05; 1 Msun at 0.2; both fine
     * at 0.03); published calibrations lie near 0.016 (Herwig 2000, A&amp;A 360, 952).
     */
    static final double MAX_TRIED_DECAYING_LENGTH = 0.03;

    /** The warning for a grid, or none. */
    static List<String> warnings(GridSpec grid) {
        double length = grid.physics().overshoots().stream().mapToDouble(Double::doubleValue).max().orElse(0.0);
        if (grid.physics().overshootScheme() == OvershootScheme.EXPONENTIAL && grid.ages().evolves()) {
            return decaying(length, "overshoot length_hp");
        }
        if (grid.physics().overshootScheme() != OvershootScheme.STEP || !grid.ages().evolves()) {
            return List.of();
        }
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
        if (physics.overshootScheme() == OvershootScheme.EXPONENTIAL && !age.isZeroAge()) {
            return decaying(physics.overshoot(), "--overshoot-hp");
        }
        if (physics.overshootScheme() != OvershootScheme.STEP || !(physics.overshoot() > 0.0) || age.isZeroAge()
                || massMsun > MassRampedStepOvershoot.RAMP_START_MSUN) {
            return List.of();
        }
        return List.of(line("on a " + MessageNumbers.format(massMsun) + " Msun star",
                "--overshoot-profile " + MassRampedStepOvershoot.LABEL));
    }

    private static List<String> decaying(double length, String option) {
        if (!(length > MAX_TRIED_DECAYING_LENGTH)) {
            return List.of();
        }
        return List.of("convgrid: warning: decaying overshoot with " + option + " " + MessageNumbers.format(length)
                + ": above " + MessageNumbers.format(MAX_TRIED_DECAYING_LENGTH) + " some evolutions stop near the"
                + " zero-age main sequence (README, Overshoot); the length of this profile is f, published near 0.016,"
                + " not the uniform profile's alpha_ov");
    }

    private static String line(String where, String remedy) {
        return "convgrid: warning: uniform overshoot " + where + ": at or below "
                + MessageNumbers.format(MassRampedStepOvershoot.RAMP_START_MSUN) + " Msun it keeps the small "
                + "convective cores of the early main sequence alive for Gyr (README, Overshoot); " + remedy
                + " gives such stars no overshoot";
    }
}
