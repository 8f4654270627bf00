package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.convgrid.output.catalogue.CatalogueZone;
import org.convgrid.output.catalogue.CatalogueZone.ZoneKind;
import org.junit.jupiter.api.Test;

/** star's zone table names each zone's kind as zones.csv does, in words (the measured zones of 1 and 1.8 Msun). */
class StarZoneKindTest {

    @Test
    void eachZoneSaysWhatItIs() {
        assertThat(StarReport.kindWords(new CatalogueZone(ZoneKind.CORE, 0.0, 0.107109, 0.0, 0.087193)))
                .isEqualTo("core");
        // 1 Msun, Z = 0.02, 150 Myr: a central zone below the core threshold, listed by zones.csv as a shell
        assertThat(StarReport.kindWords(new CatalogueZone(ZoneKind.SHELL, 0.0, 0.000622, 0.0, 0.024276)))
                .isEqualTo("central, below the core threshold");
        assertThat(StarReport.kindWords(new CatalogueZone(ZoneKind.SHELL, 0.121225, 0.124478, 0.09179, 0.092909)))
                .isEqualTo("shell");
        // 1.8 Msun, Z = 0.02, 600 Myr: the hydrogen ionisation zone, m/M ends both 1.000000
        assertThat(StarReport.kindWords(new CatalogueZone(ZoneKind.SHELL, 1.0, 1.0, 0.998595, 1.0, 1.91e-10)))
                .isEqualTo("shell, near the surface");
        assertThat(StarReport.kindWords(new CatalogueZone(ZoneKind.ENVELOPE, 0.974964, 1.0, 0.729935, 0.999904)))
                .isEqualTo("envelope");
    }
}
