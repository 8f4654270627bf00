package org.convgrid.engine.birth;

import java.util.Arrays;

import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.PreMainSequenceLimits;
import org.convgrid.engine.evolution.StepObserver;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.structure.HenyeySolver;
import org.convgrid.engine.structure.MeshPlanner;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.structure.StellarProfile;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Whether the small central convective cores of sub-solar stars after the zero-age main sequence (3He burning out
 * of equilibrium) converge with the mesh and the time steps: per number of points (-Dprobe.points=500,1000,2000)
 * and factor on every step limit (-Dprobe.coarse=1,0.5,0.25), the track from birth of each mass
 * (-Dprobe.masses=0.5,0.6, Msun) at -Dprobe.z to -Dprobe.endMyr, with a model landed at -Dprobe.atMyr; prints
 * the convective core's onset and end (life events), and at the landed age the core's top (the interpolated
 * Schwarzschild crossing), the last convective and first radiative points around it, the points inside, the
 * central nabla_rad/nabla_ad, 3He and X, and the steps and their Newton iterations, and how the track ended.
 * -Dprobe.everyMyr lands a step on every multiple of it (a cap on the step). With -Dprobe.history=true, every
 * step's (from the first with L_nuc/L at its zero-age value) length, core top and centre. Run with
 * -Dconvgrid.probe=true.
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class SmallCoreConvergenceProbe {

    @Test
    void coreAgainstMeshAndSteps() {
        double z = number("probe.z", "0.02");
        double endMyr = number("probe.endMyr", "4000");
        double atMyr = number("probe.atMyr", "1000");
        double everyMyr = number("probe.everyMyr", "0");
        boolean history = Boolean.parseBoolean(System.getProperty("probe.history", "false"));
        PhysicsSet physics = BirthTracks.physics(z);
        for (int n : list("probe.points", "500").mapToInt(d -> (int) d).toArray()) {
            for (double coarse : list("probe.coarse", "1").toArray()) {
                for (double m : list("probe.masses", "0.5").toArray()) {
                    MeshPlanner planner = new MeshPlanner(n);
                    MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT.scaled(coarse);
                    MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                            d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                            endMyr * BirthTracks.MYR, d.stepBudget(), d.retryBudget());
                    MainSequenceEvolver evolver = new MainSequenceEvolver(physics, planner,
                            HenyeySolver.Settings.DEFAULT.withIterationBudget(MainSequenceEvolver.RELAXATION_BUDGET),
                            s).withPreMainSequenceLimits(PreMainSequenceLimits.DEFAULT.scaled(coarse));
                    StartModel start = new StartModelBuilder(physics, planner,
                            StartModelBuilder.DEFAULT_CENTRAL_TEMPERATURE).build(m * Constants.M_SUN,
                            BirthTracks.birth(z));
                    LifeRecorder recorder = new LifeRecorder(BirthEvolution.DEFAULT_CORE_THRESHOLD);
                    String tag = String.format("N=%d coarse=%.2f M=%.2f Z=%s", n, coarse, m, z);
                    StepObserver observer = (age, dt, model) -> {
                        recorder.accepted(age, dt, model);
                        if (history && org.convgrid.engine.evolution.NuclearLuminosity.onMainSequence(model)) {
                            System.out.printf("%s step %.4f Myr dt %.2f Myr %s%n", tag, age / BirthTracks.MYR,
                                    dt / BirthTracks.MYR, describe(model));
                        }
                    };
                    long t0 = System.nanoTime();
                    var result = evolver.evolve(start.model(), requestedAges(atMyr, endMyr, everyMyr), observer);
                    LifeEvents e = recorder.events();
                    StellarModel at = null;
                    for (var a : result.models()) {
                        at = Math.abs(a.age() - atMyr * BirthTracks.MYR) < 1.0 ? a.model() : at;
                    }
                    System.out.printf("%s: ZAMS %.1f Myr, core onset %.1f Myr, end %.1f Myr; at %.0f Myr %s;"
                                    + " %d steps, %d Newton iterations, %.0f s; ended %s at %.0f Myr %s%n", tag,
                            e.zeroAgeMainSequence() / BirthTracks.MYR,
                            e.convectiveCoreOnset() / BirthTracks.MYR, e.convectiveCoreEnd() / BirthTracks.MYR,
                            atMyr, at == null ? "none" : describe(at), result.steps().size(),
                            result.steps().stream().mapToInt(st -> st.iterations()).sum(),
                            (System.nanoTime() - t0) * 1e-9, result.end(), result.endAge() / BirthTracks.MYR,
                            result.detail());
                }
            }
        }
    }

    /**
     * The central zone's top (interpolated crossing, m/M), the last convective and first radiative points' m/M,
     * the points inside, the central nabla_rad/nabla_ad, 3He, X and eps_nuc.
     */
    static String describe(StellarModel model) {
        StellarProfile p = model.profile();
        double total = p.mass(p.size() - 1);
        var zones = model.convection().zones();
        double top = !zones.isEmpty() && zones.get(0).innerMassFraction() == 0.0
                ? zones.get(0).outerMassFraction() : 0.0;
        int k = 0;
        while (k < p.size() && p.convective(k)) {
            k++;
        }
        double lastConvective = k > 0 ? p.mass(k - 1) / total : 0.0;
        return String.format("top %.5f (last conv pt %.5f, first rad pt %.5f, %d pts) centre rad/ad %.4f"
                        + " He3 %.4e X %.5f eps %.3f", top, lastConvective, p.mass(k) / total, k,
                p.nablaRad(0) / p.nablaAd(0), model.state().composition(0).he3(), model.state().composition(0).x(),
                p.eps(0));
    }

    /**
     * The landed age, and with {@code everyMyr} &gt; 0 every multiple of it up to the end as well: landing a step on
     * each caps the steps at that length (the growth limit, not the change limits, sets the main-sequence steps
     * of these stars, so scaling the limits alone leaves them as they are).
     */
    private static double[] requestedAges(double atMyr, double endMyr, double everyMyr) {
        java.util.List<Double> ages = new java.util.ArrayList<>(java.util.List.of(atMyr * BirthTracks.MYR));
        for (double a = everyMyr; everyMyr > 0.0 && a < endMyr; a += everyMyr) {
            ages.add(a * BirthTracks.MYR);
        }
        return ages.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static double number(String name, String fallback) {
        return Double.parseDouble(System.getProperty(name, fallback));
    }

    private static java.util.stream.DoubleStream list(String name, String fallback) {
        return Arrays.stream(System.getProperty(name, fallback).split(",")).mapToDouble(t -> Double.parseDouble(
                t.trim()));
    }
}
