package org.convgrid.engine.birth;

import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;

/**
 * The composition seen at the surface: that of the convective envelope when there is one, else that of the
 * outermost point. Above a convective envelope the mesh keeps a few radiative points of the atmosphere, holding
 * ~1e-10 of the mass, which convective mixing in this engine does not reach; their birth composition is not what
 * a spectrum would show, since any overshoot at the top of the envelope mixes such a thin layer at once (common
 * practice: surface abundances are those of the convective envelope). Stateless.
 */
final class SurfaceComposition {

    /** An outermost convective zone whose top lies above this m/M counts as the envelope. */
    static final double ENVELOPE_TOP = 0.99;

    private SurfaceComposition() {
    }

    static Composition of(StellarModel model) {
        StellarProfile p = model.profile();
        int last = p.size() - 1;
        double mass = model.mass();
        for (int k = last; k >= 0 && p.mass(k) / mass >= ENVELOPE_TOP; k--) {
            if (p.convective(k)) {
                return model.state().composition(k);
            }
        }
        return model.state().composition(last);
    }
}
