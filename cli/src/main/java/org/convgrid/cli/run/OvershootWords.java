package org.convgrid.cli.run;

import org.convgrid.engine.overshoot.MassRampedStepOvershoot;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.grids.words.MessageNumbers;

/**
 * The overshoot of a physics choice in words, as {@code check} and {@code star} print it: the decaying profile's
 * length is f, not alpha_ov, and the ramped one's full length applies from 2 Msun only, so a bare "overshoot 0.2 Hp"
 * would mislead for both.
 */
public final class OvershootWords {

    private OvershootWords() {
    }

    /**
     * "overshoot 0.2 Hp", "overshoot 0.2 Hp from 2 Msun, none up to 1.2 Msun (uniform-ramped)" or "overshoot f =
     * 0.016 (decaying)".
     */
    public static String describe(PhysicsOptions p) {
        if (p.overshoot() == 0.0) {
            // no length is the same star under every profile, as the charts say it
            return "no overshoot";
        }
        String length = MessageNumbers.format(p.overshoot());
        return switch (p.overshootScheme()) {
            case STEP -> "overshoot " + length + " Hp";
            case MASS_RAMPED_STEP -> "overshoot " + length + " Hp from "
                    + MessageNumbers.format(MassRampedStepOvershoot.RAMP_FULL_MSUN) + " Msun, none up to "
                    + MessageNumbers.format(MassRampedStepOvershoot.RAMP_START_MSUN) + " Msun ("
                    + p.overshootScheme().label() + ")";
            case EXPONENTIAL -> "overshoot f = " + length + " (" + p.overshootScheme().label() + ")";
        };
    }

    /** {@link #describe}, with the ramped length a star of {@code massMsun} gets. */
    public static String describe(PhysicsOptions p, double massMsun) {
        String words = describe(p);
        double applied = p.overshootScheme().model(p.overshoot()).parameterAt(massMsun);
        return applied == p.overshoot() ? words
                : words + ": " + MessageNumbers.format(applied) + " Hp for this star";
    }
}
