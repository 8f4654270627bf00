package org.convgrid.engine.birth;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;

/**
 * A model's total energy, internal plus gravitational, sum of (u - G m / r) dm over the mesh points with trapezoid
 * weights: what the energy checks of tracks difference between two models, independently of the eps_grav the
 * evolution used (energy conservation, common practice).
 */
final class StarEnergy {

    private StarEnergy() {
    }

    static double total(StellarModel model, PhysicsSet physics) {
        StellarProfile p = model.profile();
        var mesh = model.state().mesh();
        double sum = 0.0;
        for (int k = 0; k < p.size(); k++) {
            double w = (k == 0 ? mesh.mass(0) : 0.0) + (k > 0 ? 0.5 * mesh.intervalMass(k - 1) : 0.0)
                    + (k < p.size() - 1 ? 0.5 * mesh.intervalMass(k) : 0.0);
            double u = physics.eos().atDensity(p.density(k), p.temperature(k), model.state().composition(k))
                    .internalEnergy();
            sum += w * (u - Constants.G * p.mass(k) / p.radius(k));
        }
        return sum;
    }
}
