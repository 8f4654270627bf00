package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

/**
 * The shipped OPAL GN93 tables (Iglesias &amp; Rogers 1996, ApJ 464, 943) with analytic edges and conduction,
 * without the low-temperature tables ({@link OpalGn93Opacity#withoutCoolTables()}; the default adds them, checked by
 * {@code FergusonTablesTest}). Contract (finite-difference derivatives) away from the joins, where the slope changes
 * by design:
 * points within 1e-3 dex of a table edge or of the end of a fade are left out.
 */
class OpalGn93OpacityTest extends OpacityContractTest {

    static final OpalGn93Opacity OPACITY = OpalGn93Opacity.withoutCoolTables();
    static final Opacity ANALYTIC = AnalyticCompositeOpacity.standardRadiative();
    static final Opacity CONDUCTION = new ElectronConduction();

    @Override
    Opacity opacity() {
        return OPACITY;
    }

    @Override
    double derivativeTolerance() {
        // C1 Hermite interpolant: the centred difference straddles curvature jumps at nodes (as for every table)
        return 2.0e-3;
    }

    @Override
    List<double[]> points() {
        List<double[]> p = new ArrayList<>();
        for (double[] q : super.points()) {
            double logT = Math.log10(q[1]);
            double logR = Math.log10(q[0]) - 3.0 * (logT - 6.0);
            Composition c = Composition.scaledSolar(q[2], q[3]);
            if (!nearJoin(OPACITY, logT, logR, c, 3.70)) {
                p.add(q);
            }
        }
        return p;
    }

    /**
     * Whether (log T, log R) lies within 1e-3 dex of where the analytic terms alone take over below the tables
     * ({@code fadeEndLogT}), of the end of the fade beyond log R (1.5), or of where the tables stop answering: the
     * joins whose slope changes by design, left out of the derivative contract.
     */
    static boolean nearJoin(OpalGn93Opacity opacity, double logT, double logR, Composition c, double fadeEndLogT) {
        boolean near = Math.abs(logT - fadeEndLogT) < 1e-3 || Math.abs(logR - 1.5) < 1e-3;
        for (double d = -1e-3; d <= 1e-3; d += 2e-3) {
            near |= opacity.tableAnswers(logT + d, logR, c) != opacity.tableAnswers(logT, logR, c)
                    || opacity.tableAnswers(logT, logR + d, c) != opacity.tableAnswers(logT, logR, c);
        }
        return near;
    }

    @Test
    void insideTheTablesTheRadiativePartIsTheTable() {
        // Iglesias & Rogers 1996, GN93hz table 73 (X = 0.70, Z = 0.02) at log T 5.30, log R -3.0: 1.540 (issue 14);
        // conduction in parallel moves it by far less than the table's last digit there
        Composition c = Composition.scaledSolar(0.70, 0.02);
        double t = Math.pow(10.0, 5.3);
        double rho = Math.pow(10.0, -3.0 + 3.0 * (5.3 - 6.0));
        assertThat(Math.log10(OPACITY.rosselandMean(rho, t, c).kappa())).isCloseTo(1.540, within(5e-4));
    }

    @Test
    void theCoolJoinIsContinuousAndTheAnalyticTermsAloneAnswerBelowIt() {
        // common practice: tables and analytic low-temperature terms joined continuously; the join is ours
        for (double x : new double[] {0.35, 0.70}) {
            Composition c = Composition.scaledSolar(x, 0.02);
            for (double logR = -7.9; logR < 1.0; logR += 0.7) {
                double above = logKappa(3.75 + 1e-9, logR, c);
                double below = logKappa(3.75 - 1e-9, logR, c);
                assertThat(below).as("X %s log R %s", x, logR).isCloseTo(above, within(1e-6));
                double logT = 3.70 - 1e-6;
                double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
                double t = Math.pow(10.0, logT);
                double a = ANALYTIC.rosselandMean(rho, t, c).kappa();
                double k = CONDUCTION.rosselandMean(rho, t, c).kappa();
                assertThat(logKappa(logT, logR, c)).isCloseTo(Math.log10(a * k / (a + k)), within(1e-12));
            }
        }
    }

    @Test
    void belowTheCoolFadeValueAndSlopesAreTheAnalyticTermsWithConduction() {
        // our join (no published source): beyond every fade the tables play no part, so kappa and both logarithmic
        // derivatives are those of the analytic radiative terms with conduction in parallel, up to the rounding of
        // ln rho and ln T taken from log10 (Kippenhahn, Weigert & Weiss 2012, opacity chapter, for the harmonic sum)
        for (OpalGn93Opacity opacity : new OpalGn93Opacity[] {OPACITY, OpalGn93Opacity.shipped()}) {
            // the analytic terms alone answer below log T 3.70 (OPAL alone) or 3.25 (with the cool set)
            double top = opacity.coolTable() == null ? 3.69 : 3.24;
            for (double x : new double[] {0.0, 0.70}) {
                Composition c = Composition.scaledSolar(x, 0.0188);
                for (double logT = 3.0; logT < top; logT += 0.07) {
                    for (double logR = -7.9; logR < 1.0; logR += 0.7) {
                        double t = Math.pow(10.0, logT);
                        double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
                        OpacityValue a = ANALYTIC.rosselandMean(rho, t, c);
                        OpacityValue k = CONDUCTION.rosselandMean(rho, t, c);
                        double wc = a.kappa() / (a.kappa() + k.kappa());
                        OpacityValue v = opacity.rosselandMean(rho, t, c);
                        String where = "X " + x + " log T " + logT + " log R " + logR;
                        assertThat(v.kappa() / (a.kappa() * k.kappa() / (a.kappa() + k.kappa())) - 1.0).as(where)
                                .isCloseTo(0.0, within(1e-12));
                        assertThat(v.dlnKappaDlnRho()).as(where).isCloseTo(wc * k.dlnKappaDlnRho()
                                + (1.0 - wc) * a.dlnKappaDlnRho(), within(1e-11));
                        assertThat(v.dlnKappaDlnT()).as(where).isCloseTo(wc * k.dlnKappaDlnT()
                                + (1.0 - wc) * a.dlnKappaDlnT(), within(1e-11));
                    }
                }
            }
        }
    }

    @Test
    void theDenseEdgeJoinIsContinuous() {
        // above log R = 1 and beside the blank hot, dense corner of the published tables (Iglesias & Rogers 1996)
        Composition c = Composition.scaledSolar(0.70, 0.02);
        for (double logT = 3.8; logT < 8.0; logT += 0.33) {
            double edge = OPACITY.table().answeredLogRLimit(logT, c.x(), c.z());
            double above = logKappa(logT, edge + 1e-9, c);
            double below = logKappa(logT, edge - 1e-9, c);
            assertThat(above).as("log T %s, edge log R %s", logT, edge).isCloseTo(below, within(1e-6));
        }
    }

    @Test
    void compositionsBeyondTheTablesUseTheNearestTable() {
        // documented behaviour: the table part is taken at the nearest tabulated composition
        double t = 2.2e6;
        double rho = 0.19;
        double z = OPACITY.table().metallicities()[OPACITY.table().metallicities().length - 1];
        double inside = OPACITY.rosselandMean(rho, t, Composition.scaledSolar(0.5, z)).kappa();
        double beyond = OPACITY.rosselandMean(rho, t, Composition.scaledSolar(0.5 * (1.0 - z - 0.05) / (1.0 - z),
                z + 0.05)).kappa();
        assertThat(beyond).isPositive().isFinite();
        assertThat(Math.log10(beyond / inside)).isCloseTo(0.0, within(0.05));
    }

    private static double logKappa(double logT, double logR, Composition c) {
        double rho = Math.pow(10.0, logR + 3.0 * (logT - 6.0));
        return Math.log10(OPACITY.rosselandMean(rho, Math.pow(10.0, logT), c).kappa());
    }
}
