package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.convgrid.output.CsvNumbers;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;

/**
 * {@code star} gives one model's g-mode period scale and p-mode scales three ways: its table, its catalogue row
 * ({@code --format csv}) and its profile's meta ({@code --profile}). All three are the same doubles (the row and the
 * table to their own digits), for a gamma Dor-like 1.5 Msun star at 1 Gyr (README: Pi_0 4195 s, Delta Pi_1 2967 s).
 */
class StarPeriodScaleTest {

    @TempDir
    Path dir;

    private CliHarness.Execution run(String... args) {
        return CliHarness.real(dir).execute(args);
    }

    @Test
    void theTableTheCatalogueRowAndTheProfileMetaAgree() throws Exception {
        CliHarness.Execution csv = run("star", "--mass", "1.5", "--z", "0.02", "--age-gyr", "1", "--format", "csv",
                "--profile", "p.csv");
        assertThat(csv.code()).as(csv.err()).isZero();
        List<String> lines = csv.out().lines().filter(l -> !l.startsWith("#")).toList();
        List<String> header = List.of(lines.get(0).split(","));
        int pi0Column = header.indexOf("buoyancy_period_pi0_s");
        assertThat(header.subList(pi0Column, pi0Column + 5)).containsExactly("buoyancy_period_pi0_s",
                "period_spacing_l1_s", "large_separation_uhz", "surface_cz_base_acoustic_depth_s",
                "he_ii_ionisation_acoustic_depth_s");
        String[] row = lines.get(1).split(",", -1);

        String yaml = String.join("\n", Files.readString(dir.resolve("p.csv")).lines()
                .takeWhile(l -> l.startsWith("#")).skip(2).map(l -> l.substring(2)).toList());
        @SuppressWarnings("unchecked")
        Map<String, Object> meta = (Map<String, Object>) ((Map<String, Object>) new Load(LoadSettings.builder().build())
                .loadFromString(yaml)).get("meta");
        double pi0 = (Double) meta.get("buoyancy_period_pi0_s");
        double spacing = (Double) meta.get("period_spacing_l1_s");
        double largeSeparation = (Double) meta.get("large_separation_uhz");
        assertThat(row[header.indexOf("buoyancy_period_pi0_s")]).isEqualTo(CsvNumbers.format(pi0));
        assertThat(row[header.indexOf("period_spacing_l1_s")]).isEqualTo(CsvNumbers.format(spacing));
        assertThat(row[header.indexOf("large_separation_uhz")]).isEqualTo(CsvNumbers.format(largeSeparation));
        // this star has no convective envelope by the catalogue's rule, but a thin surface zone whose base is a
        // glitch: its depth is in the row and the meta alike, as is the helium dip's
        assertThat(row[header.indexOf("structure_class")]).isEqualTo("conv_core");
        for (String key : List.of("surface_cz_base_acoustic_depth_s", "he_ii_ionisation_acoustic_depth_s")) {
            assertThat(row[header.indexOf(key)]).as(key).isEqualTo(CsvNumbers.format((Double) meta.get(key)));
        }
        assertThat(pi0).isBetween(4150.0, 4250.0);

        CliHarness.Execution table = run("star", "--mass", "1.5", "--z", "0.02", "--age-gyr", "1");
        assertThat(table.code()).as(table.err()).isZero();
        assertThat(table.out()).contains(String.format(Locale.ROOT, "%.6g", pi0))
                .contains(String.format(Locale.ROOT, "%.6g", spacing))
                .contains(String.format(Locale.ROOT, "%-32s %.6g", "asymptotic Delta nu = 1/(2T)", largeSeparation));
    }
}
