package org.convgrid.engine.calibration;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Not a test: one solar track at a fixed mixing length, initial Y and initial Z/X (by default the calibrated values
 * of the standard physics), printing what settling changes: envelope Y and Z/X, envelope base, centre, R and L.
 * Run with -Dconvgrid.probe=true (-Dprobe.alpha, -Dprobe.y, -Dprobe.zx, -Dprobe.settling=false).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class SolarTrackProbe {

    @Test
    void track() {
        double alpha = Double.parseDouble(System.getProperty("probe.alpha", "1.7218"));
        double y = Double.parseDouble(System.getProperty("probe.y", "0.2667"));
        double zx = Double.parseDouble(System.getProperty("probe.zx", "0.02460"));
        boolean settling = Boolean.parseBoolean(System.getProperty("probe.settling", "true"));
        long t0 = System.nanoTime();
        CalibrationSettings s = CalibrationSettings.DEFAULT.withMetalsToHydrogen(zx).withSettling(settling);
        SolarTrial t = new SolarTrack(s).run(alpha, y, false);
        var m = t.model();
        var env = EnvelopeComposition.of(m);
        System.out.printf("alpha=%.4f Y0=%.4f Z/X0=%.5f settling=%b: Ys=%.4f (Y0-Ys=%.4f) Z/Xs=%.5f rcz=%.4f "
                        + "Tc=%.4e (%+.2f %%) rhoc=%.2f (%+.2f %%) lnR=%+.4f lnL=%+.4f steps=%d time=%.1f s%n",
                alpha, y,
                zx, settling, env.y(), y - env.y(), EnvelopeComposition.metalsToHydrogen(env),
                m.convection().envelopeBaseRadiusFraction(), m.global().centralTemperature(),
                100 * (m.global().centralTemperature() / 1.567e7 - 1), m.global().centralDensity(),
                100 * (m.global().centralDensity() / 152.9 - 1), t.radiusResidual(), t.luminosityResidual(),
                t.evolution().steps().size(), (System.nanoTime() - t0) / 1e9);
    }
}
