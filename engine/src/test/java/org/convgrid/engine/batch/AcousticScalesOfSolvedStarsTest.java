package org.convgrid.engine.batch;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.request.SeismicScales;
import org.convgrid.engine.structure.HeliumIonisationDip;
import org.convgrid.engine.structure.ModelSeismicScales;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * The p-mode scales ({@link ModelSeismicScales}) of solved zero-age stars at Z = 0.02, Y = 0.2771 (the default helium
 * law of {@code convgrid star}), mixing length 1.8, against the large-separation scaling relation.
 */
class AcousticScalesOfSolvedStarsTest {

    /** The observed solar large separation, microHz (Kjeldsen &amp; Bedding 1995, A&amp;A 293, 87; from memory). */
    private static final double SOLAR_LARGE_SEPARATION_UHZ = 134.9;

    private static StellarModel zeroAge(double massMsun) {
        ModelRequest request = new ModelRequest("dnu", massMsun * Constants.M_SUN, 0.02, 0.2771,
                new Age.SinceZeroAge(0.0), PhysicsOptions.DEFAULT);
        return new GridRequests(StarTrackSink.NONE, MainSequenceEvolver.Settings.DEFAULT).answers(List.of(request))
                .get(0).model();
    }

    /** Delta nu over the square root of the mean density in solar units: the scaling relation's constant. */
    private static double scaledSeparationUhz(StellarModel star, SeismicScales scales) {
        double mass = star.mass() / Constants.M_SUN;
        double radius = star.global().radius() / Constants.R_SUN;
        return scales.largeSeparation() * 1e6 / Math.sqrt(mass / (radius * radius * radius));
    }

    @Test
    void solarLikeStarsFollowTheScalingRelationAFewPerCentAboveTheSun() {
        // Delta nu scales as the square root of the mean density (Ulrich 1986, ApJ 306, L37; Kjeldsen & Bedding
        // 1995), to a few per cent over solar-like stars (White et al. 2011, ApJ 743, 161; from memory); the
        // asymptotic 1 / (2 T) lies a few per cent above the separation of the frequencies themselves, which the
        // surface layers lower (Mosser et al. 2013, A&A 550, A126, about 4 % on the main sequence; from memory), and
        // our models stop at the photosphere, so the atmosphere's few tens of seconds of travel time are missing.
        for (double massMsun : new double[] {0.7, 1.0, 1.2}) {
            StellarModel star = zeroAge(massMsun);
            double scaled = scaledSeparationUhz(star, ModelSeismicScales.of(star));
            assertThat(scaled / SOLAR_LARGE_SEPARATION_UHZ).as("%.1f Msun: %.2f microHz", massMsun, scaled)
                    .isBetween(1.02, 1.07);
            // non-regression (measured 2026-12-05): 140.43 / 141.00 / 140.39 microHz, within 0.5 % of each other
            assertThat(scaled).isCloseTo(massMsun == 1.0 ? 141.00 : massMsun == 0.7 ? 140.43 : 140.39, within(0.3));
        }
    }

    @Test
    void theSurfaceZoneDepthIsMeasuredFromItsBaseOrTheCentreHoweverThinTheZone() {
        StellarModel sunLike = zeroAge(1.0);
        SeismicScales scales = ModelSeismicScales.of(sunLike);
        assertThat(sunLike.convection().structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
        // the sound slows towards the surface, so the outer 27 % of the radius holds over half the travel time
        // (common practice, no single source); non-regression, measured 2026-12-05: 1776.3 of 3076.5 s (0.58 T)
        assertThat(scales.surfaceZoneBaseAcousticDepth() / scales.acousticRadius()).isBetween(0.5, 0.65);
        assertThat(scales.surfaceZoneBaseAcousticDepth()).isCloseTo(1776.3, within(5.0));

        StellarModel fullyConvective = zeroAge(0.3);
        SeismicScales whole = ModelSeismicScales.of(fullyConvective);
        assertThat(fullyConvective.convection().structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        // one zone from the centre: no base, so no depth (not the acoustic radius, which would read as a feature)
        assertThat(whole.surfaceZoneBaseAcousticDepth()).isNaN();
        assertThat(whole.acousticRadius()).isPositive();
        assertThat(whole.buoyancyTravelTime()).isNaN();

        // an F star whose only surface zone, the hydrogen-ionisation layer, holds too little mass (~1e-8 of it) to be
        // the catalogue's envelope: its base is still a sharp feature of the sound speed, so its depth is given
        StellarModel thinSurfaceZone = zeroAge(1.5);
        SeismicScales hot = ModelSeismicScales.of(thinSurfaceZone);
        assertThat(thinSurfaceZone.convection().structureClass()).isEqualTo(StructureClass.CONV_CORE);
        assertThat(hot.surfaceZoneBaseAcousticDepth()).isPositive().isLessThan(0.1 * hot.acousticRadius());
    }

    @Test
    void aSunLikeStarsHeliumDipLiesWhereGlitchFitsOfTheSunPutIt() {
        ModelRequest request = new ModelRequest("he2", Constants.M_SUN, 0.02, 0.2771,
                new Age.SinceBirth(4.57 * Constants.GYR), PhysicsOptions.DEFAULT);
        StellarModel sunLike = new GridRequests(StarTrackSink.NONE, MainSequenceEvolver.Settings.DEFAULT)
                .answers(List.of(request)).get(0).model();
        double depth = ModelSeismicScales.of(sunLike).heliumSecondIonisationAcousticDepth();
        // the Sun's He II zone lies some 600-800 s below its surface in glitch analyses of its frequencies (Houdek &
        // Gough 2007, MNRAS 375, 861; Verma et al. 2017, ApJ 837, 47; range from memory), at T ~ 1e5 K, r ~ 0.98 R
        // (common practice: helium's second ionisation, 54.4 eV, at envelope densities; from memory)
        assertThat(depth).isBetween(550.0, 800.0);
        double dip = HeliumIonisationDip.radiusOf(sunLike);
        StellarProfile p = sunLike.profile();
        int k = 0;
        while (p.radius(k + 1) < dip) {
            k++;
        }
        assertThat(p.temperature(k)).isBetween(5.0e4, 2.0e5);
        assertThat(dip / p.radius(p.size() - 1)).isBetween(0.97, 0.99);
        // non-regression (measured 2026-12-05, mixing length 1.8, R = 1.014 Rsun): 630.9 s
        assertThat(depth).isCloseTo(630.9, within(5.0));
    }
}
