package org.convgrid.engine.birth;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/** Fully convective stars from birth: they stay fully convective, and their central hydrogen only falls. */
class LowMassBirthTest {

    private static final double MYR = BirthTracks.MYR;

    @Test
    void quarterSolarMassStaysFullyConvectiveFromBirthToOneGyr() {
        // stars below the fully convective limit (~0.35 Msun at solar Z: Chabrier & Baraffe 1997, A&A 327, 1039)
        // never build a radiative core (Baraffe et al. 2015, A&A 577, A42; from memory)
        BirthTrack t = BirthTracks.track(0.25, 0.02, 1000, 1.0, 1000);
        for (TrackPoint p : t.points()) {
            assertThat(p.step().convectiveZones()).hasSize(1);
            assertThat(p.step().convectiveZones().get(0).innerMassFraction()).isZero();
        }
        assertThat(t.events().radiativeCore()).isNaN();
        assertThat(t.events().radiativeCoreEnd()).isNaN();
        assertThat(t.models().get(0).model().convection().structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
    }

    @Test
    void threeTenthsSolarMassHasATransientRadiativeCore() {
        // Issue 15 asks that 0.3 Msun (Z = 0.02) stay fully convective from birth to 1 Gyr, as published standard
        // sets do (Baraffe et al. 2015, A&A 577, A42; from memory). Read from their table since (2026-12-05,
        // PublishedPreMainSequenceTracksTest): their 0.3 Msun track is not fully convective either, it has a
        // radiative core from 37.3-38.5 to 156.6-160.7 Myr, at most m/M 0.147, so the difference is the size and
        // end of ours (m/M 0.19, ~168 Myr below), not its existence. KNOWN DISCREPANCY, frozen, cause measured:
        // the centre of this contracting star is lit by contraction, not burning (at the onset, 38.7 Myr,
        // eps_nuc = 0.032 against eps_grav = 0.31 erg/g/s; 3He still at its birth value plus the burnt deuterium,
        // 7.7e-5), and nabla_rad/nabla_ad at the centre falls steadily as the star contracts (1.97 at 20 Myr, 1.24
        // at 30, 0.99 at 38) to 0.862 at 60-80 Myr, until pp burning, with 3He building up, lifts it back (0.91 at
        // 100, 1.23 at 150 Myr). CentralConvectionProbe checked each factor of the central nabla_rad:
        // - L(m)/m at the centre: eps_grav,c equals T_c (L - L_nuc)/integral(T dm), the value a fully convective
        //   (isentropic) star must have, to 0.03 % (0.3669 against 0.3670 at 30 Myr): the energy equation and its
        //   central point are right, and eps_grav,c = 1.84 L/M (an n = 1.5 polytrope gives 1.885);
        // - kappa: OPAL GN93 as published; the cubic interpolation lies 0.011 dex below bilinear interpolation
        //   between the nodes at the centre (log T 6.73-6.79, log R -0.67 to -0.65), where the table is convex in
        //   log T; conduction is negligible there;
        // - nabla_ad: 0.3966, the ideal-gas 0.4 less the Coulomb term (ideal gas plus the Debye-Hueckel free
        //   energy, classical electrons, gives 0.394 at these centres; Debye & Hueckel 1923, from memory); a lower
        //   nabla_ad favours convection, so the equation of state cannot make the core;
        // - eps_nuc: p + p -> 3He at its Q value (6.67 MeV net of the neutrino), 0.103 erg/g/s at 60 Myr against
        //   ~0.09 from the textbook pp-chain rate taken to 3He only with weak screening (2.38e6 rho X^2 T6^-2/3
        //   exp(-33.8 T6^-1/3) x 6.67/13.1 x 1.13; Kippenhahn, Weigert & Weiss 2012, ch. 18, from memory).
        // With our Z = 0.02 the centre physics puts the radiative-core onset of the published 0.7 and 1 Msun tracks
        // where they have it (nabla_rad/nabla_ad 0.99-1.00 at their first states with a core;
        // RadiativeCoreOnsetCentreTest); at their own Z (~0.015, from memory) it is 20 % more radiative, the size
        // of the shortfall here: the central opacity goes as ~Z^0.8, so which Z the comparison assumes decides it.
        // As a diagnosis only (CentralConvectionProbe -Dprobe.centreScale), the opacity above log T 6.3 raised by
        // 20 % shrinks this core to m/M 0.019 (48-88 Myr), raised by 30 % to 3e-4, below the 1e-3 core threshold.
        // Published models also show pre-main-sequence cores that 3He burning dissolves, but only in a narrow
        // window just above the fully convective limit (van Saders & Pinsonneault 2012, ApJ 751, 98; Baraffe &
        // Chabrier 2018, A&A 619, A177; from memory); ours reach down to
        // 0.26 Msun (0.25 Msun: none; 0.26: m/M 0.009 at most, ~70-100 Myr; 0.28: 0.088, 57-129 Myr; README) against a
        // zero-age fully convective limit of 0.3675 Msun (0.3388 since the low-temperature tables). Here: radiative centre from 37.9 to 115.1 Myr (first and
        // last step with it), up to m/M = 0.093. Not a numerical artefact: 1000 mesh points instead of 500 give the
        // same core (38.7-107.5 Myr, up to m/M = 0.090), so do all step limits halved (39.0-110.3 Myr).
        // Not the surface either: with the cool opacity raised by 0.4 dex below log T 3.70 (PreMainSequenceProbe
        // -Dprobe.mass=0.3 -Dprobe.coolDex=0.4) the star at 20 Myr matches the published 0.3 Msun model (Teff
        // 3402 K, R 0.567, L 0.0389 against 3392 K, 0.569, 0.038) and still grows its core at 41.3 Myr.
        BirthTrack t = BirthTracks.track(0.3, 0.02, 1000, 1.0, 1000);
        double largest = 0.0;
        double last = Double.NaN;
        for (TrackPoint p : t.points()) {
            var zones = p.step().convectiveZones();
            if (zones.get(0).innerMassFraction() > 0.0) {
                largest = Math.max(largest, zones.get(0).innerMassFraction());
                last = p.age();
            }
        }
        // re-frozen when the low-temperature tables of Ferguson et al. 2005 became the default opacity: the core
        // reaches m/M 0.194 (0.090 before; 0.15 was the bound), its onset 38.7 -> 39.4 Myr, and it lasts longer:
        // the last step with a radiative centre 115.1 -> 185.5 Myr; 185.5 -> 167.7 Myr when deuterium and 7Li
        // burnt with the trapezoid of the start- and end-of-step rates (LightElementBurning#corrected): one step
        // earlier on another step history (the steps there are 15-18 Myr and the core vanishes within one; to
        // 300 Myr, BirthTrackProbe, the last such step is at 181.1 / 186.5 / 187.9 Myr with every limit scaled by
        // 1 / 0.5 / 0.25). Frozen from our own runs: the core bound 0.02-0.25 set 2026-12-02 (commit 02cc0fb),
        // the onset 38.7 Myr 2026-12-02 (commit 0bcbb18; the text above gives 39.4 since, inside the 4 Myr), the
        // last step 167.7 Myr 2026-12-03 (commit 19b4f7a). Tolerances (our choice): 10 Myr on the last radiative-centre
        // step, under one step of the track there (15-18 Myr); 4 Myr on the onset, a tenth of its age; the core
        // bound spans the two opacity choices above
        assertThat(largest).isBetween(0.02, 0.25);
        assertThat(t.events().radiativeCore() / MYR).isCloseTo(38.7, within(4.0));
        assertThat(last / MYR).isCloseTo(167.7, within(10.0));
        assertThat(t.models().get(0).model().convection().structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        // the radiative core's end (life_events.csv radiative_core_end_myr, README): the first step of the star's
        // lasting return to full convection, one zone from the centre to the surface; the table had given
        // the core's appearance and nothing after, while the catalogue called the star fully convective again.
        // Checked against the track's own steps (its definition, not a physics value)
        double end = t.events().radiativeCoreEnd();
        assertThat(end).isGreaterThan(last);
        TrackPoint before = null;
        for (TrackPoint p : t.points()) {
            if (p.age() >= end) {
                assertThat(wholeStar(p)).as("fully convective at %.1f Myr", p.age() / MYR).isTrue();
            } else {
                before = p;
            }
        }
        assertThat(wholeStar(before)).as("fully convective at %.1f Myr", before.age() / MYR).isFalse();
    }

    /** One convective zone from the centre to the surface (within the catalogue's 1e-6 surface skin). */
    private static boolean wholeStar(TrackPoint p) {
        var zones = p.step().convectiveZones();
        return zones.size() == 1 && zones.get(0).innerMassFraction() == 0.0
                && zones.get(0).outerMassFraction() >= 1.0 - 1.0e-6;
    }

    @Test
    void centralHydrogenFallsFromBirthInTheTenthSolarMassStar() {
        // the zero-age models of fully convective stars start with 3He at equilibrium only where it burns, so
        // mixing then raises X_c (0.1 Msun, Z = 0.008: 0.7301 -> 0.7326); from birth, with uniform initial
        // abundances, hydrogen can only be burnt: X_c must never rise (it may rise only by mixing)
        BirthTrack t = BirthTracks.track(0.1, 0.008, 1000, 1.0, 1000);
        double previous = t.points().get(0).step().centralHydrogen();
        for (TrackPoint p : t.points()) {
            assertThat(p.step().centralHydrogen()).isLessThanOrEqualTo(previous + 1.0e-12);
            previous = p.step().centralHydrogen();
        }
        assertThat(t.points().get(t.points().size() - 1).age()).isEqualTo(1000.0 * MYR);
        // and it stays fully convective, burning: by 1 Gyr L_nuc supplies most of L (Chabrier & Baraffe 1997)
        TrackPoint end = t.points().get(t.points().size() - 1);
        assertThat(end.nuclearFraction()).isGreaterThan(0.5);
        assertThat(end.step().radius() / Constants.R_SUN).isBetween(0.09, 0.2);
    }
}
