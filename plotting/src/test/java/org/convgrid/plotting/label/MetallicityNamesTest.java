package org.convgrid.plotting.label;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Chart words for a metallicity: Z alone for a grid given in Z (the charts as they were), [Fe/H] first for a grid
 * given in [Fe/H] (signed, two decimals, from the tables' four).
 */
class MetallicityNamesTest {

    private static final MetallicityNames IRON = new MetallicityNames(Map.of(0.005722318, -0.5, 0.01738144, 0.0,
            0.03279664, 0.3, 0.0153, 0.1049));

    @Test
    void aGridInZIsNamedByZAsBefore() {
        assertThat(MetallicityNames.Z_ONLY.of(0.014)).isEqualTo("Z = 0.014");
        assertThat(MetallicityNames.Z_ONLY.values(List.of(0.008, 0.014, 0.02))).isEqualTo("Z = 0.008, 0.014, 0.02");
        assertThat(MetallicityNames.Z_ONLY.namesIron()).isFalse();
    }

    @Test
    void aGridInIronNamesItsIronFirst() {
        assertThat(IRON.of(0.0153)).isEqualTo("[Fe/H] = +0.10, Z = 0.0153");
        assertThat(IRON.of(0.01738144)).isEqualTo("[Fe/H] = 0.00, Z = 0.01738");
        assertThat(IRON.of(0.005722318)).isEqualTo("[Fe/H] = -0.50, Z = 0.005722");
        assertThat(IRON.values(List.of(0.005722318, 0.01738144, 0.03279664))).isEqualTo("[Fe/H] = -0.50, 0.00, +0.30");
        assertThat(IRON.ironCell(0.03279664)).isEqualTo("+0.30");
        // a Z without [Fe/H] (Z = 0) is named by Z alone
        assertThat(IRON.of(0.0)).isEqualTo("Z = 0");
        assertThat(IRON.ironCell(0.0)).isEmpty();
    }

    @Test
    void ironIsRoundedHalfUpFromTheTablesFourDecimals() {
        assertThat(MetallicityNames.iron(0.125)).isEqualTo("+0.13");
        assertThat(MetallicityNames.iron(-0.125)).isEqualTo("-0.13");
        assertThat(MetallicityNames.iron(-0.004)).isEqualTo("0.00");
    }
}
