package org.convgrid.engine.birth;

import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.engine.evolution.PreMainSequenceLimits;
import org.convgrid.engine.physics.PhysicsSet;
import org.convgrid.engine.physics.StandardPhysics;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.state.BirthAbundances;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.units.Constants;

/** Tracks from birth shared by the pre-main-sequence tests, each computed once per JVM. */
final class BirthTracks {

    static final double MYR = 1.0e6 * Constants.YEAR;

    private static final Map<String, BirthTrack> TRACKS = new ConcurrentHashMap<>();
    private static final Map<Double, PhysicsSet> PHYSICS = new ConcurrentHashMap<>();

    private BirthTracks() {
    }

    /**
     * Birth composition with Y = 0.2485 + 1.5 Z. Not the README's helium law nor {@code star}'s default, which take
     * 0.2471 + 1.5 Z: the frozen values of the birth-track tests and the reference digits were taken with 0.2485.
     */
    static Composition birth(double z) {
        double y = 0.2485 + 1.5 * z;
        return BirthAbundances.of(1.0 - y - z, z);
    }

    static PhysicsSet physics(double z) {
        return PHYSICS.computeIfAbsent(z, k -> StandardPhysics.create(PhysicsOptions.DEFAULT, birth(k)));
    }

    /**
     * The default pre-main-sequence limits, or for a probe the values of -Dprobe.limits (comma-separated, in
     * the order of the {@link PreMainSequenceLimits} components).
     */
    static PreMainSequenceLimits limits() {
        String given = System.getProperty("probe.limits");
        if (given == null) {
            return PreMainSequenceLimits.DEFAULT;
        }
        double[] v = java.util.Arrays.stream(given.split(",")).mapToDouble(Double::parseDouble).toArray();
        return new PreMainSequenceLimits(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8],
                v.length > 9 ? v[9] : PreMainSequenceLimits.DEFAULT.maxContractionChange());
    }

    /**
     * @param massInSun Msun
     * @param z metals
     * @param endMyr age limit, Myr
     * @param coarseness factor on every step limit (1 = the defaults)
     * @param agesMyr requested ages, Myr
     */
    static synchronized BirthTrack track(double massInSun, double z, double endMyr, double coarseness,
                                         double... agesMyr) {
        return cached(massInSun + "/" + z + "/" + endMyr + "/" + coarseness + "/" + java.util.Arrays.toString(agesMyr),
                () -> evolve(massInSun, birth(z), physics(z), endMyr, coarseness, agesMyr));
    }

    /** The track cached under {@code key}, made by {@code make} the first time (tests share tracks). */
    private static synchronized BirthTrack cached(String key, java.util.function.Supplier<BirthTrack> make) {
        BirthTrack cached = TRACKS.get(key);
        if (cached == null) {
            cached = make.get();
            TRACKS.put(key, cached);
        }
        return cached;
    }

    /**
     * A track at the default step limits with its own birth helium and mixing length, for comparisons with published
     * sets computed with other inputs than the tests' usual Y = 0.2485 + 1.5 Z and alpha 1.8.
     *
     * @param massInSun Msun
     * @param y birth helium mass fraction
     * @param z birth metal mass fraction
     * @param mixingLength alpha, in pressure scale heights
     * @param endMyr age limit, Myr
     * @param agesMyr requested ages, Myr
     */
    static synchronized BirthTrack trackWith(double massInSun, double y, double z, double mixingLength,
                                             double endMyr, double... agesMyr) {
        Composition composition = BirthAbundances.of(1.0 - y - z, z);
        PhysicsOptions options = new PhysicsOptions(mixingLength, 0.0, PhysicsOptions.DEFAULT.criterion(),
                PhysicsOptions.DEFAULT.opacityScale());
        return cached(massInSun + "/y" + y + "/z" + z + "/alpha" + mixingLength + "/" + endMyr + "/"
                + java.util.Arrays.toString(agesMyr), () -> evolve(massInSun, composition,
                StandardPhysics.create(options, composition), endMyr, 1.0, agesMyr));
    }

    /**
     * A track at the default step limits with decaying (exponential diffusive) overshoot of length {@code f},
     * the tests' usual composition and alpha 1.8.
     */
    static synchronized BirthTrack trackDecaying(double massInSun, double z, double f, double endMyr,
                                                 double... agesMyr) {
        PhysicsOptions options = new PhysicsOptions(PhysicsOptions.DEFAULT.mixingLength(), f,
                PhysicsOptions.DEFAULT.criterion(), PhysicsOptions.DEFAULT.opacityScale(),
                PhysicsOptions.DEFAULT.opacity(), PhysicsOptions.DEFAULT.atmosphere(),
                org.convgrid.engine.request.OvershootScheme.EXPONENTIAL);
        return cached(massInSun + "/z" + z + "/decaying" + f + "/" + endMyr + "/" + java.util.Arrays.toString(agesMyr),
                () -> evolve(massInSun, birth(z), StandardPhysics.create(options, birth(z)), endMyr, 1.0, agesMyr));
    }

    private static BirthTrack evolve(double massInSun, Composition composition, PhysicsSet physics, double endMyr,
                                     double coarseness, double... agesMyr) {
        MainSequenceEvolver.Settings d = MainSequenceEvolver.Settings.DEFAULT.scaled(coarseness);
        MainSequenceEvolver.Settings s = new MainSequenceEvolver.Settings(d.maxCentralHydrogenChange(),
                d.exhaustionFraction(), d.maxLuminosityChange(), d.maxGrowth(), d.endCentralHydrogen(),
                endMyr * MYR, d.stepBudget(), d.retryBudget());
        BirthEvolution evolution = new BirthEvolution(new StartModelBuilder(physics),
                new MainSequenceEvolver(physics, s).withPreMainSequenceLimits(
                        limits().scaled(coarseness)), BirthEvolution.DEFAULT_CORE_THRESHOLD);
        double[] ages = new double[agesMyr.length];
        for (int i = 0; i < ages.length; i++) {
            ages[i] = agesMyr[i] * MYR;
        }
        return evolution.evolve(massInSun * Constants.M_SUN, composition, ages);
    }

    /** The energy a track radiated and released by burning, erg, and the index of the last step summed. */
    record EmittedEnergy(double radiated, double nuclear, int last) {
    }

    /**
     * Trapezoid sums of L and L_nuc over the steps of {@code t} from birth to the last step at or before {@code end}
     * (s).
     */
    static EmittedEnergy emitted(BirthTrack t, double end) {
        List<TrackPoint> points = t.points();
        double radiated = 0.0;
        double nuclear = 0.0;
        int last = 0;
        for (int i = 1; i < points.size() && points.get(i).age() <= end; i++) {
            double h = points.get(i).step().timeStep();
            TrackPoint a = points.get(i - 1);
            TrackPoint b = points.get(i);
            radiated += 0.5 * h * (a.step().luminosity() + b.step().luminosity());
            nuclear += 0.5 * h * (a.nuclearFraction() * a.step().luminosity()
                    + b.nuclearFraction() * b.step().luminosity());
            last = i;
        }
        return new EmittedEnergy(radiated, nuclear, last);
    }
}
