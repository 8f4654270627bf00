package org.convgrid.plotting.kippenhahn;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.util.List;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.Span;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackStep;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.junit.jupiter.api.Test;

/**
 * The burning region is hatched only where nuclear burning gives a real share of the luminosity. The shares below
 * are those of the demo run's 1 Msun, Z = 0.014 track (tracks/p0-z01-m004.csv, nuclear_lum_frac): deuterium burning
 * near 70 kyr (0.72), contraction at 1-10 Myr (5e-8 to 5e-4) with a burning region of m/M 0-0.6 all the same,
 * hydrogen from about 20 Myr (0.06, then 0.84).
 */
class BurningShareTest {

    private static final PhysicsKey PHYSICS = new PhysicsKey(1.8, 0.0, OvershootScheme.STEP,
            StabilityCriterion.SCHWARZSCHILD, 1.0);
    private static final TrackOrigin ORIGIN = new TrackOrigin("p0-z01-m004", 1.0, 0.014, PHYSICS);

    private static TrackStep step(double ageGyr, double burningTop, double nuclearShare) {
        return new TrackStep(ageGyr, "pre_main_sequence", 1.0, 1.0, 5000, 4.4, 1e7, 50, 0.7, 1.0,
                List.of(new Span(0.9, 1.0)), new Span(0.0, burningTop), nuclearShare, Double.NaN);
    }

    @Test
    void contractionWithATinyNuclearShareIsNotHatched() {
        Track track = new Track("p0-z01-m004", List.of(step(7.1e-5, 0.27, 0.72), step(6.4e-4, 0.36, 5.4e-8),
                step(2.4e-3, 0.35, 7.2e-5), step(6.2e-3, 0.55, 5.3e-4), step(2.2e-2, 0.51, 0.064),
                step(3.2e-2, 0.36, 0.84), step(5.5e-2, 0.41, 0.998)));
        KippenhahnData data = Kippenhahn.build(ORIGIN, track);
        assertThat(data.burning()).extracting(AgeRect::left).containsExactly(7.1e-5, 2.2e-2, 3.2e-2);
        assertThat(data.notes()).containsExactly(Kippenhahn.BURNING_NOTE);
    }

    @Test
    void aTrackWithoutTheShareKeepsEveryBurningRegionAndNoNote() {
        Track track = new Track("t", List.of(new TrackStep(0, "", 1, 1, 5000, 4.4, 1e7, 50, 0.7, 1.0, List.of(),
                new Span(0, 0.3)), new TrackStep(1, "", 1, 1, 5000, 4.4, 1e7, 50, 0.6, 1.0, List.of(),
                new Span(0, 0.3)), new TrackStep(2, "", 1, 1, 5000, 4.4, 1e7, 50, 0.5, 1.0, List.of(),
                new Span(0, 0.3))));
        KippenhahnData data = Kippenhahn.build(ORIGIN, track);
        assertThat(data.burning()).hasSize(2);
        assertThat(data.notes()).isEmpty();
    }

    @Test
    void theReaderGivesTheShareFromTheTrackFile() throws Exception {
        String text = "age_gyr,phase,luminosity_lsun,radius_rsun,teff_k,log_g_cgs,central_temp_k,central_density_cgs,"
                + "central_h_frac,surface_li_rel,central_cz_top_mass_frac,env_cz_base_mass_frac,conv_zone_count,"
                + "burning_inner_mass_frac,burning_outer_mass_frac,nuclear_lum_frac,time_step_yr,solver_iterations\n"
                + "0.00242185,pre_main_sequence,1.2,1.5,4500,4.1,6e6,5,0.7179,1.0,,0.3,1,0.0,0.3460563,7.185845e-05,"
                + "1000,5\n";
        List<TrackStep> steps = TrackReader.read(new StringReader(text));
        assertThat(steps.get(0).nuclearLuminosityFrac()).isEqualTo(7.185845e-05);
    }
}
