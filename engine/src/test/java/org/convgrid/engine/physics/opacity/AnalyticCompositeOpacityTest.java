package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class AnalyticCompositeOpacityTest extends OpacityContractTest {

    /** Largest allowed jump of ln kappa between neighbouring points 0.002 dex apart in T or rho. */
    static final double MAX_STEP_JUMP = 0.03;

    private final AnalyticCompositeOpacity composite = AnalyticCompositeOpacity.standard();

    @Override
    Opacity opacity() {
        return composite;
    }

    @Test
    void matchesPublishedSolarOpacitiesWithinStatedFactors() throws IOException {
        // Reference points and their sources/status: reference/opacity/solar-interior-opal.txt (OPAL/OP values,
        // partly from memory; the photospheric value is derived from the Eddington grey photosphere).
        for (String[] row : referenceRows()) {
            double t = Double.parseDouble(row[1]);
            double rho = Double.parseDouble(row[2]);
            Composition c = Composition.scaledSolar(Double.parseDouble(row[3]), Double.parseDouble(row[4]));
            double ref = Double.parseDouble(row[5]);
            double factor = Double.parseDouble(row[6]);
            double k = composite.rosselandMean(rho, t, c).kappa();
            assertThat(k).as("%s: kappa %s vs published %s", row[0], k, ref).isBetween(ref / factor, ref * factor);
        }
    }

    @Test
    void singleGuillotineWouldFailAtTheSolarCentre() {
        // formulas.md 2.3 (D): with t = 1 the Kramers terms give ~12 cm^2/g at the solar centre, ~10x OPAL's ~1.2
        // (from memory). This is the reason for the temperature-dependent guillotine.
        Opacity constant = new AnalyticCompositeOpacity(new ElectronScattering(), new KramersFreeFree(),
                new KramersBoundFree(1e9, 0.0, 50.0), new HydrogenMinus(), new MolecularOpacity(),
                new ElectronConduction());
        double k = constant.rosselandMean(150, 1.57e7, Composition.scaledSolar(0.35, 0.02)).kappa();
        assertThat(k).isBetween(9.0, 14.0);
    }

    @Test
    void continuousAcrossRegimeSwitches() {
        // Scan T at fixed R and rho at fixed T through every hand-over (molecules/H^-, H^-/Kramers, guillotine
        // knee, Kramers/scattering, radiation/conduction): no jump beyond what the local slope explains.
        Composition c = Composition.scaledSolar(0.7, 0.02);
        double step = 0.002 * Math.log(10.0);
        for (double logR = -7.0; logR <= 1.0; logR += 1.0) {
            for (double logT = 3.3; logT < 8.5; logT += 0.002) {
                double t = Math.pow(10.0, logT);
                double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
                OpacityValue a = composite.rosselandMean(rho, t, c);
                OpacityValue b = composite.rosselandMean(rho, t * Math.exp(step), c);
                double predicted = 0.5 * (a.dlnKappaDlnT() + b.dlnKappaDlnT()) * step;
                assertThat(Math.log(b.kappa() / a.kappa()) - predicted).as("T jump at logT %s logR %s", logT, logR)
                        .isBetween(-MAX_STEP_JUMP, MAX_STEP_JUMP);
                OpacityValue d = composite.rosselandMean(rho * Math.exp(step), t, c);
                double predictedRho = 0.5 * (a.dlnKappaDlnRho() + d.dlnKappaDlnRho()) * step;
                assertThat(Math.log(d.kappa() / a.kappa()) - predictedRho).as("rho jump at logT %s logR %s", logT, logR)
                        .isBetween(-MAX_STEP_JUMP, MAX_STEP_JUMP);
            }
        }
    }

    static List<String[]> referenceRows() throws IOException {
        List<String[]> rows = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(Objects.requireNonNull(
                AnalyticCompositeOpacityTest.class.getResourceAsStream("/reference/opacity/solar-interior-opal.txt")),
                StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    rows.add(line.trim().split("\\s+"));
                }
            }
        }
        assertThat(rows).hasSizeGreaterThanOrEqualTo(5);
        return rows;
    }
}
