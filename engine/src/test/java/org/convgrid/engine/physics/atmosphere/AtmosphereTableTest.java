package org.convgrid.engine.physics.atmosphere;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class AtmosphereTableTest {

    private static final Composition SOLAR = Composition.scaledSolar(0.70, 0.02);
    private static final GreyAtmosphere DIRECT = new GreyAtmosphere(new TestIdealGasEos(1.3),
            TestOpacities.blend());

    @Test
    void tableMatchesDirectIntegrationBetweenNodes() {
        // Interpolation accuracy requirement of the solver (1e-3 in ln P); no published value involved.
        AtmosphereTable table = new AtmosphereTable(DIRECT);
        long start = System.nanoTime();
        SurfaceBoundary built = table.tabulate(SOLAR);
        double seconds = (System.nanoTime() - start) * 1e-9;
        assertThat(seconds).as("build time, s").isLessThan(5.0); // ~0.15 s measured; loose for a shared machine
        assertThat(comparedWithDirect(built, AtmosphereTable.DEFAULT_TEFF_AXIS, AtmosphereTable.DEFAULT_GRAVITY_AXIS))
                .isGreaterThan(350);
    }

    @Test
    void lowGravityTableMatchesDirectIntegrationBetweenNodes() {
        // the same requirement below the default table's gravities, 2000-10 000 K
        SurfaceBoundary built = new AtmosphereTable(DIRECT, AtmosphereTable.LOW_GRAVITY_TEFF_AXIS,
                AtmosphereTable.LOW_GRAVITY_AXIS).tabulate(SOLAR);
        assertThat(comparedWithDirect(built, AtmosphereTable.LOW_GRAVITY_TEFF_AXIS, AtmosphereTable.LOW_GRAVITY_AXIS))
                .isGreaterThan(90);
    }

    @Test
    void lowGravityTableContinuesTheDefaultOne() {
        // its top row is the default table's bottom row: the two agree on the shared edge
        SurfaceBoundary low = new AtmosphereTable(DIRECT, AtmosphereTable.LOW_GRAVITY_TEFF_AXIS,
                AtmosphereTable.LOW_GRAVITY_AXIS).tabulate(SOLAR);
        SurfaceBoundary high = new AtmosphereTable(DIRECT).tabulate(SOLAR);
        double g = Math.pow(10.0, AtmosphereTable.DEFAULT_GRAVITY_AXIS.min());
        assertThat(AtmosphereTable.LOW_GRAVITY_AXIS.max()).isEqualTo(AtmosphereTable.DEFAULT_GRAVITY_AXIS.min());
        assertThat(AtmosphereTable.LOW_GRAVITY_AXIS.step()).isCloseTo(AtmosphereTable.DEFAULT_GRAVITY_AXIS.step(),
                within(1e-12));
        for (double teff : new double[] {3000.0, 4321.0, 6789.0}) {
            // either side of the edge (exactly on it, rounding may put it outside either table)
            SurfaceCondition a = low.at(teff, g * (1.0 - 1e-12), SOLAR);
            SurfaceCondition b = high.at(teff, g * (1.0 + 1e-12), SOLAR);
            assertThat(a.lnPressure()).isCloseTo(b.lnPressure(), within(1e-10));
            assertThat(a.dlnPDlnTeff()).isCloseTo(b.dlnPDlnTeff(), within(1e-8));
        }
        assertThatThrownBy(() -> low.at(5000.0, 1.1 * g, SOLAR)).isInstanceOf(ConvgridException.class);
    }

    /** Compares the table with the direct integration inside every cell of the axes; returns the cells compared. */
    private static int comparedWithDirect(SurfaceBoundary built, TableAxis tx, TableAxis ty) {
        int compared = 0;
        for (int i = 0; i < tx.points() - 1; i++) {
            for (int j = 0; j < ty.points() - 1; j++) {
                double teff = Math.pow(10, tx.node(i) + 0.43 * tx.step());
                double g = Math.pow(10, ty.node(j) + 0.57 * ty.step());
                SurfaceCondition direct;
                try {
                    direct = DIRECT.at(teff, g, SOLAR);
                } catch (ConvgridException e) {
                    continue; // no atmosphere here (radiation outweighs gravity); the table refuses it too
                }
                SurfaceCondition s;
                try {
                    s = built.at(teff, g, SOLAR);
                } catch (ConvgridException e) {
                    continue; // a corner of this cell is super-Eddington
                }
                assertThat(s.lnPressure()).as("Teff %s g %s", teff, g).isCloseTo(direct.lnPressure(), within(1e-3));
                assertThat(s.lnTemperature()).isCloseTo(direct.lnTemperature(), within(1e-6));
                assertThat(s.dlnPDlnG()).isCloseTo(direct.dlnPDlnG(), within(0.02));
                assertThat(s.dlnPDlnTeff()).isCloseTo(direct.dlnPDlnTeff(), within(0.05));
                compared++;
            }
        }
        return compared;
    }

    @Test
    void nodesAreReproducedAndDerivativesAreContinuousAcrossCellEdges() {
        SurfaceBoundary built = new AtmosphereTable(DIRECT).tabulate(SOLAR);
        double teff = Math.pow(10, AtmosphereTable.DEFAULT_TEFF_AXIS.node(20));
        double g = Math.pow(10, AtmosphereTable.DEFAULT_GRAVITY_AXIS.node(5));
        SurfaceCondition node = built.at(teff, g, SOLAR);
        SurfaceCondition direct = DIRECT.at(teff, g, SOLAR);
        assertThat(node.lnPressure()).isCloseTo(direct.lnPressure(), within(1e-12));
        assertThat(node.dlnPDlnTeff()).isCloseTo(direct.dlnPDlnTeff(), within(1e-10));
        double e = 1e-9;
        SurfaceCondition below = built.at(teff * (1 - e), g, SOLAR);
        SurfaceCondition above = built.at(teff * (1 + e), g, SOLAR);
        assertThat(above.dlnPDlnTeff()).isCloseTo(below.dlnPDlnTeff(), within(1e-6));
        assertThat(above.dlnPDlnG()).isCloseTo(below.dlnPDlnG(), within(1e-6));
        // The reported derivative is the interpolant's own slope.
        double fd = (above.lnPressure() - below.lnPressure()) / (2 * e);
        assertThat(node.dlnPDlnTeff()).isCloseTo(fd, within(1e-5));
    }

    @Test
    void offTableRequestsFailWithTheirCoordinates() {
        AtmosphereTable table = new AtmosphereTable(DIRECT);
        assertThatThrownBy(() -> table.at(1500, 1e4, SOLAR)).isInstanceOf(ConvgridException.class)
                .satisfies(ex -> {
                    ConvgridException c = (ConvgridException) ex;
                    assertThat(c.kind()).isEqualTo(ErrorKind.OFF_TABLE);
                    assertThat(c.parameters()).containsExactly("atmosphere", 1500.0, 1e4);
                });
        assertThatThrownBy(() -> table.at(5772, 1e7, SOLAR)).isInstanceOf(ConvgridException.class);
    }

    @Test
    void cachedTablesGiveIdenticalResultsPerComposition() {
        AtmosphereTable table = new AtmosphereTable(DIRECT, new TableAxis(3.5, 3.9, 9), new TableAxis(4.0, 5.0, 5));
        Composition poor = Composition.scaledSolar(0.75, 0.001);
        SurfaceCondition first = table.at(5000, 3e4, SOLAR);
        SurfaceCondition other = table.at(5000, 3e4, poor);
        assertThat(table.at(5000, 3e4, SOLAR)).isEqualTo(first);
        // Fewer metals, fewer H^- electrons in the test opacity: lower kappa, higher photospheric pressure.
        assertThat(other.lnPressure()).isGreaterThan(first.lnPressure());
    }

    @Test
    void nodesAreIntegratedOnlyWhenACellNeedsThem() {
        AtomicInteger integrations = new AtomicInteger();
        SurfaceBoundary counting = (teff, g, c) -> {
            integrations.incrementAndGet();
            return DIRECT.at(teff, g, c);
        };
        SurfaceBoundary built = new AtmosphereTable(counting).tabulate(SOLAR);
        assertThat(integrations).as("nothing integrated before the first query").hasValue(0);
        built.at(5772, 2.74e4, SOLAR);
        // An inner cell: four corners plus the four neighbours along Teff their cross derivatives need.
        assertThat(integrations).hasValue(8);
        built.at(5800, 2.8e4, SOLAR);
        assertThat(integrations).as("same cell again").hasValue(8);
        // the cell above shares two corners and their neighbours: four new nodes
        built.at(5800, 2.8e4 * Math.pow(10.0, AtmosphereTable.DEFAULT_GRAVITY_AXIS.step()), SOLAR);
        assertThat(integrations).as("cell above").hasValue(12);
    }

    @Test
    void answersDoNotDependOnQueryOrderOrThreads() {
        List<double[]> points = new ArrayList<>();
        for (int k = 0; k < 60; k++) {
            points.add(new double[] {3000 + 397.0 * k, Math.pow(10, 2.6 + 0.057 * k)});
        }
        SurfaceBoundary forward = new AtmosphereTable(DIRECT).tabulate(SOLAR);
        SurfaceBoundary backward = new AtmosphereTable(DIRECT).tabulate(SOLAR);
        SurfaceBoundary parallel = new AtmosphereTable(DIRECT).tabulate(SOLAR);
        List<Object> a = IntStream.range(0, points.size()).mapToObj(k -> answer(forward, points.get(k))).toList();
        List<Object> b = new ArrayList<>(IntStream.range(0, points.size())
                .map(k -> points.size() - 1 - k).mapToObj(k -> answer(backward, points.get(k))).toList());
        Collections.reverse(b);
        List<Object> c = IntStream.range(0, points.size()).parallel()
                .mapToObj(k -> answer(parallel, points.get(k))).toList();
        assertThat(b).isEqualTo(a); // record equality compares the doubles bit for bit
        assertThat(c).isEqualTo(a);
        assertThat(a).filteredOn(o -> o instanceof SurfaceCondition).hasSizeGreaterThan(40);
    }

    /** The condition, or the error kind where the table has no answer. */
    private static Object answer(SurfaceBoundary table, double[] point) {
        try {
            return table.at(point[0], point[1], SOLAR);
        } catch (ConvgridException e) {
            return e.kind();
        }
    }
}
