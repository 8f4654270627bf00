package org.convgrid.output.catalogue;

/**
 * One convective zone of a catalogue model, as {@code zones.csv} lists it (README, "Zones").
 *
 * @param kind what the zone is to the star
 * @param massFracInner m/M at its bottom
 * @param massFracOuter m/M at its top
 * @param radiusFracInner r/R at its bottom
 * @param radiusFracOuter r/R at its top
 * @param zoneMassMsun the zone's own mass in Msun, as the model gave it or zones.csv held it (never the difference
 *        of the written ends, which keep seven digits of m/M: one significant digit of a thin envelope's mass);
 *        NaN for a zone made from its ends alone, whose mass {@link ZoneTable#zoneMass} then takes from them
 */
public record CatalogueZone(ZoneKind kind, double massFracInner, double massFracOuter, double radiusFracInner,
                            double radiusFracOuter, double zoneMassMsun) {

    /** A zone known by its ends alone (made by hand, as in tests): its mass is taken from them. */
    public CatalogueZone(ZoneKind kind, double massFracInner, double massFracOuter, double radiusFracInner,
                         double radiusFracOuter) {
        this(kind, massFracInner, massFracOuter, radiusFracInner, radiusFracOuter, Double.NaN);
    }

    /** The four kinds of zone, with their {@code zone_kind} spelling. */
    public enum ZoneKind {
        CORE("core"), SHELL("shell"), ENVELOPE("envelope"), WHOLE_STAR("whole_star");

        private final String label;

        ZoneKind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** Parses the {@code zone_kind} spelling. */
        public static ZoneKind fromLabel(String label) {
            for (ZoneKind k : values()) {
                if (k.label.equals(label)) {
                    return k;
                }
            }
            throw new IllegalArgumentException("unknown zone kind '" + label + "'");
        }
    }
}
