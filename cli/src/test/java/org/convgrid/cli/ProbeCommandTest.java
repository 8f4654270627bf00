package org.convgrid.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

class ProbeCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return ConvgridMain.commandLine(new PrintWriter(out), new PrintWriter(err)).execute(args);
    }

    @Test
    void csvHasEveryConventionsColumnAtTheSolarCentre() {
        int code = run("probe", "--temp-k", "1.567e7", "--density-cgs", "152.9", "--x", "0.346", "--z", "0.0188",
                "--format", "csv");
        assertThat(code).isEqualTo(0);
        String[] lines = out.toString().split("\n");
        assertThat(lines).hasSize(2);
        List<String> header = Arrays.asList(lines[0].split(","));
        assertThat(header).containsSubsequence("temp_k", "density_cgs", "x", "z", "pressure_cgs",
                "gas_pressure_frac", "mu", "electrons_per_baryon", "nabla_ad", "gamma1", "cp_cgs", "chi_rho", "chi_t",
                "kappa_cgs", "eps_nuc_cgs", "eps_pp_cgs", "eps_cno_cgs", "degeneracy_eta");
        String[] row = lines[1].split(",");
        assertThat(row).hasSameSizeAs(header.toArray());
        // appended after every numeric column: which opacity tables answered (Z 0.0188 lies between table rows)
        assertThat(header).last().isEqualTo("opacity_source");
        assertThat(row[row.length - 1]).startsWith("opal-gn93hz.txt at Z 0.004/0.01/0.02/0.03 (interpolated to Z ");
        double eps = Double.parseDouble(row[header.indexOf("eps_nuc_cgs")]);
        // Bahcall, Serenelli & Basu 2005 (ApJ 621, L85) standard solar model centre: eps ~ 16.5 erg/g/s (+-25 %).
        assertThat(eps).isBetween(16.5 * 0.75, 16.5 * 1.25);
        // Same model: central pressure 2.357e17 dyn/cm^2.
        assertThat(Double.parseDouble(row[header.indexOf("pressure_cgs")])).isBetween(2.28e17, 2.43e17);
    }

    @Test
    void tableIsTheDefault() {
        assertThat(run("probe", "--temp-k", "1e6", "--density-cgs", "1", "--x", "0.7", "--z", "0.02")).isZero();
        assertThat(out.toString()).contains("nabla_ad").contains("kappa_cgs")
                .containsPattern("(?m)^opacity_source +opal-gn93hz.txt at Z ");
    }

    @Test
    void badArgumentsGetOneLineAndExitTwo() {
        assertThat(run("probe", "--temp-k", "1e6", "--density-cgs", "-1", "--x", "0.7", "--z", "0.02")).isEqualTo(2);
        assertThat(err.toString().strip().lines()).hasSize(1).first().asString().contains("--density-cgs");
        StringWriter e2 = new StringWriter();
        int code = ConvgridMain.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(e2))
                .execute("probe", "--temp-k", "1e6", "--density-cgs", "1", "--x", "0.95", "--z", "0.08");
        assertThat(code).isEqualTo(2);
        assertThat(e2.toString()).contains("X + Z");
        StringWriter e3 = new StringWriter();
        code = ConvgridMain.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(e3))
                .execute("probe", "--temp-k", "hot", "--density-cgs", "1", "--x", "0.7", "--z", "0.02");
        assertThat(code).isEqualTo(2);
        assertThat(e3.toString().strip().lines()).hasSize(1);
    }
}
