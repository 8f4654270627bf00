package org.convgrid.plotting.kippenhahn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class ZoneCoordinateTest {

    @Test
    void depthSpreadsTheOuterLayersOverDecades() {
        ZoneCoordinate depth = ZoneCoordinate.SURFACE_DEPTH;
        assertThat(depth.of(0.0)).isEqualTo(0.0);
        assertThat(depth.of(0.9)).isCloseTo(1.0, within(1e-12));
        assertThat(depth.of(0.999)).isCloseTo(3.0, within(1e-9));
        assertThat(depth.of(1.0)).isEqualTo(ZoneCoordinate.DEPTH_TOP);
        // an envelope holding a thousandth of the mass: invisible in m/M, 4 of 7 decades deep in depth
        assertThat(ZoneCoordinate.MASS_FRACTION.shows(0.999, 1.0)).isFalse();
        assertThat(depth.shows(0.999, 1.0)).isTrue();
        // a core holding a thousandth of the mass: the other way round
        assertThat(ZoneCoordinate.MASS_FRACTION.shows(0.0, 0.01)).isTrue();
        assertThat(depth.shows(0.0, 0.001)).isFalse();
    }

    @Test
    void onTheDepthAxisAZoneThatReachesTheSurfaceIsDrawnToTheTop() {
        ZoneCoordinate depth = ZoneCoordinate.SURFACE_DEPTH;
        // the demo's 1.2 Msun track at birth: one zone up to the outermost mesh point, m/M = 0.9999996
        AgeRect wholeStar = new AgeRect(0, 0.0, 1.2e-6, 0.0, 0.9999996);
        assertThat(depth.of(wholeStar.hi())).isCloseTo(6.4, within(0.01));
        assertThat(depth.of(depth.drawn(wholeStar).hi())).isEqualTo(ZoneCoordinate.DEPTH_TOP);
        AgeRect envelope = new AgeRect(1, 0.1, 0.2, 0.99, 0.9999996);
        assertThat(depth.of(depth.drawn(envelope).hi())).isEqualTo(ZoneCoordinate.DEPTH_TOP);
        assertThat(depth.drawn(envelope).lo()).isEqualTo(0.99);
        // a shell below the surface and every zone in m/M are drawn where they are
        AgeRect shell = new AgeRect(2, 0.1, 0.2, 0.9, 0.99);
        assertThat(depth.drawn(shell)).isEqualTo(shell);
        assertThat(ZoneCoordinate.MASS_FRACTION.drawn(envelope)).isEqualTo(envelope);
    }

    @Test
    void theDepthAxisSaysWhichWayIsOut() {
        assertThat(ZoneCoordinate.SURFACE_DEPTH.title())
                .isEqualTo("\u2212log10(1 \u2212 m/M), surface at the top");
    }

    @Test
    void massFractionIsTheIdentity() {
        assertThat(ZoneCoordinate.MASS_FRACTION.of(0.37)).isEqualTo(0.37);
    }
}
