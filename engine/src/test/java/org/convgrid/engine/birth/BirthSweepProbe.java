package org.convgrid.engine.birth;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Robustness from birth: masses 0.1-10 Msun every {@code probe.dex} dex at four metallicities, each evolved to
 * three times a rough contraction time (50 Myr (M/Msun)^-2.5, at most {@code probe.maxmyr}); prints which reach
 * the ZAMS (run with -Dconvgrid.probe=true).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class BirthSweepProbe {

    @Test
    void sweep() {
        double dex = Double.parseDouble(System.getProperty("probe.dex", "0.2"));
        double maxMyr = Double.parseDouble(System.getProperty("probe.maxmyr", "3000"));
        int total = 0;
        int reached = 0;
        for (double z : new double[] {1.0e-4, 0.004, 0.02, 0.04}) {
            for (double lg = -1.0; lg <= 1.0 + 1e-9; lg += dex) {
                double m = Math.pow(10.0, lg);
                double end = Math.min(maxMyr, 3.0 * 50.0 * Math.pow(m, -2.5));
                total++;
                long t0 = System.nanoTime();
                String line;
                try {
                    BirthTrack t = BirthTracks.track(m, z, end, 1.0, end);
                    boolean ok = !Double.isNaN(t.events().zeroAgeMainSequence());
                    reached += ok ? 1 : 0;
                    line = String.format("%s end %s at %.4g Myr ZAMS %.4g Myr steps %d %s", ok ? "ok  " : "NO  ",
                            t.result().end(), t.result().endAge() / BirthTracks.MYR,
                            t.events().zeroAgeMainSequence() / BirthTracks.MYR, t.points().size(), t.result().detail());
                } catch (RuntimeException e) {
                    line = "FAIL " + e;
                }
                System.out.printf("M %.3f Z %.4g (%.1f s): %s%n", m, z, (System.nanoTime() - t0) * 1e-9, line);
            }
        }
        System.out.printf("reached the ZAMS: %d of %d%n", reached, total);
    }
}
