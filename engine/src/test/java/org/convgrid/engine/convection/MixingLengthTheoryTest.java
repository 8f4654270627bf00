package org.convgrid.engine.convection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class MixingLengthTheoryTest {

    private static final double AC = Constants.A_RAD * Constants.C;
    private final MixingLengthTheory mlt = new MixingLengthTheory(1.8);

    /** Deep in a solar-like envelope: efficient convection. */
    private static LocalConvectionState deep() {
        return new LocalConvectionState(2.0e6, 0.2, 6.0e13, 5.0e4, 20.0, 3.3e8, 1.0, 0.6, 0.4, 0.4);
    }

    /** Just below a solar-like photosphere: inefficient convection. */
    private static LocalConvectionState shallow() {
        return new LocalConvectionState(1.0e4, 1.0e-7, 1.5e5, 2.74e4, 0.1, 1.0e9, 2.0, 5.0, 0.15, 0.15);
    }

    @Test
    void solutionObeysTheMixingLengthEquations() {
        // The defining relations of Böhm-Vitense (1958) as written by Kippenhahn, Weigert & Weiss (2012) ch. 7
        // (equation numbers from memory): v^2, the flux split and the element's radiative loss.
        for (LocalConvectionState s : new LocalConvectionState[] {deep(), shallow()}) {
            ConvectiveGradient r = mlt.gradient(s);
            double hp = s.pressure() / (s.density() * s.gravity());
            double lm = 1.8 * hp;
            assertThat(r.convective()).isTrue();
            assertThat(r.mixingLength()).isCloseTo(lm, within(1e-12 * lm));
            double dn = r.nabla() - r.nablaElement();
            double v2 = s.gravity() * s.delta() * dn * lm * lm / (8.0 * hp);
            assertThat(r.velocity() * r.velocity()).isCloseTo(v2, within(1e-10 * v2));
            double kRad = 4.0 * AC * Math.pow(s.temperature(), 4) / (3.0 * s.opacity() * s.density() * hp);
            double fConv = s.density() * s.cp() * s.temperature() * Math.sqrt(s.gravity() * s.delta()) * lm * lm
                    * Math.pow(dn, 1.5) / (4.0 * Math.sqrt(2.0) * Math.pow(hp, 1.5));
            assertThat(kRad * r.nabla() + fConv).isCloseTo(kRad * s.nablaRad(), within(1e-10 * kRad * s.nablaRad()));
            double lossRatio = 6.0 * AC * Math.pow(s.temperature(), 3)
                    / (s.opacity() * s.density() * s.density() * s.cp() * lm * r.velocity());
            // The differences of gradients near 0.4 carry rounding of ~1e-16 absolute: widen accordingly.
            double excess = r.nablaElement() - s.nablaAd();
            double rounding = 1e-15 * (1.0 / excess + 1.0 / dn);
            assertThat(excess / dn).isCloseTo(lossRatio, within((1e-9 + rounding) * lossRatio));
            assertThat(r.nabla()).isBetween(r.nablaElement(), s.nablaRad());
            assertThat(r.nablaElement()).isGreaterThan(s.nablaAd());
        }
    }

    @Test
    void deepEnvelopeIsNearlyAdiabaticAndPhotosphereNearlyRadiative() {
        // KWW 2012 ch. 7: efficient convection deep inside (nabla - nabla_ad ~ 1e-6 or less in the Sun, from
        // memory), strongly superadiabatic near the surface.
        MixingLengthSolution d = mlt.solve(deep());
        assertThat(d.efficiency()).isLessThan(1e-6);
        assertThat(d.gradient().nabla() - 0.4).isPositive().isLessThan(1e-5);
        MixingLengthSolution s = mlt.solve(shallow());
        assertThat(s.efficiency()).isGreaterThan(1.0);
        assertThat(s.gradient().nabla()).isGreaterThan(0.5 * (0.15 + 5.0));
    }

    @Test
    void efficientLimitHasNoCancellation() {
        // U -> 0: x^3 = (8U/9)(W - x^2 - 2Ux), so x = x0 (1 - (x0^2 + 2U x0)/(3W)) + O(x0^5), x0 = (8UW/9)^(1/3)
        // (derived from the mixing-length relations of Kippenhahn, Weigert & Weiss 2012, ch. 7).
        double w = 0.2;
        for (double u : new double[] {1e-30, 1e-18, 1e-12}) {
            double x0 = Math.cbrt(8.0 * u * w / 9.0);
            double expected = x0 * (1.0 - (x0 * x0 + 2.0 * u * x0) / (3.0 * w));
            assertThat(MixingLengthTheory.solveCubic(u, w)).isCloseTo(expected, within(1e-13 * expected));
        }
    }

    @Test
    void inefficientLimitHasNoCancellation() {
        // U -> infinity: 2Ux = W - x^2 - 9x^3/(8U), so x = (W/2U)(1 - W/(4U^2)) + O(U^-5) (derived).
        double w = 0.2;
        for (double u : new double[] {1e4, 1e9, 1e30}) {
            double expected = w / (2.0 * u) * (1.0 - w / (4.0 * u * u));
            assertThat(MixingLengthTheory.solveCubic(u, w)).isCloseTo(expected, within(1e-14 * expected));
        }
    }

    @Test
    void cubicRootAgreesWithBrentAcrossAllRegimes() {
        // Independent check with Commons Math's Brent solver on the same bracket (cubic derived from KWW 2012 ch. 7).
        BrentSolver brent = new BrentSolver(1e-15, 1e-300, 1e-300);
        int compared = 0;
        for (double lu = -12; lu <= 12; lu += 0.5) {
            for (double w : new double[] {1e-8, 1e-3, 0.1, 3.0, 1e3}) {
                double u = Math.pow(10.0, lu);
                double c = 8.0 * u / 9.0;
                double hi = w / (Math.sqrt(u * u + w) + u);
                if (!(hi * hi * hi + c * (hi * (hi + 2.0 * u) - w) > 0.0)) {
                    continue; // the bracket end rounds onto the root (U^2 >> W): covered by the limit tests
                }
                double ref = brent.solve(500, x -> x * x * x + c * (x * (x + 2.0 * u) - w), 0.0, hi);
                compared++;
                assertThat(MixingLengthTheory.solveCubic(u, w)).as("U=%s W=%s", u, w)
                        .isCloseTo(ref, within(1e-12 * ref));
            }
        }
        assertThat(compared).isGreaterThan(200);
    }

    @Test
    void derivativesMatchFiniteDifferences() {
        // Implicit differentiation checked by centred differences (derived, no published value).
        for (LocalConvectionState s : new LocalConvectionState[] {deep(), shallow()}) {
            MixingLengthSolution sol = mlt.solve(s);
            double h = 1e-5 * s.nablaRad();
            double fd = (nabla(with(s, s.nablaRad() + h, s.nablaAd(), s.opacity()))
                    - nabla(with(s, s.nablaRad() - h, s.nablaAd(), s.opacity()))) / (2 * h);
            assertThat(sol.dNablaDNablaRad()).isCloseTo(fd, within(1e-6 + 1e-5 * Math.abs(fd)));
            double ha = 1e-5 * s.nablaAd();
            double fdAd = (nabla(with(s, s.nablaRad(), s.nablaAd() + ha, s.opacity()))
                    - nabla(with(s, s.nablaRad(), s.nablaAd() - ha, s.opacity()))) / (2 * ha);
            assertThat(sol.dNablaDNablaAd()).isCloseTo(fdAd, within(1e-6 + 1e-5 * Math.abs(fdAd)));
            double e = 1e-5; // U is proportional to 1/kappa, so d ln U = -d ln kappa
            double fdU = -(nabla(with(s, s.nablaRad(), s.nablaAd(), s.opacity() * Math.exp(e)))
                    - nabla(with(s, s.nablaRad(), s.nablaAd(), s.opacity() * Math.exp(-e)))) / (2 * e);
            assertThat(sol.dNablaDLnU()).isCloseTo(fdU, within(1e-8 + 1e-5 * Math.abs(fdU)));
        }
    }

    @Test
    void stableLayersAreRadiative() {
        LocalConvectionState s = new LocalConvectionState(1e7, 10, 1e16, 1e5, 1, 3e8, 1, 0.3, 0.4, 0.4);
        MixingLengthSolution sol = mlt.solve(s);
        assertThat(sol.gradient().nabla()).isEqualTo(0.3);
        assertThat(sol.gradient().velocity()).isZero();
        assertThat(sol.gradient().convective()).isFalse();
        assertThat(sol.dNablaDNablaRad()).isEqualTo(1.0);
    }

    @Test
    void ledouxStableLayerWithSuperadiabaticRadiativeGradientStaysRadiative() {
        // nabla_ad < nabla_rad < nabla_L: semiconvective, treated as radiative here (KWW 2012 ch. 6).
        double nablaL = LedouxGradient.ledoux(0.4, 1.0, 1.0, 0.2);
        LocalConvectionState s = new LocalConvectionState(1e7, 10, 1e16, 1e5, 1, 3e8, 1, 0.5, 0.4, nablaL);
        ConvectiveGradient r = mlt.gradient(s);
        assertThat(r.convective()).isFalse();
        assertThat(r.nabla()).isEqualTo(0.5);
    }

    @Test
    void rejectsUnphysicalStates() {
        LocalConvectionState s = new LocalConvectionState(1e4, -1e-7, 1.5e5, 2.74e4, 1, 1e9, 2, 5, 0.15, 0.15);
        assertThatThrownBy(() -> mlt.gradient(s)).isInstanceOf(ConvgridException.class)
                .satisfies(e -> assertThat(((ConvgridException) e).kind()).isEqualTo(ErrorKind.OUT_OF_RANGE));
        assertThatThrownBy(() -> new MixingLengthTheory(0.0)).isInstanceOf(ConvgridException.class);
    }

    private double nabla(LocalConvectionState s) {
        return mlt.gradient(s).nabla();
    }

    private static LocalConvectionState with(LocalConvectionState s, double nablaRad, double nablaAd,
                                             double kappa) {
        return new LocalConvectionState(s.temperature(), s.density(), s.pressure(), s.gravity(), kappa, s.cp(),
                s.delta(), nablaRad, nablaAd, nablaAd);
    }
}
