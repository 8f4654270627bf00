package org.convgrid.engine.calibration;

import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.EvolutionResult;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;
import org.convgrid.engine.zams.ZamsBuilder;
import org.convgrid.engine.zams.ZamsResult;
import org.convgrid.engine.zams.ZamsTrack;

/**
 * Computes trial Suns: standard physics (no overshoot, Schwarzschild criterion, opacity as published), the
 * zero-age model from a cold start, then {@link MainSequenceEvolver}. Stopping at the calibration age saves about
 * half of the work; the steps up to that age do not depend on where the evolution stops (the step sequence is
 * set by the change limits and the landing on the requested age), so the final full-life run reproduces the
 * model of the last trial exactly. Immutable and thread-safe.
 */
final class SolarTrack {

    private final CalibrationSettings settings;

    SolarTrack(CalibrationSettings settings) {
        this.settings = settings;
    }

    /** The physics options of a trial with mixing length {@code alpha} and the settings' atmosphere. */
    static PhysicsOptions options(double alpha, CalibrationSettings settings) {
        return new PhysicsOptions(alpha, 0.0, StabilityCriterion.SCHWARZSCHILD, 1.0, OpacityChoice.BUILT_IN,
                settings.atmosphere());
    }

    /**
     * @param alpha mixing length, pressure scale heights
     * @param y initial helium
     * @param wholeLife evolve on to core-hydrogen exhaustion (for the lifetime) instead of stopping at the age
     * @throws ConvgridException NOT_CONVERGED when the zero-age model or the evolution fails
     */
    SolarTrial run(double alpha, double y, boolean wholeLife) {
        double x = settings.hydrogen(y);
        double z = settings.metals(y);
        Composition composition = Composition.scaledSolar(x, z);
        PhysicsSet physics = StandardPhysics.create(options(alpha, settings), composition);
        ZamsResult zams = ZamsTrack.solveOne(new ZamsBuilder(physics), composition, Constants.M_SUN, null);
        if (!zams.converged()) {
            throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                    "no zero-age 1 Msun model for alpha = %.5f, Y = %.5f, Z = %.5f: %s", alpha, y, z,
                    zams.failure()), "alpha", alpha, "Y", y, "Z", z);
        }
        MainSequenceEvolver.Settings s = settings.evolution();
        if (!wholeLife) {
            s = new MainSequenceEvolver.Settings(s.maxCentralHydrogenChange(), s.exhaustionFraction(),
                    s.maxLuminosityChange(), s.maxGrowth(), s.endCentralHydrogen(), settings.age(),
                    s.stepBudget(), s.retryBudget());
        }
        EvolutionResult r = new MainSequenceEvolver(physics, s).withSettling(settings.settling()).evolve(zams.model().model(),
                new double[] {settings.age()});
        AgedModel at = r.models().get(0);
        if (at.status() != ModelStatus.OK) {
            throw new ConvgridException(ErrorKind.NOT_CONVERGED, String.format(
                    "1 Msun evolution for alpha = %.5f, Y = %.5f, Z = %.5f did not reach %.4g Gyr: %s %s", alpha,
                    y, z, settings.age() / Constants.GYR, at.status(), at.detail()), "alpha", alpha, "Y", y, "Z", z);
        }
        return new SolarTrial(alpha, y, z, zams.model().model().global().luminosity(), at.model(), r);
    }
}
