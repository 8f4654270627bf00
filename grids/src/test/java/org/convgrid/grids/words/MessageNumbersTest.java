package org.convgrid.grids.words;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Numbers in messages: plain from 1e-3 to 1e5, else with a power of ten; never Double.toString's "5.0E-4". */
class MessageNumbersTest {

    @Test
    void plainDecimalsWithoutTrailingZeros() {
        assertThat(MessageNumbers.format(-1.0)).isEqualTo("-1");
        assertThat(MessageNumbers.format(0.0)).isEqualTo("0");
        assertThat(MessageNumbers.format(-0.0)).isEqualTo("0");
        assertThat(MessageNumbers.format(0.02)).isEqualTo("0.02");
        assertThat(MessageNumbers.format(300.0)).isEqualTo("300");
        assertThat(MessageNumbers.format(0.001)).isEqualTo("0.001");
        assertThat(MessageNumbers.format(1e4)).isEqualTo("10000");
        assertThat(MessageNumbers.format(2e4)).isEqualTo("20000");
        // arithmetic noise is not shown: 150 Myr in Gyr, back in Myr
        assertThat(MessageNumbers.format(0.15 * 1000.0)).isEqualTo("150");
        assertThat(MessageNumbers.format(0.1 + 0.2)).isEqualTo("0.3");
    }

    @Test
    void aPowerOfTenOutsideThePlainRange() {
        assertThat(MessageNumbers.format(5e-4)).isEqualTo("5e-4");
        assertThat(MessageNumbers.format(-2.5e-7)).isEqualTo("-2.5e-7");
        assertThat(MessageNumbers.format(2e6)).isEqualTo("2e6");
        assertThat(MessageNumbers.format(1e30)).isEqualTo("1e30");
        assertThat(MessageNumbers.format(1.23456789e6)).isEqualTo("1.234568e6");
    }

    @Test
    void notANumberAndInfinities() {
        assertThat(MessageNumbers.format(Double.NaN)).isEqualTo("NaN");
        assertThat(MessageNumbers.format(Double.POSITIVE_INFINITY)).isEqualTo("inf");
        assertThat(MessageNumbers.format(Double.NEGATIVE_INFINITY)).isEqualTo("-inf");
    }

    @Test
    void countsAgreeWithTheirNoun() {
        assertThat(Counts.of(1, "model")).isEqualTo("1 model");
        assertThat(Counts.of(0, "model")).isEqualTo("0 models");
        assertThat(Counts.of(2, "shard directory", "shard directories")).isEqualTo("2 shard directories");
    }
}
