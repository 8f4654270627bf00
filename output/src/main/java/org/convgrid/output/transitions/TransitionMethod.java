package org.convgrid.output.transitions;

/** How a transition mass was found, as written in the {@code method} column. */
public enum TransitionMethod {
    /** Read off the grid's masses. */
    GRID("grid"),
    /** Narrowed by bisection with new models. */
    REFINED("refined");

    private final String label;

    TransitionMethod(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    public static TransitionMethod fromLabel(String label) {
        for (TransitionMethod m : values()) {
            if (m.label.equals(label)) {
                return m;
            }
        }
        throw new IllegalArgumentException("unknown method '" + label + "'");
    }
}
