package org.convgrid.engine.evolution;

import java.util.Arrays;

import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.EosCurvature;
import org.convgrid.engine.structure.MassMesh;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.ModelState;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;

/**
 * The previous model as a time step needs it, on the mesh the step will use: the state (starting guess), the density,
 * temperature and P of every point (for the network and for eps_grav; ln P, for nabla_mu, on demand), its specific
 * internal energy (for eps_grav) and which points are convective (for mixing). Either the converged model itself (P and
 * u from the equation-of-state call of its last evaluation, so a step costs no call of its own), or the model moved
 * onto a new mesh: structure interpolated by {@link MeshPlanner}, composition remapped conservatively by {@link
 * MassRemap}, pressure and internal energy recomputed from the interpolated density and temperature, convective flags
 * from the nearest old point. With them, the equation of state's whole answer at every point (the model's own, or the
 * recomputed one), from which the step's structure solve starts its first equation-of-state solves, and, on the model's
 * own mesh, the equation-of-state second derivatives its Jacobian last used (null after a remesh), which the step's
 * solve reuses at points that moved little.
 */
record StepStart(ModelState state, double[] density, double[] temperature, double[] pressure,
                 double[] internalEnergy, boolean[] convective, EosState[] eos, EosCurvature[] curvature) {

    /** The model on its own mesh. */
    static StepStart of(StellarModel model) {
        StellarProfile p = model.profile();
        return new StepStart(model.state(), p.densities(), p.temperatures(), p.pressures(), p.internalEnergies(),
                p.convectiveFlags(), p.eosStates(), p.eosCurvatures());
    }

    /** The model moved onto the mesh {@code planner} chooses with the given extra interval costs. */
    static StepStart remeshed(StellarModel model, MeshPlanner planner, double[] extraCost, PhysicsSet physics) {
        ModelState old = model.state();
        ModelState moved = planner.remesh(model, extraCost);
        Composition[] comp = MassRemap.remap(old.mesh(), old.compositions(), moved.mesh());
        moved = moved.withCompositions(comp);
        int n = moved.size();
        double[] rho = new double[n];
        double[] t = new double[n];
        double[] pressure = new double[n];
        double[] u = new double[n];
        boolean[] conv = new boolean[n];
        EosState[] eos = new EosState[n];
        double[] oldMass = model.profile().masses();
        MassMesh mesh = moved.mesh();
        EosState s = null;
        for (int k = 0; k < n; k++) {
            rho[k] = Math.exp(moved.lnDensity(k));
            t[k] = Math.exp(moved.lnTemperature(k));
            // started from the point below, a few per cent away in rho and T: the same state to the equation of
            // state's solve tolerance, in fewer of its iterations than from a cold guess (not counted; the step
            // start of remeshed steps went from 2.2 to 1.6 % of the CPU before the ZAMS, JFR)
            s = s == null ? physics.eos().atDensity(rho[k], t[k], comp[k])
                    : physics.eos().atDensity(rho[k], t[k], comp[k], s);
            pressure[k] = s.pressure();
            u[k] = s.internalEnergy();
            eos[k] = s;
            conv[k] = model.profile().convective(nearest(oldMass, mesh.mass(k)));
        }
        return new StepStart(moved, rho, t, pressure, u, conv, eos, null);
    }

    /** ln P at every point (only the Ledoux criterion's nabla_mu needs it, so it is not kept). */
    double[] lnPressure() {
        double[] out = new double[pressure.length];
        for (int k = 0; k < out.length; k++) {
            out[k] = Math.log(pressure[k]);
        }
        return out;
    }

    private static int nearest(double[] sorted, double value) {
        int i = Arrays.binarySearch(sorted, value);
        if (i >= 0) {
            return i;
        }
        int above = -i - 1;
        if (above == 0) {
            return 0;
        }
        if (above == sorted.length) {
            return sorted.length - 1;
        }
        return value - sorted[above - 1] <= sorted[above] - value ? above - 1 : above;
    }
}
