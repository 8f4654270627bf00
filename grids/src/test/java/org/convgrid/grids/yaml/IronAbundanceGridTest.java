package org.convgrid.grids.yaml;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.convgrid.grids.GridFileException;
import org.convgrid.grids.GridProblem;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.HeliumLaw;
import org.convgrid.grids.IronToMetals;
import org.convgrid.grids.MetallicityPoint;
import org.junit.jupiter.api.Test;

/**
 * {@code metallicity: fe_h_dex} for spectroscopic [Fe/H] (exoplanet hosts, field stars): Z of a solar-scaled mixture,
 * Z/X = (Z/X)_sun 10^[Fe/H] with X = 1 - Y - Z (common practice, no single published source; the default solar Z/X
 * 0.0245 is Grevesse & Noels 1993's present surface value, the opacity tables' mixture).
 */
class IronAbundanceGridTest {

    private final GridFileReader reader = new GridFileReader();

    private GridSpec grid(String metallicity) {
        return reader.parse("iron.yaml", "mass: {values: [1.0]}\nmetallicity: " + metallicity + "\n");
    }

    @Test
    void solarIronGivesTheSolarRatioAndEachCompositionItsOwnZ() {
        List<MetallicityPoint> points = grid(
                "{fe_h_dex: [-0.5, 0, 0.3], helium: {primordial: 0.2471, enrichment: 1.5}}").metallicities();
        // [Fe/H] = 0: Z / X is the Sun's 0.0245, with the helium law's Y
        MetallicityPoint sun = points.get(1);
        assertThat(sun.z() / (1.0 - sun.y() - sun.z())).isCloseTo(0.0245, within(1e-15));
        assertThat(sun.y()).isCloseTo(0.2471 + 1.5 * sun.z(), within(1e-15));
        // Z = 0.0245 (1 - 0.2471) / (1 + 0.0245 x 2.5), by hand: 0.0173815
        assertThat(sun.z()).isCloseTo(0.0173815, within(1e-7));
        assertThat(points).extracting(MetallicityPoint::ironDex).containsExactly(-0.5, 0.0, 0.3);
        assertThat(grid("{z: [0.02], y: [0.27]}").metallicities().get(0).ironDex()).isNaN();
        // each 1 dex is a factor 10 in Z/X
        for (MetallicityPoint p : points) {
            double ratio = p.z() / (1.0 - p.y() - p.z());
            assertThat(Math.log10(ratio / 0.0245)).isCloseTo(
                    List.of(-0.5, 0.0, 0.3).get(points.indexOf(p)), within(1e-12));
        }
    }

    @Test
    void anotherSolarRatioAndExplicitHeliumAreHonoured() {
        List<MetallicityPoint> points = grid("{fe_h_dex: [0.0, 0.2], solar_z_over_x: 0.0181, y: [0.27, 0.28]}")
                .metallicities();
        assertThat(points).extracting(MetallicityPoint::y).containsExactly(0.27, 0.28);
        MetallicityPoint rich = points.get(1);
        assertThat(rich.z() / (1.0 - rich.y() - rich.z())).isCloseTo(0.0181 * Math.pow(10, 0.2), within(1e-15));
        assertThat(new IronToMetals(0.0181).metals(0.0, 0.27)).isEqualTo(points.get(0).z());
        assertThat(IronToMetals.GN93.metals(0.0, HeliumLaw.DEFAULT)).isCloseTo(0.0173815, within(1e-7));
    }

    @Test
    void zAndIronTogetherASolarRatioWithoutIronAndAnIronBeyondTheRangeAreRefused() {
        assertThat(messages("{z: [0.02], fe_h_dex: [0], y: [0.27]}"))
                .anyMatch(m -> m.contains("takes 'z' or 'fe_h_dex'"));
        assertThat(messages("{z: [0.02], solar_z_over_x: 0.0245, y: [0.27]}"))
                .anyMatch(m -> m.contains("solar_z_over_x is the Sun's Z/X that fe_h_dex is measured against"));
        assertThat(messages("{fe_h_dex: [0.5, 3], y: [0.27, 0.27]}")).anyMatch(m -> m.contains("fe_h_dex"));
        assertThat(messages("{fe_h_dex: [0.3, 0.1], y: [0.27, 0.27]}"))
                .anyMatch(m -> m.contains("fe_h_dex") && m.contains("increas"));
        // each with its own Y, a higher [Fe/H] can give a lower Z
        assertThat(messages("{fe_h_dex: [0.0, 0.01], y: [0.25, 0.35]}")).anyMatch(m -> m.contains(
                "fe_h_dex = 0.01 with y = 0.35 gives Z = 0.01589738, not above the Z of the value before it"));
        // 1 dex above a solar ratio of 0.1: Z/X = 1, so Z = 0.365 with Y = 0.27; Z must stay below 0.1
        assertThat(messages("{fe_h_dex: [1], solar_z_over_x: 0.1, y: [0.27]}"))
                .anyMatch(m -> m.contains("fe_h_dex = 1 gives Z = 0.365") && m.contains("outside [0, 0.1)"));
        assertThat(messages("{y: [0.27]}")).anyMatch(m -> m.contains("(or 'fe_h_dex', [Fe/H] in dex)"));
    }

    private List<String> messages(String metallicity) {
        GridFileException e = catchThrowableOfType(GridFileException.class, () -> grid(metallicity));
        assertThat(e).as("expected problems in %s", metallicity).isNotNull();
        return e.problems().stream().map(GridProblem::message).toList();
    }
}
