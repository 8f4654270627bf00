package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code star} says on the error stream when the star's central convective core has joined its envelope by the asked
 * age (life_events.csv's core_envelope_merge_myr): just above the fully convective limit the core grows, meets the
 * envelope and splits off again (van Saders &amp; Pinsonneault 2012, arXiv:1201.5381, abstract), so the structure
 * printed is one phase of a cycle whose timing depends on the steps. Production solver, 0.35 Msun, Z = 0.02.
 */
class StarMergeNoteTest {

    @TempDir
    Path dir;

    @Test
    void aStarPastItsFirstMergeIsToldSoAndOneBeforeItIsNot() {
        // default steps: the core joins the envelope near 2.9 Gyr (README, Limits, in detail: 2.7-3.5 Gyr with the
        // step history), so 4 Gyr is past it and 2 Gyr before it
        CliHarness.Execution past = CliHarness.real(dir).execute("star", "--mass", "0.35", "--z", "0.02",
                "--age-gyr", "4");
        assertThat(past.code()).as(past.err()).isZero();
        assertThat(past.err()).contains("convgrid: note: this star's central convective core joined its envelope at ",
                "van Saders & Pinsonneault 2012");
        CliHarness.Execution before = CliHarness.real(dir).execute("star", "--mass", "0.35", "--z", "0.02",
                "--age-gyr", "2");
        assertThat(before.code()).as(before.err()).isZero();
        assertThat(before.err()).doesNotContain("joined its envelope");
        assertThat(before.out()).contains("conv core and envelope");
    }
}
