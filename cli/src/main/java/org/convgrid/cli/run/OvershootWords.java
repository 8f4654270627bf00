package org.convgrid.cli.run;

import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.grids.words.MessageNumbers;
import org.convgrid.plotting.label.SliceLabels;

/**
 * The overshoot of a physics choice in words, as {@code check} and {@code star} print it: the decaying profile's
 * length is f, not alpha_ov, and the ramped one's full length applies from 2 Msun only, so a bare "overshoot 0.2 Hp"
 * would mislead for both. The charts' wording ({@link SliceLabels#overshoot}), in the terminal's numbers and "Msun".
 */
public final class OvershootWords {

    private OvershootWords() {
    }

    /**
     * "overshoot 0.2 Hp", "overshoot 0.2 Hp from 2 Msun, none up to 1.2 Msun (uniform-ramped)" or "overshoot f =
     * 0.016 (decaying)".
     */
    public static String describe(PhysicsOptions p) {
        return SliceLabels.overshoot(p.overshoot(), p.overshootScheme(), MessageNumbers::format, "Msun");
    }

    /** {@link #describe}, with the ramped length a star of {@code massMsun} gets. */
    public static String describe(PhysicsOptions p, double massMsun) {
        String words = describe(p);
        double applied = p.overshootScheme().model(p.overshoot()).parameterAt(massMsun);
        return applied == p.overshoot() ? words
                : words + ": " + MessageNumbers.format(applied) + " Hp for this star";
    }
}
