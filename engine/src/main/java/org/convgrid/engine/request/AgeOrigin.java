package org.convgrid.engine.request;

/**
 * Where age 0 lies: at the star's birth (the start of its pre-main-sequence contraction) or on its zero-age main
 * sequence.
 */
public enum AgeOrigin {
    /** Age 0 is the start model high on the Hayashi track; the pre-main sequence is part of the age. */
    BIRTH("birth"),
    /** Age 0 is the zero-age main sequence, a homogeneous model in thermal equilibrium. */
    ZAMS("zams");

    private final String label;

    AgeOrigin(String label) {
        this.label = label;
    }

    /** The spelling of grid files, the command line and the manifest. */
    public String label() {
        return label;
    }

    /** The origin spelled {@code label}, or null when there is none of that name. */
    public static AgeOrigin ofLabel(String label) {
        for (AgeOrigin o : values()) {
            if (o.label.equals(label)) {
                return o;
            }
        }
        return null;
    }
}
