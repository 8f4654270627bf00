package org.convgrid.engine.request;

import java.util.function.DoubleFunction;
import org.convgrid.engine.overshoot.ExponentialOvershoot;
import org.convgrid.engine.overshoot.MassRampedStepOvershoot;
import org.convgrid.engine.overshoot.Overshoot;
import org.convgrid.engine.overshoot.StepOvershoot;

/**
 * The overshoot profile a grid names (key {@code overshoot: {profile: uniform|decaying|uniform-ramped}}); the
 * length means alpha_ov (pressure scale heights) for {@link #STEP} and {@link #MASS_RAMPED_STEP} (its value from
 * 2 Msun up) and f for {@link #EXPONENTIAL}. Each scheme makes its {@link Overshoot}, so nothing downstream branches
 * on the scheme.
 */
public enum OvershootScheme {
    /** Homogeneous mixing to alpha_ov H_P beyond the boundary ({@link StepOvershoot}). */
    STEP(StepOvershoot.LABEL, StepOvershoot::new),
    /** Diffusion with D_ov = D_0 exp(-2 z/(f H_P)) ({@link ExponentialOvershoot}). */
    EXPONENTIAL(ExponentialOvershoot.LABEL, ExponentialOvershoot::new),
    /** {@link #STEP} with alpha_ov ramped with the star's mass ({@link MassRampedStepOvershoot}). */
    MASS_RAMPED_STEP(MassRampedStepOvershoot.LABEL, MassRampedStepOvershoot::new);

    private final String label;
    private final DoubleFunction<Overshoot> model;

    OvershootScheme(String label, DoubleFunction<Overshoot> model) {
        this.label = label;
        this.model = model;
    }

    /** The name used in grid files. */
    public String label() {
        return label;
    }

    /** The overshoot of this scheme with {@code parameter} (alpha_ov or f). */
    public Overshoot model(double parameter) {
        return model.apply(parameter);
    }

    /** The grid-file names of every scheme, for messages: "uniform, decaying or uniform-ramped". */
    public static String labels() {
        StringBuilder text = new StringBuilder();
        OvershootScheme[] all = values();
        for (int i = 0; i < all.length; i++) {
            text.append(i == 0 ? "" : i == all.length - 1 ? " or " : ", ").append(all[i].label);
        }
        return text.toString();
    }

    /** Parses a grid-file name; null when unknown. */
    public static OvershootScheme fromLabel(String label) {
        for (OvershootScheme s : values()) {
            if (s.label.equals(label)) {
                return s;
            }
        }
        return null;
    }
}
