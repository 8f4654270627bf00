package org.convgrid.engine.convection;

/** The convective layout of a star, as written in the catalogue's {@code structure_class} column. */
public enum StructureClass {
    FULLY_CONVECTIVE("fully_convective"),
    CONV_ENVELOPE("conv_envelope"),
    CONV_CORE("conv_core"),
    CONV_CORE_AND_ENVELOPE("conv_core_and_envelope"),
    RADIATIVE("radiative");

    private final String label;

    StructureClass(String label) {
        this.label = label;
    }

    /** The catalogue spelling. */
    public String label() {
        return label;
    }

    /** Parses the catalogue spelling. */
    public static StructureClass fromLabel(String label) {
        for (StructureClass c : values()) {
            if (c.label.equals(label)) {
                return c;
            }
        }
        throw new IllegalArgumentException("unknown structure class '" + label + "'");
    }
}
