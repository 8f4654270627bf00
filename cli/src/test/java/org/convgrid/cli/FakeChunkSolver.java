package org.convgrid.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.convgrid.engine.request.Age;
import org.convgrid.engine.batch.ChunkSolver;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.LifeStage;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.SeismicScales;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.units.Constants;

/**
 * A stand-in for the structure solver with made-up, smooth numbers (not physics). Like homology seeding, every
 * outcome depends on the chunk's first model and on the position in the chunk, so a change in how a grid is cut
 * into chunks (threads, shards, resumes) changes the catalogue's bytes. Fully convective below 0.375 Msun, a
 * convective envelope up to 1.225 Msun, a convective core above (between grid masses, so round-off cannot move them);
 * with {@link #withPeriodScale}, a g-mode period scale for every star but the fully convective ones.
 */
final class FakeChunkSolver implements ChunkSolver {

    private final Set<String> failing;
    private final long millisPerModel;
    private final boolean periodScale;

    FakeChunkSolver(Set<String> failing, long millisPerModel) {
        this(failing, millisPerModel, false);
    }

    private FakeChunkSolver(Set<String> failing, long millisPerModel, boolean periodScale) {
        this.failing = Set.copyOf(failing);
        this.millisPerModel = millisPerModel;
        this.periodScale = periodScale;
    }

    static FakeChunkSolver fast() {
        return new FakeChunkSolver(Set.of(), 0);
    }

    /**
     * A fast solver whose stars also have a g-mode period scale. Opt-in: the tests of earlier catalogue layouts made
     * by cutting this version's last columns expect a resume to give back every byte, which rows without the period
     * scale cells of a model not solved again cannot.
     */
    static FakeChunkSolver withPeriodScale() {
        return new FakeChunkSolver(Set.of(), 0, true);
    }

    @Override
    public List<ModelOutcome> solve(List<ModelRequest> chunk) {
        double seed = chunk.get(0).mass() / Constants.M_SUN;
        List<ModelOutcome> outcomes = new ArrayList<>(chunk.size());
        for (int i = 0; i < chunk.size(); i++) {
            pause();
            ModelRequest r = chunk.get(i);
            int iterations = 4 + i + (int) (10 * seed);
            if (failing.contains(r.modelId())) {
                outcomes.add(new ModelOutcome.Failed(r, ModelStatus.FAILED, "fake solver gave up\nat shell 12",
                        iterations));
            } else {
                ConvectiveStructure convection = convection(r);
                outcomes.add(new ModelOutcome.Solved(r, global(r, seed), convection, iterations,
                        LifeStage.MAIN_SEQUENCE_UNTRACED, Double.NaN,
                        periodScale ? new SeismicScales(buoyancyTravelTime(r, convection), Double.NaN, Double.NaN,
                                Double.NaN)
                                : SeismicScales.UNKNOWN));
            }
        }
        return outcomes;
    }

    private static GlobalProperties global(ModelRequest r, double seed) {
        double m = r.mass() / Constants.M_SUN;
        double ageGyr = ((Age.SinceZeroAge) r.age()).seconds() / Constants.GYR;
        double l = Math.pow(m, 4) * (1 + 1e-3 * seed) * (1 + 0.1 * ageGyr);
        double radius = Math.pow(m, 0.8) * (1 + 0.05 * ageGyr + r.initialMetals());
        double teff = Constants.TEFF_SUN * Math.pow(l / (radius * radius), 0.25);
        double g = Constants.G * r.mass() / Math.pow(radius * Constants.R_SUN, 2);
        return new GlobalProperties(l * Constants.L_SUN, radius * Constants.R_SUN, teff, g, 1.5e7 * Math.sqrt(m),
                150.0 / m, Math.max(0.0, 0.7 - 0.05 * ageGyr * m));
    }

    /** Made-up Pi_0 (s) falling with age, none for a fully convective star, as the real one has none. */
    private static double buoyancyTravelTime(ModelRequest r, ConvectiveStructure convection) {
        if (convection.structureClass() == StructureClass.FULLY_CONVECTIVE) {
            return Double.NaN;
        }
        double ageGyr = ((Age.SinceZeroAge) r.age()).seconds() / Constants.GYR;
        return 3000.0 * Math.sqrt(r.mass() / Constants.M_SUN) * (1 - 0.05 * ageGyr);
    }

    private static ConvectiveStructure convection(ModelRequest r) {
        double m = r.mass() / Constants.M_SUN;
        if (m < 0.375) {
            return new ConvectiveStructure(List.of(new ConvectiveZone(0, 1, 0, 1)), StructureClass.FULLY_CONVECTIVE,
                    1, 0, 0, r.mass(), 60 * Constants.DAY, 90 * Constants.DAY);
        }
        if (m < 1.225) {
            double base = 0.5 + 0.49 * (m - 0.35) / 0.85;
            double radiusBase = 0.6 + 0.3 * (m - 0.35);
            return new ConvectiveStructure(List.of(new ConvectiveZone(base, 1, radiusBase, 1)),
                    StructureClass.CONV_ENVELOPE, 0, base, radiusBase, (1 - base) * r.mass(),
                    30 * Constants.DAY / m, 40 * Constants.DAY / m);
        }
        double core = 0.08 * (m - 1.0);
        return new ConvectiveStructure(List.of(new ConvectiveZone(0, core, 0, core / 2)), StructureClass.CONV_CORE,
                core, 1, 1, 0, Double.NaN, Double.NaN);
    }

    private void pause() {
        if (millisPerModel > 0) {
            try {
                Thread.sleep(millisPerModel);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
