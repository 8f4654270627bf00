package org.convgrid.engine.birth;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/** ZAMS ages and timings of the test tracks (run with -Dconvgrid.probe=true). */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class ZamsArrivalProbe {

    @Test
    void arrivals() {
        double coarse = Double.parseDouble(System.getProperty("probe.coarse", "2"));
        double[][] cases = {{0.5, 0.02, 250}, {1.0, 0.02, 100}, {1.5, 0.02, 50}, {2.0, 0.02, 30}, {3.0, 0.02, 10},
            {0.3, 0.02, 1000}, {0.1, 0.008, 1000}};
        for (double[] c : cases) {
            long t0 = System.nanoTime();
            BirthTrack t = BirthTracks.track(c[0], c[1], c[2], coarse, 100);
            LifeEvents e = t.events();
            double minLi = Double.NaN;
            for (TrackPoint p : t.points()) {
                if (Math.abs(p.age() - 100 * BirthTracks.MYR) < 1) {
                    minLi = p.surfaceLithium();
                }
            }
            System.out.printf("M %.2f Z %.3f: %d steps %.1f s end %s %.4g Myr; rad core %.4g ZAMS %.4g core %.4g-%.4g Li/2 %.4g Myr; Li(100 Myr) %.4g %s%n",
                    c[0], c[1], t.points().size(), (System.nanoTime() - t0) * 1e-9, t.result().end(),
                    t.result().endAge() / BirthTracks.MYR, e.radiativeCore() / BirthTracks.MYR,
                    e.zeroAgeMainSequence() / BirthTracks.MYR, e.convectiveCoreOnset() / BirthTracks.MYR,
                    e.convectiveCoreEnd() / BirthTracks.MYR, e.lithiumHalved() / BirthTracks.MYR, minLi,
                    t.result().detail());
        }
    }
}
