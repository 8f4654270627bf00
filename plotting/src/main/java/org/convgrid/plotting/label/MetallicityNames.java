package org.convgrid.plotting.label;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.catalogue.CatalogueRow;

/**
 * How charts and the report name a metallicity. A run whose grid gave Z says {@code Z = 0.014}, as it always has; a
 * run whose grid gave spectroscopic [Fe/H] says its [Fe/H] first, {@code [Fe/H] = +0.10, Z = 0.0153} (signed, two
 * decimals: the precision spectroscopy gives), so that a user who asked for [Fe/H] = -0.3, 0, +0.3 finds his
 * compositions without converting Z back by hand. Each Z's [Fe/H] is the tables' {@code fe_h_dex}
 * ({@link IronAbundance#dex}, from the catalogue's z_init and y_init); a Z without one (Z = 0) is named by Z alone.
 * File names keep using Z.
 *
 * @param ironByZ the [Fe/H] of each Z of the run; empty for a run whose grid gave Z
 */
public record MetallicityNames(Map<Double, Double> ironByZ) {

    /** The names of a run whose grid gave Z: Z alone. */
    public static final MetallicityNames Z_ONLY = new MetallicityNames(Map.of());
    /** [Fe/H] decimals in chart text. */
    private static final int IRON_DECIMALS = 2;
    /** Longer lists are shown as a range in titles, as {@link SliceLabels#values} does. */
    private static final int LISTED_VALUES = 4;

    public MetallicityNames {
        ironByZ = Map.copyOf(ironByZ);
    }

    /**
     * The names of a run's compositions: with their [Fe/H] when {@code iron} says the grid gave [Fe/H], else
     * {@link #Z_ONLY}.
     */
    public static MetallicityNames of(IronAbundance iron, Collection<CatalogueRow> rows) {
        if (!iron.givenByGrid()) {
            return Z_ONLY;
        }
        Map<Double, Double> byZ = new HashMap<>();
        for (CatalogueRow r : rows) {
            double dex = iron.dex(r.zInit(), r.yInit());
            if (!Double.isNaN(dex)) {
                byZ.putIfAbsent(r.zInit(), dex);
            }
        }
        return new MetallicityNames(byZ);
    }

    /** Whether these names give [Fe/H] (the grid gave it). */
    public boolean namesIron() {
        return !ironByZ.isEmpty();
    }

    /** One composition: {@code Z = 0.014}, or {@code [Fe/H] = +0.10, Z = 0.0153}. */
    public String of(double zInit) {
        Double dex = ironByZ.get(zInit);
        return (dex == null ? "" : "[Fe/H] = " + iron(dex) + ", ") + "Z = " + SliceLabels.number(zInit);
    }

    /**
     * Several compositions for a title: {@code Z = 0.008, 0.014}, or {@code [Fe/H] = -0.50, 0.00, +0.30}; many as a
     * range with the count, as {@link SliceLabels#values} gives them. A title of several [Fe/H] leaves their Z to the
     * legend or the Z axis, which give each one beside its [Fe/H]: with both lists the HR diagram's title of three
     * compositions and two ages ran to 86 characters and was cut at both ends of a 1200-pixel chart.
     */
    public String values(List<Double> zs) {
        if (!namesIron() || zs.isEmpty() || !zs.stream().allMatch(ironByZ::containsKey)) {
            return "Z = " + SliceLabels.values(zs);
        }
        List<String> irons = zs.stream().map(z -> iron(ironByZ.get(z))).toList();
        return "[Fe/H] = " + (irons.size() <= LISTED_VALUES ? String.join(", ", irons)
                : irons.get(0) + " to " + irons.get(irons.size() - 1) + " (" + irons.size() + " values)");
    }

    /** The [Fe/H] of a Z as a table cell ({@code +0.10}); empty when the run names none for it. */
    public String ironCell(double zInit) {
        Double dex = ironByZ.get(zInit);
        return dex == null ? "" : iron(dex);
    }

    /** An [Fe/H] as chart text, as {@link #of} writes it: {@code -0.35}, {@code 0.00}, {@code +0.40}. */
    public static String signedDex(double dex) {
        return iron(dex);
    }

    /** Signed, two decimals, rounded half up from the table's four: {@code -0.35}, {@code 0.00}, {@code +0.40}. */
    static String iron(double dex) {
        BigDecimal rounded = new BigDecimal(Double.toString(dex)).setScale(IRON_DECIMALS, RoundingMode.HALF_UP);
        return (rounded.signum() > 0 ? "+" : "") + rounded.toPlainString();
    }
}
