package org.convgrid.engine.evolution;

import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.StellarModel;

/**
 * The mesh of a young star between the appearance of its radiative core and the approach to the zero-age main sequence:
 * while it has a radiative interior ({@link FullyConvectiveMesh#holds} no longer) and nuclear burning supplies less
 * than {@link #NUCLEAR_FRACTION} of its luminosity, the star contracts with a composition still uniform and needs fewer
 * points than the {@link MeshPlanner#DEFAULT_POINTS} of a star burning in its centre. The evolver moves from {@link
 * FullyConvectiveMesh#POINTS} to {@link #POINTS} on the step after the first model with a radiative interior, and to
 * its own planner on the step after the first model at or above {@link #NUCLEAR_FRACTION}, where the approach to the
 * zero-age main sequence begins (12C and 3He burning out of equilibrium, a small convective core, composition
 * gradients). The mesh never shrinks: a model on the evolver's own mesh stays on it.
 *
 * <p>Why {@link #POINTS} = 300 and {@link #NUCLEAR_FRACTION} = 0.1 (measured, Z = 0.02, default step limits,
 * ZamsArrivalProbe and YoungStepAccuracyProbe, against the same tracks with 500 points in this phase): with 300 points
 * the zero-age main-sequence ages of 0.5/1/1.5/2/3 Msun move by +0.1/+0.3/-0.3/0.0/+0.0 %, the 1 Msun lithium halving
 * by +0.5 % and its log Li/Li0 at 1 Gyr by +0.004 dex; the 1 Msun steps before the ZAMS take 0.33-0.35 s of thread CPU
 * instead of 0.37-0.42 s (BirthCostProbe, loaded machine, interleaved; the same 77 steps and 275 Newton iterations).
 * Sizes 275-600 in this phase give ZAMS ages within 38.24-38.39 / 25.56-25.72 / 11.04-11.11 / 3.474-3.482 Myr (1 / 1.5
 * / 2 / 3 Msun) and log Li/Li0 at 1 Gyr within -0.562 to -0.602, not ordered by size (500: 38.24 / 25.72 / 11.08 /
 * 3.481 Myr, -0.566): where the base of the envelope and the edge of the core fall between points moves them that much
 * at any of these sizes. Kept up to the zero-age main sequence instead, 350 points moved the 1.5 and 2 Msun ZAMS ages
 * by -0.6 and -0.7 % and 250 points by -1.4 and -1.3 %; 250 points up to L_nuc/L = 0.1 moved the 2 Msun ZAMS by -0.8 %
 * and the 1 Msun lithium halving by +2.3 %, and so did 250 points until the radiative core holds 60 % of the mass.
 * Stateless.
 */
public final class RadiativeContractionMesh {

    /** Mesh points of a contracting star with a radiative core. */
    public static final int POINTS = 300;
    /** From this L_nuc/L on the star is on the evolver's own mesh. */
    public static final double NUCLEAR_FRACTION = 0.1;

    /** Immutable, so one serves every track and thread. */
    private static final MeshPlanner PLANNER = new MeshPlanner(POINTS);

    private RadiativeContractionMesh() {
    }

    /** The planner of a contracting star with a radiative core, {@link #POINTS} points. */
    public static MeshPlanner planner() {
        return PLANNER;
    }

    /**
     * Whether a model before the zero-age main sequence is in this phase: it has a radiative interior and burns
     * less than {@link #NUCLEAR_FRACTION} of its luminosity.
     */
    public static boolean holds(StellarModel model) {
        return !FullyConvectiveMesh.holds(model) && NuclearLuminosity.fraction(model) < NUCLEAR_FRACTION;
    }
}
