package org.convgrid.output.manifest;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class UnfinishedRunTest {

    @Test
    void countsReadAsEnglish() {
        assertThat(new UnfinishedRun(30, 90).describe()).isEqualTo("30 of 90 models");
        assertThat(new UnfinishedRun(1, 3).describe()).isEqualTo("1 of 3 models");
        assertThat(new UnfinishedRun(0, 1).describe()).isEqualTo("0 of 1 model");
        assertThat(new UnfinishedRun(1, RunManifest.EXPECTED_UNKNOWN).describe()).isEqualTo("1 model");
        assertThat(new UnfinishedRun(30, RunManifest.EXPECTED_UNKNOWN).describe()).isEqualTo("30 models");
    }
}
