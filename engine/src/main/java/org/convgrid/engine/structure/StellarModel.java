package org.convgrid.engine.structure;

import org.convgrid.engine.batch.GlobalProperties;
import org.convgrid.engine.units.Constants;

/**
 * A converged stellar model: its state (the unknowns and composition on the mesh), the per-shell profile,
 * the global properties and the solve report. Immutable.
 *
 * @param state the solved unknowns
 * @param profile per-shell quantities
 * @param global surface and central properties
 * @param report the last relaxation's report (its iteration count covers every relaxation of this model)
 */
public record StellarModel(ModelState state, StellarProfile profile, GlobalProperties global,
                           SolveReport report) {

    /** Builds the model from a system whose last evaluation was at {@code y}. */
    static StellarModel of(StructureEquations eq, double[] y, SolveReport report) {
        StellarProfile p = new StellarProfile(eq, y);
        int s = p.size() - 1;
        double radius = p.radius(s);
        double lum = p.luminosity(s);
        double teff = Math.pow(lum / (4.0 * Math.PI * radius * radius * Constants.SIGMA_SB), 0.25);
        double gravity = Constants.G * p.mass(s) / (radius * radius);
        GlobalProperties g = new GlobalProperties(lum, radius, teff, gravity, p.temperature(0), p.density(0),
                p.hydrogen(0));
        return new StellarModel(eq.state(y), p, g, report);
    }

    /** Total mass, g. */
    public double mass() {
        return state.mesh().totalMass();
    }
}
