package org.convgrid.cli;

import java.util.List;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.refine.MassLine;
import org.convgrid.engine.refine.MassLineFactory;
import org.convgrid.engine.units.Constants;

/**
 * A made-up structure (not physics) that is not monotonic in mass: fully convective below 0.375 Msun, a small
 * convective core in the window 0.42-0.47 Msun, none up to 1.225 Msun, a core above. Serves grid chunks and
 * refinement lines alike.
 */
final class FlickeringFake implements ChunkSolver, MassLineFactory {

    static final double FC_EDGE = 0.375;
    static final double WINDOW_LO = 0.42;
    static final double WINDOW_HI = 0.47;
    static final double CORE_EDGE = 1.225;

    private final double fcEdge;
    private final double windowLo;
    private final double windowHi;

    /** The structure described above. */
    FlickeringFake() {
        this(FC_EDGE, WINDOW_LO, WINDOW_HI);
    }

    /** Fully convective below {@code fcEdge}, a core in [windowLo, windowHi) and from {@link #CORE_EDGE}. */
    FlickeringFake(double fcEdge, double windowLo, double windowHi) {
        this.fcEdge = fcEdge;
        this.windowLo = windowLo;
        this.windowHi = windowHi;
    }

    @Override
    public List<ModelOutcome> solve(List<ModelRequest> chunk) {
        return chunk.stream().map(this::outcome).toList();
    }

    @Override
    public MassLine open(PhysicsOptions physics, double initialMetals, double initialHelium) {
        return this::outcome;
    }

    ModelOutcome outcome(ModelRequest r) {
        double m = r.mass() / Constants.M_SUN;
        boolean fc = m < fcEdge;
        double core = fc ? 1 : (m >= windowLo && m < windowHi) ? 0.05 : m >= CORE_EDGE ? 0.08 : 0;
        StructureClass c = fc ? StructureClass.FULLY_CONVECTIVE
                : core > 0 ? StructureClass.CONV_CORE_AND_ENVELOPE : StructureClass.CONV_ENVELOPE;
        List<ConvectiveZone> zones = fc ? List.of(new ConvectiveZone(0, 1, 0, 1))
                : List.of(new ConvectiveZone(0.7, 1, 0.8, 1));
        // only the zones matter to the refinement; the surface and centre are placeholders
        GlobalProperties g = new GlobalProperties(Constants.L_SUN * m, Constants.R_SUN * m, 5000.0, 1.0e4, 1.5e7,
                100.0, 0.7);
        return new ModelOutcome.Solved(r, g,
                new ConvectiveStructure(zones, c, core, fc ? 0 : 0.7, fc ? 0 : 0.8, 0.3 * r.mass(), 1, 1), 3);
    }
}
