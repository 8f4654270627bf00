package org.convgrid.engine.evolution;

import java.util.Arrays;

import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.structure.MassMesh;

/**
 * The radiative points of the atmosphere above a mixed zone that reaches the surface (its top within the surface
 * skin, {@link ConvectiveZoneFinder#reachesSurface}) are mixed with that zone. The temperature-optical depth
 * relation keeps the few outermost mesh points radiative (~1e-10 of the mass above the Sun's envelope); any
 * overshoot at the top of the envelope mixes so thin a layer at once, and the photosphere shows the envelope's
 * composition (common practice: surface abundances are those of the convective envelope; Kippenhahn, Weigert &amp;
 * Weiss 2012, ch. 30, for the instantaneous mixing of convective zones). Left unmixed, those points kept their
 * birth composition for the star's whole life: a jump in 3He, mu and the buoyancy frequency between the
 * envelope's top and the photosphere of every profile (1 Msun, Z = 0.02, 4.57 Gyr: 3He 3.5e-5 there against the
 * envelope's 7.7e-5), and, with settling, photospheric opacities of the unsettled gas. Stateless.
 */
final class AtmosphereMixing {

    private AtmosphereMixing() {
    }

    /**
     * The mixed flags with every point above the top of the outermost mixed run that ends below the surface set as
     * well, when that top reaches the surface skin; otherwise {@code mixed} itself. A lone mixed surface point above
     * such a run (a one-point surface zone) does not keep the radiative points between them apart.
     */
    static boolean[] joined(MassMesh mesh, boolean[] mixed) {
        int n = mixed.length;
        int top = n - 2;
        while (top >= 0 && !(mixed[top] && !mixed[top + 1])) {
            top--;
        }
        if (top < 0 || !ConvectiveZoneFinder.reachesSurface(
                1.0 - mesh.exteriorFraction(top), ConvectiveZoneFinder.DEFAULT_SURFACE_SKIN_MASS_FRACTION)) {
            return mixed;
        }
        boolean[] out = mixed.clone();
        Arrays.fill(out, top + 1, n, true);
        return out;
    }
}
