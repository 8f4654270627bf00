package org.convgrid.engine.zams;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Robustness: a thinned grid line converges everywhere when walked with homology seeding. */
class ZamsSweepTest {

    /** Masses in Msun, in grid order. Below ~0.12 Msun the standard physics puts Teff under its EOS range. */
    private static final double[] MASSES = {0.15, 0.25, 0.4, 0.6, 1.0, 1.6, 2.5, 5.0, 12.0, 30.0, 100.0};

    @ParameterizedTest
    @ValueSource(doubles = {1e-4, 0.02, 0.04})
    void everyMassOfALineConverges(double z) {
        Composition composition = ZamsFixtures.withHeliumRelation(z);
        ZamsTrack track = new ZamsTrack(new ZamsBuilder(ZamsFixtures.physics(composition)), composition);
        List<String> failures = new ArrayList<>();
        double previousLuminosity = 0.0;
        for (double m : MASSES) {
            ZamsResult r = track.solve(m * Constants.M_SUN);
            if (!r.converged()) {
                failures.add(m + " Msun: " + r.failure());
                continue;
            }
            double l = r.model().model().global().luminosity();
            // main-sequence luminosity rises monotonically with mass (any mass-luminosity relation)
            assertThat(l).as("L at %s Msun", m).isGreaterThan(previousLuminosity);
            previousLuminosity = l;
        }
        assertThat(failures).isEmpty();
    }
}
