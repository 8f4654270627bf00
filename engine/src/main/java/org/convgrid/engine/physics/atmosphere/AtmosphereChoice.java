package org.convgrid.engine.physics.atmosphere;

/** The grey T(tau) relation of the surface boundary, as users name it (grid key {@code atmosphere}). */
public enum AtmosphereChoice {
    /** Milne-Eddington, T^4 = 3/4 Teff^4 (tau + 2/3) (Chandrasekhar 1935). */
    EDDINGTON("eddington"),
    /** Krishna Swamy 1966 (ApJ 145, 174) fit to the solar atmosphere (coefficients from memory). */
    KRISHNA_SWAMY("krishna_swamy");

    /**
     * The relation used when a grid file or command names none: the solar-fitted one, with which our solar
     * calibration gives a mixing length inside the published range (the Eddington relation gives ~0.2 less).
     */
    public static final AtmosphereChoice DEFAULT = KRISHNA_SWAMY;

    private final String label;

    AtmosphereChoice(String label) {
        this.label = label;
    }

    /** The name used in grid files and on the command line. */
    public String label() {
        return label;
    }

    /** The T(tau) relation. */
    public TemperatureTauRelation relation() {
        return this == EDDINGTON ? new EddingtonGrey() : new KrishnaSwamy();
    }

    /** Parses a grid-file or command-line name; null when unknown. */
    public static AtmosphereChoice fromLabel(String label) {
        for (AtmosphereChoice c : values()) {
            if (c.label.equals(label)) {
                return c;
            }
        }
        return null;
    }
}
