package org.convgrid.engine.structure;

import org.convgrid.engine.batch.GlobalProperties;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.convection.MixingLengthTheory;
import org.convgrid.engine.convection.ZoneProfile;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.units.Constants;

/**
 * A converged stellar model: its state (the unknowns and composition on the mesh), the per-shell profile,
 * the global properties, the convective zones and the solve report. Immutable.
 *
 * @param state the solved unknowns
 * @param profile per-shell quantities
 * @param global surface and central properties (centre = innermost mesh point, m/M ~ 1e-6)
 * @param convection the convective zones, found by {@link ConvectiveZoneFinder} with its defaults
 * @param report the last relaxation's report
 */
public record StellarModel(ModelState state, StellarProfile profile, GlobalProperties global,
                           ConvectiveStructure convection, SolveReport report) {

    /** Builds the model from a system whose last evaluation was at {@code y}. */
    static StellarModel of(StructureEquations eq, double[] y, SolveReport report, PhysicsSet physics) {
        StellarProfile p = new StellarProfile(eq, y);
        int s = p.size() - 1;
        double radius = p.radius(s);
        double lum = p.luminosity(s);
        double teff = Math.pow(lum / (4.0 * Math.PI * radius * radius * Constants.SIGMA_SB), 0.25);
        double gravity = Constants.G * p.mass(s) / (radius * radius);
        GlobalProperties g = new GlobalProperties(lum, radius, teff, gravity, p.temperature(0), p.density(0),
                p.hydrogen(0));
        ZoneProfile zones = new ZoneProfile(p.mass(s), radius, p.masses(), p.radii(), p.stabilityExcesses(),
                p.convectiveVelocities(), p.pressureScaleHeights(), mixingLengthAlpha(physics, eq, p));
        return new StellarModel(eq.state(y), p, g, new ConvectiveZoneFinder().find(zones), report);
    }

    /**
     * The mixing-length parameter: from {@link MixingLengthTheory} when that is the convection model, otherwise
     * read off a convective point (l_m / H_P), otherwise 1 (then no turnover time is computed anyway).
     */
    private static double mixingLengthAlpha(PhysicsSet physics, StructureEquations eq, StellarProfile p) {
        if (physics.convection() instanceof MixingLengthTheory mlt) {
            return mlt.alpha();
        }
        for (int k = 0; k < eq.points(); k++) {
            var g = eq.convectionAt(k);
            if (g != null && g.convective() && g.mixingLength() > 0.0) {
                return g.mixingLength() / p.pressureScaleHeight(k);
            }
        }
        return 1.0;
    }

    /** Total mass, g. */
    public double mass() {
        return state.mesh().totalMass();
    }
}
