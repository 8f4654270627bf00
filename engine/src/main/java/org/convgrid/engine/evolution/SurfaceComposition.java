package org.convgrid.engine.evolution;

import java.util.List;

import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;

/**
 * The composition seen at the surface: that of the convective envelope when there is one, else that of the
 * outermost point (common practice: surface abundances are those of the convective envelope). The envelope's
 * composition is read at the point nearest its middle in mass: the radiative atmosphere points above it hold it
 * too when its top reaches the surface skin ({@link AtmosphereMixing}), but an outermost zone whose top lies
 * between m/M {@value #ENVELOPE_TOP} and the skin still counts as the envelope here. Stateless.
 */
public final class SurfaceComposition {

    /** An outermost convective zone whose top lies above this m/M counts as the envelope. */
    public static final double ENVELOPE_TOP = 0.99;

    private SurfaceComposition() {
    }

    public static Composition of(StellarModel model) {
        List<ConvectiveZone> zones = model.convection().zones();
        int last = model.state().size() - 1;
        if (zones.isEmpty() || zones.get(zones.size() - 1).outerMassFraction() < ENVELOPE_TOP) {
            return model.state().composition(last);
        }
        // a point well inside the envelope: its edges move between steps, its middle was mixed last step too
        ConvectiveZone envelope = zones.get(zones.size() - 1);
        double middle = 0.5 * (envelope.innerMassFraction() + envelope.outerMassFraction());
        StellarProfile p = model.profile();
        double mass = model.mass();
        int best = last;
        for (int k = 0; k <= last; k++) {
            if (Math.abs(p.mass(k) / mass - middle) < Math.abs(p.mass(best) / mass - middle)) {
                best = k;
            }
        }
        return model.state().composition(best);
    }
}
