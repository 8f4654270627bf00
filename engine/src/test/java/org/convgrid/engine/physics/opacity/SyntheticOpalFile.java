package org.convgrid.engine.physics.opacity;

import java.util.Locale;
import org.convgrid.engine.state.Composition;

/**
 * A stand-in with the full layout of the published GN93hz file (Iglesias &amp; Rogers 1996): its 126 compositions
 * in its order (X = 0, 0.1, 0.2, 0.35, 0.5, 0.7, 0.8 at 13 Z; 0.9 at Z &lt;= 0.08; 0.95 at Z &lt;= 0.04; X = 1 - Z at
 * every Z), its 70 log T rows and 19 log R columns, "9.999" cells at the cool, thin corner of the X = 0 tables and
 * blank right-hand columns at high log T, but values from our analytic composite: synthetic data for testing the
 * converter and the interpolation on the full layout, never shipped.
 */
final class SyntheticOpalFile {

    static final double[] METALS = {0.0, 1e-4, 3e-4, 1e-3, 2e-3, 4e-3, 0.01, 0.02, 0.03, 0.04, 0.06, 0.08, 0.1};
    static final double[] HYDROGEN = {0.0, 0.1, 0.2, 0.35, 0.5, 0.7, 0.8, 0.9, 0.95};

    private SyntheticOpalFile() {
    }

    static double[] logTemperatures() {
        double[] t = new double[70];
        for (int i = 0; i < 46; i++) {
            t[i] = 3.75 + 0.05 * i;
        }
        for (int i = 0; i < 21; i++) {
            t[46 + i] = 6.1 + 0.1 * i;
        }
        t[67] = 8.3;
        t[68] = 8.5;
        t[69] = 8.7;
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.round(t[i] * 100.0) / 100.0;
        }
        return t;
    }

    /** Blank columns at the right end of the row at log T (the published tables' hot, dense corner, roughly). */
    static int blankColumns(double logT) {
        return logT < 7.15 ? 0 : logT < 7.25 ? 1 : logT < 7.45 ? 2 : logT < 7.85 ? 3 : logT < 8.2 ? 4
                : logT < 8.4 ? 5 : logT < 8.6 ? 6 : 7;
    }

    static String text() {
        Opacity source = AnalyticCompositeOpacity.standardRadiative();
        StringBuilder raw = new StringBuilder(1 << 21);
        raw.append("Synthetic stand-in, layout of the GN93hz file; values from the analytic composite\n\n");
        int number = 0;
        for (int ix = 0; ix <= HYDROGEN.length; ix++) {
            for (double z : METALS) {
                double x;
                if (ix == HYDROGEN.length) {
                    x = 1.0 - z;
                } else {
                    x = HYDROGEN[ix];
                    boolean absent = (x == 0.9 && z > 0.08) || (x == 0.95 && z > 0.04);
                    if (absent) {
                        continue;
                    }
                }
                number++;
                appendTable(raw, number, x, z, source);
            }
        }
        return raw.toString();
    }

    private static void appendTable(StringBuilder raw, int number, double x, double z, Opacity source) {
        raw.append(String.format(Locale.ROOT, "TABLE #%3d     $G&N'93 Solar$     X=%.4f Y=%.4f Z=%.4f dXc=0.0000"
                + " dXo=0.0000%n%n                                                 log R%n%n", number, x,
                Math.max(0.0, 1.0 - x - z), z));
        raw.append("logT");
        for (int j = 0; j < 19; j++) {
            raw.append(String.format(Locale.ROOT, "%7.1f", -8.0 + 0.5 * j));
        }
        raw.append("\n\n");
        Composition c = Composition.scaledSolar(x, z);
        for (double logT : logTemperatures()) {
            raw.append(String.format(Locale.ROOT, "%4.2f", logT));
            for (int j = 0; j < 19 - blankColumns(logT); j++) {
                double logR = -8.0 + 0.5 * j;
                double value;
                if (x == 0.0 && logT < 3.8 && logR < -4.0) {
                    value = OpalFileConverter.RAW_NOT_IN_TABLE;
                } else {
                    double t = Math.pow(10.0, logT);
                    value = Math.log10(source.rosselandMean(Math.pow(10.0, logR + 3.0 * logT - 18.0), t, c).kappa());
                }
                raw.append(String.format(Locale.ROOT, "%7.3f", value));
            }
            raw.append('\n');
        }
        raw.append('\n');
    }
}
