package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.junit.jupiter.api.Test;

/** A path refused under an ASCII locale names the locale, not the name ("c-locale ñ" under LC_ALL=C). */
class UnusablePathTest {

    @Test
    void aNonAsciiPathUnderAnAsciiLocaleNamesTheLocale() {
        assertThat(UnusablePath.reason("runs/c-locale \u00f1", "ANSI_X3.4-1968", Map.of("LC_ALL", "C", "LANG",
                "en_GB.UTF-8"))).contains("file-name encoding, ANSI_X3.4-1968, which comes from the locale (LC_ALL=C)")
                .contains("LC_ALL=C.UTF-8").doesNotContain("NUL");
        assertThat(UnusablePath.reason("runs/\u00f1", "ANSI_X3.4-1968", Map.of())).contains("so the C locale");
    }

    @Test
    void aNulOrAnotherRefusalSaysSo() {
        assertThat(UnusablePath.reason("runs/a\0b", "UTF-8", Map.of())).contains("contains a NUL character");
        assertThat(UnusablePath.reason("runs/\u00f1", "UTF-8", Map.of())).contains("the file system refuses")
                .doesNotContain("locale");
    }
}
