package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/** Zero-age models with the standard physics against published stellar models. */
class ZeroAgeModelsTest {

    @Test
    void oneSolarMassHasARadiativeCoreAndAConvectiveEnvelope() {
        ZamsModel z = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, 1.0);
        GlobalProperties g = z.model().global();
        ConvectiveStructure c = z.model().convection();

        // zero-age Sun ~0.70 Lsun (Sackmann, Boothroyd & Kraemer 1993, ApJ 418, 457; Gough 1981 gives 0.714),
        // accepted range 0.62-0.80 for analytic physics
        assertThat(g.luminosity() / Constants.L_SUN).isBetween(0.62, 0.80);
        // zero-age solar radius ~0.89 Rsun (from memory; loose)
        assertThat(g.radius() / Constants.R_SUN).isBetween(0.75, 1.0);
        // Teff from L and R by definition (Stefan-Boltzmann)
        assertThat(g.luminosity()).isCloseTo(4 * Math.PI * g.radius() * g.radius() * Constants.SIGMA_SB
                * Math.pow(g.effectiveTemperature(), 4), within(1e-9 * g.luminosity()));
        // central temperature of zero-age solar models 1.3-1.4e7 K (from memory; loose)
        assertThat(g.centralTemperature()).isBetween(1.1e7, 1.5e7);
        assertThat(c.structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
        // present Sun r_cz = 0.713 R (Basu & Antia 1997); the zero-age envelope is similar (from memory; loose)
        assertThat(c.envelopeBaseRadiusFraction()).isBetween(0.6, 0.8);
        // zero age: the centre keeps the initial X = 0.7062 apart from the little hydrogen moved into 3He and
        // 14N by the equilibrium abundances (by definition of the zero-age model)
        assertThat(g.centralHydrogen()).isCloseTo(0.7062, within(1e-3));
    }

    @Test
    void oneSolarMassNonRegression() {
        // frozen from this code with the standard physics (not a published value): a change of the physics
        // that moves these must be re-validated against the published checks above on purpose.
        // Re-frozen after the opacity was corrected to the OPAL tables (ReferenceCorrectedOpacity) and the default
        // atmosphere became Krishna Swamy's: L 0.6385 -> 0.7378, R 0.8210 -> 0.8789, Tc 1.315e7 -> 1.348e7 K;
        // before that the two-term H^- opacity had moved R 0.7911 -> 0.8210, L 0.6572 -> 0.6385. Re-frozen when the
        // low-temperature tables of Ferguson et al. 2005 became the default opacity (alpha 1.8 here, calibrated with
        // the analytic cool terms; the solar calibration with the tables gives 2.092): L 0.7378 -> 0.7322, R 0.8789
        // -> 0.9109, Tc 1.3480e7 -> 1.3459e7 K. Frozen from our own run, last set 2026-12-02 (commit 02cc0fb).
        // Tolerances (our choice): 2-3 % in L and R, 1.5 % in T_c, far above what mesh, step or round-off changes
        // move them (<= 1e-4 relative in the changes recorded since), near the size of the physics changes above.
        GlobalProperties g = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, 1.0).model().global();
        assertThat(g.luminosity() / Constants.L_SUN).isCloseTo(0.7322, within(0.02));
        assertThat(g.radius() / Constants.R_SUN).isCloseTo(0.9109, within(0.02));
        assertThat(g.centralTemperature()).isCloseTo(1.3459e7, within(0.02e7));
    }

    @Test
    void aFifthOfASolarMassIsFullyConvectiveAtLowMetallicity() {
        // stars below ~0.35 Msun are fully convective (Chabrier & Baraffe 1997, A&A 327, 1039; threshold quoted
        // by van Saders & Pinsonneault 2012, ApJ 751, 98), the limit moving mildly lower at low Z (from memory)
        ConvectiveStructure c = ZamsFixtures.model(ZamsFixtures.withHeliumRelation(1e-4), 0.2).model()
                .convection();
        assertThat(c.structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        assertThat(c.coreMassFraction()).isEqualTo(1.0);
        assertThat(c.envelopeBaseMassFraction()).isEqualTo(0.0);
    }

    @Test
    void aFifthOfASolarMassIsFullyConvectiveAtSolarMetallicity() {
        // Chabrier & Baraffe 1997, A&A 327, 1039: fully convective below ~0.35 Msun
        ZamsModel z = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, 0.2);
        ConvectiveStructure c = z.model().convection();
        assertThat(c.structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        // Baraffe et al. 1998 (A&A 337, 403) zero-age 0.2 Msun: R ~0.21 Rsun, Teff ~3200-3300 K (from memory);
        // a grey atmosphere makes M dwarfs a few hundred K too hot (Chabrier & Baraffe 1997), hence the loose
        // upper bound on Teff
        GlobalProperties g = z.model().global();
        assertThat(g.radius() / Constants.R_SUN).isBetween(0.18, 0.25);
        assertThat(g.effectiveTemperature()).isBetween(3000.0, 3800.0);
    }

    @Test
    void sixTenthsOfASolarMassHasARadiativeCoreAndAConvectiveEnvelope() {
        // 0.4-1.2 Msun: radiative core and convective envelope (Oxford Dictionary of Astronomy, "core"); the
        // envelope deepens with decreasing mass (from memory: base near m/M ~ 0.7-0.8 at 0.6 Msun; loose)
        ConvectiveStructure c = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, 0.6).model().convection();
        assertThat(c.structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
        assertThat(c.coreMassFraction()).isEqualTo(0.0);
        assertThat(c.envelopeBaseMassFraction()).isBetween(0.6, 0.9);
    }

    @Test
    void threeSolarMassesHaveAConvectiveCoreAndARadiativeEnvelope() {
        ConvectiveStructure c = ZamsFixtures.model(ZamsFixtures.PROTOSOLAR, 3.0).model().convection();
        // convective core of 15-30 % of the mass at 3 Msun (from memory; loose)
        assertThat(c.coreMassFraction()).isBetween(0.15, 0.30);
        // the envelope is radiative apart from thin ionisation layers under the photosphere
        assertThat(c.envelopeMass() / Constants.M_SUN).isLessThan(1e-6);
        assertThat(c.structureClass()).isEqualTo(StructureClass.CONV_CORE);
    }
}
