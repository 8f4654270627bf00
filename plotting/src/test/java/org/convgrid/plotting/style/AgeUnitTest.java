package org.convgrid.plotting.style;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.engine.request.AgeOrigin;
import org.junit.jupiter.api.Test;

/** The unit of an age axis (wording only, no physics). */
class AgeUnitTest {

    @Test
    void agesAllBelowOneGyrAreInMyr() {
        assertThat(AgeUnit.of(List.of(0.02, 0.15, 0.6))).isEqualTo(AgeUnit.MYR);
        assertThat(AgeUnit.MYR.fromGyr(0.15)).isEqualTo(150.0);
        assertThat(AgeAxisTitle.of(AgeOrigin.BIRTH, AgeUnit.MYR)).isEqualTo("age since birth / Myr");
        assertThat(AgeAxisTitle.of(AgeOrigin.ZAMS, AgeUnit.MYR))
                .isEqualTo("age since the zero-age main sequence / Myr");
    }

    @Test
    void anyAgeOfOneGyrOrMoreKeepsGyr() {
        assertThat(AgeUnit.of(List.of(0.0, 1.0, 4.57))).isEqualTo(AgeUnit.GYR);
        assertThat(AgeUnit.of(List.of(0.6, 1.0))).isEqualTo(AgeUnit.GYR);
        assertThat(AgeUnit.of(List.of())).isEqualTo(AgeUnit.GYR);
        assertThat(AgeAxisTitle.of(AgeOrigin.BIRTH)).isEqualTo("age since birth / Gyr");
    }
}
