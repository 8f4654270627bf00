package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.MetallicityPoint;
import org.convgrid.grids.yaml.GridFileReader;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.IronAbundance;
import org.junit.jupiter.api.Test;

/**
 * The tables' {@code fe_h_dex} gives back the [Fe/H] a grid file asked for: the grid reader turns [Fe/H] into Z for a
 * solar-scaled mixture, Z/X = (Z/X)_sun 10^[Fe/H] with X = 1 - Y - Z (common practice, no single published source;
 * the default (Z/X)_sun 0.0245 is Grevesse &amp; Noels 1993's present surface value), and the column takes the
 * logarithm back from z_init and y_init as the tables write them (seven significant digits), rounded to 0.0001 dex.
 */
class IronAbundanceColumnTest {

    private static final List<Double> ASKED = List.of(-2.0, -0.35, 0.0, 0.4);

    private static GridSpec grid(String metallicity) {
        return new GridFileReader().parse("iron.yaml", "mass: {values: [1.0]}\nmetallicity: " + metallicity + "\n");
    }

    private static List<String> cells(GridSpec grid) {
        IronAbundance iron = GridIronAbundance.of(grid);
        return grid.metallicities().stream().map(p -> iron.cell(p.z(), p.y())).toList();
    }

    @Test
    void aGridInIronGivesBackItsOwnValuesWithTheHeliumLaw() {
        GridSpec grid = grid("{fe_h_dex: [-2.0, -0.35, 0, 0.4], helium: {primordial: 0.2471, enrichment: 1.5}}");
        assertThat(cells(grid)).containsExactly("-2.0", "-0.35", "0.0", "0.4");
        assertThat(GridIronAbundance.of(grid)).isEqualTo(new IronAbundance(0.0245, true));
    }

    @Test
    void aGridInIronGivesBackItsOwnValuesWithAYListAndItsOwnSun() {
        GridSpec grid = grid("{fe_h_dex: [-2.0, -0.35, 0, 0.4], solar_z_over_x: 0.0181, y: [0.25, 0.26, 0.27, 0.3]}");
        assertThat(cells(grid)).containsExactly("-2.0", "-0.35", "0.0", "0.4");
        IronAbundance iron = GridIronAbundance.of(grid);
        assertThat(iron).isEqualTo(new IronAbundance(0.0181, true));
        // measured against the default Sun instead, the same rows would read log10(0.0181 / 0.0245) = -0.1315 lower
        MetallicityPoint solar = grid.metallicities().get(2);
        assertThat(IronAbundance.DEFAULT.cell(solar.z(), solar.y())).isEqualTo("-0.1315");
    }

    /** Every [Fe/H] from -5 to +0.9 (above, Z reaches 0.1) stated to four decimals comes back through the written Z. */
    @Test
    void everyFourDecimalIronComesBackThroughTheWrittenZ() {
        for (int step = -50_000; step <= 9_000; step += 11) {
            double asked = step / 10_000.0;
            GridSpec grid = grid("{fe_h_dex: [" + asked + "], helium: {primordial: 0.2471, enrichment: 1.5}}");
            MetallicityPoint p = grid.metallicities().get(0);
            double back = GridIronAbundance.of(grid).dex(CsvNumbers.parse(CsvNumbers.format(p.z())),
                    CsvNumbers.parse(CsvNumbers.format(p.y())));
            assertThat(back).as("[Fe/H] %s", asked).isEqualTo(asked == 0.0 ? 0.0 : asked);
        }
    }

    @Test
    void aGridInZMeasuresAgainstTheDefaultSunAndNamesNoIronInCharts() {
        GridSpec grid = grid("{z: [0.0, 0.014], y: [0.2471, 0.268]}");
        assertThat(GridIronAbundance.of(grid)).isEqualTo(IronAbundance.DEFAULT);
        // Z = 0 has no [Fe/H]: the cell is empty; 0.014 / 0.718 / 0.0245 is -0.0992 dex
        assertThat(cells(grid)).containsExactly("", "-0.0992");
    }
}
