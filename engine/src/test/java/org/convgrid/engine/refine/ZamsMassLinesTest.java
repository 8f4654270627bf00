package org.convgrid.engine.refine;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.function.DoubleUnaryOperator;
import java.util.function.Predicate;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/**
 * One small real refinement with the production solver: the onset of the lasting convective core of a solar-metallicity
 * zero-age line between 1.0 and 1.2 Msun (1.14 Msun with the standard physics). A contract test of the bisection on real models (bracket, sides, seeding order), not a
 * check of the onset mass against the literature.
 */
class ZamsMassLinesTest {

    private static final double MSUN = Constants.M_SUN;
    private static final double Z = 0.02;
    private static final double Y = 0.2485 + 1.5 * Z;
    /** The finder's default core threshold (m/M at the core's top). */
    private static final double CORE_THRESHOLD = 1.0e-3;

    @Test
    void narrowsTheCoreOnsetBracketWithConvergedSeededModels() {
        Predicate<ModelOutcome.Solved> noCore = o -> !(o.convection().coreMassFraction() > CORE_THRESHOLD);
        MassLine line = new ZamsMassLines().open(PhysicsOptions.DEFAULT, Z, Y);
        double tolerance = 0.03 * MSUN;
        Refinement r = new MassBisection(tolerance, DoubleUnaryOperator.identity()).refine(line,
                m -> new ModelRequest("r", m, Z, Y, 0.0, PhysicsOptions.DEFAULT), 1.0 * MSUN, 1.2 * MSUN, noCore);
        assertThat(r.stop()).as(r.detail()).isEqualTo(BisectionStop.NARROW_ENOUGH);
        assertThat(r.width()).isLessThan(tolerance);
        assertThat(r.lowMass()).isGreaterThanOrEqualTo(1.0 * MSUN);
        assertThat(r.highMass()).isLessThanOrEqualTo(1.2 * MSUN);
        // 0.2 -> 0.1 -> 0.05 -> 0.025 Msun: three midpoints
        assertThat(r.newModels()).hasSize(3).allSatisfy(o -> assertThat(o.status()).isEqualTo(ModelStatus.OK));
        for (ModelOutcome o : r.newModels()) {
            double m = o.request().mass();
            assertThat(noCore.test(o.solved())).isEqualTo(m <= r.lowMass());
        }
        // a request at an age above zero is refused, not evolved
        ModelOutcome aged = line.solve(new ModelRequest("a", MSUN, Z, Y, Constants.GYR, PhysicsOptions.DEFAULT));
        assertThat(aged.status()).isEqualTo(ModelStatus.FAILED);
    }
}
