package org.convgrid.output;

import java.math.BigDecimal;
import java.math.RoundingMode;
import org.convgrid.engine.calibration.CalibrationSettings;
import org.convgrid.engine.calibration.SolarScaledMetallicity;

/**
 * How a run's tables give a composition's spectroscopic [Fe/H] ({@code fe_h_dex}), so that a user who asked for
 * [Fe/H] = -0.3 finds his rows without converting Z back by hand: for a solar-scaled mixture [Fe/H] = [M/H] =
 * log10((Z/X) / (Z/X)_sun) with X = 1 - Y - Z, by engine's {@link SolarScaledMetallicity}, the relation the grid
 * reader turns [Fe/H] into Z with.
 * It is computed from {@code z_init} and {@code y_init} as the tables write them (seven significant digits), so a
 * table rewritten from its own cells (a resume, a merge, a table of an earlier layout) gives the same cell as the run
 * that first wrote it; rounded to {@value #DECIMALS} decimals, which gives back every [Fe/H] a grid file states to
 * that precision (Z's seven digits move [Fe/H] by 2e-7 dex at most).
 *
 * @param solarZOverX the Sun's Z/X that [Fe/H] = 0 stands for: the grid's {@code solar_z_over_x}, else
 *     {@link #DEFAULT}'s
 * @param givenByGrid whether the grid file gave its compositions as {@code fe_h_dex}; then the charts and the report
 *     name each composition's [Fe/H] beside its Z, else they keep to Z
 */
public record IronAbundance(double solarZOverX, boolean givenByGrid) {

    /** The reference of a grid given in Z: the present solar surface Z/X of Grevesse &amp; Noels (1993), 0.0245. */
    public static final IronAbundance DEFAULT = new IronAbundance(CalibrationSettings.GN93_METALS_TO_HYDROGEN, false);
    /** Decimals of the {@code fe_h_dex} cell (0.0001 dex). */
    public static final int DECIMALS = 4;

    public IronAbundance {
        SolarScaledMetallicity.requireSolarRatio(solarZOverX);
    }

    /**
     * [Fe/H] of the composition the tables write as {@code zInit}, {@code yInit}, rounded to {@value #DECIMALS}
     * decimals (half-even; never -0.0); NaN when Z = 0 (no metals: no [Fe/H]) or either is unknown.
     */
    public double dex(double zInit, double yInit) {
        double z = asWritten(zInit);
        double y = asWritten(yInit);
        if (!(z > 0.0) || Double.isNaN(y)) {
            return Double.NaN;
        }
        double exact = new SolarScaledMetallicity(solarZOverX).ironDex(z, y);
        if (!Double.isFinite(exact)) {
            // no hydrogen left after the tables' rounding, or an edited cell: no [Fe/H] rather than an exception
            return Double.NaN;
        }
        double rounded = new BigDecimal(exact).setScale(DECIMALS, RoundingMode.HALF_EVEN).doubleValue();
        return rounded == 0.0 ? 0.0 : rounded;
    }

    /** The {@code fe_h_dex} cell: {@code -0.3}, {@code 0.0}, {@code 0.1234}; empty when Z = 0. */
    public String cell(double zInit, double yInit) {
        return CsvNumbers.format(dex(zInit, yInit));
    }

    /** The column's description, naming the Sun it is measured against (the catalogue's ECSV header). */
    public String columnDescription() {
        return "[Fe/H] = log10 of (Z/X) over the solar Z/X " + CsvNumbers.format(solarZOverX)
                + " (solar-scaled mixture), X = 1 - Y - Z, from z_init and y_init, to 0.0001 dex; empty when Z = 0";
    }

    /** A value as the tables write it: their seven significant digits, read back. */
    private static double asWritten(double value) {
        return CsvNumbers.parse(CsvNumbers.format(value));
    }
}
