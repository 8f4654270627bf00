package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * The shipped low-temperature tables of Ferguson et al. 2005 (ApJ 623, 585; the GN93 set "f05.g93", Rosseland
 * means, log R -8 to +1 by 0.5), their transcription and their join to the OPAL tables (Iglesias &amp; Rogers 1996,
 * ApJ 464, 943) in {@link OpalGn93Opacity#shipped()}, the default.
 *
 * <p>The transcriptions (rows log T 4.50 down to 3.30 of seven published files, each row as published: log T then
 * 19 values of log10 kappa) are test resources under {@code reference/opacity/ferguson-transcribed/a} and
 * {@code /b}, typed twice, independently, from two separate reads of the published files. The one-off entry point
 * that writes the shipped resource from transcription a:
 * <pre>
 *   ./mvnw -q -B -ntp -o -pl engine test -Dtest=FergusonTablesTest -Dconvgrid.ferguson.write=true
 * </pre>
 */
class FergusonTablesTest {

    /** Published file names of the f05.g93 set and their (X, Z), as each file's first line states them. */
    static final String[] FILES = {"g7.0001", "g7.001", "g7.01", "g35.02", "g7.02", "g8.02", "g7.04"};
    static final double[][] COMPOSITIONS = {{0.70, 1e-4}, {0.70, 0.001}, {0.70, 0.01}, {0.35, 0.02}, {0.70, 0.02},
        {0.80, 0.02}, {0.70, 0.04}};
    static final int COLUMNS = 19;

    @Test
    void theTwoTranscriptionsAgreeCellByCell() {
        for (String file : FILES) {
            double[][] a = transcription("a", file);
            double[][] b = transcription("b", file);
            assertThat(b.length).as(file).isEqualTo(a.length);
            for (int i = 0; i < a.length; i++) {
                assertThat(b[i]).as("%s row %d", file, i).containsExactly(a[i]);
            }
        }
    }

    @Test
    void everyTranscribedRowIsSmoothAndTheRowsAreTheDocumentedOnes() {
        // a mistyped digit shows as a cell far from its neighbours; the published rows are smooth to 0.08 dex
        // (measured: largest deviation from the neighbours' mean, along the smoother of row and column, 0.074)
        for (String file : FILES) {
            double[][] t = transcription("a", file);
            assertThat(t.length).as(file).isEqualTo(41);
            assertThat(t[0][0]).isEqualTo(4.50);
            assertThat(t[t.length - 1][0]).isEqualTo(3.30);
            for (int i = 1; i < t.length; i++) {
                assertThat(t[i][0]).as("%s log T order", file).isLessThan(t[i - 1][0]);
            }
            for (int i = 1; i < t.length - 1; i++) {
                for (int j = 2; j < COLUMNS; j++) {
                    double alongT = Math.abs(t[i][j] - 0.5 * (t[i - 1][j] + t[i + 1][j]));
                    double alongR = Math.abs(t[i][j] - 0.5 * (t[i][j - 1] + t[i][j + 1]));
                    assertThat(Math.min(alongT, alongR)).as("%s log T %s column %d", file, t[i][0], j)
                            .isLessThan(0.1);
                }
            }
        }
    }

    @Test
    void theShippedTableHoldsEveryTranscribedCell() {
        TabulatedOpacity shipped = OpalGn93Opacity.readShippedCoolTable();
        assertThat(shipped.tableCount()).isEqualTo(FILES.length);
        assertThat(shipped.logR()).hasSize(COLUMNS);
        for (int f = 0; f < FILES.length; f++) {
            double[][] t = transcription("a", FILES[f]);
            int k = tableIndex(shipped, COMPOSITIONS[f][0], COMPOSITIONS[f][1]);
            for (double[] row : t) {
                int i = index(shipped.logTemperatures(), row[0]);
                for (int j = 0; j < COLUMNS; j++) {
                    assertThat(shipped.logR()[j]).isCloseTo(-8.0 + 0.5 * j, within(1e-12));
                    assertThat(shipped.logKappa(k, i, j)).as("%s log T %s column %d", FILES[f], row[0], j)
                            .isCloseTo(row[j + 1], within(1e-9));
                }
            }
        }
    }

    @Test
    void theJoinedOpacityReproducesThePublishedNodesBelowTheBlend() {
        // Ferguson et al. 2005 (ApJ 623, 585), f05.g93 tables, every node at log T <= 3.80 of the seven shipped
        // compositions; conduction in parallel is negligible at these densities (< 1e-4 dex)
        for (int f = 0; f < FILES.length; f++) {
            Composition c = composition(f);
            for (double[] row : transcription("a", FILES[f])) {
                if (row[0] > OpalGn93Opacity.BLEND_FROM_LOG_T + 1e-9) {
                    continue;
                }
                for (int j = 0; j < COLUMNS; j++) {
                    assertThat(logKappa(row[0], -8.0 + 0.5 * j, c)).as("%s log T %s column %d", FILES[f], row[0], j)
                            .isCloseTo(row[j + 1], within(0.005));
                }
            }
        }
    }

    @Test
    void theBlendToTheOpalTablesIsSmoothAndItsDerivativeConsistent() {
        // no jump larger than 0.02 dex along log T across the overlap log T 3.80-4.00, at every shipped composition
        double h = 5e-4;
        for (int f = 0; f < FILES.length; f++) {
            Composition c = composition(f);
            for (double logR = -8.0; logR <= 1.0 + 1e-9; logR += 0.25) {
                double previous = logKappa(3.70, logR, c);
                for (double logT = 3.70 + h; logT <= 4.10; logT += h) {
                    double now = logKappa(logT, logR, c);
                    assertThat(Math.abs(now - previous)).as("%s log R %s log T %s", FILES[f], logR, logT)
                            .isLessThan(0.02);
                    previous = now;
                }
                // off the nodes (a centred difference across a node straddles the Hermite curvature jump) and off
                // the edge columns (a step in T at fixed density leaves the table there)
                if (logR < -7.9 || logR > 0.9) {
                    continue;
                }
                for (double logT : new double[] {3.83, 3.915, 3.97}) {
                    double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
                    double t = Math.pow(10.0, logT);
                    double d = 1e-5;
                    double numeric = (Math.log(OpalGn93Opacity.shipped().rosselandMean(rho, t * Math.exp(d), c).kappa())
                            - Math.log(OpalGn93Opacity.shipped().rosselandMean(rho, t * Math.exp(-d), c).kappa())) / (2.0 * d);
                    assertThat(OpalGn93Opacity.shipped().rosselandMean(rho, t, c).dlnKappaDlnT()).as("%s log R %s log T %s", FILES[f],
                            logR, logT).isCloseTo(numeric, within(2e-3 * Math.max(1.0, Math.abs(numeric))));
                }
            }
        }
    }

    @Test
    void theTwoPublishedSetsAgreeWhereBothAnswerAndTheBlendRemovesTheirDifference() {
        // Ferguson et al. 2005 and Iglesias & Rogers 1996 are independent calculations with the same mixture; where
        // both are tabulated (log T 3.80-4.50) they should agree to a few tenths of a dex. The difference at
        // log T 4.00 (or 3.80) is the jump a switch without the blend would leave there; printed per composition.
        TabulatedOpacity opal = OpalGn93Opacity.shipped().table();
        double[] o = new double[3];
        for (int f = 0; f < FILES.length; f++) {
            Composition c = composition(f);
            double[][] t = transcription("a", FILES[f]);
            double atTop = 0.0;
            double atBottom = 0.0;
            double anywhere = 0.0;
            for (double[] row : t) {
                if (row[0] < 3.80 - 1e-9) {
                    continue;
                }
                for (int j = 0; j < COLUMNS; j++) {
                    assertThat(opal.interpolate(row[0], -8.0 + 0.5 * j, c.x(), c.z(), o))
                            .isEqualTo(TabulatedOpacity.ANSWERED);
                    double diff = Math.abs(row[j + 1] - o[0]);
                    anywhere = Math.max(anywhere, diff);
                    if (Math.abs(row[0] - 4.00) < 1e-9) {
                        atTop = Math.max(atTop, diff);
                    }
                    if (Math.abs(row[0] - 3.80) < 1e-9) {
                        atBottom = Math.max(atBottom, diff);
                    }
                }
            }
            System.out.printf(Locale.ROOT, "Ferguson minus OPAL, X = %.2f Z = %.4g: largest |difference| %.3f dex at"
                    + " log T 4.00, %.3f at 3.80, %.3f over log T 3.80-4.50%n", c.x(), c.z(), atTop, atBottom,
                    anywhere);
            assertThat(anywhere).as(FILES[f]).isLessThan(0.3);
        }
    }

    @Test
    void beyondLogROneAMetallicityJustOutsideTheTablesKeepsTheHeldOffset() {
        // documented behaviour (our join): above the cool set's log R = +1 the table-minus-analytic offset is held,
        // taken at the nearest tabulated composition; a Z a rounding error outside the tabulated 1e-4..0.04 (an
        // envelope whose 7Li, counted in Z, burns) must keep it. It did not before this check: Z = 1e-4 (1 - 1e-6)
        // lay 0.9-1.3 dex under Z = 1e-4 at log T 3.35-3.65, log R 2.0, and Z = 0.04 (1 + 1e-6) 0.4-0.8 dex
        // (measured), which gave 0.1 Msun at Z = 1e-4 two surfaces 250 K apart.
        double[][] edges = {{0.75, 1e-4, 1.0 - 1e-9}, {0.70, 0.04, 1.0 + 1e-9}, {0.75, 1e-4, 1.0 - 1e-6},
            {0.70, 0.04, 1.0 + 1e-6}};
        for (double[] e : edges) {
            Composition on = Composition.scaledSolar(e[0], e[1]);
            Composition off = Composition.scaledSolar(e[0], e[1] * e[2]);
            for (double logT = 3.35; logT < 3.80; logT += 0.05) {
                for (double logR = 1.2; logR < 3.0; logR += 0.4) {
                    assertThat(logKappa(logT, logR, off)).as("Z %s x %s, log T %s, log R %s", e[1], e[2], logT, logR)
                            .isCloseTo(logKappa(logT, logR, on), within(1e-5));
                }
            }
        }
    }

    @Test
    void belowTheCoolTablesTheAnalyticTermsTakeOverContinuously() {
        // common practice: tables and analytic low-temperature terms joined continuously; the join is ours
        Opacity analytic = AnalyticCompositeOpacity.standardRadiative();
        Opacity conduction = new ElectronConduction();
        for (int f = 0; f < FILES.length; f++) {
            Composition c = composition(f);
            for (double logR = -7.9; logR < 1.0; logR += 0.7) {
                assertThat(logKappa(3.30 - 1e-9, logR, c)).as("%s log R %s", FILES[f], logR)
                        .isCloseTo(logKappa(3.30 + 1e-9, logR, c), within(1e-6));
                double logT = 3.25 - 1e-6;
                double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
                double t = Math.pow(10.0, logT);
                double a = analytic.rosselandMean(rho, t, c).kappa();
                double k = conduction.rosselandMean(rho, t, c).kappa();
                assertThat(logKappa(logT, logR, c)).isCloseTo(Math.log10(a * k / (a + k)), within(1e-12));
            }
        }
    }

    @Test
    void writesTheShippedTableWhenAsked() throws IOException {
        assumeTrue(Boolean.getBoolean("convgrid.ferguson.write"), "-Dconvgrid.ferguson.write=true writes "
                + OpalGn93Opacity.COOL_RESOURCE);
        theTwoTranscriptionsAgreeCellByCell();
        everyTranscribedRowIsSmoothAndTheRowsAreTheDocumentedOnes();
        double[][] first = transcription("a", FILES[0]);
        int n = first.length;
        double[] logT = new double[n];
        for (int i = 0; i < n; i++) {
            logT[i] = first[n - 1 - i][0];
        }
        double[] logR = new double[COLUMNS];
        for (int j = 0; j < COLUMNS; j++) {
            logR[j] = -8.0 + 0.5 * j;
        }
        double[] x = new double[FILES.length];
        double[] z = new double[FILES.length];
        double[][][] kappa = new double[FILES.length][n][COLUMNS];
        List<String> comments = new ArrayList<>(List.of(
                "Ferguson et al. 2005, ApJ 623, 585:",
                "low-temperature Rosseland-mean opacities, Grevesse & Noels 1993 metal mixture (the set 'f05.g93',",
                "the same mixture as the OPAL GN93hz tables). Source: the published files, read as data (2026-12-02)",
                "from a public copy of the plain table files held in a non-stellar repository",
                "(github.com/Quacken8/MagneticDisconnectSimulator, new/simulace/OPAL/opacity_data/fergson/).",
                "Shipped: rows log T 3.30-4.50 (the published rows: 0.05 apart above 3.50, 0.01 below) of seven files;",
                "the published rows below log T 3.30 (to 2.70) and the other compositions are not shipped.",
                "Each file transcribed twice, independently, from two reads; the transcriptions are identical cell by",
                "cell and every cell lies within 0.1 dex of the mean of its neighbours along its row or column",
                "(FergusonTablesTest, which also wrote this file). Values copied as published (3 decimals).",
                "Files (X, Z):"));
        for (int f = 0; f < FILES.length; f++) {
            x[f] = COMPOSITIONS[f][0];
            z[f] = COMPOSITIONS[f][1];
            double[][] t = transcription("a", FILES[f]);
            for (int i = 0; i < n; i++) {
                double[] row = t[n - 1 - i];
                assertThat(row[0]).isEqualTo(logT[i]);
                System.arraycopy(row, 1, kappa[f][i], 0, COLUMNS);
            }
            comments.add(String.format(Locale.ROOT, "  %s.tron: X = %.2f, Z = %s", FILES[f], x[f], z[f]));
        }
        TabulatedOpacity table = new TabulatedOpacity("Ferguson et al. 2005 GN93 (f05.g93), log T 3.30-4.50", x, z,
                logT, logR, kappa);
        StringBuilder text = new StringBuilder();
        OpacityTableWriter.write(table, 3, text, comments.toArray(new String[0]));
        Files.writeString(Path.of("src/main/resources" + OpalGn93Opacity.COOL_RESOURCE), text,
                StandardCharsets.UTF_8);
    }

    /** Rows of one transcribed file, each {log T, 19 x log10 kappa}, in the published order (log T falling). */
    static double[][] transcription(String which, String file) {
        String resource = "/reference/opacity/ferguson-transcribed/" + which + "/" + file + ".tron";
        try (InputStream in = FergusonTablesTest.class.getResourceAsStream(resource)) {
            assertThat(in).as(resource).isNotNull();
            List<double[]> rows = new ArrayList<>();
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.isBlank()) {
                    continue;
                }
                String[] tokens = line.trim().split("\\s+");
                assertThat(tokens).as("%s: %s", resource, line).hasSize(COLUMNS + 1);
                double[] row = new double[tokens.length];
                for (int i = 0; i < tokens.length; i++) {
                    row[i] = Double.parseDouble(tokens[i]);
                }
                rows.add(row);
            }
            return rows.toArray(new double[0][]);
        } catch (IOException e) {
            throw new AssertionError(resource, e);
        }
    }

    private static Composition composition(int f) {
        return Composition.scaledSolar(COMPOSITIONS[f][0], COMPOSITIONS[f][1]);
    }

    private static int tableIndex(TabulatedOpacity t, double x, double z) {
        for (int k = 0; k < t.tableCount(); k++) {
            if (Math.abs(t.hydrogen(k) - x) < 1e-12 && Math.abs(t.metals(k) - z) < 1e-12) {
                return k;
            }
        }
        throw new AssertionError("no table at X = " + x + ", Z = " + z);
    }

    private static int index(double[] axis, double v) {
        for (int i = 0; i < axis.length; i++) {
            if (Math.abs(axis[i] - v) < 1e-9) {
                return i;
            }
        }
        throw new AssertionError("no node at " + v);
    }

    private static double logKappa(double logT, double logR, Composition c) {
        double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
        return Math.log10(OpalGn93Opacity.shipped().rosselandMean(rho, Math.pow(10.0, logT), c).kappa());
    }
}
