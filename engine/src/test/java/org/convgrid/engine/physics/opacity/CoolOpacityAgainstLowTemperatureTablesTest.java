package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * The opacities where pre-main-sequence photospheres sit (log T 3.60-3.80, log R -2 to 0.5: a 1 Msun star at
 * 1 Myr has its photosphere at log T = 3.674, log R = 0.28) against the published low-temperature Rosseland means of
 * Ferguson et al. 2005 (ApJ 623, 585), which include the molecules and atomic lines below 10^4 K: their GN93 table
 * for X = 0.70, Z = 0.02 (values read from the published table, the mixture of the OPAL tables shipped here). The
 * default opacity is those tables there; the OPAL tables without them (the start models' relaxation aid) leave the
 * analytic terms to answer below log T 3.70.
 */
class CoolOpacityAgainstLowTemperatureTablesTest {

    private static final Opacity DEFAULT = OpalGn93Opacity.shipped();
    private static final Opacity WITHOUT_COOL_TABLES = OpalGn93Opacity.withoutCoolTables();
    private static final Composition GAS = Composition.scaledSolar(0.70, 0.02);
    private static final double[] LOG_R = {-2.0, -1.0, 0.0, 0.5};

    /** Ferguson et al. 2005, GN93, X = 0.70, Z = 0.02: log10 kappa at LOG_R, one row per log T. */
    private static final double[] LOG_T = {3.80, 3.75, 3.70, 3.65, 3.60};
    private static final double[][] PUBLISHED = {
        {-1.047, -0.607, -0.074, 0.240},
        {-1.717, -1.203, -0.536, -0.139},
        {-2.330, -1.632, -0.786, -0.376},
        {-2.656, -1.810, -1.039, -0.691},
        {-2.779, -2.085, -1.453, -1.143},
    };

    private static double logKappa(Opacity opacity, double logT, double logR) {
        double t = Math.pow(10.0, logT);
        double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
        return Math.log10(opacity.rosselandMean(rho, t, GAS).kappa());
    }

    @Test
    void theDefaultIsThePublishedLowTemperatureTableThere() {
        // at log T <= 3.80 the Ferguson et al. 2005 tables alone answer (conduction is negligible at these densities);
        // 0.005 dex is the transcription check of the shipped tables
        for (int i = 0; i < LOG_T.length; i++) {
            for (int j = 0; j < LOG_R.length; j++) {
                assertThat(logKappa(DEFAULT, LOG_T[i], LOG_R[j])).as("log T %s, log R %s", LOG_T[i], LOG_R[j])
                        .isCloseTo(PUBLISHED[i][j], within(0.005));
            }
        }
    }

    @Test
    void insideTheOpalTablesBothPublishedSetsAgree() {
        // log T 3.75 and 3.80 are OPAL nodes (Iglesias & Rogers 1996); the two published sets overlap there and
        // differ by up to ~0.15 dex (Ferguson et al. 2005 add lines and molecules the OPAL tables leave out).
        // Measured: OPAL lower by 0.06-0.12 dex at these points, a third to a quarter of the shortfall below.
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < LOG_R.length; j++) {
                assertThat(logKappa(WITHOUT_COOL_TABLES, LOG_T[i], LOG_R[j]))
                        .as("log T %s, log R %s", LOG_T[i], LOG_R[j])
                        .isCloseTo(PUBLISHED[i][j], within(0.15));
            }
        }
    }

    @Test
    void withoutTheCoolTablesTheAnalyticTermsFallShortWherePreMainSequencePhotospheresSit() {
        // without the cool tables, below log T = 3.70 the analytic terms (H^-, Bell & Lin molecules) answer alone and
        // are 0.3-0.5 dex below the published tables at the photospheric log R of Hayashi-track stars; frozen, as it
        // is why the cool tables became the default: with the analytic terms the 1 Msun, Z = 0.02 track at 1 Myr was
        // at Teff 4715 K (Baraffe et al. 2015: 4377 K) and kept 10^-3.0 of its lithium at 1 Gyr (theirs 10^-0.51).
        // The deficits are frozen from our own run on 2026-12-02 (commit eb8053c); 0.005 dex as the check above.
        double[][] measuredDeficit = {
            {-0.012, 0.105, 0.318, 0.406},
            {0.138, 0.361, 0.487, 0.510},
            {0.396, 0.445, 0.423, 0.406},
        };
        for (int i = 2; i < LOG_T.length; i++) {
            for (int j = 0; j < LOG_R.length; j++) {
                double deficit = PUBLISHED[i][j] - logKappa(WITHOUT_COOL_TABLES, LOG_T[i], LOG_R[j]);
                assertThat(deficit).as("log T %s, log R %s", LOG_T[i], LOG_R[j])
                        .isCloseTo(measuredDeficit[i - 2][j], within(0.005));
            }
        }
    }
}
