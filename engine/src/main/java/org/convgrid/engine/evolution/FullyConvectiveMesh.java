package org.convgrid.engine.evolution;

import java.util.List;

import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.StellarModel;

/**
 * The mesh of a young star with no radiative interior: while one convective zone runs from the centre to the surface
 * layers the structure is close to an n = 1.5 polytrope (adiabatic almost everywhere, composition uniform) and needs
 * fewer points than the {@link MeshPlanner#DEFAULT_POINTS} of a star with a radiative core. The start model of the
 * pre-main sequence is built on {@link #POINTS}, and the evolver keeps the start model's mesh size while this holds
 * before the zero-age main sequence, moving (the conservative remesh of {@link StepStart}) on the step after the
 * first model with a radiative interior to {@link RadiativeContractionMesh}'s while nuclear burning supplies under its
 * share of L, else straight to the evolver's own planner, as it does on arrival at the zero-age main sequence (a star that stays fully convective, below ~0.35 Msun, spends its main sequence on the
 * mesh a zero-age track has).
 *
 * <p>Why {@link #POINTS} = 250 (measured, 0.1/0.3/0.5/1/1.5/3 Msun, Z = 0.02, against the same tracks with 500
 * points throughout; coarse sizes 150-450 tried): the Hayashi track itself hardly notices the mesh (1 Msun at 200 and 300
 * points: L and R at 0.5-10 Myr within 0.1 %, the radiative-core onset 0.3 % earlier at every coarse size), but the step history
 * after the switch does, and with it the quantities the pre-main-sequence steps leave first order: the 1 Msun ZAMS
 * age scatters by +-1 Myr around 39 Myr and its surface lithium at 1 Gyr by +-0.07 dex around -1.0 whatever the
 * coarse size (ZAMS 38.2-39.7 Myr, log Li/Li0 -0.94 to -1.08 for 150-400 points, not ordered by size; 500 points:
 * 39.2 Myr, -0.98). 150-200 points would save more (at 1 Msun the start model and the 42 fully convective
 * steps take 31 + ~155 Newton iterations at any of these sizes, the 36 later pre-main-sequence steps ~130; thread
 * CPU time of the whole track from birth to exhaustion, warm, loaded machine: 1107 ms at 500 points, 997 at 250,
 * 908 at 150, the main sequence ~510 of each) but their three draws of the 1 Gyr lithium all fell
 * 0.05-0.08 dex below the 500-point value; 250 gave -0.94, 225 and 260 the same. Stateless.
 */
public final class FullyConvectiveMesh {

    /** Mesh points of a fully convective star. */
    public static final int POINTS = 250;

    private FullyConvectiveMesh() {
    }

    /** Immutable, so one serves every track and thread. */
    private static final MeshPlanner PLANNER = new MeshPlanner(POINTS);

    /** The planner of a fully convective star, {@link #POINTS} points. */
    public static MeshPlanner planner() {
        return PLANNER;
    }

    /**
     * Whether the model has no radiative interior: its innermost convective zone starts at the centre and reaches
     * above {@link SurfaceComposition#ENVELOPE_TOP} in m/M (the thin radiative atmosphere above it does not count).
     */
    public static boolean holds(StellarModel model) {
        List<ConvectiveZone> zones = model.convection().zones();
        return !zones.isEmpty() && zones.get(0).innerMassFraction() == 0.0
                && zones.get(0).outerMassFraction() >= SurfaceComposition.ENVELOPE_TOP;
    }
}
