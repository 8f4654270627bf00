package org.convgrid.engine.calibration;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;

/**
 * The composition a model shows at its surface: that of its outermost convective point (the mixed envelope),
 * or of the surface point when the envelope is radiative. The photospheric points above the superadiabatic
 * layer are formally radiative and keep the initial composition, so they are not used when an envelope exists.
 */
final class EnvelopeComposition {

    private EnvelopeComposition() {
    }

    static Composition of(StellarModel model) {
        StellarProfile p = model.profile();
        for (int k = p.size() - 1; k >= 0; k--) {
            if (p.convective(k)) {
                return model.state().composition(k);
            }
        }
        return model.state().composition(p.size() - 1);
    }

    /** Z/X of a composition. */
    static double metalsToHydrogen(Composition c) {
        return c.z() / c.x();
    }
}
