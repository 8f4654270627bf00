package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class RefinedModelIdsTest {

    @Test
    void replacesTheMassPartOfTheSlicesGridIdWithACounter() {
        assertThat(RefinedModelIds.of("p0-z01-m023-a00", 7)).isEqualTo("p0-z01-r007-a00");
        assertThat(RefinedModelIds.of("p12-z03-m1234-a002", 1234)).isEqualTo("p12-z03-r1234-a002");
        assertThat(RefinedModelIds.counter("p0-z01-r007-a00")).isEqualTo(7);
    }

    @Test
    void gridIdsAreNeverRefinedIds() {
        assertThat(RefinedModelIds.isRefined("p0-z01-m023-a00")).isFalse();
        assertThat(RefinedModelIds.counter("p0-z01-m023-a00")).isEqualTo(-1);
        assertThat(RefinedModelIds.isRefined(RefinedModelIds.of("p0-z01-m023-a00", 0))).isTrue();
        assertThatThrownBy(() -> RefinedModelIds.of("p0-z01-r000-a00", 1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> RefinedModelIds.of("p0-z01-m000-a00", -1)).isInstanceOf(IllegalArgumentException.class);
    }
}
