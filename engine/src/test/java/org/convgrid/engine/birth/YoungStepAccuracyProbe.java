package org.convgrid.engine.birth;

import org.convgrid.engine.evolution.AgedModel;
import org.convgrid.engine.evolution.SurfaceComposition;
import org.convgrid.engine.structure.StellarModel;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * The quantities the pre-main-sequence step limits protect, at one or more factors on every limit, to compare a
 * looser limit's values with the converged ones (run with -Dconvgrid.probe=true, -Dprobe.coarse=1,0.5,0.25; the
 * limits themselves with -Dprobe.limits as for {@link BirthTracks#limits()}): central and surface deuterium over
 * their birth value at 0.3 and 1 Myr, the radius at 1 Myr, the radiative-core onset, the lithium halving, the ZAMS
 * age, the surface lithium at the last requested age (1 Gyr for 1 Msun, 100 Myr for 0.5 Msun), the energy closure to
 * that age and the steps and Newton iterations before the ZAMS; with -Dprobe.lowMass=true also 0.3 and 0.1 Msun (their
 * lithium halving; both stay on the pre-main sequence to the end age).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class YoungStepAccuracyProbe {

    private static final double MYR = BirthTracks.MYR;

    @Test
    void protectedQuantities() {
        double[] coarseness = java.util.Arrays.stream(System.getProperty("probe.coarse", "1").split(","))
                .mapToDouble(Double::parseDouble).toArray();
        // -Dprobe.lowMass=true adds 0.3 and 0.1 Msun (to 200 and 300 Myr) for their lithium halving
        double[][] cases = Boolean.getBoolean("probe.lowMass")
                ? new double[][] {{1.0, 1000, 1000}, {0.5, 300, 100}, {0.3, 200, 200}, {0.1, 300, 300}}
                : new double[][] {{1.0, 1000, 1000}, {0.5, 300, 100}};
        for (double coarse : coarseness) {
            for (double[] c : cases) {
                BirthTrack t = BirthTracks.track(c[0], 0.02, c[1], coarse, 0.3, 1, c[2]);
                StellarModel first = t.start().model();
                double d0 = first.state().composition(0).h2();
                double s0 = SurfaceComposition.of(first).h2();
                AgedModel a03 = t.models().get(0);
                AgedModel a1 = t.models().get(1);
                AgedModel last = t.models().get(2);
                int young = 0;
                int youngNewton = 0;
                int newton = 0;
                for (TrackPoint p : t.points()) {
                    newton += p.step().iterations();
                    if (p.phase() == Phase.PRE_MAIN_SEQUENCE && p.age() > 0.0) {
                        young++;
                        youngNewton += p.step().iterations();
                    }
                }
                LifeEvents e = t.events();
                System.out.printf("coarse %.3f M %.1f: Dc/D0 %.5e %.5e  Ds/D0 %.5e %.5e  R(1 Myr) %.6f Rsun  "
                                + "rad core %.5g Li/2 %.5g ZAMS %.5g Myr  log Li(%g Myr) %.4f  closure %.3f %%  "
                                + "young %d steps %d it, all %d steps %d it%n",
                        coarse, c[0], a03.model().state().composition(0).h2() / d0,
                        a1.model().state().composition(0).h2() / d0,
                        SurfaceComposition.of(a03.model()).h2() / s0, SurfaceComposition.of(a1.model()).h2() / s0,
                        a1.model().global().radius() / Constants.R_SUN, e.radiativeCore() / MYR,
                        e.lithiumHalved() / MYR, e.zeroAgeMainSequence() / MYR, c[2],
                        Math.log10(t.surfaceLithiumAt(last)), 100.0 * closure(t, last.age()), young, youngNewton,
                        t.points().size() - 1, newton);
            }
        }
    }

    /** |radiated - nuclear - released| / radiated from birth to {@code end} (as PreMainSequenceTest sums it). */
    private static double closure(BirthTrack t, double end) {
        BirthTracks.EmittedEnergy sums = BirthTracks.emitted(t, end);
        double radiated = sums.radiated();
        double nuclear = sums.nuclear();
        AgedModel last = t.models().get(t.models().size() - 1);
        double released = StarEnergy.total(t.start().model(), BirthTracks.physics(0.02))
                - StarEnergy.total(last.model(), BirthTracks.physics(0.02));
        return Math.abs(radiated - nuclear - released) / radiated;
    }
}
