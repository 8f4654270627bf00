package org.convgrid.engine.physics;

/**
 * How mixing reaches beyond a formal convective boundary (step: common practice; exponential: Freytag, Ludwig &amp;
 * Steffen 1996, A&amp;A 313, 497, and Herwig 2000, A&amp;A 360, 952); the overshoot number means alpha_ov
 * (pressure scale heights) for {@link #STEP} and f for {@link #EXPONENTIAL}.
 */
public enum OvershootScheme {
    /** Homogeneous mixing to alpha_ov H_P beyond the boundary. */
    STEP("step"),
    /** Diffusion with D_ov = D_0 exp(-2 z/(f H_P)) (Freytag, Ludwig &amp; Steffen 1996; Herwig 2000). */
    EXPONENTIAL("exponential");

    private final String label;

    OvershootScheme(String label) {
        this.label = label;
    }

    /** The name used in grid files. */
    public String label() {
        return label;
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
