package org.convgrid.engine.birth;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/** ZAMS ages and timings of the test tracks (run with -Dconvgrid.probe=true). */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class ZamsArrivalProbe {

    @Test
    void arrivals() {
        // -Dprobe.coarse: one or more factors on every step limit, comma-separated (e.g. 1,0.5 for the convergence
        // of the ZAMS age); -Dprobe.cases=5 for the first five cases only (0.5-3 Msun, Z = 0.02)
        double[] coarseness = java.util.Arrays.stream(System.getProperty("probe.coarse", "2").split(","))
                .mapToDouble(Double::parseDouble).toArray();
        double[][] all = {{0.5, 0.02, 250}, {1.0, 0.02, 100}, {1.5, 0.02, 50}, {2.0, 0.02, 30}, {3.0, 0.02, 10},
            {0.3, 0.02, 1000}, {0.1, 0.008, 1000}};
        double[][] cases = java.util.Arrays.copyOf(all, Integer.parseInt(System.getProperty("probe.cases", "7")));
        for (double coarse : coarseness) {
        for (double[] c : cases) {
            if (System.getProperty("probe.only") != null
                    && Double.parseDouble(System.getProperty("probe.only")) != c[0]) {
                continue;
            }
            long t0 = System.nanoTime();
            BirthTrack t = BirthTracks.track(c[0], c[1], c[2], coarse, 100);
            LifeEvents e = t.events();
            if (Boolean.getBoolean("probe.detail")) {
                // L_nuc/L step by step from 0.5 on, up to a few steps past the ZAMS
                for (TrackPoint p : t.points()) {
                    if (p.nuclearFraction() > 0.5 && p.age() < 1.5 * e.zeroAgeMainSequence()) {
                        System.out.printf("   %.4f Myr  dt %.3g Myr  L_nuc/L %.5f  T_c %.4g  X_c %.5f%n",
                                p.age() / BirthTracks.MYR, p.step().timeStep() / BirthTracks.MYR, p.nuclearFraction(),
                                p.step().centralTemperature(), p.step().centralHydrogen());
                    }
                }
            }
            double minLi = Double.NaN;
            for (TrackPoint p : t.points()) {
                if (Math.abs(p.age() - 100 * BirthTracks.MYR) < 1) {
                    minLi = p.surfaceLithium();
                }
            }
            System.out.printf("coarse %.2f M %.2f Z %.3f: %d steps %.1f s end %s %.4g Myr; rad core %.4g ZAMS %.4g core %.4g-%.4g Li/2 %.4g Myr; Li(100 Myr) %.4g %s%n",
                    coarse, c[0], c[1], t.points().size(), (System.nanoTime() - t0) * 1e-9, t.result().end(),
                    t.result().endAge() / BirthTracks.MYR, e.radiativeCore() / BirthTracks.MYR,
                    e.zeroAgeMainSequence() / BirthTracks.MYR, e.convectiveCoreOnset() / BirthTracks.MYR,
                    e.convectiveCoreEnd() / BirthTracks.MYR, e.lithiumHalved() / BirthTracks.MYR, minLi,
                    t.result().detail());
        }
        }
    }
}
