package org.convgrid.engine.physics.eos;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class FermiDiracTest {

    private static final double ACCURACY = 1e-10;

    @Test
    void matchesTheNonDegenerateSeriesAtEtaMinusFive() {
        // F_k = Gamma(k+1) sum (-1)^(n+1) e^(n eta)/n^(k+1), exact for eta < 0 (derived;
        // standard statistical mechanics). eta = -5 is inside the quadrature table, so this is an independent check.
        assertRelative(FermiDirac.minusHalf(-5.0), FermiDirac.series(-0.5, -5.0));
        assertRelative(FermiDirac.half(-5.0), FermiDirac.series(0.5, -5.0));
        assertRelative(FermiDirac.threeHalves(-5.0), FermiDirac.series(1.5, -5.0));
        assertRelative(FermiDirac.half(-2.37), FermiDirac.series(0.5, -2.37));
    }

    @Test
    void matchesTheSommerfeldExpansionAtEtaFifty() {
        // Sommerfeld expansion (Sommerfeld 1928, from memory; Abramowitz & Stegun 1964, 23.2.16 for zeta(2j));
        // at eta = 50 the neglected terms are ~1e-17. eta = 50 is inside the table.
        assertRelative(FermiDirac.minusHalf(50.0), FermiDirac.sommerfeld(-0.5, 50.0));
        assertRelative(FermiDirac.half(50.0), FermiDirac.sommerfeld(0.5, 50.0));
        assertRelative(FermiDirac.threeHalves(50.0), FermiDirac.sommerfeld(1.5, 50.0));
    }

    @Test
    void interpolatedValuesMatchDirectQuadratureBetweenNodes() {
        // The table against its own source, at points midway between nodes where Hermite errors peak.
        double[] q = new double[4];
        for (double eta : new double[] {-9.995, -3.0051, -0.4449, 0.0037, 1.2345, 4.5675, 12.3456, 33.3335, 69.9951}) {
            FermiDirac.quadrature(eta, q);
            assertRelative(FermiDirac.minusHalf(eta), q[0]);
            assertRelative(FermiDirac.half(eta), q[1]);
            assertRelative(FermiDirac.threeHalves(eta), q[2]);
        }
    }

    @Test
    void closedFormAtZeroAndDerivativeRelation() {
        // F_{1/2}(0) = Gamma(3/2) eta(3/2) = (sqrt(pi)/2)(1 - 2^(-1/2)) zeta(3/2), zeta(3/2) = 2.612375348685488
        // (Abramowitz & Stegun 1964, 23.2; the Dirichlet eta function identity).
        double expected = 0.5 * Math.sqrt(Math.PI) * (1.0 - Math.pow(2.0, -0.5)) * 2.612375348685488;
        assertRelative(FermiDirac.half(0.0), expected);
        // dF_{3/2}/deta = (3/2) F_{1/2} (derived under the integral), by centred differences.
        double h = 1e-4;
        double slope = (FermiDirac.threeHalves(3.3 + h) - FermiDirac.threeHalves(3.3 - h)) / (2 * h);
        assertThat(slope).isCloseTo(1.5 * FermiDirac.half(3.3), within(1e-8 * slope));
    }

    @Test
    void seriesAndSommerfeldTakeOverContinuouslyOutsideTheTable() {
        double[] out = new double[3];
        FermiDirac.all(-12.0, out);
        assertRelative(out[1], FermiDirac.series(0.5, -12.0));
        FermiDirac.all(80.0, out);
        assertRelative(out[2], FermiDirac.sommerfeld(1.5, 80.0));
        // No jump where the table hands over (series / Sommerfeld evaluated at the table edges).
        assertRelative(FermiDirac.half(FermiDirac.TABLE_MIN), FermiDirac.series(0.5, FermiDirac.TABLE_MIN));
        assertRelative(FermiDirac.half(FermiDirac.TABLE_MAX), FermiDirac.sommerfeld(0.5, FermiDirac.TABLE_MAX));
    }

    private static void assertRelative(double actual, double expected) {
        assertThat(actual).isCloseTo(expected, within(ACCURACY * Math.abs(expected)));
    }
}
