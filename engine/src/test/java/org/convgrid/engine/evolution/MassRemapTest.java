package org.convgrid.engine.evolution;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.MassMesh;
import org.junit.jupiter.api.Test;

class MassRemapTest {

    @Test
    void hydrogenAndEverySpeciesAreConservedOntoACoarserAndAFinerMesh() {
        MassMesh from = TestMeshes.logit(400, -13, 28);
        Composition[] c = TestMeshes.burntCore(from);
        double[] before = TestMeshes.totals(from, c);
        for (MassMesh to : new MassMesh[] {TestMeshes.logit(251, -11, 20), TestMeshes.logit(777, -14, 30)}) {
            Composition[] remapped = MassRemap.remap(from, c, to);
            double[] after = TestMeshes.totals(to, remapped);
            for (int s = 0; s < before.length; s++) {
                // issue requirement: total hydrogen mass conserved across remapping to 1e-8 (relative)
                assertThat(after[s]).isCloseTo(before[s], within(1e-8 * before[s]));
            }
            // a first-order conservative remap creates no new extremes
            for (Composition x : remapped) {
                assertThat(x.h1()).isBetween(0.2 - 0.02 - 1e-12, 0.7 + 1e-12);
            }
            // the homogeneous envelope stays exactly homogeneous, surface cells included
            assertThat(remapped[to.size() - 1].h1()).isCloseTo(0.7, within(1e-13));
        }
    }

    @Test
    void remappingOntoTheSameMeshIsTheIdentity() {
        MassMesh mesh = TestMeshes.logit(200, -12, 25);
        Composition[] c = TestMeshes.burntCore(mesh);
        Composition[] same = MassRemap.remap(mesh, c, mesh);
        for (int k = 0; k < c.length; k++) {
            assertThat(same[k].h1()).isCloseTo(c[k].h1(), within(1e-14));
        }
    }
}
