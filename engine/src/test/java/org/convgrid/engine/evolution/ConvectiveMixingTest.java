package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.junit.jupiter.api.Test;

class ConvectiveMixingTest {

    @Test
    void mixingConservesEverySpeciesAndHomogenisesEachZone() {
        MassMesh mesh = TestMeshes.logit(300, -12, 25);
        Composition[] c = TestMeshes.burntCore(mesh);
        boolean[] convective = new boolean[mesh.size()];
        for (int k = 0; k < convective.length; k++) {
            double q = mesh.fraction(k);
            convective[k] = q < 0.15 || q > 0.8;   // a core and an envelope
        }
        Composition[] mixed = ConvectiveMixing.mix(mesh, c, convective);
        double[] before = TestMeshes.totals(mesh, c);
        double[] after = TestMeshes.totals(mesh, mixed);
        for (int s = 0; s < before.length; s++) {
            // conservation is exact in arithmetic; 1e-12 relative allows for rounding
            assertThat(after[s]).isCloseTo(before[s], within(1e-12 * Math.max(before[s], 1e-30)));
        }
        assertThat(mixed[0]).isEqualTo(mixed[1]);
        int lastCore = 0;
        while (convective[lastCore + 1]) {
            lastCore++;
        }
        assertThat(mixed[lastCore]).isEqualTo(mixed[0]);
        assertThat(mixed[lastCore + 1]).isEqualTo(c[lastCore + 1]);   // radiative point untouched
        // the mixed core hydrogen lies between its extremes
        assertThat(mixed[0].h1()).isBetween(c[0].h1(), c[lastCore].h1());
        assertThat(mixed[mesh.size() - 1].h1()).isCloseTo(0.7, within(1e-12));
    }
}
