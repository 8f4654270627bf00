package org.convgrid.engine.request;

/** How a model request ended; the catalogue writes {@link #label()}. */
public enum ModelStatus {
    OK("ok"),
    NOT_CONVERGED("not_converged"),
    PAST_MAIN_SEQUENCE("past_main_sequence"),
    FAILED("failed");

    private final String label;

    ModelStatus(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    public static ModelStatus fromLabel(String label) {
        for (ModelStatus s : values()) {
            if (s.label.equals(label)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown status '" + label + "'");
    }
}
