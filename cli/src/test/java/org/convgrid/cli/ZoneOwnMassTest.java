package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * zones.csv gives every zone its own mass, not the difference of its written ends: the 1.3 Msun,
 * Z = 0.01 star at 50 Myr (a thin convective envelope, base at m/M 0.999998) had zone_mass_msun 2.6e-06, which is
 * (1 - 0.999998) x 1.3, against the catalogue's env_cz_mass_msun 2.537907e-06. Every envelope (and whole-star) row of
 * a run must carry exactly what the catalogue writes for the envelope. Not a physics test: it compares two files of
 * one run (production solver; the masses give a whole star, a thick and a thin envelope, cores and surface shells).
 */
class ZoneOwnMassTest {

    private static final String GRID = """
            title: Zone mass check
            mass: {values: [0.3, 1.3, 1.8]}
            metallicity: {z: [0.01], helium: {primordial: 0.2471, enrichment: 1.5}}
            age: {myr: [50]}
            output: {dir: runs/zone-mass}
            """;

    @TempDir
    Path dir;

    @Test
    void everyEnvelopeRowOfZonesCsvCarriesTheCatalogueEnvelopeMassAsWritten() throws Exception {
        Path grid = CliHarness.writeGrid(dir, "zone-mass.yaml", GRID);
        CliHarness.Execution run = CliHarness.real(dir).execute("run", "--no-refine", grid.toString(), "--out", "run",
                "--quiet");
        assertThat(run.code()).as(run.err()).isZero();
        Map<String, CatalogueRow> rows = CatalogueReader.read(dir.resolve("run/catalogue.ecsv")).stream()
                .collect(Collectors.toMap(CatalogueRow::modelId, Function.identity()));
        List<String[]> zones = Files.readAllLines(dir.resolve("run/zones.csv")).stream().skip(1)
                .map(line -> line.split(",", -1)).toList();

        List<String[]> envelopes = zones.stream()
                .filter(z -> z[2].equals("envelope") || z[2].equals("whole_star")).toList();
        assertThat(envelopes).extracting(z -> z[0]).containsExactlyInAnyOrder("p0-z00-m000-a00",
                "p0-z00-m001-a00");
        for (String[] z : envelopes) {
            assertThat(z[7]).as("zone_mass_msun of %s", z[0])
                    .isEqualTo(CsvNumbers.format(rows.get(z[0]).envCzMassMsun()));
        }
        // the 1.3 Msun star's thin envelope: its base is written 0.999998, one significant digit of 1 - m/M, while
        // its mass keeps seven
        String[] thin = envelopes.stream().filter(z -> z[0].equals("p0-z00-m001-a00")).findFirst().orElseThrow();
        assertThat(thin[3]).isEqualTo("0.999998");
        assertThat(thin[7]).isNotEqualTo("2.6e-06");
        // every other zone's mass also agrees with its written ends to within their rounding (7 digits of m/M)
        for (String[] z : zones) {
            double mass = rows.get(z[0]).massMsun();
            double fromEnds = (Double.parseDouble(z[4]) - Double.parseDouble(z[3])) * mass;
            assertThat(Math.abs(Double.parseDouble(z[7]) - fromEnds)).as("zone_mass_msun of %s", z[0])
                    .isLessThanOrEqualTo(1.0e-6 * mass);
        }
    }
}
