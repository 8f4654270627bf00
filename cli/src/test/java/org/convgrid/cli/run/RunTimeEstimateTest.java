package org.convgrid.cli.run;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class RunTimeEstimateTest {

    @Test
    void olderAgesCostMoreByTheMeasuredFactors() {
        // the nodes themselves (measured, see OLDEST_AGE_FACTORS), log-age interpolation between them, ends held
        assertThat(RunTimeEstimate.oldestAgeFactor(0.02)).isEqualTo(1.0);
        assertThat(RunTimeEstimate.oldestAgeFactor(0.6)).isEqualTo(1.0);
        assertThat(RunTimeEstimate.oldestAgeFactor(2.0)).isCloseTo(1.7, within(1e-12));
        // halfway in log age between 2 and 10 Gyr (sqrt(20) = 4.47 Gyr): halfway between 1.7 and 2.0
        assertThat(RunTimeEstimate.oldestAgeFactor(Math.sqrt(20.0))).isCloseTo(1.85, within(1e-12));
        assertThat(RunTimeEstimate.oldestAgeFactor(13.0)).isEqualTo(2.0);
    }
}
