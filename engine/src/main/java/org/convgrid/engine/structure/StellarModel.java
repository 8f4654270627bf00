package org.convgrid.engine.structure;

import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZoneFinder;
import org.convgrid.engine.convection.StructureClass;
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
        ZoneProfile zones = new ZoneProfile(p.mass(s), radius, p.masses(), p.radii(), p.stabilityExcesses(),
                p.convectiveVelocities(), p.pressureScaleHeights(), physics.convection().alpha());
        ConvectiveStructure convection = new ConvectiveZoneFinder().find(zones);
        double[] masses = p.masses();
        double[] radii = p.radii();
        double inertia = MomentOfInertia.outside(masses, radii, 0.0);
        GlobalProperties g = new GlobalProperties(lum, radius, teff, gravity, p.temperature(0), p.density(0),
                p.hydrogen(0), inertia, envelopeMomentOfInertia(convection, masses, radii, inertia));
        return new StellarModel(eq.state(y), p, g, convection, report);
    }

    /**
     * The convective envelope's moment of inertia, g cm^2: outside its base; the star's own ({@code whole}) when
     * fully convective; NaN without an envelope.
     */
    private static double envelopeMomentOfInertia(ConvectiveStructure convection, double[] masses, double[] radii,
                                                  double whole) {
        StructureClass kind = convection.structureClass();
        if (kind == StructureClass.FULLY_CONVECTIVE) {
            return whole;
        }
        double base = convection.envelopeBaseMassFraction();
        if ((kind != StructureClass.CONV_ENVELOPE && kind != StructureClass.CONV_CORE_AND_ENVELOPE)
                || Double.isNaN(base)) {
            return Double.NaN;
        }
        return MomentOfInertia.outside(masses, radii, Math.min(1.0, Math.max(0.0, base)) * masses[masses.length - 1]);
    }

    /** Total mass, g. */
    public double mass() {
        return state.mesh().totalMass();
    }
}
