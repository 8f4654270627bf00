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
    void massFractionIsTheIdentity() {
        assertThat(ZoneCoordinate.MASS_FRACTION.of(0.37)).isEqualTo(0.37);
    }
}
