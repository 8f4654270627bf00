package org.convgrid.engine.calibration;

import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

/**
 * Not a test: prints every trial of a solar calibration. Run with -Dconvgrid.probe=true (-Dprobe.zx=0.0245 for
 * another present envelope Z/X, -Dprobe.settling=false for a calibration without settling).
 */
@EnabledIfSystemProperty(named = "convgrid.probe", matches = "true")
class CalibrationProbe {

    @Test
    void calibrate() {
        long t0 = System.nanoTime();
        double zx = Double.parseDouble(System.getProperty("probe.zx", "0.0231"));
        boolean settling = Boolean.parseBoolean(System.getProperty("probe.settling", "true"));
        CalibratedSun sun = new SolarCalibration(CalibrationSettings.DEFAULT.withMetalsToHydrogen(zx)
                .withSettling(settling)).calibrate(t -> System.out.printf(
                "%7.2f s alpha=%.5f Y=%.5f Z=%.5f lnR=%+.3e lnL=%+.3e Lzams=%.4f steps=%d%n",
                (System.nanoTime() - t0) / 1e9, t.mixingLength(), t.helium(), t.metals(), t.radiusResidual(),
                t.luminosityResidual(), t.zeroAgeLuminosity() / Constants.L_SUN, t.evolution().steps().size()));
        System.out.printf("alpha=%.5f Y=%.5f Z=%.5f Z/X0=%.5f Ys=%.4f Z/Xs=%.5f rcz=%.4f Tc=%.4e (%+.2f %%) rhoc=%.2f "
                        + "(%+.2f %%) Lzams/L=%.4f life=%.3f evols=%d newton=%d resid=%.2e %.2e time=%.1f s%n",
                sun.mixingLength(), sun.helium(), sun.metals(), sun.initialMetalsToHydrogen(), sun.envelopeHelium(),
                sun.envelopeMetalsToHydrogen(), sun.envelopeBaseRadiusFraction(), sun.centralTemperature(),
                100 * (sun.centralTemperature() / 1.567e7 - 1), sun.centralDensity(),
                100 * (sun.centralDensity() / 152.9 - 1),
                sun.zeroAgeLuminosity() / Constants.L_SUN, sun.exhaustionAge() / Constants.GYR, sun.evolutions(),
                sun.newtonSteps(), sun.radiusResidual(), sun.luminosityResidual(), (System.nanoTime() - t0) / 1e9);
    }
}
