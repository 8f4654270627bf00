package org.convgrid.plotting.label;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Ages in chart titles and legends: Myr below 1 Gyr, Gyr above, ZAMS for zero (no physics here). */
class AgeLabelTest {

    @Test
    void agesBelowOneGyrAreGivenInMyr() {
        assertThat(SliceLabels.age(0.0)).isEqualTo("ZAMS");
        assertThat(SliceLabels.age(0.02)).isEqualTo("20 Myr");
        assertThat(SliceLabels.age(0.15)).isEqualTo("150 Myr");
        assertThat(SliceLabels.age(1.0)).isEqualTo("1 Gyr");
        assertThat(SliceLabels.age(4.57)).isEqualTo("4.57 Gyr");
    }

    @Test
    void titlesCarryEachAgesUnitOnlyWhenSomeAreYoung() {
        assertThat(SliceLabels.ages(List.of(0.0, 1.0, 4.57))).isEqualTo("ages 0, 1, 4.57 Gyr");
        assertThat(SliceLabels.ages(List.of(0.02, 0.15, 0.6))).isEqualTo("ages 20 Myr, 150 Myr, 600 Myr");
        assertThat(SliceLabels.ages(List.of(0.001, 0.01, 0.1, 1.0, 2.0)))
                .isEqualTo("ages 1 Myr to 2 Gyr (5 values)");
    }

    @Test
    void fileNamesCarryTheAgesUnitAsTheTitlesDo() {
        assertThat(SliceLabels.ageStem(0.0)).isEqualTo("zams");
        assertThat(SliceLabels.ageStem(0.0001)).isEqualTo("age0.1myr");
        assertThat(SliceLabels.ageStem(0.005)).isEqualTo("age5myr");
        assertThat(SliceLabels.ageStem(0.02)).isEqualTo("age20myr");
        assertThat(SliceLabels.ageStem(0.15)).isEqualTo("age150myr");
        assertThat(SliceLabels.ageStem(0.999)).isEqualTo("age999myr");
        assertThat(SliceLabels.ageStem(1.0)).isEqualTo("age1gyr");
        assertThat(SliceLabels.ageStem(4.57)).isEqualTo("age4.57gyr");
    }
}
