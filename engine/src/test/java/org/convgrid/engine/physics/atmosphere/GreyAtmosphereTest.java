package org.convgrid.engine.physics.atmosphere;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

class GreyAtmosphereTest {

    private static final Composition SOLAR = Composition.scaledSolar(0.70, 0.02);

    @Test
    void constantOpacityMatchesTheOneStepPhotosphericPressure() {
        // Derived: with constant kappa and the Eddington T(tau) (Chandrasekhar 1935), P(2/3) =
        // (2/3)(g/kappa)[1 + kappa L/(4 pi c G M)] = (2/3)(g/kappa + sigma Teff^4/c); d ln P/d ln g and
        // d ln P/d ln Teff follow from the two terms.
        double[][] cases = {{5772, 27400, 0.3}, {30000, 1e4, 0.34}, {3200, 1e5, 1e-3}};
        for (double[] c : cases) {
            double teff = c[0];
            double g = c[1];
            double kappa = c[2];
            GreyAtmosphere atm = new GreyAtmosphere(new TestIdealGasEos(0.6), TestOpacities.constant(kappa));
            SurfaceCondition s = atm.at(teff, g, SOLAR);
            double gasTerm = 2.0 / 3.0 * g / kappa;
            double radTerm = 2.0 / 3.0 * Constants.SIGMA_SB * Math.pow(teff, 4) / Constants.C;
            double p = gasTerm + radTerm;
            assertThat(s.lnPressure()).as("Teff %s", teff).isCloseTo(Math.log(p), within(1e-4));
            assertThat(s.dlnPDlnG()).isCloseTo(gasTerm / p, within(1e-4));
            assertThat(s.dlnPDlnTeff()).isCloseTo(4 * radTerm / p, within(1e-4));
            assertThat(s.lnTemperature()).isCloseTo(Math.log(teff), within(1e-14)); // T = Teff at tau = 2/3
        }
    }

    @Test
    void sensitivitiesMatchFiniteDifferences() {
        // Variational equations vs centred differences (derived, no published value). At a tight step-size tolerance:
        // the check is of the equations, and at the default one the integration's own error (~1e-7 in ln P) divided
        // by the differencing step would swamp it.
        KrishnaSwamy ks = new KrishnaSwamy();
        double tight = 1e-10;
        for (GreyAtmosphere atm : new GreyAtmosphere[] {
                new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(), new EddingtonGrey(),
                        EddingtonGrey.HOPF, tight),
                new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(), ks, ks.photosphericDepth(),
                        tight)}) {
            for (double[] c : new double[][] {{5772, 27400}, {3500, 1e5}, {9000, 1e4}, {40000, 1e4}}) {
                SurfaceCondition s = atm.at(c[0], c[1], SOLAR);
                double e = 1e-4;
                double dT = (atm.at(c[0] * Math.exp(e), c[1], SOLAR).lnPressure()
                        - atm.at(c[0] * Math.exp(-e), c[1], SOLAR).lnPressure()) / (2 * e);
                double dG = (atm.at(c[0], c[1] * Math.exp(e), SOLAR).lnPressure()
                        - atm.at(c[0], c[1] * Math.exp(-e), SOLAR).lnPressure()) / (2 * e);
                assertThat(s.dlnPDlnTeff()).as("Teff %s", c[0]).isCloseTo(dT, within(1e-5));
                assertThat(s.dlnPDlnG()).as("Teff %s", c[0]).isCloseTo(dG, within(1e-5));
            }
        }
    }

    @Test
    void defaultToleranceStaysFarBelowTheTableInterpolationError() {
        // Consistency check against a tight integration (common practice, no published value): the nodes of the
        // atmosphere table must stay well below its own interpolation error, 3e-4 in ln P with this physics
        // (AtmosphereTable), here at least 30 times.
        KrishnaSwamy ks = new KrishnaSwamy();
        GreyAtmosphere atm = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(), ks,
                ks.photosphericDepth());
        GreyAtmosphere tight = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(), ks,
                ks.photosphericDepth(), 1e-11);
        for (double[] c : new double[][] {{2500, 1e5}, {3500, 1e5}, {5772, 27400}, {9000, 1e4}, {40000, 1e4}}) {
            SurfaceCondition s = atm.at(c[0], c[1], SOLAR);
            SurfaceCondition reference = tight.at(c[0], c[1], SOLAR);
            assertThat(s.lnPressure()).as("Teff %s", c[0]).isCloseTo(reference.lnPressure(), within(1e-5));
            assertThat(s.dlnPDlnTeff()).isCloseTo(reference.dlnPDlnTeff(), within(1e-3));
            assertThat(s.dlnPDlnG()).isCloseTo(reference.dlnPDlnG(), within(1e-4));
        }
    }

    @Test
    void densityIntegrationAgreesWithTheFormerGasPressureIntegration() {
        // Consistency check of two formulations of the same equations at a tight tolerance (common practice, no
        // published value): ln rho with forward EOS calls against ln P_gas with the EOS inverted at each call.
        KrishnaSwamy ks = new KrishnaSwamy();
        for (TemperatureTauRelation relation : new TemperatureTauRelation[] {new EddingtonGrey(), ks}) {
            GreyAtmosphere atm = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(), relation,
                    relation.photosphericDepth(), 1e-11);
            GasPressureGreyAtmosphere former = new GasPressureGreyAtmosphere(new TestIdealGasEos(1.3),
                    TestOpacities.blend(), relation, relation.photosphericDepth(), 1e-11);
            for (double[] c : new double[][] {{2500, 1e5}, {3500, 1e5}, {5772, 27400}, {9000, 1e4}, {40000, 1e4}}) {
                SurfaceCondition s = atm.at(c[0], c[1], SOLAR);
                SurfaceCondition reference = former.at(c[0], c[1], SOLAR);
                assertThat(s.lnPressure()).as("Teff %s", c[0]).isCloseTo(reference.lnPressure(), within(1e-9));
                assertThat(s.lnTemperature()).isEqualTo(reference.lnTemperature());
                assertThat(s.dlnPDlnTeff()).isCloseTo(reference.dlnPDlnTeff(), within(1e-7));
                assertThat(s.dlnPDlnG()).isCloseTo(reference.dlnPDlnG(), within(1e-7));
            }
        }
    }

    @Test
    void hMinusPhotosphereScalesWithGravityAsItsDensityExponent() {
        // Derived: with the H^- power law kappa = 2.5e-31 rho^(1/2) T^9 (Hansen, Kawaler & Trimble 2004 ch. 4)
        // and negligible radiation pressure, P^(1/2) dP ~ g dtau, so P ~ g^(2/3) exactly; the full test blend
        // is H^- dominated at 4000 K and stays close.
        GreyAtmosphere pure = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.powerLaw(2.5e-31, 0.5, 9));
        assertThat(pure.at(4000, 1e4, SOLAR).dlnPDlnG()).isCloseTo(2.0 / 3.0, within(1e-6));
        double ratio = pure.at(4000, 1e5, SOLAR).lnPressure() - pure.at(4000, 1e4, SOLAR).lnPressure();
        assertThat(ratio).isCloseTo(2.0 / 3.0 * Math.log(10), within(1e-5));
        GreyAtmosphere atm = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend());
        assertThat(atm.at(4000, 1e4, SOLAR).dlnPDlnG()).isCloseTo(2.0 / 3.0, within(0.05));
    }

    @Test
    void deeperFittingPointHasHigherPressureAndTemperature() {
        GreyAtmosphere photosphere = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend());
        GreyAtmosphere deep = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(),
                new EddingtonGrey(), 10.0);
        SurfaceCondition a = photosphere.at(5772, 27400, SOLAR);
        SurfaceCondition b = deep.at(5772, 27400, SOLAR);
        assertThat(b.lnPressure()).isGreaterThan(a.lnPressure());
        // T^4 = (3/4) Teff^4 (10 + 2/3) (Chandrasekhar 1935).
        assertThat(b.lnTemperature()).isCloseTo(Math.log(5772 * Math.pow(0.75 * (10 + 2.0 / 3.0), 0.25)),
                within(1e-13));
    }

    @Test
    void krishnaSwamyAtmosphereFitsAtItsPhotosphere() {
        KrishnaSwamy ks = new KrishnaSwamy();
        GreyAtmosphere atm = new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(), ks,
                ks.photosphericDepth());
        SurfaceCondition s = atm.at(5772, 27400, SOLAR);
        assertThat(s.lnTemperature()).isCloseTo(Math.log(5772), within(1e-12));
        // Shallower photosphere than Eddington's 2/3 means less overlying mass: lower pressure.
        assertThat(s.lnPressure()).isLessThan(new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend())
                .at(5772, 27400, SOLAR).lnPressure());
    }

    @Test
    void superEddingtonAtmosphereFails() {
        // kappa F/(g c) = 0.34 * 7.3e14 / (100 * 3e10) >> 1: radiation pressure exceeds gravity.
        GreyAtmosphere atm = new GreyAtmosphere(new TestIdealGasEos(0.6), TestOpacities.constant(0.34));
        assertThatThrownBy(() -> atm.at(60000, 100, SOLAR)).isInstanceOf(ConvgridException.class);
    }

    @Test
    void rejectsFittingDepthOutsideItsRange() {
        assertThatThrownBy(() -> new GreyAtmosphere(new TestIdealGasEos(1.3), TestOpacities.blend(),
                new EddingtonGrey(), 1e-5)).isInstanceOf(ConvgridException.class)
                .satisfies(e -> assertThat(((ConvgridException) e).kind()).isEqualTo(ErrorKind.OUT_OF_RANGE));
    }
}
