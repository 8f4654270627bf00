package org.convgrid.engine.birth;

/** The stage of a star's life a model belongs to. */
public enum Phase {
    /** Contracting towards the main sequence: nuclear burning supplies less than the zero-age fraction of L. */
    PRE_MAIN_SEQUENCE("pre_main_sequence"),
    /** From the zero-age main sequence to core-hydrogen exhaustion. */
    MAIN_SEQUENCE("main_sequence");

    private final String label;

    Phase(String label) {
        this.label = label;
    }

    /** The catalogue spelling (README, catalogue column {@code phase}). */
    public String label() {
        return label;
    }
}
